using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;
using Terminal.Gui.Input;

namespace DistillPlan.Tui.Tests;

/// <summary>Issue 9, item 7: the swap form plans the charge of the open plan, as <c>distillplan swap</c> does; Esc closes it and keeps the plan.</summary>
[Collection(TerminalCollection.Name)]
public sealed class SwapOverlayTests : IDisposable
{
    private readonly PlannerHarness _h = new();
    public void Dispose() => _h.Dispose();

    [Fact]
    public void F9_plans_the_swap_of_the_charge_and_Esc_closes_it_keeping_the_plan()
    {
        _h.Vm.Edit(d => d with { Charge = "thf=150L", Inputs = d.Inputs.With("vessel", "250L") });
        _h.Press(Key.F9);
        Assert.True(_h.Window.Swap.Visible);
        _h.Type("toluene");
        _h.Press(Key.Enter);
        var text = string.Join("\n", _h.Window.Swap.Lines);
        Assert.Contains("Recommended", text);
        Assert.Contains("Constant volume", text);
        Assert.Contains("Put and take", text);
        _h.Press(Key.Esc);
        Assert.False(_h.Window.Swap.Visible);
        Assert.Equal("thf=150L", _h.Vm.Document.Charge);
    }

    [Fact]
    public void A_swap_that_cannot_be_planned_says_why_in_one_line_and_keeps_the_form()
    {
        // A relative charge has no amounts: the swap needs them.
        var model = new SwapFormModel(() => new PlanDocument { Charge = "thf" }, () => TestLibrary.Library) { To = "toluene" };
        model.Plan();
        Assert.NotNull(model.Error);
        var lines = model.Lines(Core.Reports.DisplayFormat.Default, 78);
        Assert.StartsWith("Cannot plan the swap: charge:", lines[0]);
        model.To = "";
        model.Plan();
        Assert.Contains("to:", model.Error);
    }
}
