using DistillPlan.Core.VaporPressure;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace DistillPlan.Core.Library;

/// <summary>What one library file holds: citations by key and solvent entries.</summary>
/// <param name="Sources">Citation text by source key.</param>
/// <param name="Solvents">Entries in file order.</param>
public sealed record LibraryFile(IReadOnlyDictionary<string, string> Sources, IReadOnlyList<Solvent> Solvents);

/// <summary>
/// Reads a <c>solvents.yaml</c> file (format in docs/solvents-schema.md), validates every entry
/// and normalises it to SI. Any problem is a <see cref="LibraryFormatException"/> naming file,
/// line and field.
/// </summary>
public static class SolventYamlLoader
{
    /// <summary>The format tag the loader understands.</summary>
    public const string FormatTag = "distillplan-solvents/1";

    private static readonly string[] EntryKeys =
    [
        "name", "aliases", "cas", "formula", "molar_mass_g_per_mol", "liquid_density_kg_per_m3", "liquid_density_curve",
        "liquid_heat_capacity", "melting_point_k",
        "normal_boiling_point_k", "critical", "vapor_pressure", "enthalpy_of_vaporization", "flash_point_k",
        "autoignition_k", "peroxide_class", "flags", "unifac", "notes",
    ];

    /// <summary>Reads and validates one file.</summary>
    /// <param name="path">File to read.</param>
    /// <param name="knownSources">Source keys defined elsewhere (the shipped file), usable by a user file.</param>
    public static LibraryFile Load(string path, IReadOnlyDictionary<string, string>? knownSources = null)
    {
        return Parse(ReadText(path), path, knownSources);
    }

    /// <summary>Reads one file indexed (<see cref="ParseIndexed"/>): each entry is validated when first used.</summary>
    internal static IndexedLibrary LoadIndexed(string path) => ParseIndexed(ReadText(path), path);

    private static string ReadText(string path) => YamlFileReader.ReadText(path, MaxFileBytes, ProblemIn(path));

    // Every problem of a library file is a LibraryFormatException naming the file.
    private static YamlProblem ProblemIn(string file) => (line, field, problem) => new LibraryFormatException(file, line, field, problem);

    /// <summary>Largest library file read: the shipped one is about 100 kB.</summary>
    public const long MaxFileBytes = 8 << 20;

    /// <summary>Parses library text; <paramref name="file"/> is used in messages.</summary>
    public static LibraryFile Parse(string text, string file, IReadOnlyDictionary<string, string>? knownSources = null)
    {
        var rootNode = YamlFileReader.Parse(text, ProblemIn(file))
            ?? throw new LibraryFormatException(file, 1, "file", "the file is empty");

        var root = new YamlCursor(rootNode, "", file);
        root.OnlyKeys("format", "sources", "solvents");
        var sources = ReadHeader(root, knownSources);

        var solvents = new List<Solvent>();
        // Within one file every name, alias and CAS number belongs to one entry: two entries
        // that share one would leave it to chance which a charge gets.
        var owners = new Dictionary<string, (string Name, int Line)>(StringComparer.Ordinal);
        foreach (var item in root.Required("solvents").Items())
        {
            var s = ReadSolvent(item, sources);
            foreach (var (key, field) in new[] { (s.Name, "name"), (s.Cas, "cas") }.Concat(s.Aliases.Select(a => (a, "aliases"))))
            {
                if (key.Length == 0) continue;
                string k = SolventLibrary.Normalise(key);
                if (owners.TryGetValue(k, out var first) && first.Line != item.Line)
                    throw (item.Optional(field) ?? item).Error($"'{key}' is already a name, alias or CAS number of '{first.Name}' (line {first.Line}) in this file; each entry needs its own");
                owners[k] = (s.Name, item.Line);
            }
            solvents.Add(s);
        }
        return new LibraryFile(sources, solvents);
    }

    // The format tag and the citations by key.
    private static Dictionary<string, string> ReadHeader(YamlCursor root, IReadOnlyDictionary<string, string>? knownSources)
    {
        string format = root.Required("format").String();
        if (format != FormatTag) throw root.Required("format").Error($"expected '{FormatTag}', got '{format}'");
        var sources = new Dictionary<string, string>(knownSources ?? new Dictionary<string, string>());
        if (root.Optional("sources") is { } src)
            foreach (var (key, value) in src.Entries()) sources[key] = value.String();
        return sources;
    }

    /// <summary>
    /// The library's header and an entry per solvent, each read and validated when first used
    /// (<see cref="LibraryTextIndex"/>); a file of another layout is read whole, as by <see cref="Parse"/>.
    /// </summary>
    internal static IndexedLibrary ParseIndexed(string text, string file)
    {
        // Every entry read one by one costs five times one read of the whole file: a list of all
        // solvents reads the file whole, and entries not read yet are taken from that.
        var whole = new Lazy<LibraryFile>(() => Parse(text, file), LazyThreadSafetyMode.ExecutionAndPublication);
        Solvent Read(string entryText, IReadOnlyDictionary<string, string> sources, int firstLine, int index) =>
            whole.IsValueCreated ? whole.Value.Solvents[index] : ReadEntry(entryText, file, sources, firstLine, index);
        return LibraryTextIndex.TryRead(text, file, Read, whole) ?? IndexedLibrary.Read(Parse(text, file));
    }

    /// <summary>The sources of a library's header (the text before its <c>solvents:</c> key); null when it is empty.</summary>
    internal static IReadOnlyDictionary<string, string>? ParseHeader(string header, string file)
    {
        var node = YamlFileReader.Parse(header, ProblemIn(file));
        if (node is null) return null;
        var root = new YamlCursor(node, "", file);
        root.OnlyKeys("format", "sources");
        return ReadHeader(root, null);
    }

    // One entry's lines, parsed with the blank lines above it so that YAML's line numbers are the file's.
    private static Solvent ReadEntry(string entryText, string file, IReadOnlyDictionary<string, string> sources, int firstLine, int index)
    {
        var node = YamlFileReader.Parse(new string('\n', firstLine) + entryText, ProblemIn(file));
        if (node is not YamlSequenceNode { Children.Count: 1 } list)
            throw new LibraryFormatException(file, firstLine + 1, $"solvents[{index}]", "expected one solvent entry");
        return ReadSolvent(new YamlCursor(list.Children[0], $"solvents[{index}]", file), sources);
    }

    private static Solvent ReadSolvent(YamlCursor e, IReadOnlyDictionary<string, string> sources)
    {
        e.OnlyKeys(EntryKeys);
        var fieldSources = new Dictionary<string, string>();
        string name = e.Required("name").String();

        string SourceOf(YamlCursor c, string field)
        {
            var s = c.Required("source");
            string key = s.String();
            if (!sources.ContainsKey(key))
                throw s.Error($"source '{key}' is not defined in the file's 'sources' map");
            fieldSources[field] = key;
            return key;
        }

        // A sourced scalar: {value: 12.3, source: key} (+ extra keys allowed by the caller).
        double? Sourced(string field, bool required = false, params string[] extra)
        {
            var c = required ? e.Required(field) : e.Optional(field);
            if (c is null) return null;
            c.OnlyKeys(["value", "source", .. extra]);
            double v = c.Required("value").Positive();
            // A density is given at a temperature; it must be one a liquid can have.
            if (c.Optional("at_k") is { } at && at.Number() is var k && !(k > 0 && k < MaxTemperatureK))
                throw at.Error($"expected a temperature in kelvin above 0 and below {MaxTemperatureK} K, got {k.ToString(System.Globalization.CultureInfo.InvariantCulture)}");
            SourceOf(c, field);
            return v;
        }

        // {value: K, source: key} | {not_published: [table keys], reason: text} | both (a value from
        // elsewhere, e.g. memory, for a compound the standards do not list).
        FlammabilityRecord Flammability(string field)
        {
            var c = e.Optional(field);
            if (c is null) return FlammabilityRecord.NotRecorded;
            c.OnlyKeys("value", "source", "not_published", "reason");
            double? v = null;
            string? valueSource = null;
            if (c.Optional("value") is { } val)
            {
                v = val.Positive();
                valueSource = SourceOf(c, field);
            }
            else if (c.Has("source")) throw c.Required("source").Error("a source without a value; give 'value' or only 'not_published'");
            var searched = new List<string>();
            if (c.Optional("not_published") is { } np)
                foreach (var item in np.Items())
                {
                    string key = item.String();
                    if (!sources.ContainsKey(key)) throw item.Error($"source '{key}' is not defined in the file's 'sources' map");
                    if (key == valueSource) throw item.Error($"'{key}' is named as the value's source and as not publishing it");
                    searched.Add(key);
                }
            if (v is null && searched.Count == 0)
                throw c.Error("give a value with its source, or list under 'not_published' the tables that do not list it");
            string? reason = c.Optional("reason")?.String();
            if (reason is not null && searched.Count == 0) throw c.Required("reason").Error("'reason' goes with 'not_published'");
            return new FlammabilityRecord(v, searched, reason);
        }

        // A user's own compound may have no CAS number; when one is given it must be valid.
        string cas = e.Optional("cas")?.String() ?? "";
        if (cas.Length > 0 && !CasNumber.IsValid(cas)) throw e.Required("cas").Error($"'{cas}' is not a valid CAS number (check digit)");

        double molarMass = Sourced("molar_mass_g_per_mol", required: true)!.Value;
        double density = Sourced("liquid_density_kg_per_m3", false, "at_k") ?? double.NaN;
        double? tm = Sourced("melting_point_k");
        double tb = Sourced("normal_boiling_point_k", required: true)!.Value;
        var flash = Flammability("flash_point_k");
        var autoignition = Flammability("autoignition_k");

        double? tc = null, pc = null;
        if (e.Optional("critical") is { } crit)
        {
            crit.OnlyKeys("tc_k", "pc_pa", "source");
            tc = crit.Required("tc_k").Positive();
            pc = crit.Optional("pc_pa")?.Positive();
            SourceOf(crit, "critical");
        }

        if (tm is double m && !(m < tb)) throw e.Required("melting_point_k").Error($"melting point {m} K is not below the boiling point {tb} K");
        if (tc is double t && !(tb < t)) throw e.Required("critical").Error($"critical temperature {t} K is not above the boiling point {tb} K");

        var curves = new List<IVaporPressureCurve>();
        foreach (var c in e.Required("vapor_pressure").Items()) curves.Add(ReadCurve(c, SourceOf, tc));
        if (curves.Count == 0) throw e.Required("vapor_pressure").Error("at least one vapour-pressure curve is required");

        IEnthalpyOfVaporization? dh = null;
        if (e.Optional("enthalpy_of_vaporization") is { } h) dh = ReadEnthalpy(h, tc, SourceOf);
        var cp = e.Optional("liquid_heat_capacity") is { } cpc ? LiquidPropertyReader.HeatCapacity(cpc, SourceOf) : null;
        var rhoCurve = e.Optional("liquid_density_curve") is { } rc ? LiquidPropertyReader.DensityCurve(rc, molarMass, SourceOf) : null;

        var peroxide = PeroxideClass.None;
        if (e.Optional("peroxide_class") is { } pcls)
        {
            pcls.OnlyKeys("value", "source");
            string v = pcls.Required("value").String();
            peroxide = v switch
            {
                "none" => PeroxideClass.None,
                "slow" => PeroxideClass.Slow,
                "on-concentration" => PeroxideClass.OnConcentration,
                "severe" => PeroxideClass.Severe,
                _ => throw pcls.Required("value").Error($"'{v}' is not a peroxide class; allowed: none, slow, on-concentration, severe"),
            };
            SourceOf(pcls, "peroxide_class");
        }

        var flags = SolventFlags.None;
        if (e.Optional("flags") is { } fl)
        {
            fl.OnlyKeys("value", "source");
            foreach (var f in fl.Required("value").Items())
            {
                string w = f.String();
                flags |= w switch
                {
                    "bumping-prone" => SolventFlags.BumpingProne,
                    "toxic-vapor" => SolventFlags.ToxicVapor,
                    "foaming" => SolventFlags.Foaming,
                    "hygroscopic" => SolventFlags.Hygroscopic,
                    "low-conductivity" => SolventFlags.LowConductivity,
                    _ => throw f.Error($"'{w}' is not a flag; allowed: bumping-prone, toxic-vapor, foaming, hygroscopic, low-conductivity"),
                };
            }
            SourceOf(fl, "flags");
        }

        Dictionary<int, int>? groups = null;
        if (e.Optional("unifac") is { } u)
        {
            u.OnlyKeys("groups", "source");
            groups = [];
            foreach (var (key, value) in u.Required("groups").Entries())
            {
                if (!int.TryParse(key, out int id) || id <= 0) throw value.Error($"'{key}' is not a UNIFAC subgroup id");
                double n = value.Positive();
                if (n != Math.Floor(n) || n > MaxGroupCount) throw value.Error($"a subgroup count must be a whole number from 1 to {MaxGroupCount}");
                groups[id] = (int)n;
            }
            SourceOf(u, "unifac");
        }

        var aliases = e.Optional("aliases")?.Items().Select(a => a.String()).ToList() ?? [];

        return new Solvent
        {
            Name = name,
            Aliases = aliases,
            Cas = cas,
            Formula = e.Optional("formula")?.String(),
            MolarMassGPerMol = molarMass,
            LiquidDensityKgPerM3 = double.IsNaN(density) ? null : density,
            MeltingPointK = tm,
            NormalBoilingPointK = tb,
            CriticalTemperatureK = tc,
            CriticalPressurePa = pc,
            FlashPointK = flash.ValueK,
            AutoignitionK = autoignition.ValueK,
            FlashPointRecord = flash,
            AutoignitionRecord = autoignition,
            PeroxideClass = peroxide,
            Flags = flags,
            UnifacGroups = groups,
            // Without a published Tc: Watson's Tc of an estimated curve, else Guldberg's rule Tc ≈ 1.5 Tb (common practice).
            VaporPressure = new VaporPressureModel(name, curves, tc, pc,
                curves.OfType<ClausiusClapeyron>().Select(c => c.WatsonTcK).Max() ?? Math.Max(1.5 * tb, curves.Max(c => c.TMaxK))),
            EnthalpyOfVaporization = dh,
            LiquidHeatCapacity = cp,
            LiquidDensityCurve = rhoCurve,
            Sources = fieldSources,
            Origin = $"{e.File}:{e.Line}",
        };
    }

    /// <summary>Highest temperature a library file may name [K]; no solvent is liquid near it.</summary>
    public const double MaxTemperatureK = 2000;

    /// <summary>How far past the entry's critical temperature a curve's range may end (published tables differ).</summary>
    public const double CriticalRangeTolerance = 0.05;

    /// <summary>Largest count of one UNIFAC subgroup in a molecule.</summary>
    public const int MaxGroupCount = 1000;

    private static IVaporPressureCurve ReadCurve(YamlCursor c, Func<YamlCursor, string, string> sourceOf, double? entryTcK)
    {
        string form = c.Required("form").String();
        string[] common = ["form", "t_min_k", "t_max_k", "source", "estimate"];
        double tmin = c.Required("t_min_k").Positive(), tmax = c.Required("t_max_k").Positive();
        if (!(tmin < tmax)) throw c.Required("t_max_k").Error($"t_max_k {tmax} must be above t_min_k {tmin}");
        string source = sourceOf(c, "vapor_pressure");
        double N(string k) => c.Required(k).Number();
        var estimate = c.Optional("estimate") is { } est ? ReadEstimate(est, sourceOf) : null;

        IVaporPressureCurve curve;
        switch (form)
        {
            case "antoine-log10":
            case "antoine-ln":
                c.OnlyKeys([.. common, "a", "b", "c", "p_unit", "t_unit"]);
                string pUnit = c.Optional("p_unit")?.String() ?? "Pa";
                string tUnit = c.Optional("t_unit")?.String() ?? "K";
                double unitPa = pUnit switch
                {
                    "Pa" => 1, "kPa" => 1000, "bar" => 1e5, "mbar" => 100, "MPa" => 1e6,
                    "mmHg" => 133.322387415, "Torr" => 101325.0 / 760.0,
                    _ => throw c.Required("p_unit").Error($"'{pUnit}' is not a pressure unit; allowed: Pa, kPa, MPa, bar, mbar, mmHg, Torr"),
                };
                if (tUnit is not ("K" or "C")) throw c.Required("t_unit").Error($"'{tUnit}' is not allowed; use K or C");
                curve = new Antoine
                {
                    Log10 = form == "antoine-log10", A = N("a"), B = N("b"), C = N("c"),
                    PressureUnitPa = unitPa, CelsiusScale = tUnit == "C", Source = source, TMinK = tmin, TMaxK = tmax, Estimate = estimate,
                };
                break;
            case "dippr101":
                c.OnlyKeys([.. common, "c1", "c2", "c3", "c4", "c5"]);
                curve = new Dippr101 { C1 = N("c1"), C2 = N("c2"), C3 = N("c3"), C4 = N("c4"), C5 = N("c5"), Source = source, TMinK = tmin, TMaxK = tmax, Estimate = estimate };
                break;
            case "wagner-3-6":
            case "wagner-2.5-5":
                c.OnlyKeys([.. common, "a", "b", "c", "d", "tc_k", "pc_pa"]);
                curve = new Wagner
                {
                    FormName = form, TcK = c.Required("tc_k").Positive(), PcPa = c.Required("pc_pa").Positive(),
                    Terms = form == "wagner-3-6" ? Wagner.Form36(N("a"), N("b"), N("c"), N("d")) : Wagner.Form255(N("a"), N("b"), N("c"), N("d")),
                    Source = source, TMinK = tmin, TMaxK = tmax, Estimate = estimate,
                };
                break;
            case "wagner-general":
                c.OnlyKeys([.. common, "terms", "tc_k", "pc_pa"]);
                var terms = c.Required("terms").Items().Select(t =>
                {
                    var pair = t.Items().ToList();
                    if (pair.Count != 2) throw t.Error("each term is [coefficient, exponent of tau]");
                    return (pair[0].Number(), pair[1].Number());
                }).ToList();
                curve = new Wagner { FormName = form, TcK = c.Required("tc_k").Positive(), PcPa = c.Required("pc_pa").Positive(), Terms = terms, Source = source, TMinK = tmin, TMaxK = tmax, Estimate = estimate };
                break;
            case "clausius-clapeyron":
                c.OnlyKeys([.. common, "t1_k", "p1_pa", "dhvap_j_per_mol", "watson_tc_k"]);
                double t1 = c.Required("t1_k").Positive();
                double? watsonTc = c.Optional("watson_tc_k")?.Positive();
                if (watsonTc is double wtc && !(wtc > Math.Max(t1, tmax)))
                    throw c.Required("watson_tc_k").Error($"watson_tc_k {wtc} K must lie above t1_k and t_max_k");
                curve = new ClausiusClapeyron
                {
                    T1K = t1, P1Pa = c.Required("p1_pa").Positive(), WatsonTcK = watsonTc,
                    EnthalpyJPerMol = c.Required("dhvap_j_per_mol").Positive(), Source = source, TMinK = tmin, TMaxK = tmax, Estimate = estimate,
                };
                break;
            default:
                throw c.Required("form").Error($"'{form}' is not a curve form; allowed: antoine-log10, antoine-ln, dippr101, wagner-3-6, wagner-2.5-5, wagner-general, clausius-clapeyron");
        }

        CheckCurve(c, curve, entryTcK);
        return curve;
    }

    // A curve that is not finite, positive and rising over its whole range, or that runs past
    // the critical point, is a copying error in the file: refuse it here, with its line, rather
    // than answer nonsense (or fail without a line) when a plan reaches that temperature.
    private static void CheckCurve(YamlCursor c, IVaporPressureCurve curve, double? entryTcK)
    {
        double tmin = curve.TMinK, tmax = curve.TMaxK;
        string K(double v) => v.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture) + " K";
        if (tmax > MaxTemperatureK) throw c.Required("t_max_k").Error($"{K(tmax)} is above {K(MaxTemperatureK)}; no solvent is liquid there");
        if (curve is Wagner w && tmax > w.TcK)
            throw c.Required("t_max_k").Error($"{K(tmax)} is above the curve's own critical temperature tc_k {K(w.TcK)}");
        // A curve's published range may end a little past the entry's Tc from another table
        // (DMSO: 729 K against 707 K); the model refuses above Tc anyway. Far past it is a typing error.
        if (entryTcK is double tc && tmax > tc * (1 + CriticalRangeTolerance))
            throw c.Required("t_max_k").Error($"{K(tmax)} is more than {CriticalRangeTolerance:P0} above the entry's critical temperature {K(tc)}; there is no vapour pressure there");
        if (curve is Antoine a)
        {
            // log P = A − B/(T + C): T + C = 0 is a pole, with P jumping from 0 to infinity.
            double poleK = (a.CelsiusScale ? PhysicalConstants.ZeroCelsiusK : 0) - a.C;
            if (poleK >= tmin && poleK <= tmax)
                throw c.Required("c").Error($"T + C is zero at {K(poleK)}, inside the range {K(tmin)}–{K(tmax)}: the equation has a pole there (check the sign of C and t_unit)");
        }
        const int samples = 64;
        double previous = 0;
        for (int i = 0; i <= samples; i++)
        {
            double t = tmin + (tmax - tmin) * i / samples;
            double p;
            try { p = curve.PressurePa(t); }
            catch (DistillPlanException e) { throw c.Required("form").Error($"cannot be evaluated at {K(t)}: {e.Message}"); }
            if (!(double.IsFinite(p) && p > 0 && p > previous))
                throw c.Required("form").Error($"the curve does not give a positive pressure rising with temperature over {K(tmin)}–{K(tmax)} (at {K(t)}: {p.ToString("G4", System.Globalization.CultureInfo.InvariantCulture)} Pa; check the coefficients)");
            previous = p;
        }
    }

    // estimate: {basis: trouton|hvap, expected_error_percent: 10, source: key}
    private static CurveEstimate ReadEstimate(YamlCursor e, Func<YamlCursor, string, string> sourceOf)
    {
        e.OnlyKeys("basis", "expected_error_percent", "source");
        string b = e.Required("basis").String();
        var basis = b switch
        {
            "trouton" => EstimateBasis.Trouton,
            "hvap" => EstimateBasis.EnthalpyOfVaporization,
            _ => throw e.Required("basis").Error($"'{b}' is not an estimate basis; allowed: trouton, hvap"),
        };
        double error = e.Required("expected_error_percent").Positive();
        return new CurveEstimate(basis, error, sourceOf(e, "vapor_pressure.estimate"));
    }

    private static IEnthalpyOfVaporization ReadEnthalpy(YamlCursor h, double? tc, Func<YamlCursor, string, string> sourceOf)
    {
        string form = h.Required("form").String();
        string source = sourceOf(h, "enthalpy_of_vaporization");
        switch (form)
        {
            case "dippr106":
                h.OnlyKeys("form", "tc_k", "c1", "c2", "c3", "c4", "t_min_k", "t_max_k", "source");
                return new Dippr106
                {
                    TcK = h.Required("tc_k").Positive(), C1 = h.Required("c1").Positive(), C2 = h.Required("c2").Number(),
                    C3 = h.Optional("c3")?.Number() ?? 0, C4 = h.Optional("c4")?.Number() ?? 0, Source = source,
                };
            case "value":
                h.OnlyKeys("form", "value_j_per_mol", "at_k", "source");
                return new WatsonEnthalpy { ValueJPerMol = h.Required("value_j_per_mol").Positive(), AtK = h.Required("at_k").Positive(), TcK = tc, Source = source };
            default:
                throw h.Required("form").Error($"'{form}' is not an enthalpy form; allowed: dippr106, value");
        }
    }
}
