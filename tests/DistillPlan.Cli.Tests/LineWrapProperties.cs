using CsCheck;
using DistillPlan.Reports;

namespace DistillPlan.Cli.Tests;

/// <summary>
/// LineWrap (the text of every report and the text UI's plan pane) over generated text: every
/// line fits, no visible character is lost or reordered, and it ends for any input (issue 14:
/// an indent near the width looped; a long word was cut by copying what was left, quadratic).
/// </summary>
public class LineWrapProperties
{
    private static readonly Gen<string> Text = Gen.OneOf(
        Gen.String[Gen.Char["ab  \n-"], 0, 400],
        Gen.Select(Gen.Int[0, 120], Gen.String[Gen.Char["abc "], 0, 60], (spaces, rest) => new string(' ', spaces) + rest),
        Gen.Int[0, 3000].Select(n => new string('x', n)));

    [Fact]
    public void Every_line_fits_and_no_visible_character_is_lost()
    {
        Gen.Select(Text, Gen.Int[1, 100], Gen.Int[0, 30]).Sample((text, width, hanging) =>
        {
            var lines = LineWrap.Wrap(text, width, hanging).ToList();
            int w = Math.Max(width, 8);
            Assert.All(lines, l => Assert.True(l.Length <= w, $"'{l}' is wider than {w}"));
            static string Visible(string s) => new(s.Where(c => !char.IsWhiteSpace(c)).ToArray());
            Assert.Equal(Visible(text), Visible(string.Concat(lines)));
        }, iter: 3000, threads: 1);
    }

    [Fact]
    public void A_megabyte_without_spaces_wraps_into_full_lines()
    {
        string word = new('x', 1 << 20);
        var lines = LineWrap.Wrap(word, 80).ToList();
        Assert.Equal((1 << 20) / 80 + 1, lines.Count);
        Assert.All(lines.SkipLast(1), l => Assert.Equal(80, l.Length));
    }
}
