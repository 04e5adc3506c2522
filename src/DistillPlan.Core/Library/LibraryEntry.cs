namespace DistillPlan.Core.Library;

/// <summary>A library file's citations and its entries, read or still to be read.</summary>
internal sealed record IndexedLibrary(IReadOnlyDictionary<string, string> Sources, IReadOnlyList<LibraryEntry> Entries)
{
    /// <summary>A file already read whole: every entry is read.</summary>
    public static IndexedLibrary Read(LibraryFile file) => new(file.Sources, file.Solvents.Select(s => new LibraryEntry(s)).ToList());
}

/// <summary>
/// One solvent of a library: the names it is found by, where it is written, and the entry
/// itself, which an indexed file reads and validates only when it is first used (a plan of
/// one solvent reads one entry of 65).
/// </summary>
internal sealed class LibraryEntry
{
    private readonly Lazy<Solvent> _solvent;

    /// <summary>An entry already read.</summary>
    public LibraryEntry(Solvent solvent)
    {
        (Name, Cas, Aliases, Origin) = (solvent.Name, solvent.Cas, solvent.Aliases, solvent.Origin);
        _solvent = new Lazy<Solvent>(solvent);
    }

    /// <summary>
    /// An entry read by <paramref name="read"/> on first use; a failure is kept and thrown on
    /// every use. <paramref name="wholeFile"/> reads the entry's whole file at once, for when
    /// every entry is wanted.
    /// </summary>
    public LibraryEntry(string name, string cas, IReadOnlyList<string> aliases, string origin, Func<Solvent> read, Lazy<LibraryFile> wholeFile)
    {
        WholeFile = wholeFile;
        Name = name;
        Cas = cas;
        Aliases = aliases;
        Origin = origin;
        // The text UI plans on a background thread while the screen searches the library.
        _solvent = new Lazy<Solvent>(read, LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string Name { get; }
    public string Cas { get; }
    public IReadOnlyList<string> Aliases { get; }
    /// <summary>File and line of the entry, for messages.</summary>
    public string Origin { get; }

    /// <summary>The file the entry is in, read whole once asked for; null for an entry already read.</summary>
    public Lazy<LibraryFile>? WholeFile { get; }

    public Solvent Solvent => _solvent.Value;
    public bool IsRead => _solvent.IsValueCreated;

    /// <summary>Name, CAS number and aliases, those that are not empty.</summary>
    public IEnumerable<string> Keys => new[] { Name, Cas }.Concat(Aliases).Where(k => k.Length > 0);
}
