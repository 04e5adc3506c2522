namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// The library's vapour pressure at a temperature, whichever of its curves answers, against a
/// different published table evaluated here (see <see cref="PublishedTables"/>), within 2 %.
/// Temperatures: 0, 25, 50 … 150 °C where the answering curve and the reference both cover T;
/// where that gives fewer than three, the overlap of the two is used instead (say so beside it).
/// The reference is the next curve after the answering one, in the library's ranking, that comes
/// from another source; its value is computed from the coefficients typed in PublishedTables.
/// </summary>
public class SecondTableTests
{
    private const double TolerancePercent = 2.0;

    /// <summary>(solvent, T [K], source that must answer in the library, reference table).</summary>
    public static readonly TheoryData<string, double, string, string> CheckPoints = new()
    {
        { "carbon tetrachloride", 273.15, "poling-2001", "lb-iv20" },
        { "carbon tetrachloride", 298.15, "poling-2001", "lb-iv20" },
        { "carbon tetrachloride", 323.15, "poling-2001", "lb-iv20" },
        { "carbon tetrachloride", 348.15, "poling-2001", "lb-iv20" },
        { "carbon tetrachloride", 373.15, "poling-2001", "lb-iv20" },
        { "carbon tetrachloride", 398.15, "mcgarry-1983", "perry-2-8" },
        { "carbon tetrachloride", 423.15, "mcgarry-1983", "perry-2-8" },
        { "diethyl ether", 273.15, "poling-2001", "lb-iv20" },
        { "diethyl ether", 298.15, "poling-2001", "lb-iv20" },
        { "diethyl ether", 323.15, "poling-2001", "lb-iv20" },
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
        { "acetic acid", 298.15, "poling-2001", "lb-iv20" },
        { "acetic acid", 323.15, "poling-2001", "lb-iv20" },
        { "acetic acid", 348.15, "poling-2001", "lb-iv20" },
        { "acetic acid", 373.15, "poling-2001", "lb-iv20" },
        { "acetic acid", 398.15, "poling-2001", "lb-iv20" },
        { "acetic acid", 423.15, "lb-iv20", "mcgarry-1983" },
        { "methanol", 273.15, "poling-2001", "lb-iv20" },
        { "methanol", 298.15, "poling-2001", "lb-iv20" },
        { "methanol", 323.15, "poling-2001", "lb-iv20" },
        { "methanol", 348.15, "poling-2001", "mcgarry-1983" },
        { "methanol", 373.15, "mcgarry-1983", "perry-2-8" },
        { "methanol", 398.15, "mcgarry-1983", "perry-2-8" },
        { "methanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "2-propanol", 273.15, "mcgarry-1983", "perry-2-8" },
        { "2-propanol", 298.15, "poling-2001", "lb-iv20" },
        { "2-propanol", 323.15, "poling-2001", "lb-iv20" },
        { "2-propanol", 348.15, "poling-2001", "lb-iv20" },
        { "2-propanol", 373.15, "poling-2001", "mcgarry-1983" },
        { "2-propanol", 398.15, "mcgarry-1983", "perry-2-8" },
        { "2-propanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "acetone", 273.15, "poling-2001", "lb-iv20" },
        { "acetone", 298.15, "poling-2001", "lb-iv20" },
        { "acetone", 323.15, "poling-2001", "lb-iv20" },
        { "acetone", 348.15, "poling-2001", "lb-iv20" },
        { "acetone", 373.15, "mcgarry-1983", "perry-2-8" },
        { "acetone", 398.15, "mcgarry-1983", "perry-2-8" },
        { "acetone", 423.15, "mcgarry-1983", "perry-2-8" },
        { "chloroform", 273.15, "poling-2001", "lb-iv20" },
        { "chloroform", 298.15, "poling-2001", "lb-iv20" },
        { "chloroform", 323.15, "poling-2001", "lb-iv20" },
        { "chloroform", 348.15, "poling-2001", "lb-iv20" },
        { "chloroform", 373.15, "mcgarry-1983", "perry-2-8" },
        { "chloroform", 398.15, "mcgarry-1983", "perry-2-8" },
        { "chloroform", 423.15, "mcgarry-1983", "perry-2-8" },
        { "dimethyl sulfoxide", 483.15, "lb-iv20", "perry-2-8" },  // the second table starts above 150 C: compared where the two overlap
        { "dimethyl sulfoxide", 503.15, "lb-iv20", "perry-2-8" },
        { "dimethyl sulfoxide", 518.15, "lb-iv20", "perry-2-8" },
        { "N,N-dimethylformamide", 303.15, "lb-iv20", "perry-2-8" },  // no second table covers all of 0-150 C: compared where the two overlap
        { "N,N-dimethylformamide", 333.15, "lb-iv20", "perry-2-8" },
        { "N,N-dimethylformamide", 358.15, "lb-iv20", "perry-2-8" },
        { "1-propanol", 273.15, "mcgarry-1983", "perry-2-8" },
        { "1-propanol", 298.15, "poling-2001", "lb-iv20" },
        { "1-propanol", 323.15, "poling-2001", "lb-iv20" },
        { "1-propanol", 348.15, "poling-2001", "lb-iv20" },
        { "1-propanol", 373.15, "poling-2001", "mcgarry-1983" },
        { "1-propanol", 398.15, "mcgarry-1983", "perry-2-8" },
        { "1-propanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "1-butanol", 298.15, "mcgarry-1983", "perry-2-8" },
        { "1-butanol", 323.15, "poling-2001", "lb-iv20" },
        { "1-butanol", 348.15, "poling-2001", "lb-iv20" },
        { "1-butanol", 373.15, "poling-2001", "lb-iv20" },
        { "1-butanol", 398.15, "poling-2001", "mcgarry-1983" },
        { "1-butanol", 423.15, "mcgarry-1983", "perry-2-8" },
        { "benzene", 298.15, "poling-2001", "lb-iv20" },
        { "benzene", 323.15, "poling-2001", "lb-iv20" },
        { "benzene", 348.15, "poling-2001", "lb-iv20" },
        { "benzene", 373.15, "poling-2001", "lb-iv20" },
        { "benzene", 398.15, "mcgarry-1983", "perry-2-8" },
        { "benzene", 423.15, "mcgarry-1983", "perry-2-8" },
        { "acetonitrile", 298.15, "lb-iv20", "perry-2-8" },
        { "acetonitrile", 323.15, "lb-iv20", "perry-2-8" },
        { "acetonitrile", 348.15, "lb-iv20", "perry-2-8" },
        { "dichloromethane", 273.15, "poling-2001", "lb-iv20" },
        { "dichloromethane", 298.15, "poling-2001", "lb-iv20" },
        { "dichloromethane", 323.15, "poling-2001", "lb-iv20" },
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
        { "tert-butanol", 298.15, "poling-2001", "lb-iv20" },
        { "tert-butanol", 323.15, "poling-2001", "lb-iv20" },
        { "tert-butanol", 348.15, "poling-2001", "lb-iv20" },
        { "tert-butanol", 373.15, "poling-2001", "lb-iv20" },
        { "isobutanol", 323.15, "poling-2001", "lb-iv20" },
        { "isobutanol", 348.15, "poling-2001", "lb-iv20" },
        { "isobutanol", 373.15, "poling-2001", "lb-iv20" },
        { "isobutanol", 398.15, "poling-2001", "lb-iv20" },
        { "2-butanol", 298.15, "lb-iv20", "mcgarry-1983" },
        { "2-butanol", 323.15, "lb-iv20", "mcgarry-1983" },
        { "2-butanol", 348.15, "lb-iv20", "mcgarry-1983" },
        { "2-butanol", 373.15, "lb-iv20", "mcgarry-1983" },
        { "2-butanone", 273.15, "poling-2001", "lb-iv20" },
        { "2-butanone", 298.15, "poling-2001", "lb-iv20" },
        { "2-butanone", 323.15, "poling-2001", "lb-iv20" },
        { "2-butanone", 348.15, "poling-2001", "lb-iv20" },
        { "2-butanone", 373.15, "poling-2001", "lb-iv20" },
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
        { "1,2-dichlorobenzene", 403.15, "lb-iv20", "perry-2-8" },  // no second table covers all of 0-150 C: compared where the two overlap
        { "1,2-dichlorobenzene", 413.15, "lb-iv20", "mcgarry-1983" },
        { "1,2-dichlorobenzene", 423.15, "lb-iv20", "mcgarry-1983" },
        { "2-methyltetrahydrofuran", 353.15, "poling-2001", "lb-iv20" },  // no second table covers all of 0-150 C: compared where the two overlap
        { "2-methyltetrahydrofuran", 363.15, "poling-2001", "lb-iv20" },
        { "2-methyltetrahydrofuran", 373.15, "poling-2001", "lb-iv20" },
        { "cumene", 323.15, "poling-2001", "lb-iv20" },
        { "cumene", 348.15, "poling-2001", "lb-iv20" },
        { "cumene", 373.15, "poling-2001", "lb-iv20" },
        { "cumene", 398.15, "poling-2001", "lb-iv20" },
        { "cumene", 423.15, "poling-2001", "lb-iv20" },
        { "ethylbenzene", 323.15, "poling-2001", "lb-iv20" },
        { "ethylbenzene", 348.15, "poling-2001", "lb-iv20" },
        { "ethylbenzene", 373.15, "poling-2001", "lb-iv20" },
        { "ethylbenzene", 398.15, "poling-2001", "lb-iv20" },
        { "ethylbenzene", 423.15, "poling-2001", "perry-2-8" },
        { "anisole", 373.15, "lb-iv20", "perry-2-8" },
        { "anisole", 398.15, "lb-iv20", "perry-2-8" },
        { "anisole", 423.15, "lb-iv20", "perry-2-8" },
        { "p-xylene", 323.15, "poling-2001", "lb-iv20" },
        { "p-xylene", 348.15, "poling-2001", "lb-iv20" },
        { "p-xylene", 373.15, "poling-2001", "lb-iv20" },
        { "p-xylene", 398.15, "poling-2001", "lb-iv20" },
        { "p-xylene", 423.15, "poling-2001", "lb-iv20" },
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
        { "methyl isobutyl ketone", 298.15, "mcgarry-1983", "perry-2-8" },
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
        { "m-xylene", 323.15, "poling-2001", "lb-iv20" },
        { "m-xylene", 348.15, "poling-2001", "lb-iv20" },
        { "m-xylene", 373.15, "poling-2001", "lb-iv20" },
        { "m-xylene", 398.15, "poling-2001", "lb-iv20" },
        { "m-xylene", 423.15, "poling-2001", "lb-iv20" },
        { "methylcyclohexane", 298.15, "poling-2001", "lb-iv20" },
        { "methylcyclohexane", 323.15, "poling-2001", "lb-iv20" },
        { "methylcyclohexane", 348.15, "poling-2001", "lb-iv20" },
        { "methylcyclohexane", 373.15, "poling-2001", "lb-iv20" },
        { "methylcyclohexane", 398.15, "poling-2001", "mcgarry-1983" },
        { "methylcyclohexane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "toluene", 298.15, "poling-2001", "lb-iv20" },
        { "toluene", 323.15, "poling-2001", "lb-iv20" },
        { "toluene", 348.15, "poling-2001", "lb-iv20" },
        { "toluene", 373.15, "poling-2001", "lb-iv20" },
        { "toluene", 398.15, "poling-2001", "lb-iv20" },
        { "toluene", 423.15, "mcgarry-1983", "perry-2-8" },
        { "chlorobenzene", 323.15, "poling-2001", "perry-2-8" },
        { "chlorobenzene", 348.15, "poling-2001", "lb-iv20" },
        { "chlorobenzene", 373.15, "poling-2001", "lb-iv20" },
        { "chlorobenzene", 398.15, "poling-2001", "lb-iv20" },
        { "chlorobenzene", 423.15, "poling-2001", "perry-2-8" },
        { "cyclohexanone", 298.15, "lb-iv20", "perry-2-8" },
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
        { "pentane", 273.15, "poling-2001", "lb-iv20" },
        { "pentane", 298.15, "poling-2001", "lb-iv20" },
        { "pentane", 323.15, "poling-2001", "lb-iv20" },
        { "pentane", 348.15, "mcgarry-1983", "perry-2-8" },
        { "pentane", 373.15, "mcgarry-1983", "perry-2-8" },
        { "pentane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "pentane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "tetrahydrofuran", 273.15, "poling-2001", "lb-iv20" },
        { "tetrahydrofuran", 298.15, "poling-2001", "lb-iv20" },
        { "tetrahydrofuran", 323.15, "poling-2001", "lb-iv20" },
        { "tetrahydrofuran", 348.15, "poling-2001", "lb-iv20" },
        { "hexane", 273.15, "poling-2001", "lb-iv20" },
        { "hexane", 298.15, "poling-2001", "lb-iv20" },
        { "hexane", 323.15, "poling-2001", "lb-iv20" },
        { "hexane", 348.15, "poling-2001", "lb-iv20" },
        { "hexane", 373.15, "mcgarry-1983", "perry-2-8" },
        { "hexane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "hexane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "cyclohexane", 298.15, "poling-2001", "lb-iv20" },
        { "cyclohexane", 323.15, "poling-2001", "lb-iv20" },
        { "cyclohexane", 348.15, "poling-2001", "lb-iv20" },
        { "cyclohexane", 373.15, "poling-2001", "lb-iv20" },
        { "cyclohexane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "cyclohexane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "cyclohexene", 318.15, "lb-iv20", "perry-2-8" },  // no second table covers all of 0-150 C: compared where the two overlap
        { "cyclohexene", 343.15, "lb-iv20", "perry-2-8" },
        { "cyclohexene", 363.15, "lb-iv20", "perry-2-8" },
        { "pyridine", 348.15, "poling-2001", "mcgarry-1983" },
        { "pyridine", 373.15, "poling-2001", "mcgarry-1983" },
        { "pyridine", 398.15, "poling-2001", "mcgarry-1983" },
        { "octane", 273.15, "mcgarry-1983", "perry-2-8" },
        { "octane", 298.15, "lb-iv20", "mcgarry-1983" },
        { "octane", 323.15, "poling-2001", "lb-iv20" },
        { "octane", 348.15, "poling-2001", "lb-iv20" },
        { "octane", 373.15, "poling-2001", "lb-iv20" },
        { "octane", 398.15, "poling-2001", "lb-iv20" },
        { "octane", 423.15, "poling-2001", "mcgarry-1983" },
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
        { "1,4-dioxane", 428.15, "lb-iv20", "perry-2-8" },  // the second table starts above 150 C: compared where the two overlap
        { "1,4-dioxane", 503.15, "lb-iv20", "perry-2-8" },
        { "1,4-dioxane", 578.15, "lb-iv20", "perry-2-8" },
        { "ethyl acetate", 273.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 298.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 323.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 348.15, "poling-2001", "lb-iv20" },
        { "ethyl acetate", 373.15, "mcgarry-1983", "perry-2-8" },
        { "ethyl acetate", 398.15, "mcgarry-1983", "perry-2-8" },
        { "ethyl acetate", 423.15, "mcgarry-1983", "perry-2-8" },
        { "heptane", 273.15, "mcgarry-1983", "perry-2-8" },
        { "heptane", 298.15, "poling-2001", "lb-iv20" },
        { "heptane", 323.15, "poling-2001", "lb-iv20" },
        { "heptane", 348.15, "poling-2001", "lb-iv20" },
        { "heptane", 373.15, "poling-2001", "lb-iv20" },
        { "heptane", 398.15, "mcgarry-1983", "perry-2-8" },
        { "heptane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "isooctane", 273.15, "lb-iv20", "mcgarry-1983" },
        { "isooctane", 298.15, "poling-2001", "lb-iv20" },
        { "isooctane", 323.15, "poling-2001", "lb-iv20" },
        { "isooctane", 348.15, "poling-2001", "lb-iv20" },
        { "isooctane", 373.15, "poling-2001", "lb-iv20" },
        { "isooctane", 398.15, "poling-2001", "mcgarry-1983" },
        { "isooctane", 423.15, "mcgarry-1983", "perry-2-8" },
        { "methyl tert-butyl ether", 288.15, "lb-iv20", "perry-2-8" },  // no second table covers all of 0-150 C: compared where the two overlap
        { "methyl tert-butyl ether", 308.15, "lb-iv20", "perry-2-8" },
        { "methyl tert-butyl ether", 323.15, "lb-iv20", "perry-2-8" },
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
            [("2-propanol", 273.15)] = (4.0, "below Poling's 281 K McGarry answers; McGarry and Perry differ 3.3 % at 0 C and bracket Poling/L-B by 2-6 % at 10-40 C"),
            [("dimethyl sulfoxide", 483.15)] = (3.0, "the only two tables, L-B (483-523 K) and Perry, differ 2.0 % at the low end of the L-B fit"),
            [("N,N-dimethylformamide", 333.15)] = (6.0, "the only two tables, L-B (303-363 K) and Perry, differ 4-7 % at 50-90 C"),
            [("N,N-dimethylformamide", 358.15)] = (7.5, "the only two tables, L-B (303-363 K) and Perry, differ 4-7 % at 50-90 C"),
            [("acetonitrile", 298.15)] = (3.5, "the only two tables, L-B and Perry, differ 2.5-3.3 % at 10-30 C"),
            [("dichloromethane", 423.15)] = (3.5, "above 60 C only Perry and McGarry remain; they differ 2.2-2.8 % at 130-150 C"),
            [("carbon disulfide", 373.15)] = (3.0, "above 80 C only Perry and McGarry remain; they differ 2-3 % at 100-150 C"),
            [("carbon disulfide", 398.15)] = (3.5, "above 80 C only Perry and McGarry remain; they differ 2-3 % at 100-150 C"),
            [("carbon disulfide", 423.15)] = (3.5, "above 80 C only Perry and McGarry remain; they differ 2-3 % at 100-150 C"),
            [("2-butanol", 298.15)] = (5.5, "the only two tables, L-B and McGarry, differ 3-5 % at 25-50 C"),
            [("2-butanol", 323.15)] = (4.0, "the only two tables, L-B and McGarry, differ 3-5 % at 25-50 C"),
            [("2-methyltetrahydrofuran", 353.15)] = (8.5, "the L-B row is fitted for 351-533 K and runs 5-8 % above Poling near its low end; it also misses the CRC Tb by 2.5 K, so Poling answers"),
            [("2-methyltetrahydrofuran", 363.15)] = (7.0, "the L-B row is fitted for 351-533 K and runs 5-8 % above Poling near its low end"),
            [("2-methyltetrahydrofuran", 373.15)] = (6.0, "the L-B row is fitted for 351-533 K and runs 5-8 % above Poling near its low end"),
            [("ethylene glycol", 373.15)] = (3.0, "L-B, McGarry and Perry differ by up to 3.5 % from each other at 100-150 C"),
            [("ethylene glycol", 398.15)] = (3.0, "L-B, McGarry and Perry differ by up to 3.5 % from each other at 100-150 C"),
            [("ethylene glycol", 423.15)] = (3.0, "L-B, McGarry and Perry differ by up to 3.5 % from each other at 100-150 C"),
            [("diisopropyl ether", 398.15)] = (3.5, "above the L-B range only McGarry and Perry remain; they differ 2.4-3.4 % at 120-150 C"),
            [("diisopropyl ether", 423.15)] = (4.0, "above the L-B range only McGarry and Perry remain; they differ 2.4-3.4 % at 120-150 C"),
            [("cyclohexanone", 298.15)] = (3.0, "the only two tables, L-B and Perry, differ 2.0 % at 25 C"),
            [("octane", 273.15)] = (3.5, "below 298 K only McGarry and Perry remain; they differ 2.9 % at 0 C"),
            [("triethylamine", 323.15)] = (7.0, "L-B, Perry and McGarry spread 6 % at 50 C"),
            [("triethylamine", 398.15)] = (5.5, "McGarry and Perry differ 1-9 % at 100-150 C"),
            [("triethylamine", 423.15)] = (9.5, "McGarry and Perry differ 1-9 % at 100-150 C"),
            [("butyl acetate", 323.15)] = (5.5, "Poling and L-B (one fit) run 3-10 % above Perry and McGarry below 60 C, so Perry answers here and Poling is the only other table at 50 C"),
        };

    /// <summary>Solvents with no second published table at all, and why.</summary>
    public static readonly IReadOnlyDictionary<string, string> Exemptions = new Dictionary<string, string>
    {
        ["trifluorotoluene"] = "only a Landolt-Boernstein fit is at hand",
        ["1-methoxy-2-propanol"] = "only a Landolt-Boernstein fit is at hand",
        ["isopropyl acetate"] = "only a Landolt-Boernstein fit is at hand",
        ["1,2-dimethoxyethane"] = "only a Landolt-Boernstein fit is at hand",
        ["sulfolane"] = "only a Landolt-Boernstein fit is at hand",
        ["N,N-dimethylacetamide"] = "only a Landolt-Boernstein fit is at hand",
        ["N-methyl-2-pyrrolidone"] = "only a Landolt-Boernstein fit is at hand",
        ["dimethyl carbonate"] = "no published table at hand; the curve is a Trouton estimate",
        ["cyclopentyl methyl ether"] = "from memory; the curve is a Trouton estimate",
        ["diglyme"] = "from memory; the curve is a Trouton estimate",
    };

    [Theory]
    [MemberData(nameof(CheckPoints))]
    public void The_library_vapour_pressure_agrees_with_a_different_published_table(
        string solvent, double temperatureK, string answeringSource, string referenceSource)
    {
        var s = ShippedLibrary.Instance.Find(solvent);
        var result = s.VaporPressure.SaturationPressure(temperatureK);
        Assert.False(result.Extrapolated);
        Assert.Equal(answeringSource, result.Curve.Source);
        Assert.NotEqual(result.Curve.Source, referenceSource);

        var reference = PublishedTables.For(s.Cas).Single(r => r.Source == referenceSource);
        Assert.True(reference.Covers(temperatureK), $"{referenceSource} does not cover {temperatureK} K");
        double deviation = 100 * (result.PressurePa / reference.PressurePa(temperatureK) - 1);
        double bound = KnownDisagreements.TryGetValue((solvent, temperatureK), out var k) ? k.BoundPercent : TolerancePercent;
        Assert.True(Math.Abs(deviation) <= bound,
            $"{solvent} at {temperatureK} K: library ({result.Curve.Source}) {result.PressurePa:F1} Pa is {deviation:+0.00;-0.00} % from {referenceSource}, allowed ±{bound} %");
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
    public void Every_solvent_is_checked_at_three_or_more_temperatures_unless_exempt()
    {
        var counts = Points().GroupBy(p => p.Solvent).ToDictionary(g => g.Key, g => g.Count());
        foreach (var s in ShippedLibrary.Instance.Solvents)
        {
            if (Exemptions.ContainsKey(s.Name)) continue;
            Assert.True(counts.TryGetValue(s.Name, out int n) && n >= 3, $"{s.Name} has {n} check points");
        }
    }

    [Fact]
    public void The_exemptions_are_exactly_the_solvents_without_a_second_published_table()
    {
        // A solvent needs an exemption when the typed tables hold no row from a source other than
        // its library curves' sources: nothing independent to compare with.
        var without = ShippedLibrary.Instance.Solvents.Where(s =>
        {
            var own = s.VaporPressure.Curves.Select(c => c.Source).ToHashSet();
            var published = PublishedTables.For(s.Cas).Select(r => r.Source).ToHashSet();
            return published.Count == 0 || (published.Count == 1 && own.SetEquals(published));
        }).Select(s => s.Name).OrderBy(n => n).ToList();
        Assert.Equal(Exemptions.Keys.OrderBy(n => n).ToList(), without);
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
