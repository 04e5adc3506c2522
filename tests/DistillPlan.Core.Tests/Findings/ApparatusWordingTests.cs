using DistillPlan.Core.Checks;
using DistillPlan.Core.Library;
using DistillPlan.Core.Planning;
using DistillPlan.Core.Planning.Settings;
using DistillPlan.Core.Reports;

namespace DistillPlan.Core.Tests.Findings;

/// <summary>
/// Cautions, findings and labels follow the equipment: a jacketed vessel gets the plant cautions
/// (nitrogen, earthing and static, wetted jacket, hazardous area) and no glassware words; a
/// rotary evaporator the glassware cautions and no plant ones (common practice; docs/methods.md,
/// Safety checks).
/// </summary>
public class ApparatusWordingTests
{
    private static readonly SolventLibrary Library = SolventLibrary.LoadShipped();

    private static Plan PlanFor(string name, params (string Key, string Value)[] settings)
    {
        var setup = PlanInputs.Of(settings).Build();
        var charge = Charge.Pure(Library.Find(name));
        return SetpointPlanner.Plan(charge, BoilingSystems.For(charge, null), setup);
    }

    private static Report ReportOf(Plan p) => PlanReports.ForPlan(p, new ReportContext([], k => k));

    /// <summary>Every word the reader sees of the plan's findings and notes, and its cautions.</summary>
    private static string Text(Report r) => string.Join("\n",
        r.Checks.Concat(r.Notes).SelectMany(f => new[] { f.Message(DisplayFormat.Default), f.Action(DisplayFormat.Default) })
            .Concat(r.Cautions));

    private static readonly string[] GlasswareWords = ["flask", "rotation", "rotate", "implode", "shield", "bump trap", "cold-finger"];
    private static readonly string[] PlantWords = ["nitrogen", "Earth the vessel", "static", "hazardous area", "jacket level"];

    [Theory]
    [InlineData("toluene")]
    [InlineData("water")]       // bumping-prone: its bumping finding must speak of the stirrer, not rotation
    [InlineData("tetrahydrofuran")]
    public void A_vessel_plan_carries_the_plant_cautions_and_no_glassware_words(string solvent)
    {
        var p = PlanFor(solvent, ("vessel", "250L"));
        Assert.True(p.Equipment.IsVessel);
        var r = ReportOf(p);
        string text = Text(r);
        foreach (var w in PlantWords) Assert.Contains(w, text, StringComparison.OrdinalIgnoreCase);
        foreach (var w in GlasswareWords) Assert.DoesNotContain(w, text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains(r.Sections[0].Rows, row => row.Label == "Jacket");
        Assert.DoesNotContain(r.Sections[0].Rows, row => row.Label.StartsWith("Bath", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData("toluene")]
    [InlineData("water")]
    [InlineData("tetrahydrofuran")]
    public void A_flask_plan_carries_the_glassware_cautions_and_no_plant_ones(string solvent)
    {
        var r = ReportOf(PlanFor(solvent, ("flask", "1L")));
        string text = Text(r);
        Assert.Contains("Glassware under vacuum can implode", text);
        Assert.Contains("flask at most half full", text);
        foreach (var w in PlantWords) Assert.DoesNotContain(w, text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains(r.Sections[0].Rows, row => row.Label == "Bath");
    }

    [Fact]
    public void The_bumping_finding_speaks_of_rotation_in_a_flask_and_of_the_stirrer_in_a_vessel()
    {
        // Water is flagged bumping-prone in the library (common practice), so both plans carry the finding.
        var flask = PlanFor("water", ("flask", "1L")).Checks.Single(f => f.Code == "bumping-risk");
        var vessel = PlanFor("water", ("vessel", "250L")).Checks.Single(f => f.Code == "bumping-risk");
        Assert.Equal(ApparatusKind.RotaryEvaporator, flask.Apparatus);
        Assert.Equal(ApparatusKind.JacketedVessel, vessel.Apparatus);
        Assert.Contains("rotation on before vacuum", flask.Action(DisplayFormat.Default));
        Assert.Contains("the bath is", flask.Message(DisplayFormat.Default));
        Assert.Contains("Stirrer on before vacuum", vessel.Action(DisplayFormat.Default));
        Assert.Contains("the jacket is", vessel.Message(DisplayFormat.Default));
        Assert.Equal(flask.Identity, vessel.Identity);   // the same finding, worded for its equipment
    }

    [Theory]
    [InlineData("toluene", "toluene has a low conductivity")]
    [InlineData("hexane", "hexane has a low conductivity")]
    [InlineData("diethyl ether", "diethyl ether has a low conductivity")]
    [InlineData("ethanol", "low-conductivity solvents (hydrocarbons, ethers) charge up")]   // ethanol conducts: the general line
    public void The_static_caution_names_the_low_conductivity_solvents_of_the_charge(string solvent, string expected)
    {
        var cautions = Cautions.For(PlanFor(solvent, ("vessel", "250L")).Equipment, [Library.Find(solvent)]);
        Assert.Contains(cautions, c => c.Contains(expected, StringComparison.Ordinal));
    }

    [Fact]
    public void Both_low_conductivity_solvents_of_a_mixture_are_named()
    {
        var cautions = Cautions.For(new Equipment { Apparatus = ApparatusKind.JacketedVessel }, [Library.Find("toluene"), Library.Find("heptane"), Library.Find("ethanol")]);
        Assert.Contains(cautions, c => c.Contains("toluene and heptane have a low conductivity", StringComparison.Ordinal));
    }

    [Fact]
    public void A_minimum_stirred_volume_given_by_the_user_is_quoted()
    {
        var p = PlanFor("toluene", ("vessel", "250L"), ("min-volume", "40L"));
        Assert.Contains(Cautions.For(p.Equipment, p.System.Components), c => c.Contains("minimum stirred volume (40 L here)", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(ApparatusKind.RotaryEvaporator)]
    [InlineData(ApparatusKind.JacketedVessel)]
    public void Every_caution_list_first_defers_to_the_site_the_SDS_local_codes_and_licensed_practice(ApparatusKind kind)
    {
        string first = Cautions.For(new Equipment { Apparatus = kind }, [Library.Find("toluene")])[0];
        foreach (var w in new[] { "site's safety rules", "SDS", "local codes", "licensed practice" }) Assert.Contains(w, first);
    }
}

/// <summary>The vessel wordings stand in for common ones: same keys, and no value the finding does not carry.</summary>
public class VesselWordingCatalogueTests
{
    private static Dictionary<string, (string Message, string Action)> Catalogue(string field)
    {
        var dict = (System.Collections.IDictionary)typeof(Wording)
            .GetField(field, System.Reflection.BindingFlags.NonPublic | System.Reflection.BindingFlags.Static)!.GetValue(null)!;
        var result = new Dictionary<string, (string, string)>();
        foreach (System.Collections.DictionaryEntry e in dict)
        {
            var t = e.Value!.GetType();
            result[(string)e.Key] = ((string)t.GetProperty("Message")!.GetValue(e.Value)!, (string)t.GetProperty("Action")!.GetValue(e.Value)!);
        }
        return result;
    }

    private static HashSet<string> Placeholders(string text) =>
        System.Text.RegularExpressions.Regex.Matches(text, @"\{([a-z_]+)\}").Select(m => m.Groups[1].Value).ToHashSet();

    [Fact]
    public void Every_vessel_wording_replaces_a_common_one_and_uses_only_its_values()
    {
        var common = Catalogue("Entries");
        var vessel = Catalogue("VesselEntries");
        Assert.NotEmpty(vessel);
        foreach (var (key, v) in vessel)
        {
            Assert.True(common.TryGetValue(key, out var c), $"vessel wording {key} has no common wording");
            Assert.Subset(Placeholders(c.Message + c.Action), Placeholders(v.Message + v.Action));
        }
    }

    private static readonly string[] GlasswareWords = ["flask", "rotat", "bath ", "bath.", "bath,", "bump trap", "cold-finger", "dry ice"];

    private static bool SpeaksOfGlassware(string text) => GlasswareWords.Any(w => text.Contains(w, StringComparison.OrdinalIgnoreCase));

    [Fact]
    public void No_vessel_wording_speaks_of_glassware()
    {
        foreach (var (key, v) in Catalogue("VesselEntries"))
            Assert.False(SpeaksOfGlassware(v.Message + " " + v.Action), $"vessel wording {key} speaks of glassware");
    }

    [Fact]
    public void Every_common_wording_that_speaks_of_glassware_has_a_vessel_wording()
    {
        var vessel = Catalogue("VesselEntries");
        foreach (var (key, c) in Catalogue("Entries"))
            if (SpeaksOfGlassware(c.Message + " " + c.Action))
                Assert.True(vessel.ContainsKey(key), $"{key} speaks of glassware but has no vessel wording in Wording.Vessel.cs");
    }
}
