using System.Globalization;
using System.Text.RegularExpressions;
using DistillPlan.Core.Library;

namespace DistillPlan.Core.Planning;

/// <summary>
/// Reads a charge as people write it (docs/interface.md, Charges): <c>NAME[=AMOUNT[UNIT]]</c> items joined by
/// commas, e.g. <c>ethyl-acetate</c>, <c>ethanol=30,water=70</c>, <c>thf=12L,toluene=3L</c>,
/// <c>ethanol=90%,water=10%</c>. Bare numbers are parts on the chosen basis and are
/// normalised; percentages must add to 100; absolute amounts (mL, L, g, kg, mol …) are
/// converted with the library's density and molar mass.
/// </summary>
public static partial class ChargeParser
{
    [GeneratedRegex(@"^(?<num>[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(?<unit>(?:[a-zA-Zµ%][a-zA-Zµ%0-9³]*)?)$")]
    private static partial Regex Amount();

    /// <summary>Allowed amount units, for messages.</summary>
    public const string AllowedUnits = "a number of parts, a percentage (10%), a volume (uL, mL, L, m3), a mass (mg, g, kg) or an amount (mmol, mol, kmol)";

    /// <summary>Parses a charge; throws <see cref="InputException"/> with the field and value on bad input.</summary>
    public static Charge Parse(string text, Basis basis, SolventLibrary library, string field = "charge")
    {
        if (string.IsNullOrWhiteSpace(text)) throw new InputException(field, text ?? "", "at least one solvent name, e.g. ethyl-acetate or ethanol=30,water=70");
        var items = Items(text, library, field);
        var parsed = new List<(Solvent Solvent, double Raw, double Moles, string Kind)>();   // kind: parts | percent | mol
        foreach (string item in items)
        {
            if (item.Length == 0) throw new InputException(field, text, "items separated by single commas, e.g. ethanol=30,water=70");
            string[] kv = SplitAmount(item);
            var solvent = library.Find(Unquote(kv[0]));
            if (parsed.Any(p => ReferenceEquals(p.Solvent, solvent)))
                throw new InputException(field, item, $"each solvent once; {solvent.Name} is given twice");
            if (kv.Length == 1) { parsed.Add((solvent, double.NaN, double.NaN, "none")); continue; }
            parsed.Add(ReadAmount(solvent, kv[1], basis, $"{field} ({kv[0]})"));
        }

        if (parsed.Any(p => p.Kind == "none"))
        {
            if (parsed.Count > 1)
                throw new InputException(field, text, "an amount for every solvent of a mixture, e.g. ethanol=30,water=70");
            return Charge.Pure(parsed[0].Solvent);
        }

        var kinds = parsed.Select(p => p.Kind).Distinct().ToList();
        if (kinds.Count > 1 && (kinds.Contains("parts") || kinds.Contains("percent")))
            throw new InputException(field, text, "all amounts as parts, all as percentages, or all with units (mL, g, mol …); do not mix them");
        if (kinds[0] == "percent")
        {
            double sum = parsed.Sum(p => p.Raw);
            if (Math.Abs(sum - 100) > 0.01)
                throw new InputException(field, text, $"percentages that add to 100 (these add to {sum.ToString("0.##", CultureInfo.InvariantCulture)})");
        }

        bool relative = kinds[0] != "mol";
        double total = parsed.Sum(p => p.Moles);
        var components = parsed.Select(p => new ChargeComponent(p.Solvent, relative ? p.Moles / total : p.Moles)).ToList();
        return new Charge { Components = components, IsRelative = relative };
    }

    /// <summary>
    /// The items of a charge. Library names may hold commas (1,4-dioxane, N,N-dimethylformamide),
    /// so commas split items except inside quotes ("1,4-dioxane"=30) and where the longest run of
    /// pieces names a library solvent: <c>1,4-dioxane=30,water=70</c> is two items, not three.
    /// </summary>
    internal static List<string> Items(string text, SolventLibrary library, string field)
    {
        var pieces = new List<string>();
        var current = new System.Text.StringBuilder();
        char? quote = null;
        foreach (char ch in text)
        {
            if (quote is null && ch is '"' or '\'') quote = ch;
            else if (ch == quote) quote = null;
            if (ch == ',' && quote is null) { pieces.Add(current.ToString().Trim()); current.Clear(); }
            else current.Append(ch);
        }
        if (quote is not null) throw new InputException(field, text, $"a closing {quote} after a quoted solvent name");
        pieces.Add(current.ToString().Trim());

        var items = new List<string>();
        for (int i = 0; i < pieces.Count;)
        {
            int take = 1;
            // Only the last piece of a name may carry its amount; pieces before it have no '='.
            // A name holds at most a few commas, so the search stays linear in the charge's length.
            for (int j = i + 1; j < pieces.Count && j - i < 6 && !pieces[j - 1].Contains('='); j++)
                if (library.TryFind(Unquote(SplitAmount(string.Join(",", pieces.Skip(i).Take(j - i + 1)))[0]), out _))
                    take = j - i + 1;
            items.Add(string.Join(",", pieces.Skip(i).Take(take)));
            i += take;
        }
        return items;
    }

    private static string[] SplitAmount(string item)
    {
        // The '=' that separates the amount is the first one outside quotes.
        char? quote = null;
        for (int i = 0; i < item.Length; i++)
        {
            char ch = item[i];
            if (quote is null && ch is '"' or '\'') quote = ch;
            else if (ch == quote) quote = null;
            else if (ch == '=' && quote is null) return [item[..i].Trim(), item[(i + 1)..].Trim()];
        }
        return [item.Trim()];
    }

    private static string Unquote(string name) =>
        name.Length >= 2 && name[0] is '"' or '\'' && name[^1] == name[0] ? name[1..^1].Trim() : name;

    /// <summary>How a solvent is written in a charge so that it reads back as that solvent: its name with hyphens for spaces.</summary>
    public static string NameFor(Solvent s) => SolventLibrary.Normalise(s.Name);

    /// <summary>Smallest and largest number accepted in an amount, in its own unit: beyond them a charge is a typing error.</summary>
    public const double MinAmount = 1e-9, MaxAmount = 1e12;

    /// <summary>Largest absolute charge [mol]: far above any plant batch (1000 m³ of water is 5.5e7 mol).</summary>
    public const double MaxMoles = 1e10;

    /// <summary>One amount converted to mol (absolute) or to relative moles (parts, percent).</summary>
    private static (Solvent, double, double, string) ReadAmount(Solvent s, string text, Basis basis, string field)
    {
        var m = Amount().Match(text);
        if (!m.Success || !double.TryParse(m.Groups["num"].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double n))
            throw new InputException(field, text, AllowedUnits);
        if (!(n > 0)) throw new InputException(field, text, "an amount above zero");
        string unit = m.Groups["unit"].Value;
        if (!(n >= MinAmount && n <= (unit == "%" ? 100 : MaxAmount)))
            throw new InputException(field, text, unit == "%"
                ? "a percentage above zero and at most 100"
                : $"a number from {MinAmount:0e0} to {MaxAmount:0e0} in its unit (write a large charge in kg, L or kmol)");

        double? volumeM3 = unit switch { "uL" or "µL" => n * 1e-9, "mL" or "ml" => n * 1e-6, "L" or "l" => n * 1e-3, "m3" or "m³" => n, _ => null };
        double? massG = unit switch { "mg" => n * 1e-3, "g" => n, "kg" => n * 1e3, _ => null };
        double? mol = unit switch { "mmol" => n * 1e-3, "mol" => n, "kmol" => n * 1e3, _ => null };

        if (volumeM3 is double v) return Absolute(s, n, v / RequireMolarVolume(s, field, text), field, text);
        if (massG is double g) return Absolute(s, n, g / s.MolarMassGPerMol, field, text);
        if (mol is double x) return Absolute(s, n, x, field, text);
        if (unit is "" or "%")
        {
            // Parts or percent on the basis, turned into relative moles.
            double moles = basis switch
            {
                Basis.Mole => n,
                Basis.Mass => n / s.MolarMassGPerMol,
                _ => n / RequireMolarVolume(s, field, text),
            };
            // The raw number is kept for the 100 % check.
            return (s, n, moles, unit == "%" ? "percent" : "parts");
        }
        throw new InputException(field, text, AllowedUnits);
    }

    private static (Solvent, double, double, string) Absolute(Solvent s, double n, double moles, string field, string text) =>
        double.IsFinite(moles) && moles > 0 && moles <= MaxMoles
            ? (s, n, moles, "mol")
            : throw new InputException(field, text, $"an amount of at most {MaxMoles:0e0} mol ({s.Name})");

    private static double RequireMolarVolume(Solvent s, string field, string text) =>
        s.MolarVolumeM3PerMol ?? throw new InputException(field, text, $"a mass or mole amount: the library has no density for {s.Name}");
}
