using DistillPlan.Core;
using DistillPlan.Core.Planning;

namespace DistillPlan.Tui.Model;

/// <summary>A point of the vapour-pressure picture: temperature [°C] and log10 of pressure [mbar].</summary>
/// <param name="Celsius">Temperature [°C].</param>
/// <param name="Log10Mbar">log10(P / mbar): the picture's pressure axis is logarithmic.</param>
public readonly record struct CurvePoint(double Celsius, double Log10Mbar);

/// <summary>One solvent's saturation curve, drawn with its own glyph.</summary>
/// <param name="Name">Solvent name.</param>
/// <param name="Glyph">The character its points are drawn with.</param>
/// <param name="Points">The curve.</param>
public sealed record CurveLine(string Name, char Glyph, IReadOnlyList<CurvePoint> Points);

/// <summary>
/// What the vapour-pressure pane draws: the curves of the charge's solvents and the three
/// marks a chemist checks against them. Marks are letters, so they read without colour.
/// </summary>
/// <param name="Lines">Saturation curves.</param>
/// <param name="Operating">The setpoint at the vapour temperature (mark O).</param>
/// <param name="Condenser">The condensate's vapour pressure at the coolant temperature (mark C), when computable.</param>
/// <param name="PumpLog10Mbar">log10 of the pump's ultimate pressure [mbar] (line of P).</param>
/// <param name="MinCelsius">Left edge [°C].</param>
/// <param name="MaxCelsius">Right edge [°C].</param>
/// <param name="MinLog10">Bottom edge, log10 mbar.</param>
/// <param name="MaxLog10">Top edge, log10 mbar.</param>
public sealed record CurvePicture(IReadOnlyList<CurveLine> Lines, CurvePoint Operating, CurvePoint? Condenser, double PumpLog10Mbar,
    double MinCelsius, double MaxCelsius, double MinLog10, double MaxLog10)
{
    /// <summary>Glyphs for up to six solvents, told apart without colour.</summary>
    public const string Glyphs = "*+x#%&";

    /// <summary>Builds the picture for a plan.</summary>
    public static CurvePicture For(Plan plan, int samples = 60)
    {
        var e = plan.Equipment;
        double lo = Math.Min(e.Coolant.Celsius, plan.Vapor.Celsius) - 10;
        double hi = Math.Max(plan.Bath.Celsius, plan.AtmosphericBoilingPoint.Celsius) + 10;
        var lines = plan.System.Components.Select((s, i) =>
        {
            var pts = new List<CurvePoint>();
            for (int k = 0; k <= samples; k++)
            {
                double t = lo + (hi - lo) * k / samples;
                double tk = t + PhysicalConstants.ZeroCelsiusK;
                // Only where the solvent is a liquid with a vapour pressure: between melting and critical points.
                if (s.MeltingPointK is double tm && tk < tm) continue;
                if (s.CriticalTemperatureK is double tc && tk >= tc) continue;
                try { pts.Add(new CurvePoint(t, Math.Log10(s.VaporPressure.SaturationPressure(tk).PressurePa / 100))); }
                catch (DistillPlanException) { /* outside every curve: leave a gap rather than invent */ }
            }
            return new CurveLine(s.Name, Glyphs[i % Glyphs.Length], pts);
        }).ToList();

        var operating = new CurvePoint(plan.Vapor.Celsius, Math.Log10(plan.VacuumSetpoint.Millibar));
        CurvePoint? condenser = null;
        try
        {
            double p = plan.System.BubblePressure(e.Coolant.Kelvin, plan.StartVapor).PressurePa;
            condenser = new CurvePoint(e.Coolant.Celsius, Math.Log10(p / 100));
        }
        catch (DistillPlanException) { }
        double pump = Math.Log10(e.PumpUltimate.Millibar);

        var ys = lines.SelectMany(l => l.Points).Select(p => p.Log10Mbar).Append(operating.Log10Mbar).Append(pump).Append(Math.Log10(e.Atmosphere.Millibar));
        if (condenser is CurvePoint c) ys = ys.Append(c.Log10Mbar);
        var all = ys.ToList();
        // Whole decades, so tick labels are round numbers of mbar; capped at 10 bar to keep low pressures readable.
        double minY = Math.Floor(all.Min()), maxY = Math.Min(Math.Ceiling(all.Max()), 4);
        if (maxY <= minY) maxY = minY + 1;
        return new CurvePicture(lines, operating, condenser, pump, lo, hi, minY, maxY);
    }

    /// <summary>A tick label for a log10 mbar value: 0.01, 0.1, 1, 10, 100, 1000 …</summary>
    public static string DecadeLabel(double log10Mbar)
    {
        double v = Math.Pow(10, Math.Round(log10Mbar, 6));
        return v >= 1 ? v.ToString("0", System.Globalization.CultureInfo.InvariantCulture) : v.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture);
    }
}
