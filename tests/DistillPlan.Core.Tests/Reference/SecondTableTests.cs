using DistillPlan.Core.VaporPressure;

namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// The library's vapour pressure at a temperature, whichever of its curves answers (or two of
/// them, blended in a hand-over band), against a different published table evaluated here from the
/// coefficients typed in <see cref="PublishedTables"/>, within 2 %.
/// Each row names the table the expected value comes from (the last column, a source key of
/// solvents.yaml: poling-2001 = Poling, Prausnitz, O'Connell 2001, App. A; lb-iv20 = Landolt-Boernstein
/// IV/20; perry-2-8 = Perry's 8th ed. Table 2-8, DIPPR-101; mcgarry-1983 = McGarry 1983, Wagner 3,6).
/// The reference is the next table in the library's ranking that is independent of every curve that
/// contributes to the library's value at T: another source, and not an algebraic rewrite of it (25 or so
/// Landolt-Boernstein rows are Poling's fit in ln form, same C, A and B times ln 10; they are never
/// used as a reference for Poling, or the other way round). Temperatures: 0, 25 … 150 °C where both
/// cover T; where that gives fewer than three, three points of their overlap (said beside the row).
/// </summary>
public class SecondTableTests
{
    private const double TolerancePercent = 2.0;

    /// <summary>(solvent, T [K], source of the library curve that answers, reference table).</summary>
    public static readonly TheoryData<string, double, string, string> CheckPoints = new()
    {
        { "carbon tetrachloride", 273.15, "poling-2001", "mcgarry-1983" },
        { "carbon tetrachloride", 298.15, "poling-2001", "mcgarry-1983" },
        { "carbon tetrachloride", 323.15, "poling-2001", "mcgarry-1983" },
        { "carbon tetrachloride", 348.15, "poling-2001", "mcgarry-1983" },
        { "carbon tetrachloride", 373.15, "mcgarry-1983", "perry-2-8" },
        { "carbon tetrachloride", 398.15, "mcgarry-1983", "perry-2-8" },
        { "carbon tetrachloride", 423.15, "mcgarry-1983", "perry-2-8" },
        { "diethyl ether", 273.15, "poling-2001", "mcgarry-1983" },
        { "diethyl ether", 298.15, "poling-2001", "mcgarry-1983" },
        { "diethyl ether", 323.15, "poling-2001", "mcgarry-1983" },
        { "diethyl ether", 348.15, "mcgarry-1983", "perry-2-8" },
        { "diethyl ether", 373.15, "mcgarry-1983", "perry-2-8" },
        { "diethyl ether", 398.15, "mcgarry-1983", "perry-2-8" },
        { "diethyl ether", 423.15, "mcgarry-1983", "perry-2-8" },
        { "ethanol", 298.15, "poling-2001", "mcgarry-1983" },
        { "ethanol", 323.15, "poling-2001", "mcgarry-1983" },
        { "ethanol", 348.15, "poling-2001", "lb-iv20" },
        { "ethanol", 373.15, "lb-iv20", "mcgarry-1983" },
        { "ethanol", 398.15, "lb-iv20", "mcgarry-1983" },
        { "ethanol", 423.15, "lb-iv20", "mcgarry-1983" },
        { "formic acid", 298.15, "lb-iv20", "perry-2-8" },
        { "formic acid", 323.15, "lb-iv20", "perry-2-8" },
        { "formic acid", 348.15, "lb-iv20", "perry-2-8" },
        { "formic acid", 373.15, "lb-iv20", "perry-2-8" },
        { "acetic acid", 298.15, "poling-2001", "perry-2-8" },
        { "acetic acid", 323.15, "poling-2001", "mcgarry-1983" },
        { "acetic acid", 348.15, "poling-2001", "mcgarry-1983" },
        { "acetic acid", 373.15, "poling-2001", "mcgarry-1983" },
        { "acetic acid", 398.15, "poling-2001", "mcgarry-1983" },
        { "acetic acid", 423.15, "lb-iv20", "mcgarry-1983" },
        { "methanol", 273.15, "poling-2001", "perry-2-8" },
        { "methanol", 298.15, "poling-2001", "mcgarry-1983" },
        { "methanol", 323.15, "poling-2001", "mcgarry-1983" },
        { "methanol", 348.15, "poling-2001", "mcgarry-1983" },
        { "methanol", 373.15, "mcgarry-1983", "perry-2-8" },
        { "methanol", 398.15, "mcgarry-1983", "perry-2-8" },
        { "methanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "2-propanol", 273.15, "mcgarry-1983", "perry-2-8" },
        { "2-propanol", 298.15, "poling-2001", "mcgarry-1983" },
        { "2-propanol", 323.15, "poling-2001", "mcgarry-1983" },
        { "2-propanol", 348.15, "poling-2001", "mcgarry-1983" },
        { "2-propanol", 373.15, "mcgarry-1983", "perry-2-8" },
        { "2-propanol", 398.15, "mcgarry-1983", "perry-2-8" },
        { "2-propanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "acetone", 273.15, "poling-2001", "mcgarry-1983" },
        { "acetone", 298.15, "poling-2001", "mcgarry-1983" },
        { "acetone", 323.15, "poling-2001", "mcgarry-1983" },
        { "acetone", 348.15, "poling-2001", "perry-2-8" },
        { "acetone", 373.15, "mcgarry-1983", "perry-2-8" },
        { "acetone", 398.15, "mcgarry-1983", "perry-2-8" },
        { "acetone", 423.15, "mcgarry-1983", "perry-2-8" },
        { "chloroform", 273.15, "poling-2001", "mcgarry-1983" },
        { "chloroform", 298.15, "poling-2001", "mcgarry-1983" },
        { "chloroform", 323.15, "poling-2001", "mcgarry-1983" },
        { "chloroform", 348.15, "poling-2001", "mcgarry-1983" },
        { "chloroform", 373.15, "mcgarry-1983", "perry-2-8" },
        { "chloroform", 398.15, "mcgarry-1983", "perry-2-8" },
        { "chloroform", 423.15, "mcgarry-1983", "perry-2-8" },
        { "dimethyl sulfoxide", 483.15, "perry-2-8", "lb-iv20" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "dimethyl sulfoxide", 503.15, "perry-2-8", "lb-iv20" },
        { "dimethyl sulfoxide", 522.15, "perry-2-8", "lb-iv20" },
        { "N,N-dimethylformamide", 307.15, "lb-iv20", "perry-2-8" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "N,N-dimethylformamide", 332.15, "lb-iv20", "perry-2-8" },
        { "N,N-dimethylformamide", 357.15, "lb-iv20", "perry-2-8" },
        { "1-propanol", 273.15, "mcgarry-1983", "perry-2-8" },
        { "1-propanol", 298.15, "poling-2001", "mcgarry-1983" },
        { "1-propanol", 323.15, "poling-2001", "mcgarry-1983" },
        { "1-propanol", 348.15, "poling-2001", "mcgarry-1983" },
        { "1-propanol", 373.15, "poling-2001", "mcgarry-1983" },
        { "1-propanol", 398.15, "mcgarry-1983", "perry-2-8" },
        { "1-propanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "1-butanol", 298.15, "mcgarry-1983", "perry-2-8" },
        { "1-butanol", 323.15, "poling-2001", "mcgarry-1983" },
        { "1-butanol", 348.15, "poling-2001", "mcgarry-1983" },
        { "1-butanol", 373.15, "poling-2001", "mcgarry-1983" },
        { "1-butanol", 398.15, "poling-2001", "mcgarry-1983" },
        { "1-butanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "benzene", 298.15, "poling-2001", "mcgarry-1983" },
        { "benzene", 323.15, "poling-2001", "mcgarry-1983" },
        { "benzene", 348.15, "poling-2001", "mcgarry-1983" },
        { "benzene", 373.15, "poling-2001", "perry-2-8" },
        { "benzene", 398.15, "mcgarry-1983", "perry-2-8" },
        { "benzene", 423.15, "mcgarry-1983", "perry-2-8" },
        { "acetonitrile", 298.15, "lb-iv20", "perry-2-8" },
        { "acetonitrile", 323.15, "lb-iv20", "perry-2-8" },
        { "acetonitrile", 348.15, "lb-iv20", "perry-2-8" },
        { "dichloromethane", 273.15, "poling-2001", "perry-2-8" },
        { "dichloromethane", 298.15, "poling-2001", "perry-2-8" },
        { "dichloromethane", 323.15, "poling-2001", "perry-2-8" },
        { "dichloromethane", 348.15, "perry-2-8", "mcgarry-1983" },
        { "dichloromethane", 373.15, "perry-2-8", "mcgarry-1983" },
        { "dichloromethane", 398.15, "perry-2-8", "mcgarry-1983" },
        { "dichloromethane", 423.15, "perry-2-8", "mcgarry-1983" },
        { "carbon disulfide", 273.15, "lb-iv20", "perry-2-8" },
        { "carbon disulfide", 298.15, "lb-iv20", "mcgarry-1983" },
        { "carbon disulfide", 323.15, "lb-iv20", "mcgarry-1983" },
        { "carbon disulfide", 348.15, "lb-iv20", "mcgarry-1983" },
        { "carbon disulfide", 373.15, "mcgarry-1983", "perry-2-8" },
        { "carbon disulfide", 398.15, "mcgarry-1983", "perry-2-8" },
        { "carbon disulfide", 423.15, "mcgarry-1983", "perry-2-8" },
        { "nitromethane", 298.15, "lb-iv20", "perry-2-8" },
        { "nitromethane", 323.15, "lb-iv20", "perry-2-8" },
        { "nitromethane", 348.15, "mcgarry-1983", "perry-2-8" },
        { "nitromethane", 373.15, "mcgarry-1983", "perry-2-8" },
        { "nitromethane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "nitromethane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "tert-butanol", 299.15, "poling-2001", "perry-2-8" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "tert-butanol", 334.15, "poling-2001", "perry-2-8" },
        { "tert-butanol", 369.15, "poling-2001", "perry-2-8" },
        { "2-butanol", 323.15, "lb-iv20", "mcgarry-1983" },
        { "2-butanol", 348.15, "lb-iv20", "mcgarry-1983" },
        { "2-butanol", 373.15, "lb-iv20", "mcgarry-1983" },
        { "2-butanone", 273.15, "poling-2001", "mcgarry-1983" },
        { "2-butanone", 298.15, "poling-2001", "mcgarry-1983" },
        { "2-butanone", 323.15, "poling-2001", "mcgarry-1983" },
        { "2-butanone", 348.15, "poling-2001", "mcgarry-1983" },
        { "2-butanone", 373.15, "poling-2001", "perry-2-8" },
        { "2-butanone", 398.15, "mcgarry-1983", "perry-2-8" },
        { "2-butanone", 423.15, "mcgarry-1983", "perry-2-8" },
        { "methyl acetate", 273.15, "poling-2001", "lb-iv20" },
        { "methyl acetate", 298.15, "poling-2001", "lb-iv20" },
        { "methyl acetate", 323.15, "poling-2001", "lb-iv20" },
        { "methyl acetate", 348.15, "poling-2001", "lb-iv20" },
        { "methyl acetate", 373.15, "mcgarry-1983", "perry-2-8" },
        { "methyl acetate", 398.15, "mcgarry-1983", "perry-2-8" },
        { "methyl acetate", 423.15, "mcgarry-1983", "perry-2-8" },
        { "o-xylene", 323.15, "poling-2001", "perry-2-8" },
        { "o-xylene", 348.15, "poling-2001", "mcgarry-1983" },
        { "o-xylene", 373.15, "poling-2001", "mcgarry-1983" },
        { "o-xylene", 398.15, "poling-2001", "mcgarry-1983" },
        { "o-xylene", 423.15, "poling-2001", "mcgarry-1983" },
        { "1,2-dichlorobenzene", 404.15, "perry-2-8", "mcgarry-1983" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "1,2-dichlorobenzene", 427.15, "lb-iv20", "mcgarry-1983" },
        { "1,2-dichlorobenzene", 450.15, "lb-iv20", "mcgarry-1983" },
        { "2-methyltetrahydrofuran", 351.15, "poling-2001", "lb-iv20" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "2-methyltetrahydrofuran", 364.15, "poling-2001", "lb-iv20" },
        { "2-methyltetrahydrofuran", 376.15, "poling-2001", "lb-iv20" },
        { "cumene", 323.15, "poling-2001", "perry-2-8" },
        { "cumene", 348.15, "poling-2001", "mcgarry-1983" },
        { "cumene", 373.15, "poling-2001", "mcgarry-1983" },
        { "cumene", 398.15, "poling-2001", "mcgarry-1983" },
        { "cumene", 423.15, "poling-2001", "mcgarry-1983" },
        { "ethylbenzene", 323.15, "poling-2001", "perry-2-8" },
        { "ethylbenzene", 348.15, "poling-2001", "perry-2-8" },
        { "ethylbenzene", 373.15, "poling-2001", "perry-2-8" },
        { "ethylbenzene", 398.15, "poling-2001", "perry-2-8" },
        { "ethylbenzene", 423.15, "poling-2001", "perry-2-8" },
        { "anisole", 373.15, "lb-iv20", "perry-2-8" },
        { "anisole", 398.15, "lb-iv20", "perry-2-8" },
        { "anisole", 423.15, "lb-iv20", "perry-2-8" },
        { "p-xylene", 323.15, "poling-2001", "perry-2-8" },
        { "p-xylene", 348.15, "poling-2001", "mcgarry-1983" },
        { "p-xylene", 373.15, "poling-2001", "mcgarry-1983" },
        { "p-xylene", 398.15, "poling-2001", "mcgarry-1983" },
        { "p-xylene", 423.15, "poling-2001", "mcgarry-1983" },
        { "1,2-dichloroethane", 273.15, "poling-2001", "mcgarry-1983" },
        { "1,2-dichloroethane", 298.15, "poling-2001", "mcgarry-1983" },
        { "1,2-dichloroethane", 323.15, "poling-2001", "mcgarry-1983" },
        { "1,2-dichloroethane", 348.15, "poling-2001", "mcgarry-1983" },
        { "1,2-dichloroethane", 373.15, "poling-2001", "mcgarry-1983" },
        { "1,2-dichloroethane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "1,2-dichloroethane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "ethylene glycol", 373.15, "lb-iv20", "mcgarry-1983" },
        { "ethylene glycol", 398.15, "lb-iv20", "mcgarry-1983" },
        { "ethylene glycol", 423.15, "lb-iv20", "mcgarry-1983" },
        { "methyl isobutyl ketone", 298.15, "mcgarry-1983", "poling-2001" },
        { "methyl isobutyl ketone", 323.15, "mcgarry-1983", "perry-2-8" },
        { "methyl isobutyl ketone", 348.15, "mcgarry-1983", "perry-2-8" },
        { "methyl isobutyl ketone", 373.15, "mcgarry-1983", "perry-2-8" },
        { "methyl isobutyl ketone", 398.15, "mcgarry-1983", "perry-2-8" },
        { "methyl isobutyl ketone", 423.15, "mcgarry-1983", "perry-2-8" },
        { "diisopropyl ether", 298.15, "lb-iv20", "mcgarry-1983" },
        { "diisopropyl ether", 323.15, "lb-iv20", "mcgarry-1983" },
        { "diisopropyl ether", 348.15, "lb-iv20", "mcgarry-1983" },
        { "diisopropyl ether", 373.15, "mcgarry-1983", "perry-2-8" },
        { "diisopropyl ether", 398.15, "mcgarry-1983", "perry-2-8" },
        { "diisopropyl ether", 423.15, "mcgarry-1983", "perry-2-8" },
        { "m-xylene", 323.15, "poling-2001", "perry-2-8" },
        { "m-xylene", 348.15, "poling-2001", "mcgarry-1983" },
        { "m-xylene", 373.15, "poling-2001", "mcgarry-1983" },
        { "m-xylene", 398.15, "poling-2001", "mcgarry-1983" },
        { "m-xylene", 423.15, "poling-2001", "mcgarry-1983" },
        { "methylcyclohexane", 298.15, "poling-2001", "perry-2-8" },
        { "methylcyclohexane", 323.15, "poling-2001", "mcgarry-1983" },
        { "methylcyclohexane", 348.15, "poling-2001", "mcgarry-1983" },
        { "methylcyclohexane", 373.15, "poling-2001", "mcgarry-1983" },
        { "methylcyclohexane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "methylcyclohexane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "toluene", 298.15, "poling-2001", "perry-2-8" },
        { "toluene", 323.15, "poling-2001", "mcgarry-1983" },
        { "toluene", 348.15, "poling-2001", "mcgarry-1983" },
        { "toluene", 373.15, "poling-2001", "mcgarry-1983" },
        { "toluene", 398.15, "poling-2001", "mcgarry-1983" },
        { "toluene", 423.15, "mcgarry-1983", "perry-2-8" },
        { "chlorobenzene", 323.15, "poling-2001", "perry-2-8" },
        { "chlorobenzene", 348.15, "poling-2001", "lb-iv20" },
        { "chlorobenzene", 373.15, "poling-2001", "lb-iv20" },
        { "chlorobenzene", 398.15, "poling-2001", "lb-iv20" },
        { "chlorobenzene", 423.15, "poling-2001", "perry-2-8" },
        { "cyclohexanone", 323.15, "lb-iv20", "perry-2-8" },
        { "cyclohexanone", 348.15, "lb-iv20", "perry-2-8" },
        { "cyclohexanone", 373.15, "lb-iv20", "perry-2-8" },
        { "cyclohexanone", 398.15, "lb-iv20", "perry-2-8" },
        { "cyclohexanone", 423.15, "lb-iv20", "perry-2-8" },
        { "propyl acetate", 298.15, "perry-2-8", "poling-2001" },
        { "propyl acetate", 323.15, "perry-2-8", "poling-2001" },
        { "propyl acetate", 348.15, "perry-2-8", "poling-2001" },
        { "propyl acetate", 373.15, "perry-2-8", "poling-2001" },
        { "propyl acetate", 398.15, "perry-2-8", "poling-2001" },
        { "propyl acetate", 423.15, "perry-2-8", "mcgarry-1983" },
        { "pentane", 273.15, "poling-2001", "mcgarry-1983" },
        { "pentane", 298.15, "poling-2001", "mcgarry-1983" },
        { "pentane", 323.15, "poling-2001", "mcgarry-1983" },
        { "pentane", 348.15, "mcgarry-1983", "perry-2-8" },
        { "pentane", 373.15, "mcgarry-1983", "perry-2-8" },
        { "pentane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "pentane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "tetrahydrofuran", 273.15, "poling-2001", "perry-2-8" },
        { "tetrahydrofuran", 298.15, "poling-2001", "perry-2-8" },
        { "tetrahydrofuran", 323.15, "poling-2001", "perry-2-8" },
        { "tetrahydrofuran", 348.15, "poling-2001", "perry-2-8" },
        { "hexane", 273.15, "poling-2001", "mcgarry-1983" },
        { "hexane", 298.15, "poling-2001", "mcgarry-1983" },
        { "hexane", 323.15, "poling-2001", "mcgarry-1983" },
        { "hexane", 348.15, "poling-2001", "mcgarry-1983" },
        { "hexane", 373.15, "mcgarry-1983", "perry-2-8" },
        { "hexane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "hexane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "cyclohexane", 298.15, "poling-2001", "mcgarry-1983" },
        { "cyclohexane", 323.15, "poling-2001", "mcgarry-1983" },
        { "cyclohexane", 348.15, "poling-2001", "mcgarry-1983" },
        { "cyclohexane", 373.15, "poling-2001", "mcgarry-1983" },
        { "cyclohexane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "cyclohexane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "cyclohexene", 320.15, "lb-iv20", "perry-2-8" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "cyclohexene", 340.15, "lb-iv20", "perry-2-8" },
        { "cyclohexene", 360.15, "lb-iv20", "perry-2-8" },
        { "pyridine", 348.15, "poling-2001", "mcgarry-1983" },
        { "pyridine", 373.15, "poling-2001", "mcgarry-1983" },
        { "pyridine", 398.15, "poling-2001", "mcgarry-1983" },
        { "octane", 273.15, "mcgarry-1983", "perry-2-8" },
        { "octane", 298.15, "mcgarry-1983", "perry-2-8" },
        { "octane", 323.15, "poling-2001", "mcgarry-1983" },
        { "octane", 348.15, "poling-2001", "mcgarry-1983" },
        { "octane", 373.15, "poling-2001", "mcgarry-1983" },
        { "octane", 398.15, "poling-2001", "mcgarry-1983" },
        { "octane", 423.15, "poling-2001", "perry-2-8" },
        { "triethylamine", 323.15, "lb-iv20", "mcgarry-1983" },
        { "triethylamine", 348.15, "lb-iv20", "mcgarry-1983" },
        { "triethylamine", 373.15, "mcgarry-1983", "perry-2-8" },
        { "triethylamine", 398.15, "mcgarry-1983", "perry-2-8" },
        { "triethylamine", 423.15, "mcgarry-1983", "perry-2-8" },
        { "butyl acetate", 323.15, "perry-2-8", "poling-2001" },
        { "butyl acetate", 348.15, "mcgarry-1983", "perry-2-8" },
        { "butyl acetate", 373.15, "mcgarry-1983", "perry-2-8" },
        { "butyl acetate", 398.15, "mcgarry-1983", "perry-2-8" },
        { "butyl acetate", 423.15, "mcgarry-1983", "perry-2-8" },
        { "1,4-dioxane", 431.15, "lb-iv20", "perry-2-8" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "1,4-dioxane", 507.15, "lb-iv20", "perry-2-8" },
        { "1,4-dioxane", 582.15, "lb-iv20", "perry-2-8" },
        { "ethyl acetate", 273.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 298.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 323.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 348.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 373.15, "mcgarry-1983", "perry-2-8" },
        { "ethyl acetate", 398.15, "mcgarry-1983", "perry-2-8" },
        { "ethyl acetate", 423.15, "mcgarry-1983", "perry-2-8" },
        { "heptane", 273.15, "mcgarry-1983", "perry-2-8" },
        { "heptane", 298.15, "poling-2001", "mcgarry-1983" },
        { "heptane", 323.15, "poling-2001", "mcgarry-1983" },
        { "heptane", 348.15, "poling-2001", "mcgarry-1983" },
        { "heptane", 373.15, "poling-2001", "mcgarry-1983" },
        { "heptane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "heptane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "isooctane", 273.15, "mcgarry-1983", "perry-2-8" },
        { "isooctane", 298.15, "poling-2001", "mcgarry-1983" },
        { "isooctane", 323.15, "poling-2001", "mcgarry-1983" },
        { "isooctane", 348.15, "poling-2001", "mcgarry-1983" },
        { "isooctane", 373.15, "poling-2001", "mcgarry-1983" },
        { "isooctane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "isooctane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "methyl tert-butyl ether", 291.15, "lb-iv20", "perry-2-8" },  // no second table covers three of 0, 25 ... 150 C: compared where the two overlap
        { "methyl tert-butyl ether", 306.15, "lb-iv20", "perry-2-8" },
        { "methyl tert-butyl ether", 321.15, "lb-iv20", "perry-2-8" },
        { "water", 298.15, "wagner-pruss-1993", "poling-2001" },
        { "water", 323.15, "wagner-pruss-1993", "poling-2001" },
        { "water", 348.15, "wagner-pruss-1993", "poling-2001" },
        { "water", 373.15, "wagner-pruss-1993", "poling-2001" },
        { "water", 398.15, "wagner-pruss-1993", "poling-2001" },
        { "water", 423.15, "wagner-pruss-1993", "poling-2001" },
    };

    /// <summary>
    /// Check points where the published tables themselves disagree by more than 2 %. The bound
    /// is the measured spread rounded up to 0.5 % plus 0.5 %; the list must stay exactly the
    /// points that exceed 2 % (a fix to the data shows up as a failure here, to be removed).
    /// </summary>
    public static readonly IReadOnlyDictionary<(string Solvent, double T), (double BoundPercent, string Reason)> KnownDisagreements =
        new Dictionary<(string, double), (double, string)>
        {
            [("methanol", 273.15)] = (3, "library (poling-2001) and perry-2-8 differ +2.1 %"),
            [("2-propanol", 273.15)] = (4, "library (mcgarry-1983) and perry-2-8 differ -3.3 %"),
            [("2-propanol", 298.15)] = (5, "library (poling-2001) and mcgarry-1983 differ +4.2 %"),
            [("dimethyl sulfoxide", 483.15)] = (3, "library (perry-2-8) and lb-iv20 differ +2.1 %"),
            [("N,N-dimethylformamide", 332.15)] = (6, "library (lb-iv20) and perry-2-8 differ +5.2 %"),
            [("N,N-dimethylformamide", 357.15)] = (7.5, "library (lb-iv20) and perry-2-8 differ +6.8 %"),
            [("acetonitrile", 298.15)] = (3.5, "library (lb-iv20) and perry-2-8 differ -2.5 %"),
            [("dichloromethane", 423.15)] = (3.5, "library (perry-2-8) and mcgarry-1983 differ -2.7 %"),
            [("carbon disulfide", 373.15)] = (3, "library (mcgarry-1983) and perry-2-8 differ -2.0 %"),
            [("carbon disulfide", 398.15)] = (3.5, "library (mcgarry-1983) and perry-2-8 differ -2.6 %"),
            [("carbon disulfide", 423.15)] = (3.5, "library (mcgarry-1983) and perry-2-8 differ -3.0 %"),
            [("2-butanol", 323.15)] = (4, "library (lb-iv20) and mcgarry-1983 differ +3.0 %"),
            [("2-butanone", 273.15)] = (3, "library (poling-2001) and mcgarry-1983 differ -2.3 %"),
            [("2-methyltetrahydrofuran", 351.15)] = (8.5, "library (poling-2001) and lb-iv20 differ -7.9 %"),
            [("2-methyltetrahydrofuran", 364.15)] = (7, "library (poling-2001) and lb-iv20 differ -6.1 %"),
            [("2-methyltetrahydrofuran", 376.15)] = (6, "library (poling-2001) and lb-iv20 differ -5.1 %"),
            [("ethylene glycol", 398.15)] = (3, "library (lb-iv20) and mcgarry-1983 differ -2.0 %"),
            [("ethylene glycol", 423.15)] = (3, "library (lb-iv20) and mcgarry-1983 differ -2.2 %"),
            [("diisopropyl ether", 398.15)] = (3.5, "library (mcgarry-1983) and perry-2-8 differ -2.6 %"),
            [("diisopropyl ether", 423.15)] = (4, "library (mcgarry-1983) and perry-2-8 differ -3.3 %"),
            [("octane", 273.15)] = (3.5, "library (mcgarry-1983) and perry-2-8 differ -2.8 %"),
            [("triethylamine", 323.15)] = (7, "library (lb-iv20) and mcgarry-1983 differ +6.3 %"),
            [("triethylamine", 398.15)] = (5.5, "library (mcgarry-1983) and perry-2-8 differ -4.8 %"),
            [("triethylamine", 423.15)] = (9.5, "library (mcgarry-1983) and perry-2-8 differ -8.6 %"),
            [("butyl acetate", 323.15)] = (5.5, "library (perry-2-8) and poling-2001 differ -4.5 %"),
        };

    /// <summary>Solvents with no independent second published table, and why.</summary>
    public static readonly IReadOnlyDictionary<string, string> Exemptions = new Dictionary<string, string>
    {
        ["trifluorotoluene"] = "only a Landolt-Boernstein fit is at hand",
        ["1-methoxy-2-propanol"] = "only a Landolt-Boernstein fit is at hand",
        ["isopropyl acetate"] = "only a Landolt-Boernstein fit is at hand",
        ["1,2-dimethoxyethane"] = "only a Landolt-Boernstein fit is at hand",
        ["N-methyl-2-pyrrolidone"] = "only a Landolt-Boernstein fit is at hand",
        ["isobutanol"] = "only Poling and its Landolt-Boernstein rewrite (the same fit); the CRC boiling point is checked in NormalBoilingPointTests",
        ["sulfolane"] = "its curve is a refit of the only table at hand (Landolt-Boernstein) and the CRC boiling point",
        ["N,N-dimethylacetamide"] = "the only table at hand (Landolt-Boernstein) is left out; the curve is an estimate",
        ["dimethyl carbonate"] = "no published table at hand; the curve is an estimate",
        ["cyclopentyl methyl ether"] = "no published table at hand; the curve is an estimate",
        ["diglyme"] = "no published table at hand; the curve is an estimate",
    };

    /// <summary>The ln-form Antoine constants (A, B, C) of a typed row or a library curve, or null for other forms.</summary>
    private static (double A, double B, double C)? LnAntoine(string form, double a, double b, double c) => form switch
    {
        "antoine-log10" => (a * Math.Log(10), b * Math.Log(10), c),
        "antoine-ln" => (a, b, c),
        _ => null,
    };

    /// <summary>
    /// True when a typed row is the library curve in another guise: both Antoine with A and B within
    /// 0.1 % and C within 1.5 K once written in the same logarithm, or agreeing within 0.05 % at five
    /// points over their common range (any form).
    /// </summary>
    public static bool IsRewriteOf(PublishedTables.Row row, IVaporPressureCurve curve)
    {
        if (curve is Antoine lib && LnAntoine(row.Form, row.K[0], row.K[1], row.K.Length > 2 ? row.K[2] : 0) is var (a1, b1, c1)
            && LnAntoine(lib.Form, lib.A, lib.B, lib.C) is var (a2, b2, c2) && lib.PressureUnitPa == 1 && !lib.CelsiusScale)
            if (Math.Abs(a1 / a2 - 1) < 1e-3 && Math.Abs(b1 / b2 - 1) < 1e-3 && Math.Abs(c1 - c2) <= 1.5) return true;
        double lo = Math.Max(row.TMinK, curve.TMinK), hi = Math.Min(row.TMaxK, curve.TMaxK);
        if (hi <= lo) return false;
        for (int k = 0; k <= 4; k++)
        {
            double t = lo + (hi - lo) * (0.05 + 0.9 * k / 4);
            if (Math.Abs(row.PressurePa(t) / curve.PressurePa(t) - 1) > 5e-4) return false;
        }
        return true;
    }

    /// <summary>True when the row is independent of the curve: another source (a refit counts as its base source) and no rewrite.</summary>
    private static bool Independent(PublishedTables.Row row, IVaporPressureCurve curve) =>
        row.Source != curve.Source && !curve.Source.StartsWith(row.Source + "-") && !IsRewriteOf(row, curve);

    private static IEnumerable<IVaporPressureCurve> Contributing(PsatResult r) =>
        r.BlendedWith is null ? [r.Curve] : [r.Curve, r.BlendedWith];

    [Theory]
    [MemberData(nameof(CheckPoints))]
    public void The_library_vapour_pressure_agrees_with_a_different_published_table(
        string solvent, double temperatureK, string answeringSource, string referenceSource)
    {
        var s = ShippedLibrary.Instance.Find(solvent);
        var result = s.VaporPressure.SaturationPressure(temperatureK);
        Assert.False(result.Extrapolated);
        Assert.Equal(answeringSource, result.Curve.Source);

        var reference = PublishedTables.For(s.Cas).Single(r => r.Source == referenceSource);
        Assert.True(reference.Covers(temperatureK), $"{referenceSource} does not cover {temperatureK} K");
        double deviation = 100 * (result.PressurePa / reference.PressurePa(temperatureK) - 1);
        double bound = KnownDisagreements.TryGetValue((solvent, temperatureK), out var k) ? k.BoundPercent : TolerancePercent;
        Assert.True(Math.Abs(deviation) <= bound,
            $"{solvent} at {temperatureK} K: library ({result.Curve.Source}) {result.PressurePa:F1} Pa is {deviation:+0.00;-0.00} % from {referenceSource}, allowed ±{bound} %");
    }

    [Theory]
    [MemberData(nameof(CheckPoints))]
    public void No_reference_row_is_the_library_curve_it_checks_in_another_form(
        string solvent, double temperatureK, string answeringSource, string referenceSource)
    {
        var s = ShippedLibrary.Instance.Find(solvent);
        var result = s.VaporPressure.SaturationPressure(temperatureK);
        var reference = PublishedTables.For(s.Cas).Single(r => r.Source == referenceSource);
        foreach (var curve in Contributing(result))
            Assert.True(Independent(reference, curve),
                $"{solvent} at {temperatureK} K: the {referenceSource} row is the library's {curve.Source} curve rewritten (answering: {answeringSource})");
    }

    [Theory]
    // the detector itself: Landolt-Boernstein rows that are Poling's fit in ln form, and rows that are not
    [InlineData("toluene", "lb-iv20", true)]            // L-B: A and B are Poling's times ln 10, same C
    [InlineData("benzene", "lb-iv20", true)]            // same, C rounded differently (-55.623 vs -55.578)
    [InlineData("o-xylene", "lb-iv20", true)]           // same A and B, C 1 K apart
    [InlineData("toluene", "mcgarry-1983", false)]      // a Wagner fit of other data
    [InlineData("ethyl acetate", "lb-iv20", false)]     // L-B's own fit: A, B, C all differ from Poling's
    public void The_rewrite_detector_finds_a_Poling_fit_written_in_ln_form(string solvent, string rowSource, bool expected)
    {
        var s = ShippedLibrary.Instance.Find(solvent);
        var poling = PublishedTables.For(s.Cas).Single(r => r.Source == "poling-2001");
        var polingCurve = new Antoine { Log10 = true, A = poling.K[0], B = poling.K[1], C = poling.K[2], Source = "poling-2001", TMinK = poling.TMinK, TMaxK = poling.TMaxK };
        Assert.Equal(expected, IsRewriteOf(PublishedTables.For(s.Cas).Single(r => r.Source == rowSource), polingCurve));
    }

    private static IEnumerable<(string Solvent, double T, string Reference)> Points() =>
        CheckPoints.Select(row => ((string)row[0], (double)row[1], (string)row[3]));

    [Fact]
    public void The_known_disagreements_are_exactly_the_check_points_beyond_two_percent()
    {
        var beyond = Points().Where(p =>
        {
            var s = ShippedLibrary.Instance.Find(p.Solvent);
            double lib = s.VaporPressure.SaturationPressure(p.T).PressurePa;
            double reference = PublishedTables.For(s.Cas).Single(r => r.Source == p.Reference).PressurePa(p.T);
            return Math.Abs(100 * (lib / reference - 1)) > TolerancePercent;
        }).Select(p => (p.Solvent, p.T)).OrderBy(p => p).ToList();
        Assert.Equal(KnownDisagreements.Keys.OrderBy(p => p).ToList(), beyond);
    }

    [Fact]
    public void The_exemptions_are_exactly_the_solvents_without_an_independent_second_table()
    {
        // A solvent needs an exemption when no typed row is independent of any library curve it
        // overlaps, or when its curves are estimates (nothing published to compare with).
        var without = ShippedLibrary.Instance.Solvents.Where(s =>
            s.VaporPressure.Curves.All(c => c.Estimate is not null)
            || !PublishedTables.For(s.Cas).Any(r => s.VaporPressure.Curves.Any(c =>
                Independent(r, c) && Math.Min(r.TMaxK, c.TMaxK) > Math.Max(r.TMinK, c.TMinK))))
            .Select(s => s.Name).OrderBy(n => n).ToList();
        Assert.Equal(Exemptions.Keys.OrderBy(n => n).ToList(), without);
        // and every other solvent has check points
        var checkedOnes = Points().Select(p => p.Solvent).ToHashSet();
        Assert.All(ShippedLibrary.Instance.Solvents.Where(s => !Exemptions.ContainsKey(s.Name)), s => Assert.Contains(s.Name, checkedOnes));
    }

    [Fact]
    public void The_rejected_pyridine_row_really_misses_the_CRC_boiling_point_and_is_not_in_the_library()
    {
        var row = PublishedTables.Rejected;
        // solve the row for 101325 Pa by bisection over its own range
        double lo = row.TMinK, hi = row.TMaxK;
        for (int i = 0; i < 100; i++)
        {
            double mid = (lo + hi) / 2;
            if (row.PressurePa(mid) < 101325) lo = mid; else hi = mid;
        }
        double crcTb = CrcTables.Organic.Single(r => r.Cas == "110-86-1").TbK;   // CRC: 388.35 K
        Assert.True(lo - crcTb > 30, $"the rejected row boils at {lo:F1} K");
        var pyridine = ShippedLibrary.Instance.Find("pyridine");
        Assert.DoesNotContain(pyridine.VaporPressure.Curves, c => c.Source == row.Source);
    }
}
