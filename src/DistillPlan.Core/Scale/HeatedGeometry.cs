namespace DistillPlan.Core.Scale;

/// <summary>
/// The heated wall a charge sits against: how much of it the liquid wets at a given liquid
/// volume (docs/methods.md, Heat and time). Heat goes in only through the wetted part, so the
/// area falls as a strip lowers the level.
/// </summary>
public interface IHeatedGeometry
{
    /// <summary>Heated area wetted by this volume of liquid [m²].</summary>
    double WettedAreaM2(double liquidM3);
    /// <summary>What it is, in words, for the assumptions list.</summary>
    string Describe();
}

/// <summary>A heat-transfer area the user gave: the same at every level.</summary>
/// <param name="AreaM2">The area [m²].</param>
public sealed record FixedArea(double AreaM2) : IHeatedGeometry
{
    /// <inheritdoc />
    public double WettedAreaM2(double liquidM3) => AreaM2;
    /// <inheritdoc />
    public string Describe() => "the area given, the same at every level";
}
