using BenchmarkDotNet.Attributes;
using DistillPlan.Core.Library;
using DistillPlan.Core.Mixtures;
using DistillPlan.Core.PlanFiles;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Tui.Model;

namespace DistillPlan.Benchmarks;

/// <summary>
/// The hot paths behind a command and a text-UI keystroke, each from a parsed library (the
/// library load itself is <see cref="LibraryLoad"/>). A mixture "plan with its ramp" is what the
/// text UI computes after every edit: setpoints, then the strip planner's pressure ramp.
/// Charges are ordinary laboratory mixtures; the amounts are demo data.
/// </summary>
[MemoryDiagnoser]
public class PlanBenchmarks
{
    private SolventLibrary _library = null!;
    private PlannerViewModel _planner = null!;
    private MixtureComponent _ethanol = null!, _water = null!;

    private const string Pure = "ethyl-acetate";
    private const string Binary = "ethanol=90,water=10";
    private const string Ternary = "acetone=50,ethanol=30,toluene=20";
    private const string WetTernary = "ethyl-acetate=60,ethanol=25,water=15";
    private const string StripCharge = "thf=12L,toluene=3L";
    private const string ChlorinatedTernary = "methanol=40,dichloromethane=40,toluene=20";
    private const string HexaneTernary = "hexane=50,ethyl-acetate=40,methanol=10";

    [GlobalSetup]
    public void Setup()
    {
        _library = SolventLibrary.LoadShipped();
        _planner = new PlannerViewModel(_library);
        _ethanol = MixtureComponent.FromSolvent(_library.Find("ethanol"));
        _water = MixtureComponent.FromSolvent(_library.Find("water"));
        // Warm the lazily loaded UNIFAC tables so each figure is the plan, not the first table parse.
        PlanWithRamp(Ternary);
    }

    // The same calls as the CLI's PlanVerb.Plan and the text UI's PlannerViewModel.Compute.
    private (Plan Plan, PlanSetup Setup) PlanOnly(string charge)
    {
        var (c, setup) = new PlanDocument { Charge = charge }.Build(_library);
        return (SetpointPlanner.Plan(c, BoilingSystems.For(c, setup.Model), setup), setup);
    }

    private StripPlan PlanWithRamp(string charge, double reportEvery = 0.1)
    {
        var (plan, setup) = PlanOnly(charge);
        return StripPlanner.Plan(plan, setup.Strip, setup.Model, reportEvery);
    }

    /// <summary>`distillplan setpoints ethyl-acetate` without the process around it.</summary>
    [Benchmark(Baseline = true)]
    public Plan PurePlan() => PlanOnly(Pure).Plan;

    /// <summary>A binary mixture's setpoints and its ramp (what the text UI computes per edit).</summary>
    [Benchmark]
    public StripPlan BinaryPlanWithRamp() => PlanWithRamp(Binary);

    /// <summary>A ternary mixture's setpoints and its ramp (what the text UI computes per edit).</summary>
    [Benchmark]
    public StripPlan TernaryPlanWithRamp() => PlanWithRamp(Ternary);

    /// <summary>A whole text-UI keystroke for the ternary: plan, report, curve picture, ramp and its report.</summary>
    [Benchmark]
    public PlanOutcome TernaryKeystroke() => _planner.Compute(new PlanDocument { Charge = Ternary });

    /// <summary>A wet extract (two liquids possible): setpoints and the ramp.</summary>
    [Benchmark]
    public StripPlan WetTernaryPlanWithRamp() => PlanWithRamp(WetTernary);

    /// <summary>A whole text-UI keystroke for the wet extract.</summary>
    [Benchmark]
    public PlanOutcome WetTernaryKeystroke() => _planner.Compute(new PlanDocument { Charge = WetTernary });

    /// <summary>A ternary with a chlorinated solvent: setpoints and the ramp.</summary>
    [Benchmark]
    public StripPlan ChlorinatedTernaryPlanWithRamp() => PlanWithRamp(ChlorinatedTernary);

    /// <summary>Hexane, ethyl acetate and a little methanol (a chromatography eluent): setpoints and the ramp.</summary>
    [Benchmark]
    public StripPlan HexaneTernaryPlanWithRamp() => PlanWithRamp(HexaneTernary);

    /// <summary>`distillplan azeotrope ethanol water` at 1013.25 mbar.</summary>
    [Benchmark]
    public AzeotropeSearchResult AzeotropeSearchEthanolWater() => AzeotropeSearch.Find(_ethanol, _water, 101_325, ActivityModelKind.Dortmund);

    /// <summary>`distillplan strip thf=12L,toluene=3L`: the strip verb's default report every 5 %.</summary>
    [Benchmark]
    public StripPlan Strip() => PlanWithRamp(StripCharge, reportEvery: 0.05);

    /// <summary>`distillplan swap thf=150L --to toluene --target 1% --vessel 250L`: both methods compared.</summary>
    [Benchmark]
    public SwapPlan Swap()
    {
        var setup = PlanInputs.Of(("vessel", "250L")).Build();
        var charge = ChargeParser.Parse("thf=150L", setup.Basis, _library);
        return SwapPlanner.Plan(charge, _library.Find("toluene"), setup, SwapTarget.Parse("1%"));
    }
}

/// <summary>
/// Reading the shipped solvents.yaml: what every command does once (the index and the entries
/// it uses), against reading and validating every entry (a list of all solvents, the text UI's
/// library pane, and every command before the index).
/// </summary>
[MemoryDiagnoser]
public class LibraryLoad
{
    [Benchmark(Baseline = true)]
    public Solvent LoadShippedLibraryAndFindOne() => SolventLibrary.LoadShipped().Find("ethyl-acetate");

    [Benchmark]
    public int LoadShippedLibraryReadEveryEntry() => SolventLibrary.LoadShipped().Solvents.Count;
}
