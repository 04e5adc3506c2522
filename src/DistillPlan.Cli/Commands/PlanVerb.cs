using System.CommandLine;
using DistillPlan.Cli.Output;
using DistillPlan.Core;
using DistillPlan.Core.Library;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;

namespace DistillPlan.Cli.Commands;

/// <summary>
/// What <c>setpoints</c> and <c>strip</c> share: the charge (or a saved plan file), the settings
/// from the settings table, and writing the report. Options given beside <c>--plan</c> override
/// the file's settings.
/// </summary>
internal sealed class PlanVerb
{
    public CommonOptions Common { get; } = new();
    public Argument<string?> Charge { get; } = new("charge")
    {
        Description = "A solvent (ethyl-acetate, THF, 141-78-6) or a mixture NAME=AMOUNT,… (ethanol=90,water=10; thf=12L,toluene=3L); optional with --plan.",
        Arity = ArgumentArity.ZeroOrOne,
    };
    public Option<string?> PlanFile { get; } = new("--plan") { Description = "Run a saved plan file; options given beside it override its settings." };
    private readonly SettingOptions _settings;

    public PlanVerb(params SettingGroup[] groups) => _settings = new SettingOptions(groups);

    public void AddTo(Command cmd)
    {
        cmd.Arguments.Add(Charge);
        cmd.Options.Add(PlanFile);
        _settings.AddTo(cmd);
        Common.AddOutput(cmd, files: true, formats: true);
    }

    /// <summary>The document to plan: the plan file (if any) with the command line on top.</summary>
    public PlanDocument Document(ParseResult r)
    {
        var doc = r.GetValue(PlanFile) is string path ? PlanFileReader.Load(path) : new PlanDocument();
        string? charge = r.GetValue(Charge);
        if (charge is not null) doc = doc with { Charge = charge };
        if (string.IsNullOrWhiteSpace(doc.Charge))
            throw new InputException("charge", "", "a charge such as ethyl-acetate or ethanol=90,water=10 (or --plan FILE)");
        return doc with { Inputs = doc.Inputs.Over(_settings.Read(r)) };
    }

    /// <summary>Plans the document: the same calls as the text UI.</summary>
    public static (Plan Plan, PlanSetup Setup) Plan(PlanDocument doc, SolventLibrary library, double rampReportEvery = StripPlanner.RampReportEvery)
    {
        var (charge, setup) = doc.Build(library);
        var system = BoilingSystems.For(charge, setup.Model);
        return (SetpointPlanner.Plan(charge, system, setup, rampReportEvery), setup);
    }

    public static ReportContext Context(PlanDocument doc, SolventLibrary library) =>
        new(doc.InputList(), library.Cite) { UserTitle = doc.Title, UserNotes = doc.Notes };

    public void Write(ParseResult r, Report report, PlanDocument doc) =>
        ReportWriter.Write(r, Common, report, r.GetValue(PlanFile) is null ? null : doc.PressureUnit);
}
