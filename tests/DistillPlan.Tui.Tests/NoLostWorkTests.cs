using DistillPlan.Core.PlanFiles;
using DistillPlan.Tui.Model;
using Terminal.Gui.Input;

namespace DistillPlan.Tui.Tests;

/// <summary>Issue 11, item 1: Esc never discards work, leaving asks with the safe answer as default, opening is not an edit.</summary>
[Collection(TerminalCollection.Name)]
public sealed class NoLostWorkTests : IDisposable
{
    private readonly PlannerHarness _h = new();
    public void Dispose() => _h.Dispose();

    private static string Example(string name) => Path.Combine(TestLibrary.RepoRoot, "examples", name);

    [Fact]
    public void Esc_on_the_main_screen_with_unsaved_changes_keeps_the_work_and_returns_to_the_search()
    {
        _h.Type("tolu");
        _h.Press(Key.Enter);
        _h.Press(Key.F4);
        _h.Press(Key.Esc);
        _h.Press(Key.Esc);
        Assert.True(_h.Window.IsRunning);
        Assert.Empty(_h.Dialogs.Asked);
        Assert.Equal("toluene", _h.Vm.Document.Charge);
        Assert.True(_h.Vm.IsDirty);
        Assert.Same(_h.Window.Charge, _h.Window.CurrentPane);
        Assert.True(_h.Window.Charge.SearchField.HasFocus);
    }

    [Fact]
    public void Esc_closes_the_help_and_the_fit_form_first()
    {
        _h.Press(Key.F1);
        Assert.Contains("Keys (F1 or Esc closes)", _h.Screen() + "\n" + string.Join("|", _h.Window.SubViews.Select(v => v.GetType().Name + v.Visible)));
        _h.Press(Key.Esc);
        Assert.DoesNotContain("Keys (F1 or Esc closes)", _h.Screen());
        _h.Press(Key.F8);
        Assert.Contains("Fit your own compound", _h.Screen());
        _h.Press(Key.Esc);
        Assert.DoesNotContain("Fit your own compound", _h.Screen());
        Assert.True(_h.Window.IsRunning);
    }

    [Fact]
    public void Quit_with_unsaved_changes_asks_and_its_default_button_keeps_working()
    {
        _h.Vm.Edit(d => d with { Charge = "ethanol" });
        _h.Press(Key.Q.WithCtrl);
        var (title, buttons) = Assert.Single(_h.Dialogs.Asked);
        Assert.Equal("Quit", title);
        // The last button is the default (Enter): it must be the safe one.
        Assert.Equal("_Keep working", buttons[^1]);
        Assert.True(_h.Window.IsRunning);
        Assert.Equal("ethanol", _h.Vm.Document.Charge);
    }

    [Fact]
    public void Replacing_a_file_asks_and_its_default_button_keeps_the_file()
    {
        string path = Path.Combine(_h.Dir, "mine.yaml");
        File.WriteAllText(path, "the user's own file");
        _h.Vm.Edit(d => d with { Charge = "ethanol" });
        _h.Dialogs.Paths.Enqueue(path);
        _h.Press(Key.S.WithCtrl);
        var (title, buttons) = Assert.Single(_h.Dialogs.Asked);
        Assert.Equal("Replace file?", title);
        Assert.Equal("_Cancel", buttons[^1]);
        Assert.Equal("the user's own file", File.ReadAllText(path));
        Assert.True(_h.Vm.IsDirty);
        Assert.Contains("Not saved: the existing file was kept.", _h.Screen());
    }

    [Fact]
    public void Opening_over_unsaved_changes_asks_and_its_default_button_keeps_the_plan()
    {
        _h.Vm.Edit(d => d with { Charge = "ethanol" });
        _h.Dialogs.Paths.Enqueue(Example("dmf-reaction-workup.yaml"));
        _h.Press(Key.O.WithCtrl);
        var (title, buttons) = Assert.Single(_h.Dialogs.Asked);
        Assert.Equal("Open", title);
        Assert.Equal("_Cancel", buttons[^1]);
        Assert.Equal("ethanol", _h.Vm.Document.Charge);
    }

    [Theory]
    [InlineData("aqueous-ethanol-extract.yaml")]
    [InlineData("column-fractions-etoac-heptane.yaml")]
    [InlineData("dmf-reaction-workup.yaml")]
    [InlineData("pilot-thf-strip-jacket.yaml")]
    public void Opening_an_example_through_the_dialog_does_not_mark_it_unsaved(string file)
    {
        _h.Dialogs.Paths.Enqueue(Example(file));
        _h.Press(Key.O.WithCtrl);
        string screen = _h.Screen();
        Assert.Equal(PlanFileReader.Load(Example(file)), _h.Vm.Document);
        Assert.False(_h.Vm.IsDirty);
        Assert.Contains("Setpoints - " + file, screen);
        Assert.DoesNotContain("(unsaved)", screen);
        // Every pane refreshed from the file, and none of them echoed it back as an edit.
        foreach (var k in new[] { Key.F2, Key.F3, Key.F4, Key.F5, Key.F6 }) _h.Press(k);
        Assert.False(_h.Vm.IsDirty);
    }

    [Fact]
    public void Settings_typed_in_another_order_than_the_file_are_not_a_change()
    {
        var a = new PlannerViewModel(TestLibrary.Library);
        a.SetSetting("coolant-temp", "5");
        a.SetSetting("pump-limit", "2mbar");
        string path = Path.Combine(_h.Dir, "a.yaml");
        a.Save(path, _ => true);
        var b = new PlannerViewModel(TestLibrary.Library);
        b.Open(path);
        b.SetSetting("pump-limit", "");
        b.SetSetting("pump-limit", "2mbar");
        Assert.False(b.IsDirty);
    }
}
