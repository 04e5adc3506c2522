using System.CommandLine;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;

namespace DistillPlan.Cli.Commands;

/// <summary>
/// <c>distillplan strip CHARGE</c>: the Rayleigh batch evaporation of a charge, as steps a person
/// or a vacuum controller can follow, with the checks at each step (Core's <see cref="StripPlanner"/>).
/// </summary>
internal static class StripCommand
{
    public static Command Build()
    {
        var verb = new PlanVerb(SettingGroup.Charge, SettingGroup.Equipment, SettingGroup.Size, SettingGroup.Rules, SettingGroup.Strip);
        var cmd = new Command("strip", "Batch evaporation step by step: pressure ramp (or temperature rise), compositions, distillate and residue, checks.");
        verb.AddTo(cmd);
        cmd.SetAction(r =>
        {
            var library = verb.Common.LoadLibrary(r);
            var doc = verb.Document(r);
            // The plan's own ramp is then this strip when the strip is the default one (planned once).
            var (plan, setup) = PlanVerb.Plan(doc, library, StripPlanner.DefaultReportEvery);
            var strip = StripPlanner.Plan(plan, setup.Strip, setup.Model);
            verb.Write(r, PlanReports.ForStrip(strip, PlanVerb.Context(doc, library)), doc);
            return CliApp.Ok;
        });
        return cmd;
    }
}
