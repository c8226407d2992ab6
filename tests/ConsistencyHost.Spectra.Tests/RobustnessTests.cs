using ConsistencyHost.Spectra.Jcamp;
using ConsistencyHost.Spectra.Nmredata;
using ConsistencyHost.Spectra.Reported;
using ConsistencyHost.Spectra.Tests.Nmredata;
using ConsistencyHost.Spectra.Tests.Solvents;

namespace ConsistencyHost.Spectra.Tests;

/// <summary>Bad input gets problems, never an exception: seeded mutations of the well-formed fixtures.</summary>
public sealed class RobustnessTests
{
    private const string Reported =
        "1H NMR (400 MHz, CDCl3) δ 7.31–7.24 (m, 5H), 4.12 (q, J = 7.1 Hz, 2H, OCH2), 1.26 (t, J = 7.1 Hz, 3H). " +
        "13C{1H} NMR (101 MHz, CDCl3) δ 162.4 (d, J = 245.3 Hz), 130.9 (d, J(C,F) = 9.3 Hz, 2C). " +
        "HRMS (ESI) m/z: [M + H]+ calcd for C8H8FO 139.0554; found 139.0551.";

    [Theory]
    [InlineData(1, ReadMode.Strict)]
    [InlineData(2, ReadMode.Lenient)]
    public void ReportedTextReader_MutatedText_GivesLocatedProblemsNotExceptions(int seed, ReadMode mode)
    {
        var mutations = new SeededMutations(seed, "0123456789.,;:()[]–-δdJHzsmtqbr =+*/\n CDClF NMR HRMS calcd found");
        for (var i = 0; i < 3000; i++)
        {
            var text = mutations.Mutate(Reported);
            var result = ReportedTextReader.Read(text, mode);
            Assert.All(result.Problems, p => Assert.InRange(p.Offset, 0, text.Length));
            Assert.All(result.Problems, p => Assert.True(p.Fragment.Length <= 30));
            if (mode == ReadMode.Strict && !result.Succeeded) Assert.Empty(result.Spectra);
        }
    }

    [Fact]
    public void JcampReader_MutatedFiles_GiveProblemsNotExceptions()
    {
        var mutations = new SeededMutations(3, "#=$ ,;()<>.0123456789\n\rXYWMA-_^");
        string[] files = [ImpurityFixtures.EthylAcetateLinkFile, ImpurityFixtures.DiethylEtherInDmsoHz, ImpurityFixtures.TriethylamineCarbonAssignments];
        for (var i = 0; i < 1500; i++)
        {
            var result = JcampReader.Read(mutations.Mutate(files[i % files.Length]));
            Assert.All(result.Problems, p => Assert.True(p.Line >= 1 && p.Column >= 1));
        }
    }

    [Fact]
    public void NmredataReader_MutatedRecords_GiveProblemsNotExceptions()
    {
        var mutations = new SeededMutations(4, "<>\\;, =()\"\n0123456789HSJNLEW$-.M");
        for (var i = 0; i < 1500; i++)
        {
            var result = NmredataReader.Read(mutations.Mutate(NmredataFixtures.TwoRecords));
            Assert.All(result.Problems, p => Assert.True(p.Line >= 1));
        }
    }
}
