namespace DistillPlan.Core.Scale;

/// <summary>
/// A vertical jacketed vessel: a cylinder on a 2:1 elliptical bottom head (the usual dished
/// end), with the straight side as tall as the diameter at the working volume and the jacket
/// over the head and the straight side up to the working level (rules of thumb for stirred
/// vessels, from memory). The wetted area at a level is the head's wetted surface plus the
/// wetted straight side; it is integrated numerically from the head's shape.
/// </summary>
public sealed class VesselGeometry : IHeatedGeometry
{
    /// <summary>Straight-side height over diameter at the working volume (rule of thumb).</summary>
    public const double StraightSideOverDiameter = 1.0;

    /// <summary>A vessel of this working volume [m³].</summary>
    public VesselGeometry(double workingVolumeM3)
    {
        if (!(workingVolumeM3 > 0) || !double.IsFinite(workingVolumeM3)) throw new ArgumentOutOfRangeException(nameof(workingVolumeM3), workingVolumeM3, "a working volume above zero");
        WorkingVolumeM3 = workingVolumeM3;
        // V = πD³/24 (2:1 head) + πD²/4 · kD (straight side k·D): solve for D.
        DiameterM = Math.Cbrt(workingVolumeM3 / (Math.PI * (1.0 / 24 + StraightSideOverDiameter / 4)));
        HeadDepthM = DiameterM / 4;
        HeadVolumeM3 = Math.PI * Math.Pow(DiameterM, 3) / 24;
        HeadAreaM2 = CapArea(HeadDepthM);
    }

    /// <summary>Working volume [m³].</summary>
    public double WorkingVolumeM3 { get; }
    /// <summary>Inside diameter [m].</summary>
    public double DiameterM { get; }
    /// <summary>Depth of the dished head [m] (D/4 for a 2:1 elliptical head).</summary>
    public double HeadDepthM { get; }
    /// <summary>Volume of the head [m³] (πD³/24).</summary>
    public double HeadVolumeM3 { get; }
    /// <summary>Inside surface of the head [m²] (about 1.08·D² for a 2:1 head).</summary>
    public double HeadAreaM2 { get; }

    /// <inheritdoc />
    public double WettedAreaM2(double liquidM3)
    {
        double v = Math.Clamp(liquidM3, 0, WorkingVolumeM3);
        if (v >= HeadVolumeM3) return HeadAreaM2 + 4 * (v - HeadVolumeM3) / DiameterM; // πD·(ΔV / (πD²/4))
        return CapArea(LevelInHead(v));
    }

    /// <inheritdoc />
    public string Describe() =>
        $"a cylinder on a 2:1 dished bottom, straight side as tall as the diameter ({DiameterM:0.00} m), jacket up to the working level";

    // The head as half an oblate spheroid, semi-axes a = D/2 across and c = D/4 deep; z from the bottom.
    private double A => DiameterM / 2;

    private double CapVolume(double z) => Math.PI * A * A / (HeadDepthM * HeadDepthM) * (HeadDepthM * z * z - z * z * z / 3);

    private double LevelInHead(double v)
    {
        double lo = 0, hi = HeadDepthM;
        for (int i = 0; i < 60; i++)
        {
            double z = 0.5 * (lo + hi);
            if (CapVolume(z) < v) lo = z; else hi = z;
        }
        return 0.5 * (lo + hi);
    }

    // Surface of revolution: ∫ 2π r √(1 + r'²) dz = ∫ 2π √(r² + (r r')²) dz, smooth at the bottom; Simpson's rule.
    private double CapArea(double z)
    {
        double a = A, c = HeadDepthM;
        double F(double s)
        {
            double u = (c - s) / c;
            double r2 = a * a * (1 - u * u);
            double rr = a * a / (c * c) * (c - s);
            return 2 * Math.PI * Math.Sqrt(Math.Max(r2, 0) + rr * rr);
        }
        const int n = 200;
        double h = z / n, sum = F(0) + F(z);
        for (int i = 1; i < n; i++) sum += (i % 2 == 1 ? 4 : 2) * F(i * h);
        return sum * h / 3;
    }
}
