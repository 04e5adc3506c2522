using System.Text.RegularExpressions;

namespace DistillPlan.Core.Library;

/// <summary>CAS registry numbers: format and check digit (CAS's published rule).</summary>
public static partial class CasNumber
{
    [GeneratedRegex(@"^(\d{2,7})-(\d{2})-(\d)$")]
    private static partial Regex Shape();

    /// <summary>
    /// True when the text is NNNNNNN-NN-R with the right check digit R: the digits before it,
    /// read from the right, weighted 1, 2, 3 …, summed, modulo 10. Example: 7732-18-5 (water).
    /// </summary>
    public static bool IsValid(string text)
    {
        var m = Shape().Match(text);
        if (!m.Success) return false;
        string digits = m.Groups[1].Value + m.Groups[2].Value;
        int sum = 0;
        for (int i = 0; i < digits.Length; i++) sum += (digits[^(i + 1)] - '0') * (i + 1);
        return sum % 10 == m.Groups[3].Value[0] - '0';
    }
}
