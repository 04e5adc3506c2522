using DistillPlan.Core.Checks;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Tests.Findings;

/// <summary>Findings are data with wording for every case, and a check that cannot be evaluated says so.</summary>
public class FindingTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    public static TheoryData<string> Setups => new()
    {
        "",
        "coolant-temp=-20;pump=rotary-vane;heating=oil-bath",
        "coolant-temp=25;pump=aspirator;product-max=45",
        "coolant-temp=40;heating=jacket;bath-max=90;pump=liquid-ring;delta-t=25,20",
        // A cold coolant and a low product limit: the pot-freezing bound is the one that loses (tert-butanol, DMSO, water).
        "coolant-temp=-20;product-max=40",
    };

    [Theory]
    [MemberData(nameof(Setups))]
    public void Every_finding_of_every_library_solvent_has_its_words_in_every_unit(string settings)
    {
        var inputs = PlanInputs.Of([.. settings.Split(';', StringSplitOptions.RemoveEmptyEntries).Select(kv => (kv.Split('=')[0], kv.Split('=')[1]))]);
        var setup = inputs.Build();
        foreach (var s in Library.Solvents)
        {
            var charge = Charge.Pure(s);
            Plan plan;
            try { plan = SetpointPlanner.Plan(charge, BoilingSystems.For(charge, null), setup); }
            catch (DistillPlanException) { continue; } // a plan refused with a clear message is not a wording matter
            foreach (var f in plan.Checks.Concat(plan.Notes))
                foreach (var unit in new[] { PressureUnits.Millibar, PressureUnits.Torr, PressureUnits.Kilopascal })
                {
                    string message = f.Message(new DisplayFormat(unit)), action = f.Action(new DisplayFormat(unit));
                    Assert.DoesNotContain("{", message + action);
                    Assert.False(string.IsNullOrWhiteSpace(message), $"{f.Code}/{f.Variant}");
                    Assert.DoesNotMatch(@"\d{3}(\.\d+)? K\b", message + action);
                }
        }
    }

    /// <summary>A boiling system whose bubble pressure fails below a temperature, as a user's curve can.</summary>
    private sealed class FailsWhenCold(IBoilingSystem inner, double belowK) : IBoilingSystem
    {
        public IReadOnlyList<Solvent> Components => inner.Components;
        public string Model => inner.Model;
        public string? ModelNote => inner.ModelNote;
        public BubblePoint BubblePressure(double t, double[] x) =>
            t < belowK ? throw new OutOfRangeException(Components[0].Name, "test curve", "no vapour pressure this cold") : inner.BubblePressure(t, x);
        public BubblePoint BubbleTemperature(double p, double[] x) => inner.BubbleTemperature(p, x);
    }

    [Fact]
    public void A_check_that_cannot_be_evaluated_is_shown_as_not_evaluated_with_the_reason()
    {
        var charge = Charge.Pure(Library.Find("toluene"));
        var system = new FailsWhenCold(BoilingSystems.For(charge, null), 290);
        var plan = SetpointPlanner.Plan(charge, system, new PlanInputs().Build());
        var f = Assert.Single(plan.Checks, c => c.Code == "condenser-breakthrough");
        Assert.False(f.Evaluated);
        Assert.Contains("not evaluated", f.Message(DisplayFormat.Default));
        Assert.Contains("no vapour pressure this cold", f.Message(DisplayFormat.Default));
    }

    [Fact]
    public void A_missing_autoignition_temperature_is_not_read_as_safe()
    {
        var toluene = Library.Find("toluene") with { AutoignitionK = null };
        var charge = Charge.Pure(toluene);
        var plan = SetpointPlanner.Plan(charge, BoilingSystems.For(charge, null), PlanInputs.Of(("heating", "oil-bath")).Build());
        var f = Assert.Single(plan.Checks, c => c.Code == "autoignition");
        Assert.False(f.Evaluated);
        Assert.Equal(["heating", "bath-max"], f.Settings);
    }

    [Fact]
    public void Findings_carry_typed_values_not_text_so_each_reader_gets_their_unit()
    {
        // DMSO melts at 18.5 °C (CRC); a 10 °C coolant freezes it.
        var charge = Charge.Pure(Library.Find("dmso"));
        var plan = SetpointPlanner.Plan(charge, BoilingSystems.For(charge, null), new PlanInputs().Build());
        var f = Assert.Single(plan.Checks, c => c.Code == "condenser-freeze");
        Assert.Equal(QuantityKind.Temperature, f.Values["melting_point"].Kind);
        Assert.Equal(291.65, f.Values["melting_point"].Value, 0.1);
        Assert.Equal(["coolant-temp"], f.Settings);
    }
}
