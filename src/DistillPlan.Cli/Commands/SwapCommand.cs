using System.CommandLine;
using DistillPlan.Core;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Quantities;
using DistillPlan.Core.Reports;
using DistillPlan.Core.Scale;

namespace DistillPlan.Cli.Commands;

/// <summary>
/// <c>distillplan swap CHARGE --to SOLVENT --target RESIDUAL</c>: replacing the charge's solvent
/// by another in its flask or vessel, put-and-take and constant-volume compared (Core's <see cref="SwapPlanner"/>).
/// </summary>
internal static class SwapCommand
{
    public static Command Build()
    {
        var verb = new PlanVerb(SettingGroup.Charge, SettingGroup.Equipment, SettingGroup.Size, SettingGroup.Rules);
        var to = new Option<string>("--to") { Description = "The new solvent (toluene, 2-MeTHF, 108-88-3).", Required = true };
        var target = new Option<string>("--target") { Description = "Residual of the old solvent to reach: 1% or 1wt% (by mass), 0.5mol% (by moles), 1000ppm (by mass).", Required = true };
        var method = new Option<string?>("--method") { Description = "constant-volume or put-and-take (default: both, compared)." };
        var pressure = new Option<string?>("--pressure") { Description = "Hold this pressure (the boiling temperature rises); default: hold the plan's vapour temperature and let the pressure fall." };
        var cmd = new Command("swap", "Solvent swap in a flask or vessel: new solvent, distillate, time and residual by put-and-take and by constant volume.");
        verb.AddTo(cmd);
        cmd.Options.Add(to);
        cmd.Options.Add(target);
        cmd.Options.Add(method);
        cmd.Options.Add(pressure);
        cmd.SetAction(r =>
        {
            var library = verb.Common.LoadLibrary(r);
            var doc = verb.Document(r);
            var (charge, setup) = doc.Build(library);
            var newSolvent = library.Find(r.GetValue(to)!);
            var swapTarget = SwapTarget.Parse(r.GetValue(target)!);
            SwapMethod? only = r.GetValue(method) switch
            {
                null => null,
                "constant-volume" => SwapMethod.ConstantVolume,
                "put-and-take" => SwapMethod.PutAndTake,
                var m => throw new InputException("--method", m, "constant-volume or put-and-take"),
            };
            Pressure? held = r.GetValue(pressure) is string p ? PressureUnits.Parse(p, "--pressure", setup.Equipment.Atmosphere) : null;
            var swap = SwapPlanner.Plan(charge, newSolvent, setup, swapTarget, only, held);
            var context = PlanVerb.Context(doc, library);
            var inputs = context.Inputs.Concat([new("to", newSolvent.Name), new("target", swapTarget.Text)]).ToList();
            verb.Write(r, SwapReport.For(swap, context with { Inputs = inputs }), doc);
            return CliApp.Ok;
        });
        return cmd;
    }
}
