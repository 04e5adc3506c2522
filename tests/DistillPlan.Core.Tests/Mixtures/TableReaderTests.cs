using System.Globalization;
using System.Text;
using CsCheck;
using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

/// <summary>
/// The quick reader of the shipped table files (FlowTableReader) against YamlDotNet, which stays
/// the reader of every other table. Both must give the same content, cell for cell and line for
/// line, and the same error for a broken file. This checks the reader, not the data: the data
/// are checked against published values in UnifacTests, DortmundUnifacTests and the reference tests.
/// </summary>
public class TableReaderTests
{
    private const string Dortmund = "DistillPlan.Core.Mixtures.unifac-dortmund.yaml";
    private const string Original = "DistillPlan.Core.Mixtures.unifac-original.yaml";
    private const string Lle = "DistillPlan.Core.Mixtures.unifac-lle.yaml";

    public static TheoryData<string> ShippedTables => [Original, Dortmund, Lle];

    public static TheoryData<string> ShippedFiles => [Original, Dortmund, Lle, PublishedMixtureFacts.ShippedResource];

    [Theory]
    [MemberData(nameof(ShippedFiles))]
    public void The_quick_reader_reads_every_shipped_file_exactly_as_YamlDotNet_does(string resource)
    {
        string text = TableText.ReadResource(resource);
        var fast = FlowTableReader.TryRead(text);
        Assert.NotNull(fast); // the shipped files are of the restricted shape: no fallback
        var yaml = YamlTableReader.Read(new StringReader(text), resource);
        Assert.Equal(Render(yaml), Render(fast));
    }

    [Theory]
    [MemberData(nameof(ShippedTables))]
    public void Both_paths_give_the_same_table_in_every_field_and_row(string resource)
    {
        string text = TableText.ReadResource(resource);
        var fast = UnifacParameters.FromTable(FlowTableReader.TryRead(text)!, resource);
        var yaml = UnifacParameters.Parse(new StringReader(text), resource);
        Assert.Equal(Render(yaml), Render(fast));
        // The table is not empty on either side (a reader that dropped rows would still compare equal
        // to another that dropped them).
        Assert.Equal(RowCount(text, "subgroups"), fast.Subgroups.Count);
        Assert.Equal(RowCount(text, "interactions"), fast.InteractionCount);
        Assert.Equal(resource == Original ? 0 : RowCount(text, "assignments"), fast.AssignmentCount);
    }

    [Fact]
    public void Both_paths_give_the_same_mixture_facts()
    {
        string resource = PublishedMixtureFacts.ShippedResource, text = TableText.ReadResource(resource);
        var fast = PublishedMixtureFacts.FromTable(FlowTableReader.TryRead(text)!, resource);
        var yaml = PublishedMixtureFacts.FromTable(YamlTableReader.Read(new StringReader(text), resource), resource);
        Assert.Equal(string.Join("\n", yaml.Miscible), string.Join("\n", fast.Miscible));
        Assert.Equal(string.Join("\n", yaml.Azeotropes), string.Join("\n", fast.Azeotropes));
        Assert.Equal(RowCount(text, "miscible"), fast.Miscible.Count);
        Assert.Equal(RowCount(text, "azeotropes"), fast.Azeotropes.Count);
    }

    // A broken row the quick reader still reads (wrong width, a word for a number, a table error):
    // the shared checks refuse it with the same message on both paths, naming the row's line.
    [Theory]
    [InlineData("  - [9, \"ACH\",", "  - [9, \"ACH\", 3, \"ACH\", 0.3763]", "'subgroups' rows have 6 plain values")]
    [InlineData("  - [9, \"ACH\",", "  - [9, \"ACH\", 3, \"ACH\", 0.3763, 0.4321, 1]", "'subgroups' rows have 6 plain values")]
    [InlineData("  - [9, \"ACH\",", "  - [9, \"ACH\", 3, \"ACH\", 0.37x63, 0.4321]", "'0.37x63' is not a number")]
    [InlineData("  - [9, \"ACH\",", "  - [9, \"ACH\", 3, \"ACH\", 0.3763, 1e999]", "'1e999' is not a number")]
    [InlineData("  - [9, \"ACH\",", "  - [9.5, \"ACH\", 3, \"ACH\", 0.3763, 0.4321]", "'9.5' is not an integer")]
    [InlineData("  - [9, \"ACH\",", "  - [8, \"ACH\", 3, \"ACH\", 0.3763, 0.4321]", "subgroup 8 listed twice")]
    [InlineData("  - [1, 2,", "  - [1, 1, 189.66, -0.2723, 0]", "interaction (1, 1) names an unknown or equal main group")]
    [InlineData("  - [1, 2,", "  - [1, 999, 189.66, -0.2723, 0]", "interaction (1, 999) names an unknown or equal main group")]
    [InlineData("  - [1, 3,", "  - [1, 2, 114.2, 0.0933, 0]", "interaction (1, 2) listed twice")]
    [InlineData("  - [\"67-64-1\",", "  - [\"67-64-1\", \"acetone\", \"1 1 18\", \"DDBST\"]", "assignment needs pairs of subgroup and count")]
    [InlineData("  - [\"67-64-1\",", "  - [\"67-64-1\", \"acetone\", \"1 1 9999 1\", \"DDBST\"]", "'9999 1' is not a known subgroup and a positive count")]
    public void A_broken_row_is_refused_with_the_same_message_and_its_line(string rowStart, string replacement, string expected)
    {
        var (text, line) = ReplaceRow(TableText.ReadResource(Dortmund), rowStart, replacement);
        Assert.NotNull(FlowTableReader.TryRead(text));
        var fast = Assert.Throws<FormatException>(() => UnifacParameters.ParseText(text, "t.yaml"));
        var yaml = Assert.Throws<FormatException>(() => UnifacParameters.Parse(new StringReader(text), "t.yaml"));
        Assert.Equal($"t.yaml, line {line}: {expected}", fast.Message);
        Assert.Equal(yaml.Message, fast.Message);
    }

    // A quote that does not end on its line is legal YAML (a quoted scalar may span lines), so the
    // quick reader leaves the text to YamlDotNet, whose error names the broken row.
    [Theory]
    [InlineData("  - [9, \"ACH\",", "  - [9, \"ACH, 3, \"ACH\", 0.3763, 0.4321]")]
    [InlineData("  - [9, \"ACH\",", "  - [9, \"ACH\", 3, \"ACH, 0.3763, 0.4321]")]
    public void An_unterminated_quote_falls_back_to_YamlDotNet_and_its_error(string rowStart, string replacement)
    {
        var (text, line) = ReplaceRow(TableText.ReadResource(Dortmund), rowStart, replacement);
        var (fast, yaml) = BothFail(text);
        Assert.Equal(yaml.GetType(), fast.GetType());
        Assert.Equal(yaml.Message, fast.Message);
        var mark = Assert.IsAssignableFrom<YamlDotNet.Core.YamlException>(fast).Start;
        Assert.InRange(mark.Line, line, line + 1);
    }

    // A flow row left open continues on the next lines in YAML; YamlDotNet's representation model
    // then fails with an InvalidOperationException, on both paths alike.
    [Fact]
    public void An_unclosed_row_falls_back_to_YamlDotNet_and_its_error()
    {
        var (text, _) = ReplaceRow(TableText.ReadResource(Dortmund), "  - [9, \"ACH\",", "  - [9, \"ACH\", 3, \"ACH\", 0.3763, 0.4321");
        var (fast, yaml) = BothFail(text);
        Assert.Equal(yaml.GetType(), fast.GetType());
        Assert.Equal(yaml.Message, fast.Message);
    }

    private static (Exception Fast, Exception Yaml) BothFail(string text)
    {
        Assert.Null(FlowTableReader.TryRead(text));
        return (Assert.ThrowsAny<Exception>(() => UnifacParameters.ParseText(text, "t.yaml")),
            Assert.ThrowsAny<Exception>(() => UnifacParameters.Parse(new StringReader(text), "t.yaml")));
    }

    // Generated damage to a shipped table (a character deleted, inserted or replaced, a line
    // repeated or dropped): whatever the quick reader accepts, YamlDotNet reads the same, and the
    // final answer (a table or an error) is the same on both paths. Test input, not data.
    [Fact]
    public void Damaged_tables_give_the_same_answer_on_both_paths()
    {
        string text = TableText.ReadResource(Lle);
        var damage = Gen.Select(Gen.Int[0, text.Length - 1], Gen.Int[0, 4],
            Gen.Char["\"',[]{}#:-&*!|>%@`\\ \t\r\n0a.e+\uFEFF\u0085é"]);
        damage.Sample((at, kind, c) =>
        {
            string broken = Damage(text, at, kind, c);
            if (FlowTableReader.TryRead(broken) is { } fast)
                Assert.Equal(Render(YamlTableReader.Read(new StringReader(broken), "t.yaml")), Render(fast));
            Assert.Equal(Outcome(() => UnifacParameters.Parse(new StringReader(broken), "t.yaml")),
                Outcome(() => UnifacParameters.ParseText(broken, "t.yaml")));
        }, iter: 400, threads: 1);
    }

    // Small documents of the shapes the quick reader knows and some it does not: it either gives
    // YamlDotNet's reading or leaves the text to YamlDotNet. Test input, not data.
    [Fact]
    public void Small_documents_are_read_as_YamlDotNet_reads_them_or_left_to_it()
    {
        var scalar = Gen.OneOf(Gen.Const("1"), Gen.Const("-2.5e3"), Gen.Const("\"a, b\""), Gen.Const("null"), Gen.Const("x y"),
            Gen.Const("\"\""), Gen.Const("- a"), Gen.Const("a: b"), Gen.Const("a #c"), Gen.Const("'q'"), Gen.Const("\"q\" #c"),
            Gen.String[Gen.Char["ab1.-\" #:,[]"], 0, 5]);
        var line = Gen.OneOf(
            Gen.Select(Gen.OneOf(Gen.Const("k"), Gen.Const("list"), Gen.Const("m-2")), scalar, (k, v) => $"{k}: {v}"),
            Gen.OneOf(Gen.Const("k:"), Gen.Const("list:"), Gen.Const("m-2:"), Gen.Const("# note"), Gen.Const(""), Gen.Const("  ")),
            Gen.Select(scalar.Array[0, 4], Gen.OneOf(Gen.Const("  "), Gen.Const(" "), Gen.Const("   ")),
                (cells, indent) => $"{indent}- [{string.Join(", ", cells)}]"),
            Gen.Select(scalar, v => $"  key: {v}"));
        line.Array[1, 8].Sample(lines =>
        {
            string text = string.Join("\n", lines);
            if (FlowTableReader.TryRead(text) is not { } fast) return;
            Assert.Equal(Outcome(() => Render(YamlTableReader.Read(new StringReader(text), "t.yaml"))), "ok:" + Render(fast));
        }, iter: 3000, threads: 1);
    }

    private static string Damage(string text, int at, int kind, char c)
    {
        int lineStart = text.LastIndexOf('\n', Math.Max(at - 1, 0)) + 1;
        int lineEnd = text.IndexOf('\n', at) is var e and >= 0 ? e + 1 : text.Length;
        return kind switch
        {
            0 => text.Remove(at, 1),
            1 => text.Insert(at, c.ToString()),
            2 => text.Remove(at, 1).Insert(at, c.ToString()),
            3 => text.Insert(lineStart, text[lineStart..lineEnd]),
            _ => text.Remove(lineStart, lineEnd - lineStart),
        };
    }

    private static (string Text, int Line) ReplaceRow(string text, string rowStart, string replacement)
    {
        var lines = text.Split('\n');
        int i = Array.FindIndex(lines, l => l.StartsWith(rowStart, StringComparison.Ordinal));
        Assert.True(i >= 0, $"no row starts with {rowStart}");
        lines[i] = replacement;
        return (string.Join('\n', lines), i + 1);
    }

    private static int RowCount(string text, string list)
    {
        var lines = text.Split('\n');
        int start = Array.IndexOf(lines, list + ":");
        Assert.True(start >= 0, $"no list {list}");
        return lines.Skip(start + 1).TakeWhile(l => !char.IsAsciiLetter(l.FirstOrDefault())).Count(l => l.StartsWith("  - [", StringComparison.Ordinal));
    }

    private static string Outcome(Func<object> read)
    {
        try
        {
            var result = read();
            return result is UnifacParameters table ? "ok:" + Render(table) : "ok:" + result;
        }
        catch (Exception e)
        {
            return $"{e.GetType().Name}: {e.Message}";
        }
    }

    private static string Render(TableText table)
    {
        var text = new StringBuilder();
        foreach (var (key, entry) in table.Entries.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            text.Append(key).Append(" = ");
            if (entry.Scalar is { } scalar) text.Append("scalar ⟨").Append(scalar).Append('⟩');
            else if (entry.Rows is { } rows)
                foreach (var row in rows)
                    text.Append("\n  row @").Append(row.Line).Append(row.Cells is null
                        ? " (not scalars)"
                        : " [" + string.Join(" | ", row.Cells.Select(c => $"⟨{c.Value}⟩@{c.Line}")) + "]");
            else if (entry.Pairs is { } pairs)
                foreach (var (k, v) in pairs) text.Append($"\n  {k}: ⟨{v.Value}⟩@{v.Line}");
            else text.Append("other");
            text.Append('\n');
        }
        return text.ToString();
    }

    private static string Render(UnifacParameters table)
    {
        var text = new StringBuilder($"{table.Model} {table.Variant} {table.Source}\n");
        foreach (var s in table.Subgroups.Values.OrderBy(s => s.Id))
            text.Append(CultureInfo.InvariantCulture, $"{s.Id} {s.Name} {s.MainGroup} {s.MainGroupName} {s.R:R} {s.Q:R}\n");
        foreach (var ((m, n), p) in table.Interactions.OrderBy(p => p.Key))
            text.Append(CultureInfo.InvariantCulture, $"{m} {n} {p.AK:R} {p.B:R} {p.CPerK:R}\n");
        foreach (var (cas, counts) in table.Assignments.OrderBy(p => p.Key, StringComparer.Ordinal))
            text.Append(cas).Append(':').AppendJoin(' ', counts.OrderBy(c => c.Key).Select(c => $"{c.Key}x{c.Value}")).Append('\n');
        return text.ToString();
    }
}
