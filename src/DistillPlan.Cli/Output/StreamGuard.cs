using System.Text;

namespace DistillPlan.Cli.Output;

/// <summary>The output could not be written (stdout closed, disk full, a broken pipe).</summary>
internal sealed class OutputUnwritableException(Exception inner) : Exception("cannot write the output: " + inner.Message, inner);

/// <summary>
/// Wraps the process's streams so a closed or full stdout becomes one clear line instead of an
/// "internal error", and a closed stderr (nowhere left to say anything) never aborts the process.
/// </summary>
internal sealed class StreamGuard(TextWriter inner, bool swallow) : TextWriter
{
    public override Encoding Encoding => inner.Encoding;

    private void Do(Action write)
    {
        try { write(); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ObjectDisposedException)
        {
            if (!swallow) throw new OutputUnwritableException(e);
        }
    }

    public override void Write(char value) => Do(() => inner.Write(value));
    public override void Write(string? value) => Do(() => inner.Write(value));
    public override void Write(char[] buffer, int index, int count) => Do(() => inner.Write(buffer, index, count));
    public override void WriteLine(string? value) => Do(() => inner.WriteLine(value));
    public override void Flush() => Do(inner.Flush);
}
