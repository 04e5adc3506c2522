using DistillPlan.Cli;

// With no verb the full-screen planner opens; with a verb one computation runs.
CliApp.OpenPlanner = args => DistillPlan.Tui.PlannerApp.Run(args);
return CliApp.Run(args, Console.Out, Console.Error);
