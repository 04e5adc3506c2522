using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

/// <summary>
/// Modified UNIFAC (Dortmund) against published reference calculations. The reference values
/// are DDBST's worked example "11.02 Azeotropic points in the quaternary system benzene –
/// cyclohexane – acetone – ethanol using mod. UNIFAC" and further points of the same system,
/// as reproduced in CalebBell/thermo's test suite (tests/test_unifac.py, test_UNIFAC_modified_2006,
/// test_UNIFAC_psi, test_UNIFAC_RQ). They were made with the 2006 parameter set; of the pairs this
/// system uses only ACH/CH2CO – cyclic CH2 (9–42) differs from the 2016 set we ship, so the test
/// puts back its 2006 values (Jakob, Grensemann, Lohmann, Gmehling, Ind. Eng. Chem. Res. 45 (2006)
/// 7924, as compiled by DDBST: a = 168.2 K, b = −0.8197 for 9→42; a = 464.5 K, b = 0.1542 for 42→9).
/// </summary>
public class DortmundUnifacTests
{
    // DDBST subgroups: benzene 6 ACH (9); cyclohexane 6 CY-CH2 (78); acetone CH3 (1) + CH3CO (18);
    // ethanol CH3 (1) + CH2 (2) + OH(P) (14).
    private static readonly IReadOnlyDictionary<int, int>?[] Quaternary =
    [
        new Dictionary<int, int> { [9] = 6 },
        new Dictionary<int, int> { [78] = 6 },
        new Dictionary<int, int> { [1] = 1, [18] = 1 },
        new Dictionary<int, int> { [1] = 1, [2] = 1, [14] = 1 },
    ];

    private static UnifacParameters Table2006 => UnifacParameters.Dortmund.WithInteractions(
        new Dictionary<(int M, int N), UnifacInteraction>
        {
            [(9, 42)] = new(168.2, -0.8197, 0),
            [(42, 9)] = new(464.5, 0.1542, 0),
        });

    [Fact]
    public void The_shipped_table_holds_every_library_solvent_and_the_published_pairs()
    {
        // Counts from the data compilation's own description (../shared/data/README.md):
        // 73 subgroups, 668 interaction rows, 65 solvents.
        var table = UnifacParameters.Dortmund;
        Assert.Equal(73, table.Subgroups.Count);
        Assert.Equal(668, table.InteractionCount);
        Assert.Equal(65, table.AssignmentCount);
        Assert.Equal(UnifacVariant.Modified, table.Variant);
    }

    [Fact]
    public void Ethanol_has_the_published_volume_and_surface_parameters()
    {
        // thermo test_UNIFAC_RQ: ethanol r = 2.4952, q = 2.6616 with the Dortmund subgroups.
        var model = Unifac.FromGroups([Quaternary[3]], UnifacParameters.Dortmund);
        Assert.Equal(2.4952, model.VolumeParameters[0], 12);
        Assert.Equal(2.6616, model.SurfaceParameters[0], 12);
    }

    [Fact]
    public void Psi_between_aromatic_and_cyclic_CH2_matches_the_reference_at_373_K()
    {
        // thermo test_UNIFAC_psi: ψ(ACH, CY-CH2) at 373.15 K = 1.3703140538273264 (main groups 3, 42).
        Assert.True(UnifacParameters.Dortmund.TryGetInteractionParameters(3, 42, out var psi));
        Assert.Equal(1.3703140538273264, psi.Psi(373.15), 1e-13);
    }

    [Fact]
    public void The_quaternary_worked_example_at_373_K_is_reproduced()
    {
        // DDBST worked example 11.02 at 373.15 K with x = 0.2, 0.3, 0.2, 0.2 as printed there
        // (they add up to 0.9 and are used as given): γ = 1.18643111, 1.44028013, 1.20447983, 1.97207061.
        var model = Unifac.FromGroups(Quaternary, Table2006);
        var lnGamma = new double[4];
        model.LnActivityCoefficientsAsGiven(373.15, [0.2, 0.3, 0.2, 0.2], lnGamma);

        double[] expected = [1.18643111370682970, 1.44028013391119700, 1.20447983349960850, 1.97207060902998130];
        for (int i = 0; i < 4; i++)
            Assert.Equal(expected[i], Math.Exp(lnGamma[i]), 1e-12);
    }

    [Theory]
    // Same system, further points (thermo test_UNIFAC_modified_2006): at 290 K, x = 0.2, 0.3, 0.3, 0.2,
    // and at 250 K, x = 0.01, 0.01, 0.01, 0.97.
    [InlineData(290.0, new[] { 0.2, 0.3, 0.3, 0.2 }, new[] { 1.2555831362844658, 2.002790560351622, 1.313653013490284, 2.4472442902051923 })]
    [InlineData(250.0, new[] { 0.01, 0.01, 0.01, 0.97 }, new[] { 6.233033961983859, 10.01994111294437, 3.376394671321658, 1.00137007335149700 })]
    public void The_quaternary_reference_points_are_reproduced(double temperatureK, double[] x, double[] expectedGamma)
    {
        var model = Unifac.FromGroups(Quaternary, Table2006);
        var lnGamma = model.LnActivityCoefficients(temperatureK, x);
        for (int i = 0; i < 4; i++)
            Assert.Equal(expectedGamma[i], Math.Exp(lnGamma[i]), 1e-11);
    }

    [Fact]
    public void The_2016_set_differs_from_the_2006_set_only_through_the_changed_pair()
    {
        // A check that the test above is not passing by accident: with the shipped 2016 9–42 values
        // the 290 K point moves (the pair matters), and with 2006 values it is back.
        var shipped = Unifac.FromGroups(Quaternary, UnifacParameters.Dortmund).LnActivityCoefficients(290.0, [0.2, 0.3, 0.3, 0.2]);
        Assert.NotEqual(1.313653013490284, Math.Exp(shipped[2]), 1e-6);
    }
}
