using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Tests.Reference;

/// <summary>Properties every curve of every solvent must have over its own range.</summary>
public class CurvePropertyTests
{
    private const int Samples = 40;

    public static TheoryData<string, int> EveryCurve()
    {
        var data = new TheoryData<string, int>();
        foreach (var s in ShippedLibrary.Instance.Solvents)
            for (int i = 0; i < s.VaporPressure.Curves.Count; i++) data.Add(s.Name, i);
        return data;
    }

    private static (IVaporPressureCurve Curve, double[] T) Sample(string name, int index)
    {
        var curve = ShippedLibrary.Instance.Find(name).VaporPressure.Curves[index];
        // the lower end and points strictly inside (a Wagner curve ends at Tc, where it has no inverse)
        var t = Enumerable.Range(0, Samples).Select(k => curve.TMinK + (curve.TMaxK - curve.TMinK) * (k == 0 ? 0 : (k + 0.5) / Samples)).ToArray();
        return (curve, t);
    }

    [Theory]
    [MemberData(nameof(EveryCurve))]
    public void The_boiling_temperature_at_the_vapour_pressure_of_T_is_T(string name, int index)
    {
        var (curve, temperatures) = Sample(name, index);
        foreach (double t in temperatures)
            Assert.Equal(t, curve.TemperatureK(curve.PressurePa(t)), 1e-6);
    }

    [Theory]
    [MemberData(nameof(EveryCurve))]
    public void The_vapour_pressure_rises_strictly_with_temperature(string name, int index)
    {
        var (curve, temperatures) = Sample(name, index);
        for (int i = 1; i < temperatures.Length; i++)
            Assert.True(curve.PressurePa(temperatures[i]) > curve.PressurePa(temperatures[i - 1]),
                $"{name} {curve.Source}: P({temperatures[i]:F2} K) <= P({temperatures[i - 1]:F2} K)");
    }
}
