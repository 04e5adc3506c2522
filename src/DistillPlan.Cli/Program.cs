using DistillPlan.Cli;

// With no verb the full-screen planner opens; with a verb one computation runs.
return CliApp.Run(args, Console.Out, Console.Error);
