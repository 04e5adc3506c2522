using DistillPlan.Tui.Model;
using Terminal.Gui.Input;

namespace DistillPlan.Tui.Tests;

/// <summary>
/// Issue 14, item 1: a paste of 3,000 characters into the charge field froze the screen for minutes
/// (Terminal.Gui's text field slows with every character it holds). Entries now take a bounded
/// amount and say so; nothing here is timed.
/// </summary>
[Collection(TerminalCollection.Name)]
public sealed class LongInputTests
{
    [Fact]
    public void A_paste_of_thousands_of_characters_into_the_charge_is_cut_at_the_limit_and_the_field_says_so()
    {
        var held = new HeldScheduler();
        using var h = new PlannerHarness(vm: new PlannerViewModel(TestLibrary.Library) { Scheduler = held });
        h.Window.Charge.ChargeEntry.SetFocus();
        h.Type(string.Concat(Enumerable.Repeat("ethanol=1,", 300)));
        Assert.True(h.Vm.Document.Charge.Length <= Views.EntryLimit.Field, $"{h.Vm.Document.Charge.Length} characters taken");
        Assert.Contains("limit: 400 characters", h.Screen());
        // Planning is requested per edit but only the last request matters; the edits stop at the limit.
        Assert.True(held.Held.Count <= Views.EntryLimit.Field + 1);
    }

    [Fact]
    public void The_search_takes_a_name_length_and_no_more()
    {
        using var h = new PlannerHarness();
        h.Type(new string('x', 500));
        Assert.True(((Terminal.Gui.Views.TextField)h.Window.Charge.SearchField).Text.Length <= Views.EntryLimit.Search);
    }
}
