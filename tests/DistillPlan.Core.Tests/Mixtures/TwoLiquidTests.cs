using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Tests.Reference;

namespace DistillPlan.Core.Tests.Mixtures;

/// <summary>
/// Liquid–liquid splits, three-phase bubble points and heteroazeotropes against outside values:
/// handbook heteroazeotropes, the immiscible-liquids rule Psat,A + Psat,B = P with IAPWS-IF97
/// water, a published UNIFAC-LLE reference calculation and miscibility facts of the trade.
/// </summary>
public class TwoLiquidTests
{
    private const double OneAtmospherePa = 101325.0;

    // Heteroazeotropes with water at 1 atm: CRC Handbook, "Azeotropic Data for Binary Mixtures",
    // after Horsley, Adv. Chem. Ser. 116 (1973) - all temperatures from memory.
    public static TheoryData<string, double> HandbookHeteroazeotropesC => new()
    {
        { "toluene", 84.1 },
        { "benzene", 69.3 },
        { "heptane", 79.2 },
        { "hexane", 61.6 },
        { "dichloromethane", 38.1 },
        { "chloroform", 56.1 },
        { "cyclohexane", 69.8 },
        { "ethyl acetate", 70.4 },
        { "1-butanol", 92.7 },
    };

    [Theory]
    [MemberData(nameof(HandbookHeteroazeotropesC))]
    public void The_heteroazeotrope_with_water_boils_where_the_handbook_says(string organic, double handbookC)
    {
        var result = AzeotropeSearch.Find(TestSolvents.ByName(organic), TestSolvents.Water, OneAtmospherePa);

        Assert.Equal("dortmund", result.Model);
        var azeotrope = Assert.Single(result.Azeotropes);
        Assert.Equal(AzeotropeKind.Heterogeneous, azeotrope.Kind);
        // 1.5 K: the model's mutual solubilities, not the vapour pressures, set the spread
        // (ethyl acetate is the widest at about 1 K).
        Assert.Equal(handbookC + 273.15, azeotrope.TemperatureK, 1.5);
        Assert.Equal(2, azeotrope.LiquidPhases.Count);
        // The vapour (= overall) composition lies between the two layers.
        double y = azeotrope.MoleFractions[organic];
        double a = azeotrope.LiquidPhases[0].MoleFractions[organic], b = azeotrope.LiquidPhases[1].MoleFractions[organic];
        Assert.InRange(y, Math.Min(a, b), Math.Max(a, b));
        Assert.True(azeotrope.TemperatureK < result.PureBoilingPointsK.Values.Min());
    }

    /// <summary>Toluene: Landolt-Börnstein IV/20 Antoine (ln P/Pa = A − B/(T + C), 286–410 K), a
    /// different table from the library's first toluene curve (Poling 2001).</summary>
    private static double TolueneLandoltBornsteinPa(double t) => Math.Exp(20.839385203186104 - 3056.958021160755 / (t - 55.525));

    /// <summary>T [K] where Psat,water (IAPWS-IF97) + Psat,toluene (Landolt-Börnstein) = P, by bisection.</summary>
    private static double ImmiscibleBoilingK(double pressurePa)
    {
        double lo = 280, hi = 380;
        for (int i = 0; i < 100; i++)
        {
            double mid = 0.5 * (lo + hi);
            if (Reference.IapwsIf97.SaturationPressurePa(mid) + TolueneLandoltBornsteinPa(mid) > pressurePa) hi = mid;
            else lo = mid;
        }
        return 0.5 * (lo + hi);
    }

    [Theory]
    [InlineData(0.2)]
    [InlineData(0.5)]
    [InlineData(0.8)]
    public void Toluene_and_water_boil_at_100_mbar_where_their_vapour_pressures_add_up(double xToluene)
    {
        // Nearly immiscible liquids: each layer exerts its own vapour pressure, so the pot boils
        // where Psat,toluene + Psat,water = P (about 31.7 °C at 100 mbar), whatever the proportions.
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Toluene, TestSolvents.Water]);

        var bubble = equilibrium.BubbleTemperature(10000.0, [xToluene, 1 - xToluene]);

        Assert.Equal(2, bubble.LiquidPhaseCount);
        Assert.Equal(ImmiscibleBoilingK(10000.0), bubble.TemperatureK, 0.3);
        Assert.Equal(31.7 + 273.15, bubble.TemperatureK, 0.3);
    }

    [Fact]
    public void Toluene_and_water_at_40_C_have_the_summed_vapour_pressure()
    {
        // Psat,water(IAPWS-IF97) + Psat,toluene(Landolt-Börnstein) at 313.15 K ≈ 152.8 mbar.
        double expected = Reference.IapwsIf97.SaturationPressurePa(313.15) + TolueneLandoltBornsteinPa(313.15);
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Toluene, TestSolvents.Water]);

        var bubble = equilibrium.BubblePressure(313.15, [0.5, 0.5]);

        Assert.Equal(2, bubble.LiquidPhaseCount);
        Assert.Equal(expected, bubble.PressurePa, 0.01 * expected);
    }

    [Fact]
    public void Unifac_lle_reproduces_the_published_water_butanol_layers_at_25_C()
    {
        // UNIFAC-LLE (Magnussen 1981) water + 1-butanol at 298.15 K: layers with x_water = 0.53369
        // and 0.98145 (CalebBell/thermo test_flashes.py reference, solver tolerance 5e-7).
        var components = new[] { TestSolvents.Water, TestSolvents.ByName("1-butanol") };
        var lle = new ActivityModelChoice(new Unifac(components, UnifacParameters.Lle), ActivityModelKind.Unifac, null, null);
        var equilibrium = new PhaseEquilibrium(components, lle);

        var split = equilibrium.LiquidPhases(298.15, [0.8, 0.2]);

        Assert.True(split.IsSplit);
        var waterFractions = split.Phases.Select(p => p.MoleFractions["water"]).Order().ToArray();
        Assert.Equal(0.53369, waterFractions[0], 2e-5);
        Assert.Equal(0.98145, waterFractions[1], 2e-5);
    }

    [Fact]
    public void The_layers_balance_the_feed_and_share_one_activity_per_component()
    {
        // Property checks (no outside value): mole balance and equal activities in both layers.
        var components = new[] { TestSolvents.Toluene, TestSolvents.Water, TestSolvents.Ethanol };
        var equilibrium = PhaseEquilibrium.Create(components);
        double[] z = [0.3, 0.5, 0.2];

        var split = equilibrium.LiquidPhases(310.0, z);

        Assert.True(split.IsSplit);
        Assert.Equal(1.0, split.Phases.Sum(p => p.Share), 1e-12);
        var model = equilibrium.Model.Model;
        var lnI = model.LnActivityCoefficients(310.0, split.Phases[0].MoleFractions.Values.ToArray());
        var lnII = model.LnActivityCoefficients(310.0, split.Phases[1].MoleFractions.Values.ToArray());
        for (int i = 0; i < 3; i++)
        {
            string name = components[i].Name;
            Assert.Equal(z[i], split.Phases.Sum(p => p.Share * p.MoleFractions[name]), 1e-9);
            double activityI = split.Phases[0].MoleFractions[name] * Math.Exp(lnI[i]);
            double activityII = split.Phases[1].MoleFractions[name] * Math.Exp(lnII[i]);
            Assert.Equal(activityI, activityII, 1e-6 * activityI);
        }
    }

    [Fact]
    public void Inside_the_two_liquid_region_the_ternary_boils_at_one_temperature_along_a_tie_line()
    {
        // Gibbs phase rule: three phases, three components, fixed P leaves one degree of freedom;
        // along one tie line (feeds mixed from the same two layers) T does not change.
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Toluene, TestSolvents.Water, TestSolvents.Ethanol]);
        var first = equilibrium.BubbleTemperature(20000.0, [0.3, 0.5, 0.2]);
        var a = first.LiquidPhases[0].MoleFractions.Values.ToArray();
        var b = first.LiquidPhases[1].MoleFractions.Values.ToArray();
        double[] otherFeed = [0.7 * a[0] + 0.3 * b[0], 0.7 * a[1] + 0.3 * b[1], 0.7 * a[2] + 0.3 * b[2]];

        var second = equilibrium.BubbleTemperature(20000.0, otherFeed);

        Assert.Equal(2, second.LiquidPhaseCount);
        Assert.Equal(first.TemperatureK, second.TemperatureK, 1e-4);
    }

    // Miscible in all proportions at room temperature (solvent miscibility charts, common
    // knowledge of the trade; from memory). THF-water is the case every UNIFAC variant gets wrong.
    [Theory]
    [InlineData("tetrahydrofuran")]
    [InlineData("acetone")]
    [InlineData("ethanol")]
    [InlineData("methanol")]
    [InlineData("acetonitrile")]
    [InlineData("1,4-dioxane")]
    [InlineData("dimethyl sulfoxide")]
    [InlineData("N,N-dimethylformamide")]
    public void Liquids_known_to_mix_with_water_give_one_liquid_at_25_C(string solvent)
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.ByName(solvent), TestSolvents.Water]);
        foreach (double x in new[] { 0.1, 0.3, 0.5, 0.7, 0.9 })
            Assert.Equal(1, equilibrium.LiquidPhases(298.15, [x, 1 - x]).Count);
    }

    [Fact]
    public void The_thf_water_split_of_the_model_is_overruled_and_says_so()
    {
        var components = new[] { TestSolvents.ByName("tetrahydrofuran"), TestSolvents.Water };
        var withFacts = PhaseEquilibrium.Create(components);
        var modelOnly = new PhaseEquilibrium(components, withFacts.Model) { Facts = PublishedMixtureFactsWithout() };

        var overruled = withFacts.LiquidPhases(298.15, [0.3, 0.7]);
        var predicted = modelOnly.LiquidPhases(298.15, [0.3, 0.7]);

        Assert.True(predicted.IsSplit, "the README of the data notes every UNIFAC variant splits THF-water at 25 °C");
        Assert.False(overruled.IsSplit);
        Assert.NotNull(overruled.OverrulingFact);
        Assert.Contains("overruled", overruled.Basis);
    }

    private static PublishedMixtureFacts PublishedMixtureFactsWithout() => PublishedMixtureFacts.Empty;

    // Immiscible with water at 25 °C (common knowledge of the trade; from memory).
    [Theory]
    [InlineData("toluene")]
    [InlineData("hexane")]
    [InlineData("dichloromethane")]
    [InlineData("ethyl acetate")]
    [InlineData("diethyl ether")]
    public void Liquids_known_not_to_mix_with_water_split_at_25_C(string solvent)
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.ByName(solvent), TestSolvents.Water]);
        var split = equilibrium.LiquidPhases(298.15, [0.5, 0.5]);
        Assert.True(split.IsSplit);
        Assert.Contains("agree", split.Basis);
    }

    [Fact]
    public void A_wet_toluene_strip_at_40_C_holds_its_pressure_while_both_layers_last_then_leaves_water()
    {
        // While both layers are present the pressure is the three-phase one (Psat sum, about 152.8
        // mbar); toluene leaves first and the pot ends as water at its IAPWS-IF97 vapour pressure.
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Toluene, TestSolvents.Water]);

        var strip = BatchStrip.AtFixedVaporTemperature(equilibrium, [1.0, 3.0], 313.15,
            new StripOptions { StopAtFractionLeft = 0.2 });

        var twoLayers = strip.Steps.Where(s => s.LiquidPhaseCount == 2).ToList();
        Assert.True(twoLayers.Count >= 3);
        Assert.All(twoLayers, s => Assert.Equal(twoLayers[0].PressurePa, s.PressurePa, 1e-6 * s.PressurePa));
        Assert.All(twoLayers, s => Assert.Equal(twoLayers[0].Vapor["toluene"], s.Vapor["toluene"], 1e-6));
        var last = strip.Steps[^1];
        Assert.Equal(1, last.LiquidPhaseCount);
        Assert.True(last.Liquid["water"] > 0.999);
        Assert.Equal(Reference.IapwsIf97.SaturationPressurePa(313.15), last.PressurePa, 0.005 * last.PressurePa);
    }
}
