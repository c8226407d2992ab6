using System.Collections.Frozen;

namespace ConsistencyHost.Chemistry.Model;

/// <summary>The element table: symbols, default valences, most-abundant nuclide masses, conventional weights.</summary>
/// <remarks>
/// Nuclide masses: NIST "Atomic Weights and Isotopic Compositions" (AME evaluation), relative to Ar(12C) = 12.
/// Values for H, B, C, N, O, F, Na, Si, P, S, Cl, K, Br and I are the ones confirmed in
/// /work/shared/reference/nmr-data-standards.md §7.1; all others are from memory of the same NIST table and
/// are checked against RDKit's exact masses by the oracle test (to 1e-5 u).
/// Weights: CIAAW conventional/abridged standard atomic weights (IUPAC 2013–2017 tables, §7.4 of the same
/// reference for H…I); the others from memory of the CIAAW abridged table.
/// Valences: OpenSMILES organic subset (B 3; C 4; N 3,5; O 2; P 3,5; S 2,4,6; halogens 1).
/// </remarks>
public static class Elements
{
    private static readonly int[] None = [];

    private static readonly Element[] Table =
    [
        new(0, "*", None, 0, 0.0, 0.0),
        new(1, "H", [1], 1, 1.00782503223, 1.008),
        new(2, "He", None, 4, 4.00260325413, 4.0026),
        new(3, "Li", None, 7, 7.0160034366, 6.94),
        new(4, "Be", None, 9, 9.012183065, 9.0122),
        new(5, "B", [3], 11, 11.00930536, 10.81),
        new(6, "C", [4], 12, 12.0, 12.011),
        new(7, "N", [3, 5], 14, 14.00307400443, 14.007),
        new(8, "O", [2], 16, 15.99491461957, 15.999),
        new(9, "F", [1], 19, 18.99840316273, 18.998),
        new(10, "Ne", None, 20, 19.9924401762, 20.180),
        new(11, "Na", None, 23, 22.9897692820, 22.990),
        new(12, "Mg", None, 24, 23.985041697, 24.305),
        new(13, "Al", None, 27, 26.98153853, 26.982),
        new(14, "Si", [4], 28, 27.97692653465, 28.085),
        new(15, "P", [3, 5], 31, 30.97376199842, 30.974),
        new(16, "S", [2, 4, 6], 32, 31.9720711744, 32.06),
        new(17, "Cl", [1], 35, 34.968852682, 35.45),
        new(18, "Ar", None, 40, 39.9623831237, 39.95),
        new(19, "K", None, 39, 38.9637064864, 39.098),
        new(20, "Ca", None, 40, 39.962590863, 40.078),
        new(21, "Sc", None, 45, 44.95590828, 44.956),
        new(22, "Ti", None, 48, 47.94794198, 47.867),
        new(23, "V", None, 51, 50.94395704, 50.942),
        new(24, "Cr", None, 52, 51.94050623, 51.996),
        new(25, "Mn", None, 55, 54.93804391, 54.938),
        new(26, "Fe", None, 56, 55.93493633, 55.845),
        new(27, "Co", None, 59, 58.93319429, 58.933),
        new(28, "Ni", None, 58, 57.93534241, 58.693),
        new(29, "Cu", None, 63, 62.92959772, 63.546),
        new(30, "Zn", None, 64, 63.92914201, 65.38),
        new(31, "Ga", None, 69, 68.9255735, 69.723),
        new(32, "Ge", None, 74, 73.921177761, 72.630),
        new(33, "As", [3, 5], 75, 74.92159457, 74.922),
        new(34, "Se", [2, 4, 6], 80, 79.9165218, 78.971),
        new(35, "Br", [1], 79, 78.9183376, 79.904),
        new(36, "Kr", None, 84, 83.9114977282, 83.798),
        new(37, "Rb", None, 85, 84.9117897379, 85.468),
        new(38, "Sr", None, 88, 87.9056125, 87.62),
        new(39, "Y", None, 89, 88.9058403, 88.906),
        new(40, "Zr", None, 90, 89.9046977, 91.224),
        new(41, "Nb", None, 93, 92.906373, 92.906),
        new(42, "Mo", None, 98, 97.90540482, 95.95),
        new(43, "Tc", None, 98, 97.9072124, 98.0),
        new(44, "Ru", None, 102, 101.9043441, 101.07),
        new(45, "Rh", None, 103, 102.905498, 102.91),
        new(46, "Pd", None, 106, 105.9034804, 106.42),
        new(47, "Ag", None, 107, 106.9050916, 107.87),
        new(48, "Cd", None, 114, 113.90336509, 112.41),
        new(49, "In", None, 115, 114.903878776, 114.82),
        new(50, "Sn", None, 120, 119.90220163, 118.71),
        new(51, "Sb", None, 121, 120.903812, 121.76),
        new(52, "Te", [2, 4, 6], 130, 129.906222748, 127.60),
        new(53, "I", [1], 127, 126.9044719, 126.90),
        new(54, "Xe", None, 132, 131.9041550856, 131.29),
        new(55, "Cs", None, 133, 132.905451961, 132.91),
        new(56, "Ba", None, 138, 137.905247, 137.33),
        new(57, "La", None, 139, 138.9063563, 138.91),
        new(58, "Ce", None, 140, 139.9054431, 140.12),
    ];

    private static readonly (int Z, string Symbol, int A, double Mass, double Weight)[] Heavy =
    [
        (64, "Gd", 158, 157.9241123, 157.25),
        (74, "W", 184, 183.95093092, 183.84),
        (76, "Os", 192, 191.961477, 190.23),
        (77, "Ir", 193, 192.9629216, 192.22),
        (78, "Pt", 195, 194.9647917, 195.08),
        (79, "Au", 197, 196.96656879, 196.97),
        (80, "Hg", 202, 201.9706434, 200.59),
        (81, "Tl", 205, 204.9744278, 204.38),
        (82, "Pb", 208, 207.9766525, 207.2),
        (83, "Bi", 209, 208.9803991, 208.98),
        (90, "Th", 232, 232.0380558, 232.04),
        (92, "U", 238, 238.0507884, 238.03),
    ];

    private static readonly FrozenDictionary<int, Element> ByNumber = BuildByNumber();
    private static readonly FrozenDictionary<string, Element> BySymbol =
        ByNumber.Values.ToFrozenDictionary(e => e.Symbol, StringComparer.Ordinal);

    /// <summary>The element with atomic number <paramref name="atomicNumber"/>, or null when not tabulated.</summary>
    public static Element? ByAtomicNumber(int atomicNumber) => ByNumber.GetValueOrDefault(atomicNumber);

    /// <summary>The element with this exact (case-sensitive) symbol, or null.</summary>
    public static Element? FromSymbol(string symbol) => BySymbol.GetValueOrDefault(symbol);

    /// <summary>Symbol for Z, "?" when not tabulated.</summary>
    public static string SymbolOf(int atomicNumber) => ByNumber.TryGetValue(atomicNumber, out var e) ? e.Symbol : "?";

    private static FrozenDictionary<int, Element> BuildByNumber()
    {
        var d = new Dictionary<int, Element>();
        foreach (var e in Table)
        {
            d[e.AtomicNumber] = e;
        }

        foreach (var (z, symbol, a, mass, weight) in Heavy)
        {
            d[z] = new Element(z, symbol, None, a, mass, weight);
        }

        return d.ToFrozenDictionary();
    }
}
