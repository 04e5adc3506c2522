using DistillPlan.Core.Library;

namespace DistillPlan.Tui.Model;

/// <summary>Edits of the charge text (<c>NAME=AMOUNT,…</c>) made by the mixture builder.</summary>
public static class ChargeText
{
    /// <summary>
    /// The charge with <paramref name="solvent"/> added as <c>NAME=</c>, and where the cursor goes
    /// (after its "="). A solvent already in the charge, under any of its names, is not added
    /// twice: the cursor goes to its amount instead (an "=" is added when it had none).
    /// </summary>
    public static (string Charge, int Cursor) Add(string charge, Solvent solvent, SolventLibrary library)
    {
        var items = charge.Split(',').Select(i => i.Trim()).Where(i => i.Length > 0).ToList();
        int at = items.FindIndex(i => library.TryFind(i.Split('=')[0].Trim(), out var s) && s!.Name == solvent.Name);
        if (at < 0)
        {
            items.Add(PlannerViewModel.ChargeName(solvent) + "=");
            at = items.Count - 1;
        }
        else if (!items[at].Contains('=')) items[at] += "=";
        int start = items.Take(at).Sum(i => i.Length + 1);
        // A new item ends in "=", so its end is just after "="; one with an amount: at its end, to change it.
        return (string.Join(",", items), start + items[at].Length);
    }
}
