using System.Collections.Frozen;

namespace ConsistencyHost.Chemistry.Model;

/// <summary>Masses of specific nuclides written as isotopes ([2H], [13C], …).</summary>
/// <remarks>
/// NIST "Atomic Weights and Isotopic Compositions" (AME evaluation): 2H from the confirmed transcription in
/// nmr-data-standards.md §7.1; the other values from memory of the same NIST table. Most-abundant nuclides
/// come from <see cref="Elements"/>.
/// </remarks>
public static class Nuclides
{
    private static readonly FrozenDictionary<(int Z, int A), double> Masses = new Dictionary<(int, int), double>
    {
        [(1, 2)] = 2.01410177812,
        [(1, 3)] = 3.0160492779,
        [(5, 10)] = 10.0129369,
        [(6, 11)] = 11.0114336,
        [(6, 13)] = 13.00335483507,
        [(6, 14)] = 14.0032419884,
        [(7, 15)] = 15.00010889888,
        [(8, 17)] = 16.99913175650,
        [(8, 18)] = 17.99915961286,
        [(9, 18)] = 18.0009380,
        [(15, 32)] = 31.97390764,
        [(16, 33)] = 32.9714589098,
        [(16, 34)] = 33.967867004,
        [(16, 35)] = 34.96903231,
        [(17, 36)] = 35.96830698,
        [(17, 37)] = 36.965902602,
        [(35, 81)] = 80.9162897,
        [(53, 123)] = 122.905589,
        [(53, 125)] = 124.9046294,
        [(53, 131)] = 130.9061263,
    }.ToFrozenDictionary();

    /// <summary>Mass of nuclide (Z, A) in u, or null when not tabulated.</summary>
    public static double? MassOf(int atomicNumber, int massNumber)
    {
        if (Masses.TryGetValue((atomicNumber, massNumber), out var m))
        {
            return m;
        }

        var e = Elements.ByAtomicNumber(atomicNumber);
        return e is not null && e.MostAbundantMassNumber == massNumber ? e.MonoisotopicMass : null;
    }
}
