using Terminal.Gui.Input;
using Terminal.Gui.Views;

namespace DistillPlan.Tui.Views;

/// <summary>
/// A cap on how much text an entry takes. Terminal.Gui's text field gets slower with every
/// character it holds (typing 1,500 characters takes tens of seconds), so a paste of thousands
/// of characters froze the screen; no charge, setting or name needs more than a few hundred.
/// Keys past the cap are dropped before the field sees them, and the field says why.
/// </summary>
internal static class EntryLimit
{
    /// <summary>Characters a charge or a setting may hold (a charge of 30 solvents with amounts fits in 400).</summary>
    public const int Field = 400;
    /// <summary>Characters the solvent search takes (the longest library name is under 40).</summary>
    public const int Search = 60;

    /// <summary>Drops printable keys once the entry holds <paramref name="max"/> characters; <paramref name="refused"/> is told once per burst.</summary>
    public static void Attach(TextField entry, int max, Action<string>? refused = null)
    {
        bool told = false;
        entry.KeyDown += (_, key) =>
        {
            if (entry.Text.Length < max) { told = false; return; }
            if (key.AsRune.Value < 32 || key.IsCtrl || key.IsAlt) return; // editing and planner keys still work
            key.Handled = true;
            if (!told) refused?.Invoke($"limit: {max} characters");
            told = true;
        };
    }
}
