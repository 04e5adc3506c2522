using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Library;

/// <summary>How a solvent behaves towards peroxide formation (classes after Kelly, Chem. Health Saf. 3(5) (1996) 28).</summary>
public enum PeroxideClass
{
    /// <summary>Not a known peroxide former.</summary>
    None,
    /// <summary>Forms peroxides slowly (e.g. cyclopentyl methyl ether).</summary>
    Slow,
    /// <summary>Peroxides become a hazard on concentration (THF, diethyl ether, dioxane …).</summary>
    OnConcentration,
    /// <summary>Forms explosive peroxides even in storage (diisopropyl ether).</summary>
    Severe,
}

/// <summary>Behaviour flags a planner warns about.</summary>
[Flags]
public enum SolventFlags
{
    /// <summary>No flag.</summary>
    None = 0,
    /// <summary>Prone to bumping (superheats, boils violently): water, alcohols, DMSO …</summary>
    BumpingProne = 1,
    /// <summary>Vapour toxic enough to require extraction (benzene, CCl4, chloroform …).</summary>
    ToxicVapor = 2,
    /// <summary>Prone to foaming.</summary>
    Foaming = 4,
    /// <summary>Takes up water from the air.</summary>
    Hygroscopic = 8,
    /// <summary>
    /// Low electrical conductivity (below about 50 pS/m; IEC TS 60079-32-1, NFPA 77): charges up when
    /// it flows, is stirred or sprayed, so a plant vessel and its lines must be earthed (hydrocarbons, ethers …).
    /// </summary>
    LowConductivity = 16,
}

/// <summary>One solvent of the library, in SI units, with the source key of each number.</summary>
public sealed record Solvent
{
    /// <summary>Display name.</summary>
    public required string Name { get; init; }
    /// <summary>Other names people type (EtOAc, THF …).</summary>
    public IReadOnlyList<string> Aliases { get; init; } = [];
    /// <summary>CAS registry number; empty for a user's compound that has none.</summary>
    public required string Cas { get; init; }
    /// <summary>Molecular formula, for display.</summary>
    public string? Formula { get; init; }
    /// <summary>Molar mass [g/mol].</summary>
    public required double MolarMassGPerMol { get; init; }
    /// <summary>Liquid density near room temperature [kg/m³].</summary>
    public double? LiquidDensityKgPerM3 { get; init; }
    /// <summary>Melting point [K].</summary>
    public double? MeltingPointK { get; init; }
    /// <summary>Normal boiling point, at 101325 Pa [K] (tabulated value, not computed).</summary>
    public required double NormalBoilingPointK { get; init; }
    /// <summary>Critical temperature [K].</summary>
    public double? CriticalTemperatureK { get; init; }
    /// <summary>Critical pressure [Pa].</summary>
    public double? CriticalPressurePa { get; init; }
    /// <summary>Closed-cup flash point [K].</summary>
    public double? FlashPointK { get; init; }
    /// <summary>Autoignition temperature [K].</summary>
    public double? AutoignitionK { get; init; }
    /// <summary>The flash-point record: value and/or the tables that do not publish one.</summary>
    public FlammabilityRecord FlashPointRecord { get; init; } = FlammabilityRecord.NotRecorded;
    /// <summary>The autoignition record: value and/or the tables that do not publish one.</summary>
    public FlammabilityRecord AutoignitionRecord { get; init; } = FlammabilityRecord.NotRecorded;
    /// <summary>Null when the flash point is known; otherwise why a check on it is not evaluated.</summary>
    public string? FlashPointMissingReason => FlashPointK is null ? FlashPointRecord.MissingReason() : null;
    /// <summary>Null when the autoignition temperature is known; otherwise why a check on it is not evaluated.</summary>
    public string? AutoignitionMissingReason => AutoignitionK is null ? AutoignitionRecord.MissingReason() : null;
    /// <summary>
    /// Null when the vapour pressure rests on published curves; otherwise one line saying it is an
    /// estimate and how large its error may be (the <c>estimated-curve</c> check quotes it).
    /// </summary>
    public string? EstimatedCurveNote => VaporPressure.EstimatedCurveNote;
    /// <summary>Peroxide-formation class.</summary>
    public PeroxideClass PeroxideClass { get; init; }
    /// <summary>Behaviour flags.</summary>
    public SolventFlags Flags { get; init; }
    /// <summary>UNIFAC (original) subgroup id → count, when assigned.</summary>
    public IReadOnlyDictionary<int, int>? UnifacGroups { get; init; }
    /// <summary>The ranked vapour-pressure curves.</summary>
    public required VaporPressureModel VaporPressure { get; init; }
    /// <summary>Enthalpy of vaporization, when tabulated.</summary>
    public IEnthalpyOfVaporization? EnthalpyOfVaporization { get; init; }
    /// <summary>Liquid heat capacity, DIPPR-100 (Perry Table 2-153 in the shipped library), when the library has it.</summary>
    public Dippr100? LiquidHeatCapacity { get; init; }
    /// <summary>Liquid density as a function of temperature, DIPPR-105 (Perry Table 2-32), when the library has it.</summary>
    public Dippr105? LiquidDensityCurve { get; init; }
    /// <summary>Source key of each field, by field name as written in the YAML.</summary>
    public IReadOnlyDictionary<string, string> Sources { get; init; } = new Dictionary<string, string>();
    /// <summary>File and line the entry was read from, for messages.</summary>
    public string Origin { get; init; } = "";

    /// <summary>ΔHvap at T [J/mol]: tabulated when available, else implied by the vapour-pressure curve.</summary>
    public double EnthalpyJPerMol(double temperatureK) =>
        EnthalpyOfVaporization?.At(temperatureK) ?? VaporPressure.ImpliedEnthalpyJPerMol(temperatureK);

    /// <summary>
    /// Liquid heat capacity Cp [J/(mol·K)] at T [K]; null when the library has no curve for this
    /// solvent. Clamped to the curve's published range: outside it, the value at the nearer end
    /// (the polynomial is not extrapolated), so check <see cref="Dippr100.Covers"/> where it matters.
    /// </summary>
    public double? LiquidHeatCapacityJPerMolK(double temperatureK) => LiquidHeatCapacity?.At(temperatureK);

    /// <summary>
    /// Liquid density [kg/m³] at T [K] from the density curve; null when the library has no curve
    /// (then only <see cref="LiquidDensityKgPerM3"/>, near room temperature, is known). Clamped to the
    /// curve's published range: outside it, the value at the nearer end.
    /// </summary>
    public double? LiquidDensityKgPerM3At(double temperatureK) =>
        LiquidDensityCurve is { } rho ? rho.At(temperatureK) * MolarMassGPerMol / 1000.0 : null;

    /// <summary>Molar volume of the liquid [m³/mol], for volume amounts.</summary>
    public double? MolarVolumeM3PerMol => LiquidDensityKgPerM3 is double rho ? MolarMassGPerMol / 1000.0 / rho : null;
}
