using DistillPlan.Core.Checks;
using DistillPlan.Core.Quantities;
using MathNet.Numerics.RootFinding;
using static DistillPlan.Core.Checks.F;

namespace DistillPlan.Core.Planning;

public static partial class SetpointPlanner
{
    /// <summary>
    /// The condensate must be captured with this much to spare: its bubble pressure at coolant +
    /// this margin [K] stays below the setpoint (common practice, the same 3 K as condenser-freeze).
    /// </summary>
    public const double CaptureMarginK = 3;

    /// <summary>What the condenser rule decided about the vapour temperature.</summary>
    /// <param name="Captured">True when the condensate is captured at the vapour temperature returned.</param>
    /// <param name="Raised">True when the vapour temperature had to be raised for it.</param>
    /// <param name="Vapor">The vapour temperature that captures it (or the highest the limits allow).</param>
    /// <param name="Before">The vapour temperature the other rules had chosen.</param>
    /// <param name="BeforePressure">The setpoint those rules would have given.</param>
    private sealed record Capture(bool Captured, bool Raised, Temperature Vapor, Temperature Before, Pressure BeforePressure);

    /// <summary>
    /// The condenser sees the vapour (docs/methods.md, Condenser capture and solvent loss): the
    /// first vapour of composition y(Tv) condenses only if a liquid of that composition has a
    /// bubble pressure at the coolant below the system pressure. Breakthrough is
    /// P_bubble(y, Tc + margin) ≥ P_bubble(x, Tv); the smallest Tv within the upper limits that
    /// clears it is found with Brent's method.
    /// </summary>
    private static class CondensateCapture
    {
        /// <summary>Setpoint minus the condensate's bubble pressure at coolant + margin [Pa], at a pot temperature [K].</summary>
        private static double Excess(IBoilingSystem system, double[] x, Temperature coolant, double tK)
        {
            var pot = system.BubblePressure(tK, x);
            return pot.PressurePa - system.BubblePressure(coolant.Kelvin + CaptureMarginK, pot.Vapor).PressurePa;
        }

        /// <summary>Null when the computation failed (the breakthrough check then says "not evaluated").</summary>
        public static Capture? Decide(IBoilingSystem system, double[] x, Temperature coolant, Temperature vapor, Temperature high)
        {
            try
            {
                var before = Pressure.FromPascal(system.BubblePressure(vapor.Kelvin, x).PressurePa);
                if (Excess(system, x, coolant, vapor.Kelvin) > 0) return new Capture(true, false, vapor, vapor, before);
                if (high.Kelvin <= vapor.Kelvin || Excess(system, x, coolant, high.Kelvin) <= 0)
                    return new Capture(false, false, high, vapor, before);
                double root = Brent.FindRoot(t => Excess(system, x, coolant, t), vapor.Kelvin, high.Kelvin, 1e-3, 100);
                // A tenth of a kelvin above the root, so the setpoint clears the margin, not just touches it.
                return new Capture(true, true, Temperature.FromKelvin(Math.Min(root + 0.1, high.Kelvin)), vapor, before);
            }
            catch (Exception e) when (e is DistillPlanException or MathNet.Numerics.NonConvergenceException) { return null; }
        }

        /// <summary>The warmest coolant that captures condensate y at P: its bubble temperature − margin; null when not computable.</summary>
        public static Temperature? CondenserLimit(IBoilingSystem system, Pressure setpoint, double[] y)
        {
            try { return Temperature.FromKelvin(system.BubbleTemperature(setpoint.Pascal, y).TemperatureK - CaptureMarginK); }
            catch (DistillPlanException) { return null; }
        }

        /// <summary>The light component of the condensate: the largest vapour mole fraction.</summary>
        private static (string Name, double Y) Light(IBoilingSystem system, double[] y)
        {
            int i = Array.IndexOf(y, y.Max());
            return (system.Components[i].Name, y[i]);
        }

        /// <summary>condensate-capture note: the setpoint was raised so the first vapour condenses.</summary>
        public static Finding RaisedNote(IBoilingSystem system, Capture c, Temperature coolant, Pressure setpoint, double[] y)
        {
            var (light, share) = Light(system, y);
            double pCond = system.BubblePressure(coolant.Kelvin + CaptureMarginK, y).PressurePa;
            return Make("condensate-capture", Severity.Info, "raised", ["coolant-temp", "vapor-temp"],
                W("light", light), X("light_fraction", share), T("coolant", coolant), DT("margin", CaptureMarginK),
                PPa("condensate_pressure", pCond), P("before", c.BeforePressure), T("before_vapor", c.Before),
                P("pressure", setpoint), T("vapor", c.Vapor));
        }

        /// <summary>
        /// coolant-limit (condensate): no pressure within the heating limits captures the first
        /// vapour; the coolant that would is the condensate's bubble temperature at the setpoint − margin.
        /// </summary>
        public static Finding ColderCoolantFinding(IBoilingSystem system, Temperature coolant, Pressure setpoint, Temperature vapor, double[] y)
        {
            var (light, share) = Light(system, y);
            var values = new List<(string, Reports.Quantity)>
            {
                W("light", light), X("light_fraction", share), T("coolant", coolant), P("pressure", setpoint), T("vapor", vapor),
            };
            try { values.Add(TK("needed_coolant", system.BubbleTemperature(setpoint.Pascal, y).TemperatureK - CaptureMarginK)); }
            catch (DistillPlanException) { values.Add(W("needed_coolant", "a much colder coolant")); }
            return Make("coolant-limit", Severity.Warning, "condensate", ["coolant-temp", "heating", "bath-max"], [.. values]);
        }
    }
}
