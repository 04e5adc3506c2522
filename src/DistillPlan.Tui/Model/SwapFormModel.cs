using DistillPlan.Core;
using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Reports;
using DistillPlan.Core.Scale;
using DistillPlan.Reports;

namespace DistillPlan.Tui.Model;

/// <summary>
/// The swap form: the plan's charge and equipment (from the document the other panes edit), the
/// new solvent, the residual to reach and the method, planned on request with Core's
/// <see cref="SwapPlanner"/> and shown in the same text as <c>distillplan swap</c>.
/// </summary>
public sealed class SwapFormModel(Func<PlanDocument> document, Func<SolventLibrary> library)
{
    /// <summary>The new solvent as typed (name, alias or CAS).</summary>
    public string To { get; set; } = "";
    /// <summary>The residual to reach (1%, 0.5mol%, 1000ppm).</summary>
    public string Target { get; set; } = "1%";
    /// <summary>constant-volume, put-and-take, or empty for both.</summary>
    public string Method { get; set; } = "";

    /// <summary>The last swap planned, or null.</summary>
    public SwapPlan? Swap { get; private set; }
    /// <summary>The one-line error of the last attempt, or null.</summary>
    public string? Error { get; private set; }

    /// <summary>Plans the swap with the current fields; an error becomes <see cref="Error"/>, never an exception.</summary>
    public void Plan()
    {
        try
        {
            var doc = document();
            var (charge, setup) = doc.Build(library());
            if (string.IsNullOrWhiteSpace(To)) throw new InputException("to", "", "the new solvent, e.g. toluene");
            var target = SwapTarget.Parse(Target);
            SwapMethod? method = Method.Trim() switch
            {
                "" => null,
                "constant-volume" => SwapMethod.ConstantVolume,
                "put-and-take" => SwapMethod.PutAndTake,
                var m => throw new InputException("method", m, "constant-volume, put-and-take, or empty for both"),
            };
            Swap = SwapPlanner.Plan(charge, library().Find(To), setup, target, method);
            Error = null;
        }
        catch (DistillPlanException e)
        {
            Swap = null;
            Error = e.Message;
        }
    }

    /// <summary>The lines to show: the hint, the error, or the swap's report at this width.</summary>
    public IReadOnlyList<string> Lines(DisplayFormat format, int width)
    {
        if (Error is string error) return [.. LineWrap.Wrap("Cannot plan the swap: " + error, width, hanging: 2)];
        if (Swap is not SwapPlan s)
            return ["Give the new solvent and the residual to reach, then press Enter (or the Plan button).",
                    "The charge, its amounts and the flask or vessel come from the Charge and Equipment panes."];
        var report = SwapReport.For(s, new ReportContext(document().InputList(), library().Cite));
        return TextReport.Render(report, format, width).Split('\n');
    }
}
