using System.CommandLine;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;

namespace DistillPlan.Cli.Commands;

/// <summary><c>distillplan setpoints CHARGE</c>: bath, vapour, vacuum and condenser by the ΔT rule, with the checks.</summary>
internal static class SetpointsCommand
{
    public static Command Build()
    {
        var verb = new PlanVerb(SettingGroup.Charge, SettingGroup.Equipment, SettingGroup.Size, SettingGroup.Rules);
        var cmd = new Command("setpoints", "Bath temperature, vacuum setpoint and condenser limit for a charge, with the checks.");
        verb.AddTo(cmd);
        cmd.SetAction(r =>
        {
            var library = verb.Common.LoadLibrary(r);
            var doc = verb.Document(r);
            var (plan, _) = PlanVerb.Plan(doc, library);
            verb.Write(r, PlanReports.ForPlan(plan, PlanVerb.Context(doc, library)), doc);
            return CliApp.Ok;
        });
        return cmd;
    }
}
