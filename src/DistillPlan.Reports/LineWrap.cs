using System.Text;
using System.Text.RegularExpressions;

namespace DistillPlan.Reports;

/// <summary>
/// Word wrapping with a hanging indent that keeps the spacing inside a line (aligned labels
/// stay aligned). Always makes progress: a word longer than the width is cut, and an indent
/// wider than half the width is shortened, so no input can make it loop.
/// </summary>
public static partial class LineWrap
{
    [GeneratedRegex(@"\S+\s*")]
    private static partial Regex Token();

    /// <summary>The lines of <paramref name="text"/> wrapped at <paramref name="width"/> columns; continuation lines get <paramref name="hanging"/> more spaces than the line's own indent.</summary>
    public static IEnumerable<string> Wrap(string text, int width, int hanging = 0)
    {
        width = Math.Max(width, 8);
        foreach (var raw in text.Replace("\r", "").Split('\n'))
        {
            if (raw.Length <= width) { yield return raw; continue; }
            // An indent that leaves too little room is shortened, never kept at any cost.
            int lead = Math.Min(raw.Length - raw.TrimStart(' ').Length, width / 2);
            int indent = Math.Min(lead + hanging, width / 2);
            var line = new StringBuilder().Append(' ', lead);
            int start = lead;
            foreach (Match m in Token().Matches(raw.TrimStart(' ')))
            {
                // The rest of the word starts at pos: cutting a long word moves an index, never
                // copies what is left, so a megabyte without spaces wraps in linear time.
                string token = m.Value;
                int wordLength = token.TrimEnd().Length, pos = 0;
                while (pos < wordLength)
                {
                    if (line.Length + wordLength - pos <= width)
                    {
                        line.Append(token, pos, token.Length - pos);
                        break;
                    }
                    if (line.Length == start)
                    {
                        // A word wider than the whole line is cut.
                        int room = width - line.Length;
                        line.Append(token, pos, room);
                        pos += room;
                    }
                    yield return line.ToString().TrimEnd();
                    line.Clear().Append(' ', indent);
                    start = indent;
                }
            }
            if (line.Length > start) yield return line.ToString().TrimEnd();
        }
    }
}
