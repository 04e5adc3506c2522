namespace DistillPlan.Core.Scale;

/// <summary>
/// A round-bottomed evaporator flask as a sphere of its nominal volume, with the bath up to the
/// liquid level: the wetted (heated) area is the spherical cap the liquid fills,
/// A = 2πRh, where the liquid of volume V = πh²(3R − h)/3 stands h high (geometry). The
/// rotating film inside wets more glass, but the heat enters through the immersed part.
/// </summary>
public sealed class FlaskGeometry : IHeatedGeometry
{
    /// <summary>Usual flask sizes for rotary evaporators [m³] (common practice): 50 mL to 20 L.</summary>
    public static IReadOnlyList<double> UsualSizesM3 { get; } = [50e-6, 100e-6, 250e-6, 500e-6, 1e-3, 2e-3, 3e-3, 5e-3, 10e-3, 20e-3];

    /// <summary>A flask of this nominal volume [m³].</summary>
    public FlaskGeometry(double volumeM3)
    {
        if (!(volumeM3 > 0) || !double.IsFinite(volumeM3)) throw new ArgumentOutOfRangeException(nameof(volumeM3), volumeM3, "a flask volume above zero");
        VolumeM3 = volumeM3;
        RadiusM = Math.Cbrt(3 * volumeM3 / (4 * Math.PI));
    }

    /// <summary>Nominal volume [m³].</summary>
    public double VolumeM3 { get; }
    /// <summary>Radius of the sphere [m].</summary>
    public double RadiusM { get; }

    /// <summary>The smallest usual flask this volume fills at most half (rule of thumb against bumping), or null when even 20 L is too small.</summary>
    public static double? SmallestHolding(double liquidM3) =>
        UsualSizesM3.Cast<double?>().FirstOrDefault(v => liquidM3 <= 0.5 * v!.Value * (1 + 1e-9));

    /// <summary>Height of the liquid in the sphere [m] (bisection on the cap volume, which rises with h).</summary>
    public double LevelM(double liquidM3)
    {
        double v = Math.Clamp(liquidM3, 0, VolumeM3);
        double lo = 0, hi = 2 * RadiusM;
        for (int i = 0; i < 60; i++)
        {
            double h = 0.5 * (lo + hi);
            if (Math.PI * h * h * (3 * RadiusM - h) / 3 < v) lo = h; else hi = h;
        }
        return 0.5 * (lo + hi);
    }

    /// <inheritdoc />
    public double WettedAreaM2(double liquidM3) => 2 * Math.PI * RadiusM * LevelM(liquidM3);

    /// <inheritdoc />
    public string Describe() => $"a sphere of the flask's volume, bath up to the liquid level (radius {RadiusM * 100:0.#} cm)";
}
