using System.Diagnostics;
using DistillPlan.Cli;

namespace DistillPlan.Cli.Tests;

/// <summary>
/// Runs the command line and captures what it wrote: in-process, or, when
/// <c>DISTILLPLAN_TEST_BINARY</c> names a built <c>distillplan</c> (the native binary in
/// <c>.ci/run</c>), as that program, so every test here also checks the native build's answers.
/// </summary>
internal static class CliRunner
{
    public sealed record Result(int ExitCode, string Output, string Error);

    /// <summary>The program under test when it is not this process, else null.</summary>
    public static string? Binary { get; } = Environment.GetEnvironmentVariable("DISTILLPLAN_TEST_BINARY") is { Length: > 0 } b ? b : null;

    public static Result Run(params string[] args) => Binary is string binary ? RunProcess(binary, args) : RunInProcess(args);

    /// <summary>In this process whatever <see cref="Binary"/> says (for tests that replace a hook of <see cref="CliApp"/>).</summary>
    public static Result RunInProcess(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        int code = CliApp.Run(args, output, error);
        return new Result(code, output.ToString(), error.ToString());
    }

    private static Result RunProcess(string binary, string[] args)
    {
        var start = new ProcessStartInfo(binary)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            // The test's working folder, as in-process: relative paths in tests resolve alike.
            WorkingDirectory = Environment.CurrentDirectory,
        };
        foreach (string a in args) start.ArgumentList.Add(a);
        using var p = Process.Start(start) ?? throw new InvalidOperationException($"cannot start {binary}");
        p.StandardInput.Close();
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(120_000)) { p.Kill(); throw new TimeoutException($"{binary} {string.Join(' ', args)} did not end in 2 min"); }
        return new Result(p.ExitCode, stdout.Result, stderr.Result);
    }

    public static System.Text.Json.JsonElement Json(params string[] args)
    {
        var r = Run([.. args, "--json"]);
        Assert.True(r.ExitCode == 0, $"exit {r.ExitCode}: {r.Error}");
        return System.Text.Json.JsonDocument.Parse(r.Output).RootElement;
    }
}
