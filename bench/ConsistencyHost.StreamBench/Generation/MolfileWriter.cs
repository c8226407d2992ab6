using System.Globalization;
using System.Text;
using ConsistencyHost.Chemistry.Model;

namespace ConsistencyHost.StreamBench.Generation;

/// <summary>
/// A minimal V2000 molfile (CTfile format, BIOVIA "CTFile Formats" specification) of a parsed molecule:
/// heavy atoms with their Kekulé bond orders and charges; hydrogens are left to the reader's valence model.
/// Atoms sit on a circle so that no two coincide; no stereo is written.
/// </summary>
internal static class MolfileWriter
{
    public static string Write(Molecule molecule, string title)
    {
        var text = new StringBuilder();
        text.Append(title).Append('\n').Append("  StreamBench         2D\n\n");
        text.Append(CultureInfo.InvariantCulture, $"{molecule.AtomCount,3}{molecule.Bonds.Length,3}  0  0  0  0  0  0  0  0999 V2000\n");
        for (var i = 0; i < molecule.AtomCount; i++)
        {
            var angle = 2 * Math.PI * i / molecule.AtomCount;
            var radius = 0.25 * molecule.AtomCount;
            text.Append(CultureInfo.InvariantCulture, $"{radius * Math.Cos(angle),10:0.0000}{radius * Math.Sin(angle),10:0.0000}{0.0,10:0.0000} {molecule.Atoms[i].Symbol,-3} 0  0  0  0  0  0  0  0  0  0  0  0\n");
        }

        foreach (var bond in molecule.Bonds)
        {
            text.Append(CultureInfo.InvariantCulture, $"{bond.Begin + 1,3}{bond.End + 1,3}{bond.Order,3}  0  0  0  0\n");
        }

        var charged = Enumerable.Range(0, molecule.AtomCount).Where(i => molecule.Atoms[i].Charge != 0).ToList();
        foreach (var chunk in charged.Chunk(8))
        {
            text.Append(CultureInfo.InvariantCulture, $"M  CHG{chunk.Length,3}");
            foreach (var atom in chunk) text.Append(CultureInfo.InvariantCulture, $"{atom + 1,4}{molecule.Atoms[atom].Charge,4}");
            text.Append('\n');
        }

        return text.Append("M  END\n").ToString();
    }
}
