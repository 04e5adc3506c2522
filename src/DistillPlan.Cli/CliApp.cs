using System.CommandLine;
using DistillPlan.Cli.Commands;
using DistillPlan.Core;

namespace DistillPlan.Cli;

/// <summary>
/// The command line: builds the verbs, runs one, and turns every failure into one line on
/// stderr with the documented exit code (0 done, 2 bad input, 1 internal error).
/// </summary>
public static class CliApp
{
    /// <summary>Exit code for success (warnings included).</summary>
    public const int Ok = 0;
    /// <summary>Exit code for an unexpected internal error.</summary>
    public const int InternalError = 1;
    /// <summary>Exit code for bad input.</summary>
    public const int BadInput = 2;

    /// <summary>Hook for the text UI, set by the executable; null in tests that never open it.</summary>
    public static Func<string[], int>? OpenPlanner { get; set; }

    /// <summary>The root command with every verb.</summary>
    public static RootCommand BuildRoot()
    {
        var root = new RootCommand(
            "DistillPlan: bath temperature, vacuum setpoint and condenser temperature for evaporating solvents under vacuum. " +
            "Run without a verb to open the full-screen planner.");
        root.Subcommands.Add(SetpointsCommand.Build());
        root.Subcommands.Add(CurveCommand.Build());
        root.Subcommands.Add(SolventsCommand.Build());
        root.Subcommands.Add(MixtureCommand.Build());
        root.Subcommands.Add(AzeotropeCommand.Build());
        root.Subcommands.Add(StripCommand.Build());
        root.Subcommands.Add(SwapCommand.Build());
        root.Subcommands.Add(FitCommand.Build());
        return root;
    }

    /// <summary>Runs the program with arguments, writing to the given streams.</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        if (args.Length == 0)
        {
            if (OpenPlanner is null)
            {
                error.WriteLine("distillplan: the text UI is not available in this build; give a verb (distillplan --help)");
                return BadInput;
            }
            return Guard(() => OpenPlanner(args), error);
        }

        var root = BuildRoot();
        // `distillplan plan.yaml` opens a saved plan in the text UI.
        if (args.Length == 1 && !args[0].StartsWith('-') && root.Subcommands.All(c => c.Name != args[0]))
        {
            if (!File.Exists(args[0]))
            {
                error.WriteLine($"distillplan: '{args[0]}' is neither a verb ({string.Join(", ", root.Subcommands.Select(c => c.Name))}) nor a plan file (see distillplan --help)");
                return BadInput;
            }
            if (OpenPlanner is null)
            {
                error.WriteLine("distillplan: the text UI is not available in this build; run the plan with: distillplan setpoints --plan " + args[0]);
                return BadInput;
            }
            return Guard(() => OpenPlanner(args), error);
        }
        var parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            var command = parse.CommandResult.Command;
            string verb = command == root ? "" : " " + command.Name;
            error.WriteLine($"distillplan: {Describe(parse.Errors[0].Message, command)} (see distillplan{verb} --help)");
            return BadInput;
        }
        return Guard(() => parse.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false }), error);
    }

    /// <summary>
    /// A parse error in the one-line style: a missing argument is named with what it expects,
    /// instead of the parser's "Required argument missing for command".
    /// </summary>
    private static string Describe(string parserMessage, Command command)
    {
        if (parserMessage.StartsWith("Required argument missing", StringComparison.Ordinal))
        {
            var missing = command.Arguments.Where(a => a.Arity.MinimumNumberOfValues > 0).ToList();
            return "missing " + string.Join(" and ", missing.Select(a => $"<{a.Name}> ({a.Description?.Split('.')[0]})"));
        }
        if (parserMessage.StartsWith("Required command was not provided", StringComparison.Ordinal))
            return "give a verb: " + string.Join(", ", command.Subcommands.Select(c => c.Name));
        return parserMessage.TrimEnd('.');
    }

    /// <summary>Runs an action and maps the exception family to one line and an exit code.</summary>
    internal static int Guard(Func<int> action, TextWriter error)
    {
        try
        {
            return action();
        }
        catch (DistillPlanException e) when (e is not NoConvergenceException)
        {
            error.WriteLine("distillplan: " + e.Message);
            return BadInput;
        }
        catch (Output.OutputUnwritableException e)
        {
            error.WriteLine("distillplan: " + e.Message);
            return InternalError;
        }
        catch (Exception e)
        {
            error.WriteLine($"distillplan: internal error: {e.GetType().Name}: {e.Message.Split('\n')[0]} (please report it)");
            return InternalError;
        }
    }
}
