using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Tests.Reference;

namespace DistillPlan.Core.Tests.Mixtures;

public class MixtureComponentTests
{
    [Theory]
    [InlineData("ethanol", 300.0)]
    [InlineData("EtOAc", 330.0)]
    [InlineData("water", 350.0)]
    public void A_library_solvent_keeps_its_curves_groups_and_density(string name, double temperatureK)
    {
        var solvent = ShippedLibrary.Instance.Find(name);

        var component = MixtureComponent.FromSolvent(solvent);

        Assert.Equal(solvent.Name, component.Name);
        Assert.Equal(solvent.MolarMassGPerMol, component.MolarMassGPerMol);
        Assert.Equal(solvent.LiquidDensityKgPerM3, component.LiquidDensityKgPerM3);
        Assert.Equal(solvent.UnifacGroups, component.UnifacSubgroups);
        Assert.Equal(solvent.VaporPressure.SaturationPressure(temperatureK).PressurePa, component.SaturationPressurePa(temperatureK));
        Assert.False(component.IsNonVolatile);
    }

    [Fact]
    public void A_bubble_point_names_the_components_whose_curve_is_extrapolated()
    {
        // A made-up component whose curve claims validity only up to 340 K.
        var limited = new MixtureComponent("limited", 100.0, t => TestSolvents.Heptane.SaturationPressurePa(t),
            TestSolvents.Heptane.UnifacSubgroups, isExtrapolated: t => t > 340.0);
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Toluene, limited]);

        var cool = equilibrium.BubblePressure(320.0, [0.5, 0.5]);
        var hot = equilibrium.BubblePressure(360.0, [0.5, 0.5]);

        Assert.Empty(cool.ExtrapolatedComponents);
        Assert.Equal(["limited"], hot.ExtrapolatedComponents);
    }

    [Fact]
    public void A_bubble_point_just_below_the_light_components_critical_temperature_is_still_found()
    {
        // Dichloromethane (Tc about 510 K, CRC) in sulfolane boils near 480 K at 1 atm; the
        // bracket search steps past Tc, where the library refuses, and must come back.
        var equilibrium = PhaseEquilibrium.Create(
            [TestSolvents.ByName("dichloromethane"), TestSolvents.ByName("sulfolane")], ActivityModelKind.Ideal);

        var point = equilibrium.BubbleTemperature(101325.0, [0.02, 0.98]);

        Assert.InRange(point.TemperatureK, 400.0, 510.0);
        double p = 0.02 * equilibrium.Components[0].SaturationPressurePa(point.TemperatureK)
                   + 0.98 * equilibrium.Components[1].SaturationPressurePa(point.TemperatureK);
        Assert.Equal(101325.0, p, 1e-3);
    }

    [Fact]
    public void A_bubble_point_beyond_the_light_components_critical_temperature_is_a_convergence_error()
    {
        var equilibrium = PhaseEquilibrium.Create(
            [TestSolvents.ByName("dichloromethane"), TestSolvents.ByName("sulfolane")], ActivityModelKind.Ideal);

        var error = Assert.Throws<EquilibriumConvergenceException>(
            () => equilibrium.BubbleTemperature(101325.0, [1e-4, 1 - 1e-4]));

        Assert.IsAssignableFrom<DistillPlanException>(error);
        Assert.Equal(101325.0, error.PressurePa);
    }
}
