using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

public class ActivityModelChoiceTests
{
    [Fact]
    public void Dortmund_is_chosen_by_default_when_every_group_pair_has_a_parameter()
    {
        var choice = ActivityModelChoice.Choose([TestSolvents.Ethanol, TestSolvents.Water]);

        Assert.Equal("dortmund", choice.Name);
        Assert.Null(choice.FallbackReason);
        Assert.Contains("Dortmund", choice.Reason);
    }

    [Fact]
    public void Original_unifac_is_chosen_when_asked_for()
    {
        var choice = ActivityModelChoice.Choose([TestSolvents.Ethanol, TestSolvents.Water], ActivityModelKind.Unifac);

        Assert.Equal("unifac", choice.Name);
        Assert.Null(choice.FallbackReason);
    }

    [Fact]
    public void A_missing_dortmund_pair_falls_back_to_original_unifac_and_says_why()
    {
        // The data compilation (../shared/data/README.md) notes that modified UNIFAC has no
        // water parameter for carbon disulfide (CS2, main group 28); original UNIFAC has one.
        var components = new[] { TestSolvents.ByName("carbon disulfide"), TestSolvents.Water };

        var choice = ActivityModelChoice.Choose(components);

        Assert.Equal("unifac", choice.Name);
        Assert.Contains("instead of modified UNIFAC (Dortmund)", choice.FallbackReason);
        Assert.Contains("CS2", choice.FallbackReason);
        Assert.Equal(choice.FallbackReason, choice.Reason);
    }

    [Theory]
    [InlineData("dortmund", ActivityModelKind.Dortmund)]
    [InlineData("UNIFAC", ActivityModelKind.Unifac)]
    [InlineData("ideal", ActivityModelKind.Ideal)]
    public void Model_names_parse_as_the_command_line_spells_them(string name, ActivityModelKind kind)
    {
        Assert.True(ActivityModelChoice.TryParse(name, out var parsed));
        Assert.Equal(kind, parsed);
        Assert.Equal(name.ToLowerInvariant(), ActivityModelChoice.NameOf(kind));
        Assert.False(ActivityModelChoice.TryParse("wilson", out _));
    }

    [Fact]
    public void A_carboxylic_acid_makes_the_answer_approximate()
    {
        // Acetic acid dimerises in the vapour (common knowledge of the trade); no UNIFAC variant models it.
        var withAcid = ActivityModelChoice.Choose([TestSolvents.ByName("acetic acid"), TestSolvents.Water]);
        var withoutAcid = ActivityModelChoice.Choose([TestSolvents.Ethanol, TestSolvents.Water]);

        Assert.Contains("acetic acid", withAcid.ApproximationNote);
        Assert.Null(withoutAcid.ApproximationNote);
    }

    [Fact]
    public void Ideal_is_used_when_asked_for()
    {
        var choice = ActivityModelChoice.Choose([TestSolvents.Ethanol, TestSolvents.Water], ActivityModelKind.Ideal);

        Assert.Equal("ideal", choice.Name);
        Assert.Null(choice.FallbackReason);
    }

    [Fact]
    public void A_missing_main_group_pair_falls_back_to_ideal_and_names_the_pair()
    {
        // The original UNIFAC table (Hansen et al. 1991 and revisions) has no CCL (21) / DMSO (35)
        // parameter; 1,2-dichloroethane is 2 × CH2Cl (subgroup 44, main group 21), DMSO is
        // subgroup 67 (main group 35), both per the DDBST assignments.
        var components = new[] { TestSolvents.Dichloroethane, TestSolvents.Dmso };

        var coverage = Unifac.CheckCoverage(components);
        var choice = ActivityModelChoice.Choose(components);

        var pair = Assert.Single(coverage.MissingPairs);
        Assert.Equal((21, 35), (pair.M, pair.N));
        Assert.Equal("ideal", choice.Name);
        Assert.Contains("CCL (21) / DMSO (35)", choice.FallbackReason);
        Assert.Throws<ArgumentException>(() => new Unifac(components));
    }

    [Fact]
    public void A_volatile_component_without_groups_falls_back_to_ideal_and_names_it()
    {
        var unknown = new MixtureComponent("mystery solvent", 100.0, _ => 1000.0);

        var choice = ActivityModelChoice.Choose([TestSolvents.Ethanol, unknown]);

        Assert.Equal("ideal", choice.Name);
        Assert.Contains("mystery solvent", choice.FallbackReason);
    }

    [Fact]
    public void An_unknown_subgroup_id_falls_back_to_ideal_and_names_the_id()
    {
        var odd = new MixtureComponent("odd", 100.0, _ => 1000.0, new Dictionary<int, int> { [999] = 1 });

        var coverage = Unifac.CheckCoverage([TestSolvents.Water, odd]);

        Assert.Equal([999], coverage.UnknownSubgroups);
        Assert.Contains("999", coverage.Reason);
    }

    [Fact]
    public void The_shipped_table_holds_the_published_parameters()
    {
        // Spot checks against the published table (Hansen et al. 1991): a(CH2, OH) = 986.5 K,
        // a(OH, CH2) = 156.4 K, a(OH, H2O) = 353.5 K, a(H2O, OH) = -229.1 K; subgroup CH3:
        // R = 0.9011, Q = 0.848; H2O: R = 0.92, Q = 1.4.
        var table = UnifacParameters.Original;

        Assert.True(table.TryGetInteraction(1, 5, out double a15));
        Assert.True(table.TryGetInteraction(5, 1, out double a51));
        Assert.True(table.TryGetInteraction(5, 7, out double a57));
        Assert.True(table.TryGetInteraction(7, 5, out double a75));
        Assert.Equal((986.5, 156.4, 353.5, -229.1), (a15, a51, a57, a75));
        Assert.Equal((0.9011, 0.848), (table.Subgroups[1].R, table.Subgroups[1].Q));
        Assert.Equal((0.92, 1.4), (table.Subgroups[16].R, table.Subgroups[16].Q));
        Assert.False(table.TryGetInteraction(21, 35, out _));
        Assert.Contains("Hansen", table.Source);
    }

    [Fact]
    public void The_acid_check_answers_the_same_from_either_assignment_of_every_shipped_solvent()
    {
        // Two independent group assignments of each shipped solvent: the Dortmund Data Bank's (by
        // CAS, in unifac-dortmund.yaml) and the library's original-UNIFAC groups (solvents.yaml).
        // The acid check answers from the Dortmund one where it exists (so a Dortmund plan need not
        // read the original table); that is only sound if both agree on which solvents are acids.
        int both = 0;
        foreach (var solvent in Reference.ShippedLibrary.Instance.Solvents)
        {
            var component = MixtureComponent.FromSolvent(solvent);
            if (UnifacParameters.Dortmund.GroupsFor(component) is not { } dortmund || component.UnifacSubgroups is not { } original)
                continue;
            both++;
            bool dortmundAcid = dortmund.Keys.Any(k => UnifacParameters.Dortmund.Subgroups[k].MainGroup is 20 or 44);
            bool originalAcid = original.Keys.Any(k => UnifacParameters.Original.Subgroups.TryGetValue(k, out var s) && s.MainGroup == 20);
            Assert.True(dortmundAcid == originalAcid, $"{solvent.Name}: Dortmund says acid {dortmundAcid}, original {originalAcid}");
        }
        Assert.True(both >= 20, $"only {both} solvents have both assignments");

        // Acetic (CH3COOH) and formic acid (HCOOH) are carboxylic acids, ethanol and ethyl acetate
        // are not (their structures; common knowledge).
        Assert.True(ActivityModelChoice.IsCarboxylicAcid(TestSolvents.ByName("acetic acid")));
        Assert.True(ActivityModelChoice.IsCarboxylicAcid(TestSolvents.ByName("formic acid")));
        Assert.False(ActivityModelChoice.IsCarboxylicAcid(TestSolvents.Ethanol));
        Assert.False(ActivityModelChoice.IsCarboxylicAcid(TestSolvents.EthylAcetate));
    }
}
