using System.Diagnostics;

namespace DistillPlan.Cli.Tests;

/// <summary>Closed and full output streams give one clear line and a non-zero exit, never a stack trace or an abort.</summary>
public class StreamTests
{
    private static (int Code, string Error) Shell(string redirect)
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "distillplan.dll");
        var psi = new ProcessStartInfo("/bin/sh", ["-c", $"dotnet \"{dll}\" setpoints ethanol {redirect}"]) { RedirectStandardError = true };
        using var p = Process.Start(psi)!;
        string error = p.StandardError.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, error);
    }

    [Theory]
    [InlineData(">/dev/full")]
    [InlineData(">&-")]
    public void An_output_that_cannot_be_written_is_said_in_one_line(string redirect)
    {
        if (!OperatingSystem.IsLinux()) return;
        var (code, error) = Shell(redirect);
        Assert.Equal(1, code);
        Assert.StartsWith("distillplan: cannot write the output", error);
        Assert.Single(error.TrimEnd().Split('\n'));
    }

    [Fact]
    public void Bad_input_with_stderr_closed_still_exits_2_without_aborting()
    {
        if (!OperatingSystem.IsLinux()) return;
        string dll = Path.Combine(AppContext.BaseDirectory, "distillplan.dll");
        using var p = Process.Start(new ProcessStartInfo("/bin/sh", ["-c", $"dotnet \"{dll}\" setpoints kryptonite 2>&-"]))!;
        p.WaitForExit();
        Assert.Equal(2, p.ExitCode);
    }
}
