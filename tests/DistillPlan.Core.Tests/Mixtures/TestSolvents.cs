using DistillPlan.Core.Mixtures;

namespace DistillPlan.Core.Tests.Mixtures;

/// <summary>
/// Mixture components for the tests, built from published tables transcribed here (so the
/// mixture code can be tested before and independently of the solvent library):
/// <list type="bullet">
/// <item>Vapour pressure: Antoine, log10(P/Pa) = A − B/(T/K + C), Poling, Prausnitz, O'Connell,
/// The Properties of Gases and Liquids, 5th ed. (2001), Appendix A; water: Wagner–Pruß,
/// J. Phys. Chem. Ref. Data 22 (1993) 783 (the IAPWS saturation-pressure equation).</item>
/// <item>UNIFAC subgroups: Dortmund Data Bank (DDBST) group assignments; n-alkanes and water
/// decomposed by hand by the usual UNIFAC rules.</item>
/// <item>Molar mass: from the IUPAC standard atomic weights (from memory).
/// Liquid density and normal boiling point: CRC Handbook, "Physical Constants of Organic
/// Compounds".</item>
/// </list>
/// </summary>
internal static class TestSolvents
{
    // Poling 2001 Antoine rows: A, B, C (log10 Pa, K), valid Tmin..Tmax K.
    public static MixtureComponent Acetone { get; } =
        Antoine("acetone", 58.079, 9.2184, 1197.01, -45.09, 784.525, (1, 1), (18, 1));        // Poling 247–351 K
    public static MixtureComponent Chloroform { get; } =
        Antoine("chloroform", 119.377, 8.96288, 1106.904, -54.598, 1478.825, (50, 1));       // Poling 250–357 K
    public static MixtureComponent EthylAcetate { get; } =
        Antoine("ethyl acetate", 88.105, 9.13361, 1195.13, -60.68, 900.32, (1, 1), (2, 1), (21, 1)); // Poling 266–373 K
    public static MixtureComponent Ethanol { get; } =
        Antoine("ethanol", 46.068, 10.33675, 1648.22, -42.232, 789.32, (1, 1), (2, 1), (14, 1)); // Poling 277–370 K
    public static MixtureComponent Methanol { get; } =
        Antoine("methanol", 32.042, 10.20277, 1580.08, -33.65, 791.42, (15, 1));             // Poling 263–356 K
    public static MixtureComponent Benzene { get; } =
        Antoine("benzene", 78.112, 8.98523, 1184.24, -55.578, 876.52, (9, 6));               // Poling 280–377 K
    public static MixtureComponent Toluene { get; } =
        Antoine("toluene", 92.138, 9.05043, 1327.62, -55.525, 862.325, (9, 5), (11, 1));     // Poling 286–410 K
    public static MixtureComponent Cyclohexane { get; } =
        Antoine("cyclohexane", 84.159, 8.93002, 1182.774, -52.532, 773.925, (2, 6));         // Poling 282–378 K
    public static MixtureComponent Hexane { get; } =
        Antoine("n-hexane", 86.175, 9.00139, 1170.875, -48.833, 660.625, (1, 2), (2, 4));    // Poling 254–365 K; groups by hand
    public static MixtureComponent Heptane { get; } =
        Antoine("n-heptane", 100.202, 9.02023, 1263.909, -56.718, 679.525, (1, 2), (2, 5));  // Poling 278–397 K; groups by hand
    public static MixtureComponent Pentane { get; } =
        Antoine("n-pentane", 72.149, 8.97786, 1064.84, -41.136, 626.22, (1, 2), (2, 3));     // Poling 229–331 K; groups by hand
    public static MixtureComponent Isopropanol { get; } =
        Antoine("2-propanol", 60.096, 10.24268, 1580.92, -53.54, 780.925, (1, 2), (3, 1), (14, 1)); // Poling 281–373 K

    /// <summary>1,2-dichloroethane (2 × CH2Cl); Antoine from Poling 2001 (267–380 K).</summary>
    public static MixtureComponent Dichloroethane { get; } =
        Antoine("1,2-dichloroethane", 98.959, 9.28356, 1341.37, -43.1, 1245.425, (44, 2));

    /// <summary>DMSO (subgroup 67); DIPPR-101 from Perry's Handbook, 8th ed., Table 2-8
    /// (291.67–729 K): ln(P/Pa) = C1 + C2/T + C3 ln T + C4 T^C5.</summary>
    public static MixtureComponent Dmso { get; } =
        new("dimethyl sulfoxide", 78.133,
            t => Math.Exp(56.273 - 7620.6 / t - 4.6279 * Math.Log(t) + 4.3819e-7 * t * t),
            new Dictionary<int, int> { [67] = 1 }, 1101.025);

    /// <summary>Water: Wagner–Pruß (1993) saturation pressure; H2O is UNIFAC subgroup 16;
    /// density 997 kg/m³ at 25 °C (from memory).</summary>
    public static MixtureComponent Water { get; } =
        new("water", 18.015, WagnerPruss, new Dictionary<int, int> { [16] = 1 }, 997.0);

    /// <summary>A made-up non-volatile product (M = 300 g/mol, no groups), as in a demo scenario.</summary>
    public static MixtureComponent Product { get; } = MixtureComponent.NonVolatile("product", 300.0, null, 1200.0);

    /// <summary>Normal boiling points [K], CRC Handbook "Physical Constants of Organic
    /// Compounds"; water 373.124 K from IAPWS (from memory).</summary>
    public static IReadOnlyDictionary<string, double> CrcNormalBoilingPointK { get; } = new Dictionary<string, double>
    {
        ["acetone"] = 329.23,
        ["chloroform"] = 334.35,
        ["ethyl acetate"] = 350.25,
        ["ethanol"] = 351.39,
        ["methanol"] = 337.65,
        ["benzene"] = 353.23,
        ["toluene"] = 383.75,
        ["cyclohexane"] = 353.85,
        ["n-hexane"] = 341.87,
        ["n-heptane"] = 371.53,
        ["2-propanol"] = 355.36,
        ["water"] = 373.124,
    };

    public static MixtureComponent ByName(string name) => name switch
    {
        "acetone" => Acetone,
        "chloroform" => Chloroform,
        "ethyl acetate" => EthylAcetate,
        "ethanol" => Ethanol,
        "methanol" => Methanol,
        "benzene" => Benzene,
        "toluene" => Toluene,
        "cyclohexane" => Cyclohexane,
        "n-hexane" => Hexane,
        "n-heptane" => Heptane,
        "n-pentane" => Pentane,
        "2-propanol" => Isopropanol,
        "water" => Water,
        "1,2-dichloroethane" => Dichloroethane,
        "dimethyl sulfoxide" => Dmso,
        _ => throw new ArgumentException($"no test solvent '{name}'"),
    };

    /// <summary>ln(P/Pc) = (Tc/T)(a1 τ + a2 τ^1.5 + a3 τ^3 + a4 τ^3.5 + a5 τ^4 + a6 τ^7.5),
    /// τ = 1 − T/Tc; Wagner and Pruß, J. Phys. Chem. Ref. Data 22 (1993) 783.</summary>
    public static double WagnerPruss(double temperatureK)
    {
        const double tc = 647.096, pc = 22.064e6;
        double tau = 1 - temperatureK / tc;
        double sum = -7.85951783 * tau + 1.84408259 * Math.Pow(tau, 1.5) - 11.7866497 * Math.Pow(tau, 3)
                     + 22.6807411 * Math.Pow(tau, 3.5) - 15.9618719 * Math.Pow(tau, 4) + 1.80122502 * Math.Pow(tau, 7.5);
        return pc * Math.Exp(tc / temperatureK * sum);
    }

    private static MixtureComponent Antoine(string name, double molarMass, double a, double b, double c,
        double densityKgPerM3, params (int Subgroup, int Count)[] groups)
        => new(name, molarMass, t => Math.Pow(10, a - b / (t + c)),
            groups.ToDictionary(g => g.Subgroup, g => g.Count), densityKgPerM3);
}
