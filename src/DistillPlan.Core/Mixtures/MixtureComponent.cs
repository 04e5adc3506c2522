using DistillPlan.Core.Library;

namespace DistillPlan.Core.Mixtures;

/// <summary>
/// Saturation (vapour) pressure of a pure liquid.
/// </summary>
/// <param name="temperatureK">Temperature [K].</param>
/// <returns>Saturation pressure [Pa].</returns>
public delegate double SaturationPressureFunction(double temperatureK);

/// <summary>
/// Whether a vapour-pressure function is extrapolating (outside the validity range of its
/// curve) at a temperature.
/// </summary>
/// <param name="temperatureK">Temperature [K].</param>
public delegate bool ExtrapolationCheck(double temperatureK);

/// <summary>
/// One component of a liquid mixture as the phase-equilibrium code needs it: a name, a molar
/// mass, a pure-component vapour-pressure function and, optionally, UNIFAC subgroup counts
/// and a liquid density. A non-volatile component (the product) has no vapour pressure: it
/// only dilutes the liquid.
/// </summary>
/// <remarks>
/// The vapour pressure is a delegate so that the mixture code does not depend on how pure
/// components are described; <see cref="FromSolvent"/> adapts a library entry.
/// </remarks>
public sealed class MixtureComponent
{
    private readonly SaturationPressureFunction? _saturationPressure;
    private readonly ExtrapolationCheck? _isExtrapolated;

    /// <summary>Creates a volatile component.</summary>
    /// <param name="name">Display name; unique within a mixture.</param>
    /// <param name="molarMassGPerMol">Molar mass [g/mol], &gt; 0.</param>
    /// <param name="saturationPressure">Pure-component vapour pressure, T [K] → P [Pa].</param>
    /// <param name="unifacSubgroups">UNIFAC (original) subgroup id → count, or null when unknown.</param>
    /// <param name="liquidDensityKgPerM3">Liquid density [kg/m³] near room temperature, or null;
    /// needed only for volume-based strip end conditions.</param>
    /// <param name="isExtrapolated">Tells when <paramref name="saturationPressure"/> extrapolates,
    /// or null when it cannot tell.</param>
    public MixtureComponent(
        string name,
        double molarMassGPerMol,
        SaturationPressureFunction saturationPressure,
        IReadOnlyDictionary<int, int>? unifacSubgroups = null,
        double? liquidDensityKgPerM3 = null,
        ExtrapolationCheck? isExtrapolated = null)
        : this(name, molarMassGPerMol, unifacSubgroups, liquidDensityKgPerM3)
    {
        ArgumentNullException.ThrowIfNull(saturationPressure);
        _saturationPressure = saturationPressure;
        _isExtrapolated = isExtrapolated;
    }

    /// <summary>
    /// Adapts a library solvent: its ranked vapour-pressure model (extrapolation flagged, refusal
    /// above Tc kept), UNIFAC groups, molar mass and density.
    /// </summary>
    /// <param name="solvent">A solvent from the library.</param>
    public static MixtureComponent FromSolvent(Solvent solvent)
    {
        ArgumentNullException.ThrowIfNull(solvent);
        var curves = solvent.VaporPressure;
        return new MixtureComponent(solvent.Name, solvent.MolarMassGPerMol,
            curves.SaturationPressurePa, solvent.UnifacGroups, solvent.LiquidDensityKgPerM3,
            curves.IsExtrapolated)
        {
            Cas = string.IsNullOrWhiteSpace(solvent.Cas) ? null : solvent.Cas,
            MeltingPointK = solvent.MeltingPointK,
        };
    }

    private MixtureComponent(
        string name,
        double molarMassGPerMol,
        IReadOnlyDictionary<int, int>? unifacSubgroups,
        double? liquidDensityKgPerM3)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        if (!(molarMassGPerMol > 0) || !double.IsFinite(molarMassGPerMol))
            throw new ArgumentOutOfRangeException(nameof(molarMassGPerMol), molarMassGPerMol,
                $"molar mass of {name} must be a positive number of g/mol");
        if (liquidDensityKgPerM3 is { } rho && (!(rho > 0) || !double.IsFinite(rho)))
            throw new ArgumentOutOfRangeException(nameof(liquidDensityKgPerM3), rho,
                $"liquid density of {name} must be a positive number of kg/m3");
        if (unifacSubgroups is not null)
        {
            foreach (var (subgroup, count) in unifacSubgroups)
                if (count <= 0)
                    throw new ArgumentOutOfRangeException(nameof(unifacSubgroups), count,
                        $"UNIFAC subgroup {subgroup} of {name} must occur a positive number of times");
        }

        Name = name;
        MolarMassGPerMol = molarMassGPerMol;
        UnifacSubgroups = unifacSubgroups;
        LiquidDensityKgPerM3 = liquidDensityKgPerM3;
    }

    /// <summary>
    /// Creates a non-volatile component (a product or salt): its vapour pressure is zero, so it
    /// only lowers the other components' mole fractions.
    /// </summary>
    /// <param name="name">Display name; unique within a mixture.</param>
    /// <param name="molarMassGPerMol">Molar mass [g/mol], &gt; 0.</param>
    /// <param name="unifacSubgroups">UNIFAC subgroups if known; without them UNIFAC treats the
    /// component as an ideal diluent (see <see cref="Unifac"/>).</param>
    /// <param name="liquidDensityKgPerM3">Density [kg/m³] if known.</param>
    public static MixtureComponent NonVolatile(
        string name,
        double molarMassGPerMol,
        IReadOnlyDictionary<int, int>? unifacSubgroups = null,
        double? liquidDensityKgPerM3 = null)
        => new(name, molarMassGPerMol, unifacSubgroups, liquidDensityKgPerM3);

    /// <summary>Display name, unique within a mixture.</summary>
    public string Name { get; }

    /// <summary>Molar mass [g/mol].</summary>
    public double MolarMassGPerMol { get; }

    /// <summary>UNIFAC (original) subgroup id → count, or null when not known.</summary>
    public IReadOnlyDictionary<int, int>? UnifacSubgroups { get; }

    /// <summary>CAS registry number, or null. It keys the group assignments of modified UNIFAC
    /// (Dortmund) and UNIFAC-LLE, and the published miscibility and azeotrope facts.</summary>
    public string? Cas { get; init; }

    /// <summary>Melting point [K], or null when not known.</summary>
    public double? MeltingPointK { get; init; }

    /// <summary>Liquid density [kg/m³], or null when not known.</summary>
    public double? LiquidDensityKgPerM3 { get; }

    /// <summary>Liquid molar volume [m³/mol] from molar mass and density, or null.</summary>
    public double? LiquidMolarVolumeM3PerMol =>
        LiquidDensityKgPerM3 is { } rho ? MolarMassGPerMol * 1e-3 / rho : null;

    /// <summary>True for a component with no vapour pressure (the product).</summary>
    public bool IsNonVolatile => _saturationPressure is null;

    /// <summary>Pure-component saturation pressure [Pa] at <paramref name="temperatureK"/> [K];
    /// zero for a non-volatile component.</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    public double SaturationPressurePa(double temperatureK)
        => _saturationPressure is null ? 0.0 : _saturationPressure(temperatureK);

    /// <summary>True when the vapour pressure at <paramref name="temperatureK"/> is an
    /// extrapolation of its curve (false when unknown or non-volatile).</summary>
    /// <param name="temperatureK">Temperature [K].</param>
    public bool IsSaturationPressureExtrapolated(double temperatureK)
        => _isExtrapolated is not null && _isExtrapolated(temperatureK);

    /// <inheritdoc />
    public override string ToString() => Name;
}
