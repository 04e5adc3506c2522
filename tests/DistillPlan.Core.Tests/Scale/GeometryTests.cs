using DistillPlan.Core.Scale;

namespace DistillPlan.Core.Tests.Scale;

/// <summary>The heated areas against plane geometry worked out by hand.</summary>
public class GeometryTests
{
    [Fact]
    public void A_half_full_flask_wets_a_hemisphere()
    {
        // 1 L sphere: R = (3·0.001/(4π))^(1/3) = 0.06204 m; half full: h = R, A = 2πR² = 0.02418 m².
        var flask = new FlaskGeometry(1e-3);
        Assert.Equal(0.06204, flask.RadiusM, 1e-5);
        Assert.Equal(flask.RadiusM, flask.LevelM(0.5e-3), 1e-9);
        Assert.Equal(0.02418, flask.WettedAreaM2(0.5e-3), 1e-5);
        // Full: the whole sphere, 4πR² = 0.04836 m².
        Assert.Equal(4 * Math.PI * flask.RadiusM * flask.RadiusM, flask.WettedAreaM2(1e-3), 1e-9);
    }

    [Fact]
    public void A_flask_a_quarter_full_stands_at_the_cap_height_of_a_quarter_sphere()
    {
        // Cap volume πh²(3R − h)/3 = V/4 → for R = 1, h²(3 − h) = 1: h = 0.6527 (root of h³ − 3h² + 1 = 0 in 0..1).
        var flask = new FlaskGeometry(4.0 / 3 * Math.PI);
        Assert.Equal(1.0, flask.RadiusM, 1e-12);
        Assert.Equal(0.6527, flask.LevelM(Math.PI / 3), 1e-4);
    }

    [Fact]
    public void The_smallest_flask_is_the_first_the_charge_fills_at_most_half()
    {
        Assert.Equal(500e-6, FlaskGeometry.SmallestHolding(250e-6)!.Value, 1e-12);
        Assert.Equal(1e-3, FlaskGeometry.SmallestHolding(251e-6)!.Value, 1e-12);
        Assert.Null(FlaskGeometry.SmallestHolding(10.5e-3));
    }

    [Fact]
    public void A_vessel_head_has_the_published_area_and_volume_of_a_2_to_1_elliptical_head()
    {
        var v = new VesselGeometry(0.25);
        // Volume of a 2:1 elliptical head: πD³/24; inside surface about 1.084·D²
        // (head tables of vessel fabricators, e.g. "1.084 D²" for 2:1 semi-ellipsoidal heads; from memory).
        Assert.Equal(Math.PI * Math.Pow(v.DiameterM, 3) / 24, v.HeadVolumeM3, 1e-12);
        Assert.Equal(1.084 * v.DiameterM * v.DiameterM, v.HeadAreaM2, 0.01 * v.HeadAreaM2);
        // Working volume = head + straight side of height D: πD³(1/24 + 1/4) = 0.25 m³ → D = (0.25/0.91630)^(1/3) = 0.6486 m.
        Assert.Equal(0.6486, v.DiameterM, 1e-4);
        // Above the head the wetted wall grows by πD per unit of height: ΔA = 4ΔV/D.
        double a1 = v.WettedAreaM2(0.15), a2 = v.WettedAreaM2(0.20);
        Assert.Equal(4 * 0.05 / v.DiameterM, a2 - a1, 1e-9);
        // Full: head + πD·D.
        Assert.Equal(v.HeadAreaM2 + Math.PI * v.DiameterM * v.DiameterM, v.WettedAreaM2(0.25), 1e-9);
    }

    [Fact]
    public void Inside_the_head_the_wetted_area_rises_with_the_level()
    {
        var v = new VesselGeometry(1.0);
        double last = 0;
        foreach (double share in new[] { 0.1, 0.3, 0.6, 0.9, 1.0 })
        {
            double a = v.WettedAreaM2(share * v.HeadVolumeM3);
            Assert.True(a > last, $"area at {share} of the head");
            last = a;
        }
        Assert.Equal(v.HeadAreaM2, last, 1e-9);
    }
}
