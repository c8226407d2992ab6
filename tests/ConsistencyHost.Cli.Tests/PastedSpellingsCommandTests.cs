using System.Text.Json;

namespace ConsistencyHost.Cli.Tests;

/// <summary>
/// A characterisation paragraph written in the spellings of published supporting information (issue 13): check reads
/// all of it even with --strict, and the rules see what was read.
/// </summary>
public sealed class PastedSpellingsCommandTests
{
    // 4'-Methylacetophenone, shifts from memory of the usual literature values; "dH"/"dC" headers with the solvent
    // first, "arom. H"/"aromatic CH" assignments, "and" before the last signal, DEPT labels with "2×CH", and the RSC
    // HRMS wording with a mass error. [M+H]+ C9H11O: 135.0804 (NIST atomic masses less one electron).
    private const string Text =
        "dH (CDCl3, 400 MHz) 7.86 (d, J 8.2 Hz, 2H, arom. H), 7.25 (d, J 8.0 Hz, 2H, aromatic CH), 2.57 (s, 3H), and 2.41 (s, 3H). " +
        "dC (CDCl3, 101 MHz) 197.9 (C), 143.9 (C), 134.8 (C), 129.3 (2×CH), 128.5 (2×CH), 26.6 (CH3), 21.6 (CH3). " +
        "HRMS (ESI) m/z: found 135.0802 [M+H]+, C9H11O requires 135.0804 (Δ = −1.8 ppm).";

    [Fact]
    public async Task Check_StrictOnPublishedSpellings_ReadsEverythingAndChecksTheHrmsClaim()
    {
        var (exit, stdout, stderr) = await CliProcess.RunAsync("check", "--strict", "--smiles", "CC(=O)c1ccc(C)cc1", "--data", Text, "--format", "json");

        Assert.True(exit != 2, stderr);
        using var json = JsonDocument.Parse(stdout);
        var codes = json.RootElement.GetProperty("findings").EnumerateArray().Select(f => f.GetProperty("code").GetString()).ToList();
        Assert.DoesNotContain("text-unreadable", codes);
        // The claim was read whole: formula, ion and both values agree with the structure, so mass-formula is silent.
        Assert.DoesNotContain(codes, c => c is "ion-formula-mismatch" or "calculated-mass-mismatch" or "found-outside-window" or "ion-formula-unreadable");
    }
}
