using System.Globalization;
using DistillPlan.Core.Library;
using DistillPlan.Core.Quantities;

namespace DistillPlan.Core.Fitting;

/// <summary>
/// Reads measured (T, P) points as people write them, into kelvin and pascal for
/// <see cref="VaporPressureFit.Fit"/>:
/// <list type="bullet">
/// <item>a list, <c>30C:42.5mbar,50C:123mbar</c>: each point is TEMPERATURE:PRESSURE with the units
/// <see cref="TemperatureUnits.Parse"/> and <see cref="PressureUnits.Parse"/> take (a bare number is
/// °C or mbar), points joined by commas or semicolons;</item>
/// <item>one boiling point, <c>78C</c> (at 1 atm) or <c>78C@1013mbar</c>;</item>
/// <item>a CSV file whose header names a temperature column and a pressure column, each with its unit
/// in brackets or after an underscore: <c>T (°C),P (mbar)</c>, <c>temperature [K];pressure [kPa]</c>,
/// <c>temperature_c,pressure_kpa</c>. Comma, semicolon or tab separate the columns; other columns,
/// blank lines and lines starting with # are skipped; a column without a unit, or with a unit the
/// parsers do not know, is refused with one line naming the column.</item>
/// </list>
/// </summary>
public static class MeasuredPoints
{
    /// <summary>How a list of points is written, for messages and help.</summary>
    public const string ListSyntax = "TEMPERATURE:PRESSURE points joined by commas, e.g. 30C:42.5mbar,50C:123mbar (bare numbers are °C and mbar)";

    /// <summary>Parses <c>30C:42.5mbar,50C:123mbar</c>.</summary>
    /// <param name="text">What the user wrote.</param>
    /// <param name="field">Option or field name for messages.</param>
    /// <param name="atmosphere">Local atmosphere, for gauge readings.</param>
    public static IReadOnlyList<(double TK, double PPa)> ParseList(string text, string field, Pressure atmosphere)
    {
        var items = (text ?? "").Split([',', ';'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        if (items.Length == 0) throw new InputException(field, text ?? "", ListSyntax);
        return items.Select(item =>
        {
            var parts = item.Split(':');
            if (parts.Length != 2 || parts[0].Trim().Length == 0 || parts[1].Trim().Length == 0)
                throw new InputException(field, item, ListSyntax);
            return Point(parts[0], parts[1], field, atmosphere);
        }).ToList();
    }

    /// <summary>Parses a boiling point, <c>78C</c> (at 101325 Pa) or <c>78C@1013mbar</c>.</summary>
    /// <param name="text">What the user wrote.</param>
    /// <param name="field">Option or field name for messages.</param>
    /// <param name="atmosphere">Local atmosphere, for gauge readings.</param>
    public static (double TK, double PPa) ParseBoilingPoint(string text, string field, Pressure atmosphere)
    {
        var parts = (text ?? "").Split('@');
        if (parts.Length > 2 || parts[0].Trim().Length == 0)
            throw new InputException(field, text ?? "", "a temperature, at 1 atm (78C) or at a pressure (78C@1013mbar)");
        return parts.Length == 1
            ? (TemperatureUnits.Parse(parts[0].Trim(), field).Kelvin, PhysicalConstants.StandardAtmospherePa)
            : Point(parts[0], parts[1], field, atmosphere);
    }

    private static (double TK, double PPa) Point(string t, string p, string field, Pressure atmosphere) =>
        (TemperatureUnits.Parse(t.Trim(), field).Kelvin, PressureUnits.Parse(p.Trim(), field, atmosphere).Pascal);

    /// <summary>Largest CSV file of measured points read (thousands of points fit in far less).</summary>
    public const long MaxCsvBytes = 1 << 20;

    /// <summary>Reads the points of a CSV file (see the class summary for the header rule).</summary>
    /// <param name="path">The file.</param>
    /// <param name="field">Option or field name for messages.</param>
    /// <param name="atmosphere">Local atmosphere, for gauge readings.</param>
    public static IReadOnlyList<(double TK, double PPa)> ReadCsv(string path, string field, Pressure atmosphere)
    {
        string text;
        // The same guarded read as every file a user names: a FIFO or /dev/zero must not hang or fill memory.
        try { text = YamlFileReader.ReadText(path, MaxCsvBytes, (_, _, problem) => new InputException(field, path, "a readable CSV file", $"{field}: '{InputException.Shorten(path)}' {problem}")); }
        catch (ArgumentException e)
        {
            throw new InputException(field, path, "a readable CSV file", $"{field}: cannot read '{InputException.Shorten(path)}': {e.Message}");
        }
        return ParseCsv(text.ReplaceLineEndings("\n").TrimEnd('\n').Split('\n'), path, field, atmosphere);
    }

    /// <summary>Reads the points of CSV text already split into lines; <paramref name="file"/> names it in messages.</summary>
    /// <param name="lines">The lines of the file.</param>
    /// <param name="file">File name for messages.</param>
    /// <param name="field">Option or field name for messages.</param>
    /// <param name="atmosphere">Local atmosphere, for gauge readings.</param>
    public static IReadOnlyList<(double TK, double PPa)> ParseCsv(IReadOnlyList<string> lines, string file, string field, Pressure atmosphere)
    {
        var content = lines.Select((text, i) => (Text: text.Trim().TrimStart('\uFEFF'), Line: i + 1))
            .Where(l => l.Text.Length > 0 && !l.Text.StartsWith('#')).ToList();
        if (content.Count == 0) throw new InputException(field, file, "a CSV file with a header (e.g. T (°C),P (mbar)) and one point a line");
        char sep = content[0].Text.Contains('\t') ? '\t' : content[0].Text.Contains(';') ? ';' : ',';
        var header = Cells(content[0].Text, sep);
        int tCol = -1, pCol = -1;
        string tUnit = "", pUnit = "";
        for (int i = 0; i < header.Length; i++)
        {
            var (quantity, unit) = SplitHeader(header[i]);
            bool isT = quantity is "t" or "temp" or "temperature";
            bool isP = quantity is "p" or "pressure" or "vapor pressure" or "vapour pressure" or "psat";
            if (!isT && !isP) continue;
            string where = $"{field}: {file}: column {i + 1} '{header[i]}'";
            if (isT ? tCol >= 0 : pCol >= 0)
                throw new InputException(field, header[i], "", $"{where}: a second {(isT ? "temperature" : "pressure")} column; give one of each");
            if (unit.Length == 0)
                throw new InputException(field, header[i], "", $"{where} has no unit; write it in the header, e.g. {(isT ? "T (°C) or temperature_k" : "P (mbar) or pressure_kpa")}");
            try
            {
                if (isT) TemperatureUnits.Parse("300" + unit, field); else PressureUnits.Parse("1" + unit, field, atmosphere);
            }
            catch (InputException)
            {
                throw new InputException(field, header[i], "", $"{where}: unknown {(isT ? "temperature" : "pressure")} unit '{unit}'; allowed: " +
                    (isT ? "C, °C, K, F" : "Pa, hPa, mbar, kPa, MPa, bar, Torr, mmHg, inHg, psia, atm, barg, mbarg, kPag, psig"));
            }
            if (isT) { tCol = i; tUnit = unit; } else { pCol = i; pUnit = unit; }
        }
        if (tCol < 0 || pCol < 0)
            throw new InputException(field, content[0].Text, "", $"{field}: {file}: line {content[0].Line}: the header needs a temperature and a pressure column " +
                "with units, e.g. T (°C),P (mbar) or temperature_c,pressure_kpa");

        var points = new List<(double TK, double PPa)>();
        foreach (var (text, line) in content.Skip(1))
        {
            var cells = Cells(text, sep);
            string where = $"{field}: {file}: line {line}";
            if (cells.Length <= Math.Max(tCol, pCol))
                throw new InputException(field, text, "", $"{where}: '{text}' has {cells.Length} column(s); the header has {header.Length}");
            double t = Number(cells[tCol], where, header[tCol]), p = Number(cells[pCol], where, header[pCol]);
            points.Add(Point(t.ToString("R", CultureInfo.InvariantCulture) + tUnit, p.ToString("R", CultureInfo.InvariantCulture) + pUnit,
                $"{where}", atmosphere));
        }
        if (points.Count == 0) throw new InputException(field, file, "at least one point below the header");
        return points;
    }

    private static string[] Cells(string line, char sep) => line.Split(sep).Select(c => c.Trim().Trim('"').Trim()).ToArray();

    private static double Number(string cell, string where, string column) =>
        double.TryParse(cell, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v)
            ? v
            : throw new InputException(column, cell, "", $"{where}: column '{column}': '{cell}' is not a number (use a decimal point)");

    /// <summary>"T (°C)" → ("t", "°C"); "temperature_c" → ("temperature", "c"); "P [kPa]" → ("p", "kPa").</summary>
    private static (string Quantity, string Unit) SplitHeader(string cell)
    {
        string c = cell.Trim();
        int open = c.IndexOfAny(['(', '[']);
        if (open > 0 && (c.EndsWith(')') || c.EndsWith(']')))
            return (Name(c[..open]), c[(open + 1)..^1].Trim());
        int us = c.LastIndexOf('_');
        if (us > 0) return (Name(c[..us]), c[(us + 1)..].Trim());
        string[] words = c.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (words.Length > 1 && Name(string.Join(' ', words[..^1])) is "t" or "temp" or "temperature" or "p" or "pressure" or "psat")
            return (Name(string.Join(' ', words[..^1])), words[^1]);
        return (Name(c), "");
    }

    private static string Name(string s) => string.Join(' ', s.Trim().ToLowerInvariant().Replace('_', ' ').Split(' ', StringSplitOptions.RemoveEmptyEntries));
}
