using DistillPlan.Cli;

// With no verb the full-screen planner opens; with a verb one computation runs.
CliApp.OpenPlanner = args => DistillPlan.Tui.PlannerApp.Run(args);
// A closed or full stdout is said in one line; a closed stderr must not abort the process.
var output = new DistillPlan.Cli.Output.StreamGuard(Console.Out, swallow: false);
var error = new DistillPlan.Cli.Output.StreamGuard(Console.Error, swallow: true);
int code = CliApp.Run(args, output, error);
try { output.Flush(); }
catch (DistillPlan.Cli.Output.OutputUnwritableException e) { error.WriteLine("distillplan: " + e.Message); code = CliApp.InternalError; }
return code;
