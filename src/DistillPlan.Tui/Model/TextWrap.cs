namespace DistillPlan.Tui.Model;

/// <summary>Word wrap for read-only panes, with a hanging indent so wrapped check lines stay grouped.</summary>
public static class TextWrap
{
    /// <summary>Wraps every line of <paramref name="text"/> at <paramref name="width"/> columns; continuation lines keep the line's indent plus two.</summary>
    public static IReadOnlyList<string> Lines(string text, int width)
    {
        width = Math.Max(width, 10);
        var result = new List<string>();
        foreach (string raw in text.Replace("\r", "").Split('\n'))
        {
            if (raw.Length <= width) { result.Add(raw); continue; }   // fits: keep its alignment
            string indent = new(' ', raw.Length - raw.TrimStart().Length);
            string hang = indent + "  ";
            string line = "";
            foreach (string word in raw.Trim().Split(' ', StringSplitOptions.RemoveEmptyEntries))
            {
                string w = word;
                if (line.Length == 0) { line = indent + w; }
                else if (line.Length + 1 + w.Length <= width) { line += " " + w; }
                else { result.Add(line); line = hang + w; }
                while (line.Length > width) { result.Add(line[..width]); line = hang + line[width..]; }
            }
            result.Add(line);
        }
        if (text.EndsWith('\n') && result.Count > 0 && result[^1].Length == 0) result.RemoveAt(result.Count - 1);
        return result;
    }
}
