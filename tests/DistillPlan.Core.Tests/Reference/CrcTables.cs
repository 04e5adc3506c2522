namespace DistillPlan.Core.Tests.Reference;

/// <summary>
/// Figures typed from the CRC Handbook of Chemistry and Physics, "Physical Constants of Organic
/// Compounds": normal boiling point Tb and melting point Tm [K], by CAS number. Water's Tb is
/// the IAPWS-IF97 Region 4 saturation temperature at 101325 Pa (IAPWS R7-97(2012)).
/// </summary>
public static class CrcTables
{
    /// <summary>(CAS, name as the CRC prints it, Tb [K], Tm [K] or null where the CRC gives none).</summary>
    public static readonly IReadOnlyList<(string Cas, string CrcName, double TbK, double? TmK)> Organic =
    [
        ("56-23-5", "Tetrachloromethane", 349.85, 250.35),
        ("60-29-7", "Diethyl ether", 307.55, 156.93),
        ("64-17-5", "Ethanol", 351.39, 159.01),
        ("64-18-6", "Formic acid", 374.15, 281.45),
        ("64-19-7", "Acetic acid", 391.05, 290.15),
        ("67-56-1", "Methanol", 337.65, 175.65),
        ("67-63-0", "2-Propanol", 355.36, 185.24),
        ("67-64-1", "Acetone", 329.23, 178.25),
        ("67-66-3", "Trichloromethane", 334.35, 209.68),
        ("67-68-5", "Dimethyl sulfoxide", 465.05, 291.67),
        ("68-12-2", "N,N-Dimethylformamide", 425.95, 212.85),
        ("71-23-8", "1-Propanol", 370.19, 148.76),
        ("71-36-3", "1-Butanol", 390.75, 184.55),
        ("71-43-2", "Benzene", 353.23, 278.688),
        ("75-05-8", "Acetonitrile", 354.75, 229.15),
        ("75-09-2", "Dichloromethane", 312.95, 178.15),
        ("75-15-0", "Carbon disulfide", 319.35, 161.45),
        ("75-52-5", "Nitromethane", 374.34, 244.45),
        ("75-65-0", "2-Methyl-2-propanol", 355.45, 298.96),
        ("78-83-1", "2-Methyl-1-propanol", 380.99, 171.19),
        ("78-92-2", "2-Butanol", 372.55, 184.71),
        ("78-93-3", "2-Butanone", 352.75, 186.48),
        ("79-20-9", "Methyl acetate", 329.85, 174.95),
        ("95-47-6", "o-Xylene", 417.55, 247.99),
        ("95-50-1", "o-Dichlorobenzene", 453.35, 256.15),
        ("96-47-9", "2-Methyltetrahydrofuran", 353.15, null),
        ("98-08-8", "(Trifluoromethyl)benzene", 375.15, 244.16),
        ("98-82-8", "Isopropylbenzene", 425.55, 177.14),
        ("100-41-4", "Ethylbenzene", 409.35, 178.2),
        ("100-66-3", "Anisole", 426.75, 235.85),
        ("106-42-3", "p-Xylene", 411.45, 286.45),
        ("107-06-2", "1,2-Dichloroethane", 356.55, 237.55),
        ("107-21-1", "1,2-Ethanediol", 470.65, 260.15),
        ("107-98-2", "1-Methoxy-2-propanol", 393.15, null),
        ("108-10-1", "4-Methyl-2-pentanone", 388.85, 188.15),
        ("108-20-3", "Diisopropyl ether", 341.55, 187.78),
        ("108-21-4", "Isopropyl acetate", 361.75, 199.75),
        ("108-38-3", "m-Xylene", 412.25, 225.3),
        ("108-87-2", "Methylcyclohexane", 374.05, 146.55),
        ("108-88-3", "Toluene", 383.75, 178.15),
        ("108-90-7", "Chlorobenzene", 404.75, 227.95),
        ("108-94-1", "Cyclohexanone", 428.55, 245.22),
        ("109-60-4", "Propyl acetate", 374.15, 180.15),
        ("109-66-0", "Pentane", 309.21, 143.48),
        ("109-99-9", "Tetrahydrofuran", 339.15, 164.77),
        ("110-54-3", "Hexane", 341.87, 177.88),
        ("110-71-4", "1,2-Dimethoxyethane", 358.15, 204.15),
        ("110-82-7", "Cyclohexane", 353.85, 279.85),
        ("110-83-8", "Cyclohexene", 356.05, 169.65),
        ("110-86-1", "Pyridine", 388.35, 231.52),
        ("111-65-9", "Octane", 398.77, 216.42),
        ("121-44-8", "Triethylamine", 361.95, 158.45),
        ("123-86-4", "Butyl acetate", 399.15, 196.15),
        ("123-91-1", "1,4-Dioxane", 374.35, 284.9),
        ("126-33-0", "Sulfolane", 559.15, 301.6),
        ("127-19-5", "N,N-Dimethylacetamide", 439.05, 254.15),
        ("141-78-6", "Ethyl acetate", 350.25, 189.35),
        ("142-82-5", "Heptane", 371.53, 182.601),
        ("540-84-1", "2,2,4-Trimethylpentane", 372.35, 165.79),
        ("616-38-6", "Dimethyl carbonate", 363.26, 272.15),
        ("872-50-4", "N-Methyl-2-pyrrolidinone", 477.35, 249.15),
        ("1634-04-4", "Methyl tert-butyl ether", 328.25, 164.55),
    ];

    /// <summary>Water: normal boiling point 373.124 K (IAPWS-IF97 Region 4 at 101325 Pa; confirmed with python3-iapws, _TSat_P(0.101325) = 373.1243 K).</summary>
    public const double WaterTbK = 373.124;
}
