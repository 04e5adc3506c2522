using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

public class PhaseEquilibriumTests
{
    private const double OneAtmospherePa = 101325.0;

    // Normal boiling points from the CRC Handbook (TestSolvents.CrcNormalBoilingPointK), a
    // different source from the library's vapour-pressure curves (Poling 2001 Antoine first).
    [Theory]
    [InlineData("ethanol", "water")]
    [InlineData("water", "ethanol")]
    [InlineData("acetone", "chloroform")]
    [InlineData("ethyl acetate", "heptane")]
    [InlineData("heptane", "ethyl acetate")]
    [InlineData("benzene", "toluene")]
    [InlineData("toluene", "benzene")]
    [InlineData("methanol", "water")]
    [InlineData("2-propanol", "water")]
    public void Bubble_temperature_tends_to_the_boiling_point_of_the_component_that_is_almost_pure(
        string almostPure, string trace)
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.ByName(almostPure), TestSolvents.ByName(trace)]);

        var point = equilibrium.BubbleTemperature(OneAtmospherePa, [1 - 1e-9, 1e-9]);

        Assert.Equal(TestSolvents.CrcNormalBoilingPointK[almostPure], point.TemperatureK, 0.35);
        Assert.Equal(1.0, point.Vapor[almostPure], 1e-6);
    }

    // Benzene–toluene at 101.325 kPa: Geankoplis, Transport Processes and Unit Operations,
    // equilibrium table for benzene–toluene (from memory): T [K], x_benzene, y_benzene.
    [Theory]
    [InlineData(358.2, 0.780, 0.900)]
    [InlineData(363.2, 0.581, 0.777)]
    [InlineData(368.2, 0.411, 0.632)]
    [InlineData(373.2, 0.258, 0.456)]
    [InlineData(378.2, 0.130, 0.261)]
    public void Benzene_toluene_bubble_points_at_one_atmosphere_match_the_published_table(
        double publishedK, double xBenzene, double publishedY)
    {
        foreach (var model in new[] { ActivityModelKind.Unifac, ActivityModelKind.Ideal })
        {
            var equilibrium = PhaseEquilibrium.Create([TestSolvents.Benzene, TestSolvents.Toluene], model);

            var point = equilibrium.BubbleTemperature(OneAtmospherePa, [xBenzene, 1 - xBenzene]);

            Assert.Equal(publishedK, point.TemperatureK, 1.0);
            Assert.Equal(publishedY, point.Vapor["benzene"], 0.015);
        }
    }

    [Fact]
    public void Benzene_toluene_relative_volatility_is_near_the_textbook_two_and_a_half()
    {
        // α(benzene/toluene) ≈ 2.4–2.6 at 1 atm, the usual textbook figure (from memory).
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Benzene, TestSolvents.Toluene]);

        var point = equilibrium.BubbleTemperature(OneAtmospherePa, [0.5, 0.5]);

        var alpha = Assert.Single(point.RelativeVolatilities);
        Assert.Equal(("benzene", "toluene"), (alpha.First, alpha.Second));
        Assert.InRange(alpha.Alpha, 2.3, 2.6);
        Assert.Equal(point.KValues["benzene"] / point.KValues["toluene"], alpha.Alpha, 1e-12);
    }

    public static TheoryData<double, double, double> TernaryCompositions => new()
    {
        // ethanol, water, ethyl acetate (arbitrary compositions for a property check)
        { 0.2, 0.3, 0.5 },
        { 0.05, 0.9, 0.05 },
        { 0.6, 0.1, 0.3 },
        { 0.0, 0.5, 0.5 },
    };

    [Theory]
    [MemberData(nameof(TernaryCompositions))]
    public void Bubble_and_dew_mole_fractions_sum_to_one(double ethanol, double water, double ethylAcetate)
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Ethanol, TestSolvents.Water, TestSolvents.EthylAcetate]);

        var bubble = equilibrium.BubbleTemperature(20000.0, [ethanol, water, ethylAcetate]);
        var dew = equilibrium.DewTemperature(20000.0, [ethanol, water, ethylAcetate]);

        Assert.Equal(1.0, bubble.Liquid.Values.Sum(), 1e-12);
        Assert.Equal(1.0, bubble.Vapor.Values.Sum(), 1e-12);
        Assert.Equal(1.0, dew.Liquid.Values.Sum(), 1e-12);
        Assert.Equal(1.0, dew.Vapor.Values.Sum(), 1e-12);
        Assert.True(dew.TemperatureK >= bubble.TemperatureK - 1e-7, "the dew point lies above the bubble point");
    }

    // Only where the liquid is one phase: with much water and ethyl acetate UNIFAC predicts two
    // liquids, and the vapour then has a second dew point on the other liquid branch.
    public static TheoryData<double, double, double> SinglePhaseTernaryCompositions => new()
    {
        { 0.2, 0.3, 0.5 },
        { 0.6, 0.1, 0.3 },
        { 0.4, 0.4, 0.2 },
        { 0.8, 0.15, 0.05 },
    };

    [Theory]
    [MemberData(nameof(SinglePhaseTernaryCompositions))]
    public void Dew_point_of_the_first_bubble_returns_the_bubble_point_and_its_liquid(
        double ethanol, double water, double ethylAcetate)
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Ethanol, TestSolvents.Water, TestSolvents.EthylAcetate]);
        var bubble = equilibrium.BubbleTemperature(20000.0, [ethanol, water, ethylAcetate]);
        var vapor = equilibrium.Components.Select(c => bubble.Vapor[c.Name]).ToArray();

        var dewAtT = equilibrium.DewPressure(bubble.TemperatureK, vapor);
        var dewAtP = equilibrium.DewTemperature(20000.0, vapor);

        Assert.Equal(20000.0, dewAtT.PressurePa, 1e-4);
        Assert.Equal(bubble.TemperatureK, dewAtP.TemperatureK, 1e-6);
        foreach (var c in equilibrium.Components)
            Assert.Equal(bubble.Liquid[c.Name], dewAtP.Liquid[c.Name], 1e-7);
    }

    [Theory]
    [InlineData(300.0, 0.3)]
    [InlineData(330.0, 0.7)]
    [InlineData(350.0, 0.95)]
    public void Bubble_temperature_at_the_bubble_pressure_gives_back_the_temperature(double temperatureK, double xEthanol)
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Ethanol, TestSolvents.Water]);
        var atT = equilibrium.BubblePressure(temperatureK, [xEthanol, 1 - xEthanol]);

        var atP = equilibrium.BubbleTemperature(atT.PressurePa, [xEthanol, 1 - xEthanol]);

        Assert.Equal(temperatureK, atP.TemperatureK, 1e-7);
        Assert.Equal(atT.Vapor["ethanol"], atP.Vapor["ethanol"], 1e-9);
    }

    [Theory]
    [InlineData(0.1)]
    [InlineData(0.5)]
    public void A_non_volatile_product_lowers_the_solvent_partial_pressure_as_raoult_says(double productMoleFraction)
    {
        // Raoult's law for a single solvent: P = x_solvent Psat(T) (the product has γ = 1 as an
        // ideal diluent), with the component's own Psat: this checks the mixture code, not the curve.
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Toluene, TestSolvents.Product]);
        double psat = TestSolvents.Toluene.SaturationPressurePa(330.0);

        var point = equilibrium.BubblePressure(330.0, [1 - productMoleFraction, productMoleFraction]);

        Assert.Equal("dortmund", point.Model);
        Assert.Equal((1 - productMoleFraction) * psat, point.PressurePa, 1e-6 * psat);
        Assert.Equal(0.0, point.Vapor["product"]);
        Assert.Equal(1.0, point.Vapor["toluene"], 1e-12);
        Assert.NotNull(equilibrium.Model.Note);
    }

    [Fact]
    public void A_pressure_no_mixture_can_boil_at_raises_a_convergence_error_naming_the_method()
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Ethanol, TestSolvents.Water]);

        var error = Assert.Throws<EquilibriumConvergenceException>(
            () => equilibrium.BubbleTemperature(1e15, [0.5, 0.5]));

        Assert.Equal("bubble temperature", error.Method);
        Assert.Equal(1e15, error.PressurePa);
        Assert.Contains("bubble temperature", error.Message);
        Assert.False(equilibrium.TryBubbleTemperature(1e15, [0.5, 0.5], out var none));
        Assert.Null(none);
    }
}
