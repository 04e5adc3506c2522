using System.Collections.Concurrent;
using DistillPlan.Core.Mixtures;
using DistillPlan.Core.Tests.Reference;

namespace DistillPlan.Core.Tests.Mixtures;

/// <summary>
/// Mixture components for the tests, taken from the shipped solvent library (vapour-pressure
/// curves, UNIFAC groups, molar mass, density). The check values the tests compare against
/// come from other sources, named beside each of them: CRC boiling points, published
/// azeotropes, a textbook VLE table.
/// </summary>
internal static class TestSolvents
{
    private static readonly ConcurrentDictionary<string, MixtureComponent> Cache = new();

    public static MixtureComponent Acetone => ByName("acetone");
    public static MixtureComponent EthylAcetate => ByName("ethyl acetate");
    public static MixtureComponent Ethanol => ByName("ethanol");
    public static MixtureComponent Benzene => ByName("benzene");
    public static MixtureComponent Toluene => ByName("toluene");
    public static MixtureComponent Heptane => ByName("heptane");
    public static MixtureComponent Pentane => ByName("pentane");
    public static MixtureComponent Water => ByName("water");
    public static MixtureComponent Dichloroethane => ByName("1,2-dichloroethane");
    public static MixtureComponent Dmso => ByName("dimethyl sulfoxide");

    /// <summary>A made-up non-volatile product (M = 300 g/mol, 1200 kg/m³, no UNIFAC groups),
    /// as in a demo scenario.</summary>
    public static MixtureComponent Product { get; } = MixtureComponent.NonVolatile("product", 300.0, null, 1200.0);

    /// <summary>Normal boiling points [K]: CRC Handbook, "Physical Constants of Organic
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
        ["hexane"] = 341.87,
        ["heptane"] = 371.53,
        ["2-propanol"] = 355.36,
        ["water"] = 373.124,
    };

    /// <summary>The library solvent called <paramref name="name"/> as a mixture component.</summary>
    public static MixtureComponent ByName(string name)
        => Cache.GetOrAdd(name, n => MixtureComponent.FromSolvent(ShippedLibrary.Instance.Find(n)));
}
