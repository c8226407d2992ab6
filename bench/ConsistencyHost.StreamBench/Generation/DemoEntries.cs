using ConsistencyHost.Chemistry.Model;
using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Perception.Formula;
using ConsistencyHost.Chemistry.Perception.Rings;
using ConsistencyHost.Chemistry.Perception.Symmetry;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.StreamBench.Generation;

/// <summary>
/// Turns the NCI SMILES set into entry templates: single, neutral organic molecules of 6–40 heavy atoms (so none
/// of the smallest molecules the house rules keep out of demo data can appear: those have at most 5 heavy atoms),
/// written as a molfile, read back as the host will read it, and given a 1H list with one signal per
/// NMR-equivalent hydrogen class (the project's own perception) whose proton counts match the class sizes.
/// </summary>
internal static class DemoEntries
{
    private static readonly HashSet<int> Elements = [6, 7, 8, 9, 15, 16, 17, 35, 53];

    public static IReadOnlyList<DemoEntry> FromSmilesFile(string path)
    {
        var templates = new List<DemoEntry>();
        var lineNumber = 0;
        foreach (var line in File.ReadLines(path))
        {
            lineNumber++;
            var smiles = line.Split('\t', ' ')[0];
            if (smiles.Length == 0 || smiles.Contains('.')) continue;
            if (Make(smiles, $"{Path.GetFileName(path)} line {lineNumber}") is { } entry) templates.Add(entry);
        }

        return templates.Count > 0 ? templates : throw new InvalidDataException($"'{path}' gave no usable structure (expected SMILES, one per line)");
    }

    private static DemoEntry? Make(string smiles, string name)
    {
        var parsed = SmilesReader.Read(smiles);
        if (!parsed.Succeeded || !Usable(parsed.Value!)) return null;
        var molfile = MolfileWriter.Write(parsed.Value!, name);
        var reread = MolfileReader.Read(molfile);
        if (!reread.Succeeded || reread.Value is not { } molecule) return null;
        var formula = MolecularFormula.Of(molecule);
        if (formula != MolecularFormula.Of(parsed.Value!)) return null;
        var equivalence = NmrEquivalence.Of(molecule);
        if (equivalence.HydrogenClasses.Length == 0 || equivalence.CarbonClasses13C.Length == 0) return null;
        var guesses = new ShiftGuesses(molecule, Aromaticity.Of(molecule, RingSet.Of(molecule)).AromaticAtoms);
        return new DemoEntry(name, molfile, PeakLines.Proton(equivalence, guesses), PeakLines.Carbon(equivalence, guesses), formula.Hill);
    }

    private static bool Usable(Molecule molecule) =>
        molecule.AtomCount is >= 6 and <= 40
        && molecule.Atoms.Any(a => a.AtomicNumber == 6)
        && molecule.Atoms.All(a => Elements.Contains(a.AtomicNumber) && a.Charge == 0 && a.Isotope == 0 && a.Radical == 0);
}
