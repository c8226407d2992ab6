using System.Globalization;
using ConsistencyHost.Contract.V1;
using ConsistencyHost.Tests.Shared;

namespace ConsistencyHost.Server.Tests.Replicas;

/// <summary>
/// Varied real structures for load through the replicas: NCI structures from RDKit's data folder, each with a
/// simple 1H peak list (one aromatic and one aliphatic multiplet holding the structure's hydrogens) and the
/// molecular formula, both computed by RDKit.
/// </summary>
internal static class NciEntries
{
    private const string Smi = "/usr/share/RDKit/Data/NCI/first_5K.smi";

    // RDKit is the outside reference for the formula and the hydrogen counts. Structures under six heavy atoms
    // are skipped, so that no tiny solvent-like molecule is ever submitted.
    private const string Script = """
        import sys
        from rdkit import Chem, RDLogger
        from rdkit.Chem.rdMolDescriptors import CalcMolFormula
        RDLogger.DisableLog("rdApp.*")
        wanted = int(sys.argv[2])
        for line in open(sys.argv[1], encoding="utf-8"):
            parts = line.split()
            if len(parts) < 2:
                continue
            mol = Chem.MolFromSmiles(parts[0])
            if mol is None or mol.GetNumHeavyAtoms() < 6 or Chem.GetFormalCharge(mol) != 0 or "." in parts[0]:
                continue
            aromatic = sum(a.GetTotalNumHs() for a in mol.GetAtoms() if a.GetIsAromatic())
            other = sum(a.GetTotalNumHs() for a in mol.GetAtoms() if not a.GetIsAromatic())
            if aromatic + other == 0:
                continue
            print(f"{parts[1]}\t{parts[0]}\t{CalcMolFormula(mol)}\t{aromatic}\t{other}")
            wanted -= 1
            if wanted == 0:
                break
        """;

    public static async Task<IReadOnlyList<CheckEntryRequest>> ReadAsync(int count)
    {
        var (exit, stdout, stderr) = await ChildProcess.RunAsync("/usr/bin/python3", ["-c", Script, Smi, count.ToString(CultureInfo.InvariantCulture)], timeout: TimeSpan.FromSeconds(60));
        Assert.True(exit == 0, "RDKit (Debian python3-rdkit) failed: " + stderr);
        var entries = stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(Entry).ToList();
        Assert.Equal(count, entries.Count);
        return entries;
    }

    private static CheckEntryRequest Entry(string line)
    {
        var fields = line.Split('\t');
        var request = new CheckEntryRequest
        {
            EntryId = "NCI-" + fields[0],
            Structure = new Structure { Smiles = fields[1] },
            Claims = new Claims { Formula = fields[2] },
        };
        request.ReportedText.Add("1H NMR (400 MHz, CDCl3) δ " + string.Join(", ", Signals(int.Parse(fields[3], CultureInfo.InvariantCulture), int.Parse(fields[4], CultureInfo.InvariantCulture))) + ".");
        return request;
    }

    // Common practice: aromatic protons fall around 6.5–8.5 ppm, most others below 4.5 ppm.
    private static IEnumerable<string> Signals(int aromatic, int other)
    {
        if (aromatic > 0) yield return $"8.10–6.60 (m, {aromatic}H)";
        if (other > 0) yield return $"4.40–0.80 (m, {other}H)";
    }
}
