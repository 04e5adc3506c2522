using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

public class BatchStripTests
{
    private static PhaseEquilibrium EthylAcetateHeptane(ActivityModelKind model = ActivityModelKind.Unifac)
        => PhaseEquilibrium.Create([TestSolvents.EthylAcetate, TestSolvents.Heptane], model);

    private static void AssertMassBalance(StripResult result)
    {
        foreach (var step in result.Steps)
            foreach (var (name, charged) in result.ChargeMol)
                Assert.Equal(charged, step.DistillateMol[name] + step.ResidueMol[name], 1e-9 * Math.Max(charged, 1e-300));
    }

    [Fact]
    public void At_fixed_vapour_temperature_the_pressure_falls_and_the_residue_gets_richer_in_heptane()
    {
        // Column fractions: 3 mol ethyl acetate, 1 mol heptane, held at 40 °C vapour temperature.
        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [3.0, 1.0], 313.15,
            new StripOptions { StopAtFractionLeft = 0.1 });

        Assert.Equal(StripEndReason.FractionLeftReached, result.EndReason);
        for (int i = 1; i < result.Steps.Count; i++)
            Assert.True(result.Steps[i].PressurePa < result.Steps[i - 1].PressurePa, $"pressure rises at step {i}");
        Assert.True(result.Steps[^1].Liquid["heptane"] > 0.25, "the residue is richer in heptane than the charge");
        Assert.All(result.Steps, s => Assert.Equal(313.15, s.TemperatureK));
        AssertMassBalance(result);
    }

    [Fact]
    public void At_fixed_pressure_the_boiling_temperature_rises_and_the_balance_closes_with_a_product_present()
    {
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Ethanol, TestSolvents.Water, TestSolvents.Product]);

        var result = BatchStrip.AtFixedPressure(equilibrium, [5.0, 3.0, 0.2], 20000.0,
            new StripOptions { TemperatureLimitK = 333.15, ReportTemperatureStepK = 2.0 });

        Assert.Equal(StripEndReason.TemperatureLimitReached, result.EndReason);
        Assert.Equal(333.15, result.Steps[^1].TemperatureK, 1e-6);
        for (int i = 1; i < result.Steps.Count; i++)
            Assert.True(result.Steps[i].TemperatureK > result.Steps[i - 1].TemperatureK, $"temperature falls at step {i}");
        Assert.All(result.Steps, s => Assert.Equal(0.0, s.DistillateMol["product"]));
        Assert.All(result.Steps, s => Assert.Equal(20000.0, s.PressurePa));
        Assert.NotNull(result.ModelNote);
        AssertMassBalance(result);
    }

    [Theory]
    [InlineData(1.0, 1.0, 300.0)]
    [InlineData(3.0, 1.0, 313.15)]
    [InlineData(1.0, 4.0, 330.0)]
    public void An_ideal_binary_at_fixed_temperature_follows_the_integrated_rayleigh_equation(
        double ethylAcetateMol, double heptaneMol, double temperatureK)
    {
        // Raoult's law at fixed T makes α = Psat1/Psat2 constant, and the Rayleigh equation then
        // integrates to N1/N1,0 = (N2/N2,0)^α (Rayleigh, Phil. Mag. 4 (1902) 521; the
        // constant-volatility form in any unit-operations text; from memory). This checks the
        // integrator, so α uses the same pure-component curves as the strip.
        double alpha = TestSolvents.EthylAcetate.SaturationPressurePa(temperatureK)
                       / TestSolvents.Heptane.SaturationPressurePa(temperatureK);

        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(ActivityModelKind.Ideal),
            [ethylAcetateMol, heptaneMol], temperatureK, new StripOptions { StopAtFractionLeft = 0.2 });

        Assert.True(result.Steps.Count > 10);
        foreach (var step in result.Steps)
        {
            double heptaneLeft = step.ResidueMol["heptane"] / heptaneMol;
            Assert.Equal(Math.Pow(heptaneLeft, alpha), step.ResidueMol["ethyl acetate"] / ethylAcetateMol, 1e-7);
        }
        AssertMassBalance(result);
    }

    [Fact]
    public void Steps_are_reported_every_five_percent_evaporated()
    {
        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [3.0, 1.0], 313.15,
            new StripOptions { StopAtFractionLeft = 0.42 });

        var fractions = result.Steps.Select(s => s.EvaporatedMoleFraction).ToArray();
        Assert.Equal(0.0, fractions[0]);
        for (int i = 1; i < fractions.Length - 1; i++)
            Assert.Equal(0.05 * i, fractions[i], 1e-9);
        Assert.Equal(0.58, fractions[^1], 1e-9);
        Assert.Equal(13, fractions.Length); // 0, 0.05 … 0.55, 0.58
    }

    [Fact]
    public void Pressure_ratio_reports_follow_each_fall_of_the_chosen_ratio()
    {
        // Heptane alone boils at about 12 kPa at 40 °C, so a 15 kPa pump limit is reached.
        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [3.0, 1.0], 313.15,
            new StripOptions { ReportPressureRatio = 0.95, ReportEveryEvaporatedFraction = 1.0, PumpLimitPa = 15000.0 });

        Assert.Equal(StripEndReason.PumpLimitReached, result.EndReason);
        Assert.Equal(15000.0, result.Steps[^1].PressurePa, 1e-6);
        for (int i = 1; i < result.Steps.Count - 1; i++)
            Assert.Equal(0.95, result.Steps[i].PressurePa / result.Steps[i - 1].PressurePa, 1e-8);
        Assert.True(result.Steps.Count > 5);
        AssertMassBalance(result);
    }

    [Fact]
    public void A_residual_mole_fraction_target_ends_the_strip_at_that_composition()
    {
        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [3.0, 1.0], 313.15,
            new StripOptions { StopAtResidualMoleFraction = new("ethyl acetate", 0.05) });

        Assert.Equal(StripEndReason.ResidualMoleFractionReached, result.EndReason);
        Assert.Equal(0.05, result.Steps[^1].Liquid["ethyl acetate"], 1e-8);
        Assert.Contains("ethyl acetate", result.EndMessage);
        AssertMassBalance(result);
    }

    [Fact]
    public void A_minimum_residue_by_volume_stops_short_of_dryness()
    {
        // Volumes by ideal mixing of the components' liquid molar volumes (M/ρ).
        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [3.0, 1.0], 313.15,
            new StripOptions { Basis = StripBasis.Volume, MinimumResidueFraction = 0.1 });

        var last = result.Steps[^1];
        Assert.Equal(StripEndReason.MinimumResidueReached, result.EndReason);
        Assert.Equal(0.9, last.EvaporatedVolumeFraction!.Value, 1e-8);
        double vEthylAcetate = TestSolvents.EthylAcetate.MolarMassGPerMol * 1e-3 / TestSolvents.EthylAcetate.LiquidDensityKgPerM3!.Value;
        double vHeptane = TestSolvents.Heptane.MolarMassGPerMol * 1e-3 / TestSolvents.Heptane.LiquidDensityKgPerM3!.Value;
        double residueVolume = last.ResidueMol["ethyl acetate"] * vEthylAcetate + last.ResidueMol["heptane"] * vHeptane;
        double chargeVolume = 3.0 * vEthylAcetate + 1.0 * vHeptane;
        Assert.Equal(0.1, residueVolume / chargeVolume, 1e-8);
        AssertMassBalance(result);
    }

    [Fact]
    public void Without_an_end_condition_the_strip_runs_practically_dry()
    {
        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [3.0, 1.0], 313.15);

        Assert.Equal(StripEndReason.Dry, result.EndReason);
        Assert.True(result.Steps[^1].ResidueMol.Values.Sum() < 1e-5);
        Assert.Equal(1.0, result.Steps[^1].Liquid["heptane"], 1e-3);
        AssertMassBalance(result);
    }

    [Fact]
    public void The_distillate_of_dilute_ethanol_never_passes_the_azeotrope()
    {
        // Ethanol–water azeotrope near x_EtOH = 0.89 at 1 atm (CRC azeotrope table, from memory):
        // by evaporation the vapour cannot become richer than that.
        var equilibrium = PhaseEquilibrium.Create([TestSolvents.Ethanol, TestSolvents.Water]);

        var result = BatchStrip.AtFixedPressure(equilibrium, [1.0, 1.0], 101325.0, new StripOptions { StopAtFractionLeft = 0.05 });

        Assert.All(result.Steps, s => Assert.InRange(s.Vapor["ethanol"], 0.0, 0.9));
        Assert.True(result.Steps[^1].Liquid["water"] > 0.99);
        AssertMassBalance(result);
    }

    [Fact]
    public void A_pump_limit_above_the_starting_pressure_ends_the_strip_at_once()
    {
        var result = BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [3.0, 1.0], 313.15,
            new StripOptions { PumpLimitPa = 1e6 });

        Assert.Equal(StripEndReason.PumpLimitReached, result.EndReason);
        Assert.Single(result.Steps);
    }

    [Fact]
    public void Options_for_the_other_mode_are_refused()
    {
        Assert.Throws<ArgumentException>(() => BatchStrip.AtFixedPressure(EthylAcetateHeptane(), [1.0, 1.0], 20000.0,
            new StripOptions { PumpLimitPa = 1000.0 }));
        Assert.Throws<ArgumentException>(() => BatchStrip.AtFixedVaporTemperature(EthylAcetateHeptane(), [1.0, 1.0], 313.15,
            new StripOptions { TemperatureLimitK = 350.0 }));
    }
}
