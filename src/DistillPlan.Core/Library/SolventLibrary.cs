namespace DistillPlan.Core.Library;

/// <summary>
/// The solvents a plan can use: the shipped <c>solvents.yaml</c>, with a user's file merged
/// over it (an entry with the same CAS number, or name, replaces the shipped one).
/// Lookup is by name, alias or CAS number, case-insensitive, with spaces, hyphens and
/// underscores interchangeable.
/// </summary>
public sealed class SolventLibrary
{
    /// <summary>File name of the shipped library.</summary>
    public const string FileName = "solvents.yaml";

    private readonly IReadOnlyList<LibraryEntry> _entries;
    private readonly Dictionary<string, LibraryEntry> _byKey;
    private readonly Lazy<IReadOnlyList<Solvent>> _all;

    private SolventLibrary(IReadOnlyList<LibraryEntry> entries, IReadOnlyDictionary<string, string> sources, IReadOnlyList<string> files)
    {
        _entries = entries;
        Citations = sources;
        Files = files;
        _all = new(() =>
        {
            foreach (var file in _entries.Where(e => !e.IsRead).Select(e => e.WholeFile).OfType<Lazy<LibraryFile>>().Distinct())
                _ = file.Value;
            return _entries.Select(e => e.Solvent).ToList();
        }, LazyThreadSafetyMode.ExecutionAndPublication);
        _byKey = new Dictionary<string, LibraryEntry>(StringComparer.Ordinal);
        foreach (var s in entries)
            foreach (string key in s.Keys)
            {
                string k = Normalise(key);
                if (_byKey.TryGetValue(k, out var other) && !ReferenceEquals(other, s))
                {
                    // Blame the user's entry, not the shipped one it collides with: the user's file is what to edit.
                    var (blamed, kept) = files.Count > 1 && OriginFile(s) == files[0] && OriginFile(other) != files[0] ? (other, s) : (s, other);
                    string field = Normalise(blamed.Name) == k ? "name" : Normalise(blamed.Cas) == k ? "cas" : "aliases";
                    throw new LibraryFormatException(OriginFile(blamed), OriginLine(blamed), field,
                        $"'{key}' of {blamed.Name} is also a name, alias or CAS number of {kept.Name} ({kept.Origin}); " +
                        "an entry replaces a shipped one only when its CAS number (or, without one, its name) is the same");
                }
                _byKey[k] = s;
            }
    }

    private static string OriginFile(LibraryEntry s) => s.Origin[..Math.Max(0, s.Origin.LastIndexOf(':'))];
    private static int OriginLine(LibraryEntry s) => int.TryParse(s.Origin[(s.Origin.LastIndexOf(':') + 1)..], out int l) ? l : 0;

    /// <summary>All solvents, shipped first, then the user's additions (reads every entry not read yet).</summary>
    public IReadOnlyList<Solvent> Solvents => _all.Value;
    /// <summary>Full citation text by source key.</summary>
    public IReadOnlyDictionary<string, string> Citations { get; }
    /// <summary>The files the library was read from, in merge order.</summary>
    public IReadOnlyList<string> Files { get; }

    /// <summary>
    /// How many entries have been read so far. The shipped library is indexed by name, alias and
    /// CAS number at load; an entry is parsed and validated when a lookup, search or list first
    /// needs it, so a plan of one solvent reads one.
    /// </summary>
    public int EntriesRead => _entries.Count(e => e.IsRead);

    /// <summary>The citation for a source key, or the key itself when it is not defined.</summary>
    public string Cite(string sourceKey) => Citations.TryGetValue(sourceKey, out var c) ? c : sourceKey;

    /// <summary>Reads one library file on its own.</summary>
    public static SolventLibrary Load(string path)
    {
        var file = IndexedLibrary.Read(SolventYamlLoader.Load(path));
        return new SolventLibrary(file.Entries, file.Sources, [path]);
    }

    /// <summary>
    /// Reads one library file the way the shipped one is read: indexed by name, alias and CAS
    /// number, each entry parsed and validated when first used, so a mistake in an entry is
    /// reported (with its line) only when that entry is asked for.
    /// </summary>
    public static SolventLibrary LoadIndexed(string path)
    {
        var file = SolventYamlLoader.LoadIndexed(path);
        return new SolventLibrary(file.Entries, file.Sources, [path]);
    }

    /// <summary>
    /// The shipped library merged with the user's: <paramref name="userPath"/> when given
    /// (it must exist), else the per-user default file when it exists.
    /// </summary>
    public static SolventLibrary LoadWithUser(string? userPath)
    {
        var (shipped, shippedPath) = ReadShipped();
        string? user = userPath ?? (File.Exists(DefaultUserPath) ? DefaultUserPath : null);
        if (user is null) return new SolventLibrary(shipped.Entries, shipped.Sources, [shippedPath]);
        if (!File.Exists(user))
            throw new InputException("--library", user, "a readable solvents YAML file (docs/solvents-schema.md)");

        // The user's own file is read whole, so a mistake anywhere in it is said at once.
        var mine = SolventYamlLoader.Load(user, shipped.Sources);
        var merged = shipped.Entries.ToList();
        foreach (var s in mine.Solvents)
        {
            int i = merged.FindIndex(x => (s.Cas.Length > 0 && x.Cas == s.Cas) || Normalise(x.Name) == Normalise(s.Name));
            if (i >= 0) merged[i] = new LibraryEntry(s); else merged.Add(new LibraryEntry(s));
        }
        return new SolventLibrary(merged, mine.Sources, [shippedPath, user]);
    }

    /// <summary>The shipped library alone.</summary>
    public static SolventLibrary LoadShipped()
    {
        var (file, name) = ReadShipped();
        return new SolventLibrary(file.Entries, file.Sources, [name]);
    }

    /// <summary>What <see cref="Files"/> names when the library built into the program answered.</summary>
    public const string BuiltInName = "solvents.yaml (built in)";

    // The build embeds the repository's solvents.yaml (DistillPlan.Core.csproj), so a single
    // native binary needs no file beside it; a file found by FindShipped still wins.
    private const string BuiltInResource = "DistillPlan.Core.Library.solvents.yaml";

    // The shipped library is indexed, not read whole: LibraryTextIndex says why. Its entries are
    // checked all together by the library's own tests (LibraryIntegrityTests).
    private static (IndexedLibrary File, string Name) ReadShipped()
    {
        if (FindShipped() is string path) return (SolventYamlLoader.LoadIndexed(path), path);
        using var stream = typeof(SolventLibrary).Assembly.GetManifestResourceStream(BuiltInResource)
            ?? throw new LibraryFormatException(FileName, 0, "file", "the shipped solvent library is not built into this program and was not found next to it or above it");
        using var reader = new StreamReader(stream);
        return (SolventYamlLoader.ParseIndexed(reader.ReadToEnd(), BuiltInName), BuiltInName);
    }

    /// <summary>The per-user library file: $XDG_CONFIG_HOME/distillplan/solvents.yaml, else ~/.config/distillplan/solvents.yaml.</summary>
    public static string DefaultUserPath
    {
        get
        {
            string? xdg = Environment.GetEnvironmentVariable("XDG_CONFIG_HOME");
            string config = string.IsNullOrEmpty(xdg)
                ? Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), ".config")
                : xdg;
            return Path.Combine(config, "distillplan", FileName);
        }
    }

    /// <summary>
    /// The shipped library file on disk, if any: $DISTILLPLAN_SHIPPED_LIBRARY, next to the
    /// executable (the build copies it there), or in a parent folder (running from a source
    /// checkout). Null means the copy built into the program is used.
    /// </summary>
    public static string? FindShipped()
    {
        string? env = Environment.GetEnvironmentVariable("DISTILLPLAN_SHIPPED_LIBRARY");
        if (!string.IsNullOrEmpty(env)) return env;
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            string candidate = Path.Combine(dir.FullName, FileName);
            if (File.Exists(candidate)) return candidate;
        }
        return null;
    }

    /// <summary>The solvent for a name, alias or CAS number; throws with suggestions when unknown.</summary>
    public Solvent Find(string nameAliasOrCas) =>
        TryFind(nameAliasOrCas, out var s) ? s! : throw new UnknownSolventException(nameAliasOrCas, Suggest(nameAliasOrCas));

    /// <summary>The solvent for a name, alias or CAS number, when the library holds it.</summary>
    public bool TryFind(string nameAliasOrCas, out Solvent? solvent)
    {
        solvent = _byKey.TryGetValue(Normalise(nameAliasOrCas), out var entry) ? entry.Solvent : null;
        return solvent is not null;
    }

    /// <summary>
    /// Solvents whose name, alias or CAS contains the text (for type-to-search), best first:
    /// exact, then prefix, then substring matches.
    /// </summary>
    public IReadOnlyList<Solvent> Search(string text)
    {
        string q = Normalise(text);
        if (q.Length == 0) return Solvents;
        return _entries
            .Select(s => (s, rank: Keys(s).Select(k => k == q ? 0 : k.StartsWith(q, StringComparison.Ordinal) ? 1 : k.Contains(q, StringComparison.Ordinal) ? 2 : 9).Min()))
            .Where(t => t.rank < 9).OrderBy(t => t.rank).ThenBy(t => t.s.Name, StringComparer.Ordinal).Select(t => t.s.Solvent).ToList();
    }

    /// <summary>Up to <paramref name="count"/> library names nearest to a misspelt one (edit distance).</summary>
    public IReadOnlyList<string> Suggest(string text, int count = 3)
    {
        string q = Normalise(text);
        return _entries
            .Select(s => (s.Name, d: Keys(s).Min(k => EditDistance(q, k) - (k.StartsWith(q, StringComparison.Ordinal) && q.Length >= 2 ? q.Length : 0))))
            .OrderBy(t => t.d).ThenBy(t => t.Name, StringComparer.Ordinal)
            .Where(t => t.d <= Math.Max(3, q.Length / 2))
            .Take(count).Select(t => t.Name).ToList();
    }

    private static IEnumerable<string> Keys(LibraryEntry s) => s.Keys.Select(Normalise);

    /// <summary>Lower case, with spaces, hyphens and underscores made the same.</summary>
    public static string Normalise(string name) =>
        string.Join('-', name.Trim().ToLowerInvariant().Split([' ', '-', '_'], StringSplitOptions.RemoveEmptyEntries));

    private static int EditDistance(string a, string b)
    {
        var d = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++) d[j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            int prev = d[0];
            d[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int tmp = d[j];
                d[j] = Math.Min(Math.Min(d[j] + 1, d[j - 1] + 1), prev + (a[i - 1] == b[j - 1] ? 0 : 1));
                prev = tmp;
            }
        }
        return d[b.Length];
    }
}
