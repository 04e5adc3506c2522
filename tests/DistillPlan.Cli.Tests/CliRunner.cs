using DistillPlan.Cli;

namespace DistillPlan.Cli.Tests;

/// <summary>Runs the command line in-process and captures what it wrote.</summary>
internal static class CliRunner
{
    public sealed record Result(int ExitCode, string Output, string Error);

    public static Result Run(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CliApp.Run(args, output, error);
        return new Result(code, output.ToString(), error.ToString());
    }

    public static System.Text.Json.JsonElement Json(params string[] args)
    {
        var r = Run([.. args, "--json"]);
        Assert.True(r.ExitCode == 0, $"exit {r.ExitCode}: {r.Error}");
        return System.Text.Json.JsonDocument.Parse(r.Output).RootElement;
    }
}
