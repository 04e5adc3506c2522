using DistillPlan.Core.Checks;
using DistillPlan.Core.Planning.Settings;

namespace DistillPlan.Core.Reports;

/// <summary>
/// One labelled value (or list of values) of a report. With <see cref="Names"/> the values are
/// by name (a composition); <see cref="JsonKey"/> is the machine name (renderers add the unit
/// suffix: _c, _mbar, _k).
/// </summary>
/// <param name="Label">The label people read ("Vacuum setpoint").</param>
/// <param name="Values">One value, or several (approach steps, a composition).</param>
/// <param name="JsonKey">Machine name without unit suffix, or null when machines do not need it.</param>
public sealed record Row(string Label, IReadOnlyList<Quantity> Values, string? JsonKey = null)
{
    /// <summary>A row of one value.</summary>
    public Row(string label, Quantity value, string? jsonKey = null) : this(label, [value], jsonKey) { }
    /// <summary>Names of the values, for a composition (JSON writes an object).</summary>
    public IReadOnlyList<string>? Names { get; init; }
    /// <summary>A remark after the value ("set by: bath-limit").</summary>
    public string? Note { get; init; }
    /// <summary>Between values in text ("→" for approach steps).</summary>
    public string Joiner { get; init; } = ", ";
    /// <summary>True for a list even when it holds one value (JSON writes an array).</summary>
    public bool IsList { get; init; }
    /// <summary>Only for machines (JSON); people read it elsewhere in the report.</summary>
    public bool MachineOnly { get; init; }
}

/// <summary>A table column: header, kind of value, and where JSON puts it.</summary>
/// <param name="Header">Header people read ("Pressure"); renderers add the unit.</param>
/// <param name="Kind">Kind of the cells.</param>
/// <param name="JsonKey">Field of the row object (composition columns share one, e.g. "liquid").</param>
/// <param name="JsonName">For a shared field: the key inside it (the solvent's name).</param>
public sealed record Column(string Header, QuantityKind Kind, string JsonKey, string? JsonName = null)
{
    /// <summary>Unit of a plain-number column.</summary>
    public string? NumberUnit { get; init; }
    /// <summary>Short header for narrow text tables.</summary>
    public string? ShortHeader { get; init; }
    /// <summary>Only for machines and spreadsheets (JSON, CSV); the text table leaves it out.</summary>
    public bool MachineOnly { get; init; }
}

/// <summary>One table row: its cells in column order and the findings that belong to it.</summary>
/// <param name="Cells">Cells, one per column.</param>
/// <param name="Findings">Findings at this row (a strip step's checks).</param>
public sealed record TableRow(IReadOnlyList<Quantity> Cells, IReadOnlyList<Finding> Findings);

/// <summary>A table (the strip's steps); its section gives the heading.</summary>
/// <param name="JsonKey">Name of the list in JSON ("steps").</param>
/// <param name="Columns">Columns.</param>
/// <param name="Rows">Rows.</param>
public sealed record Table(string JsonKey, IReadOnlyList<Column> Columns, IReadOnlyList<TableRow> Rows);

/// <summary>A part of a report with a heading: rows, then tables.</summary>
/// <param name="Heading">Heading.</param>
/// <param name="Rows">Labelled values.</param>
/// <param name="Tables">Tables.</param>
public sealed record Section(string Heading, IReadOnlyList<Row> Rows, IReadOnlyList<Table> Tables)
{
    /// <summary>
    /// When set, JSON writes this section as one object (its rows and tables) appended to the
    /// list of this name, e.g. each swap method under "methods"; otherwise its rows and tables
    /// go to the top level.
    /// </summary>
    public string? JsonGroup { get; init; }
}

/// <summary>One line of a plot: points in the report's typed quantities.</summary>
/// <param name="Name">Legend text.</param>
/// <param name="X">X values.</param>
/// <param name="Y">Y values.</param>
/// <param name="OnRightAxis">True to draw against the right-hand axis.</param>
/// <param name="MarkersOnly">True to draw points only (a setpoint).</param>
public sealed record PlotSeries(string Name, IReadOnlyList<Quantity> X, IReadOnlyList<Quantity> Y, bool OnRightAxis = false, bool MarkersOnly = false);

/// <summary>A straight reference line across a plot (a coolant temperature, the pump limit).</summary>
/// <param name="Label">Legend text.</param>
/// <param name="At">Where it crosses.</param>
/// <param name="Vertical">True for a line at an x value, false for a y value.</param>
public sealed record PlotLine(string Label, Quantity At, bool Vertical);

/// <summary>A plot a report offers: axes, series and reference lines, renderer-neutral.</summary>
/// <param name="Title">Title.</param>
/// <param name="XLabel">X-axis label without unit.</param>
/// <param name="XKind">Kind of x values.</param>
/// <param name="YLabel">Left y-axis label without unit.</param>
/// <param name="YKind">Kind of left y values.</param>
/// <param name="LogY">True for a logarithmic left axis (pressures).</param>
/// <param name="Series">Series.</param>
/// <param name="Lines">Reference lines.</param>
public sealed record Plot(string Title, string XLabel, QuantityKind XKind, string YLabel, QuantityKind YKind, bool LogY,
    IReadOnlyList<PlotSeries> Series, IReadOnlyList<PlotLine> Lines)
{
    /// <summary>Right y-axis label, when a series uses it.</summary>
    public string? RightLabel { get; init; }
    /// <summary>Kind of the right y values.</summary>
    public QuantityKind RightKind { get; init; } = QuantityKind.Temperature;
}

/// <summary>A source a report relied on: key and full citation.</summary>
/// <param name="Key">The library's source key.</param>
/// <param name="Citation">Full citation.</param>
public sealed record SourceCitation(string Key, string Citation);

/// <summary>
/// What every output shows for one computation (a plan, a strip): renderer-neutral sections,
/// findings, assumptions, sources, cautions and plots, built once in Core. Text, JSON,
/// Markdown, CSV, plot files and the text UI are thin renderers of it, and the display unit
/// is a rendering choice.
/// </summary>
public sealed record Report
{
    /// <summary>"plan" or "strip".</summary>
    public required string Kind { get; init; }
    /// <summary>Heading ("Plan for ethanol").</summary>
    public required string Title { get; init; }
    /// <summary>The user's own title of the plan, when given.</summary>
    public string? UserTitle { get; init; }
    /// <summary>The user's notes, when given.</summary>
    public string? UserNotes { get; init; }
    /// <summary>Program name and version.</summary>
    public required string Program { get; init; }
    /// <summary>When the report was made (UTC).</summary>
    public required DateTimeOffset Made { get; init; }
    /// <summary>Every input: the charge as given and each setting given, by setting key.</summary>
    public required IReadOnlyList<KeyValuePair<string, string>> Inputs { get; init; }
    /// <summary>Machine-only fields at the top of the JSON (the contract's fixed fields come from sections).</summary>
    public IReadOnlyList<Row> Header { get; init; } = [];
    /// <summary>The sections in reading order.</summary>
    public required IReadOnlyList<Section> Sections { get; init; }
    /// <summary>The checks, most severe first.</summary>
    public required IReadOnlyList<Finding> Checks { get; init; }
    /// <summary>Notes on what was done and why (severity info).</summary>
    public required IReadOnlyList<Finding> Notes { get; init; }
    /// <summary>Every value used, defaults marked.</summary>
    public required IReadOnlyList<Assumption> Assumptions { get; init; }
    /// <summary>Published sources used.</summary>
    public required IReadOnlyList<SourceCitation> Sources { get; init; }
    /// <summary>The general cautions.</summary>
    public required IReadOnlyList<string> Cautions { get; init; }
    /// <summary>Plots offered.</summary>
    public IReadOnlyList<Plot> Plots { get; init; } = [];
    /// <summary>The main table for CSV (the strip's steps), when there is one.</summary>
    public Table? MainTable => Sections.SelectMany(s => s.Tables).FirstOrDefault();
}
