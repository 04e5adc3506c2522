using DistillPlan.Core.Tests.Reference;
using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Tests.VaporPressure;

/// <summary>
/// P(T) of every library solvent is continuous where one ranked curve hands over to the next:
/// stepping 0.1 K at a time from its lowest to its highest curve temperature (or Tc), P rises
/// and each relative step stays within 1.5 times what the local Clausius–Clapeyron slope of the
/// answering curve explains, plus 0.2 %. Before the hand-over bands the curves stepped by up to
/// 7 % (2-propanol +6.7 % at 7.9 °C, 2-butanol +5.0 % at 21.9 °C, DMF −6.4 % at 89.9 °C).
/// </summary>
public class ContinuityTests
{
    public static TheoryData<string> EverySolvent()
    {
        var data = new TheoryData<string>();
        foreach (var s in ShippedLibrary.Instance.Solvents) data.Add(s.Name);
        return data;
    }

    private static double LocalSlope(IVaporPressureCurve c, double t)
    {
        // d ln P/dT of the answering curve alone, on the side inside its range
        double lo = t - 0.01, hi = t + 0.01;
        if (hi > c.TMaxK) { hi = c.TMaxK; lo = hi - 0.02; }
        if (lo < c.TMinK) { lo = c.TMinK; hi = lo + 0.02; }
        return (Math.Log(c.PressurePa(hi)) - Math.Log(c.PressurePa(lo))) / (hi - lo);
    }

    [Theory]
    [MemberData(nameof(EverySolvent))]
    public void The_vapour_pressure_has_no_step_between_neighbouring_tenths_of_a_kelvin(string name)
    {
        var m = ShippedLibrary.Instance.Find(name).VaporPressure;
        double top = Math.Min(m.MaxK, m.CriticalTemperatureK ?? double.MaxValue);
        int n = (int)Math.Floor((top - m.MinK) / 0.1);
        double previous = m.SaturationPressure(m.MinK).PressurePa;
        for (int k = 1; k <= n; k++)
        {
            double t = m.MinK + 0.1 * k;
            var r = m.SaturationPressure(t);
            double step = r.PressurePa / previous - 1;
            double bound = 1.5 * LocalSlope(r.Curve, t - 0.05) * 0.1 + 0.002;
            Assert.True(step > 0 && step <= bound,
                $"{name}: P steps {step * 100:+0.000;-0.000} % from {t - 0.1:F2} to {t:F2} K ({r.Curve.Source}{(r.BlendedWith is null ? "" : " + " + r.BlendedWith.Source)}); allowed 0 to {bound * 100:F3} %");
            previous = r.PressurePa;
        }
    }

    [Theory]
    [MemberData(nameof(EverySolvent))]
    public void The_boiling_temperature_at_the_vapour_pressure_of_T_is_T_across_the_hand_over_bands(string name)
    {
        var m = ShippedLibrary.Instance.Find(name).VaporPressure;
        var temperatures = m.HandOverBands.SelectMany(b => new[] { b.LoK, (b.LoK + b.HiK) / 2, b.HiK, b.LoK + 0.3 * (b.HiK - b.LoK) })
            .Append((m.MinK + m.MaxK) / 2).Where(t => t < (m.CriticalTemperatureK ?? double.MaxValue) - 0.5);
        foreach (double t in temperatures)
            Assert.Equal(t, m.SaturationTemperature(m.SaturationPressure(t).PressurePa).TemperatureK, 1e-6);
    }

    [Fact]
    public void Inside_a_band_the_value_lies_between_the_two_curves()
    {
        // 2-propanol hands over from McGarry to Poling near 8 C; a blend can only lie between them
        var m = ShippedLibrary.Instance.Find("2-propanol").VaporPressure;
        Assert.NotEmpty(m.HandOverBands);
        foreach (var b in m.HandOverBands)
        {
            double t = (b.LoK + b.HiK) / 2;
            var r = m.SaturationPressure(t);
            Assert.NotNull(r.BlendedWith);
            double p1 = Math.Exp(VaporPressureModel_ExtendedLnP(b.From, t)), p2 = Math.Exp(VaporPressureModel_ExtendedLnP(b.To, t));
            Assert.InRange(r.PressurePa, Math.Min(p1, p2) * (1 - 1e-12), Math.Max(p1, p2) * (1 + 1e-12));
        }
    }

    private static double VaporPressureModel_ExtendedLnP(IVaporPressureCurve c, double t) =>
        c.Covers(t) ? Math.Log(c.PressurePa(t)) : throw new InvalidOperationException("the band lies where both curves are valid");
}
