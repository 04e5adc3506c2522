using DistillPlan.Core.Library;

namespace DistillPlan.Core.Planning;

/// <summary>A bubble point: where a liquid of given composition starts to boil.</summary>
/// <param name="TemperatureK">Temperature [K].</param>
/// <param name="PressurePa">Pressure [Pa].</param>
/// <param name="Vapor">Mole fractions of the first vapour, in component order.</param>
/// <param name="Extrapolated">True when a vapour-pressure curve was used outside its fitted range.</param>
/// <param name="LiquidPhases">The pot's liquid phases: null or one for a single liquid, two when it has split into layers
/// (the pot then boils at the three-phase point and <paramref name="Vapor"/> is in equilibrium with both).</param>
/// <param name="LiquidPhaseBasis">What decided the number of liquids (models that agreed, or a published fact), or null.</param>
public readonly record struct BubblePoint(double TemperatureK, double PressurePa, double[] Vapor, bool Extrapolated,
    IReadOnlyList<Mixtures.LiquidPhase>? LiquidPhases = null, string? LiquidPhaseBasis = null)
{
    /// <summary>True when two liquid layers are present.</summary>
    public bool TwoLiquids => LiquidPhases is { Count: > 1 };
}

/// <summary>
/// The vapour–liquid equilibrium a plan is computed with: a pure solvent, or a mixture with an
/// activity model. Compositions are liquid mole fractions in component order.
/// </summary>
public interface IBoilingSystem
{
    /// <summary>The solvents, in the order compositions use.</summary>
    IReadOnlyList<Solvent> Components { get; }
    /// <summary>"pure", "ideal", "unifac" (original) or "dortmund".</summary>
    string Model { get; }
    /// <summary>Why the model is what it is, when it fell back (e.g. a missing UNIFAC pair).</summary>
    string? ModelNote { get; }
    /// <summary>Bubble pressure [Pa] of a liquid at T [K].</summary>
    BubblePoint BubblePressure(double temperatureK, double[] liquid);
    /// <summary>Bubble temperature [K] of a liquid at P [Pa].</summary>
    BubblePoint BubbleTemperature(double pressurePa, double[] liquid);
}

/// <summary>One solvent: the bubble point is its saturation point.</summary>
public sealed class PureSolventSystem(Solvent solvent) : IBoilingSystem
{
    /// <inheritdoc />
    public IReadOnlyList<Solvent> Components { get; } = [solvent];
    /// <inheritdoc />
    public string Model => "pure";
    /// <inheritdoc />
    public string? ModelNote => null;

    /// <inheritdoc />
    public BubblePoint BubblePressure(double temperatureK, double[] liquid)
    {
        var r = solvent.VaporPressure.SaturationPressure(temperatureK);
        return new BubblePoint(temperatureK, r.PressurePa, [1.0], r.Extrapolated);
    }

    /// <inheritdoc />
    public BubblePoint BubbleTemperature(double pressurePa, double[] liquid)
    {
        var r = solvent.VaporPressure.SaturationTemperature(pressurePa);
        return new BubblePoint(r.TemperatureK, pressurePa, [1.0], r.Extrapolated);
    }
}
