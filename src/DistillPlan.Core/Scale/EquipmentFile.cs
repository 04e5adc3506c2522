using DistillPlan.Core.Library;
using DistillPlan.Core.Planning.Settings;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.Scale;

/// <summary>One named unit of a user's equipment file: its settings as text, by setting key.</summary>
/// <param name="Name">The unit's name (rotavap-2, R-101).</param>
/// <param name="Description">What it is, in the user's words.</param>
/// <param name="Settings">Setting key → text, as on the command line.</param>
/// <param name="Origin">File and line, for messages.</param>
public sealed record EquipmentUnit(string Name, string? Description, IReadOnlyDictionary<string, string> Settings, string Origin);

/// <summary>
/// The user's equipment file (docs/equipment-file.md): named units, each a set of equipment
/// settings spelt as the command-line options (flask, vessel, heating, pump-speed …). Read
/// with the same standard as the solvent library: every error names file, line and field.
/// </summary>
public static class EquipmentFile
{
    /// <summary>The format tag on the file's first key.</summary>
    public const string FormatTag = "distillplan-equipment/1";

    /// <summary>The file name inside the user's config folder.</summary>
    public const string FileName = "equipment.yaml";

    /// <summary>The default file: $DISTILLPLAN_EQUIPMENT_FILE, else $XDG_CONFIG_HOME/distillplan/equipment.yaml, else ~/.config/distillplan/equipment.yaml.</summary>
    public static string DefaultPath
    {
        get
        {
            string? env = Environment.GetEnvironmentVariable("DISTILLPLAN_EQUIPMENT_FILE");
            if (!string.IsNullOrEmpty(env)) return env;
            return Path.Combine(Path.GetDirectoryName(SolventLibrary.DefaultUserPath)!, FileName);
        }
    }

    /// <summary>The settings a unit may carry: every equipment and size setting.</summary>
    public static IReadOnlyList<string> AllowedKeys { get; } =
        [.. PlanSettings.All.Where(s => s.Group is SettingGroup.Equipment or SettingGroup.Size && s.Key is not ("equipment" or "equipment-file")).Select(s => s.Key)];

    /// <summary>The unit of this name (case-insensitive) from a file; throws naming the file and the units it has.</summary>
    public static EquipmentUnit Find(string name, string? path = null)
    {
        path ??= DefaultPath;
        var units = Load(path);
        return units.FirstOrDefault(u => string.Equals(u.Name, name.Trim(), StringComparison.OrdinalIgnoreCase))
            ?? throw new InputException("--equipment", name, units.Count == 0
                ? $"a unit named in {path} (it has none)"
                : $"a unit of {path}: {string.Join(", ", units.Select(u => u.Name))}");
    }

    /// <summary>Reads and validates a file (again only when it has changed since the last read).</summary>
    public static IReadOnlyList<EquipmentUnit> Load(string path)
    {
        if (!File.Exists(path))
            throw new InputException("--equipment", path, "an equipment file that exists (" + DefaultPath + ", or --equipment-file FILE)");
        // Every settings read looks the unit up, and the text UI reads the settings for each field's
        // hint: read and validate the file once per version of it, not once per field.
        var info = new FileInfo(path);
        var stamp = (info.LastWriteTimeUtc, info.Length);
        if (Cache.TryGetValue(info.FullName, out var known) && known.Stamp == stamp) return known.Units;
        string text = YamlFileReader.ReadText(path, MaxFileBytes, (line, field, problem) => new LibraryFormatException(path, line, field, problem));
        var units = Parse(text, path);
        Cache[info.FullName] = (stamp, units);
        return units;
    }

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<string, ((DateTime, long) Stamp, IReadOnlyList<EquipmentUnit> Units)> Cache = new();

    /// <summary>Largest file read (a few hundred units fit in far less).</summary>
    public const int MaxFileBytes = 1 << 20;

    /// <summary>Parses equipment-file text; <paramref name="file"/> is used in messages.</summary>
    public static IReadOnlyList<EquipmentUnit> Parse(string text, string file)
    {
        var rootNode = YamlFileReader.Parse(text, (line, field, problem) => new LibraryFormatException(file, line, field, problem))
            ?? throw new LibraryFormatException(file, 1, "file", "the file is empty");
        var root = new YamlCursor(rootNode, "", file);
        root.OnlyKeys("format", "units");
        string format = root.Required("format").String();
        if (format != FormatTag) throw root.Required("format").Error($"expected '{FormatTag}', got '{format}'");

        var units = new List<EquipmentUnit>();
        foreach (var item in root.Required("units").Items())
        {
            item.OnlyKeys([.. AllowedKeys, "name", "description"]);
            string name = item.Required("name").String();
            if (units.Any(u => string.Equals(u.Name, name, StringComparison.OrdinalIgnoreCase)))
                throw item.Required("name").Error($"a second unit named '{name}' (names must differ)");
            var settings = new Dictionary<string, string>();
            var inputs = new PlanInputs();
            foreach (var (key, value) in item.Entries())
            {
                if (key is "name" or "description") continue;
                settings[key] = value.String();
                inputs = inputs.With(key, settings[key]);
            }
            // The same readers as the command line, so a unit holds only values an option would accept.
            try { PlanSettings.Build(inputs); }
            catch (InputException e)
            {
                string key = e.Field.TrimStart('-');
                var at = item.Optional(key) ?? item;
                throw at.Error($"'{e.Value}' is not allowed; expected {e.Allowed}");
            }
            units.Add(new EquipmentUnit(name, item.Optional("description")?.String(), settings, $"{file}:{item.Line}"));
        }
        return units;
    }
}
