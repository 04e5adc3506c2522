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

/// <summary>Issue 13: a plan file with close to a megabyte of notes froze the text UI for minutes (the notes view and a list filled line by line).</summary>
[Collection(TerminalCollection.Name)]
public sealed class LongNotesTests
{
    [Fact]
    public void A_plan_with_huge_notes_opens_keeps_the_notes_and_shows_them_read_only()
    {
        string dir = Directory.CreateTempSubdirectory("dp-notes-").FullName;
        try
        {
            string line = "Line of notes about the batch, with some words and a number 42.";
            var notes = string.Join("\n", Enumerable.Repeat(line, 12_000));
            string path = Path.Combine(dir, "big.yaml");
            File.WriteAllText(path, "format: distillplan-plan/1\ntitle: \"big\"\nnotes: |-\n"
                + string.Concat(notes.Split('\n').Select(l => "  " + l + "\n")) + "charge:\n  solvents: \"ethanol\"\n");
            var vm = new PlannerViewModel(TestLibrary.Library);
            vm.Open(path);
            using var h = new PlannerHarness(vm: vm);
            string screen = h.Screen();
            Assert.Contains("Bath 60.0 °C", screen);
            Assert.Equal(notes, vm.Document.Notes);
            Assert.False(vm.IsDirty);
            Assert.True(vm.Document.Notes.Length > Views.ChargePane.NotesEditLimit);
        }
        finally { Directory.Delete(dir, recursive: true); }
    }
}
