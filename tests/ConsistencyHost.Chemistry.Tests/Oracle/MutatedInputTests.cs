using ConsistencyHost.Chemistry.Molfile;
using ConsistencyHost.Chemistry.Reading;
using ConsistencyHost.Chemistry.Smiles;

namespace ConsistencyHost.Chemistry.Tests.Oracle;

/// <summary>Property: bad input gives problems, never an exception (seeded random edits of real inputs).</summary>
public sealed class MutatedInputTests
{
    private const string Alphabet = "CNOcn()[]=#@+-123%0/\\.H:*Br";

    [Fact]
    public void SmilesReader_MutatedNciSmiles_NeverThrowsAndExplainsEveryFailure()
    {
        var lines = File.ReadLines(RdkitOracle.Nci5K).Select(l => l.Split('\t')[0]).ToList();
        var random = new Random(7);
        for (var i = 0; i < 5000; i++)
        {
            var text = Mutate(lines[random.Next(lines.Count)], random);
            var result = SmilesReader.Read(text, i % 2 == 0 ? SmilesReadOptions.Default : SmilesReadOptions.Lenient);
            Assert.True(result.Succeeded || result.Problems.Any(p => p.Severity == ProblemSeverity.Error), text);
            Assert.All(result.Problems, p => Assert.InRange(p.Offset, -1, text.Length));
        }
    }

    [Fact]
    public void MolfileReader_MutatedRdkitMolfiles_NeverThrows()
    {
        var (sdf, error) = RdkitOracle.Sdf(RdkitOracle.Nci5K);
        Assert.True(error is null, error);
        var random = new Random(11);
        var blocks = sdf.Split("$$$$\n", StringSplitOptions.RemoveEmptyEntries);
        for (var i = 0; i < 2000; i++)
        {
            var lines = blocks[random.Next(blocks.Length)].Split('\n').ToList();
            var k = random.Next(lines.Count);
            switch (random.Next(3))
            {
                case 0:
                    lines.RemoveAt(k);
                    break;
                case 1:
                    lines[k] = lines[k][..random.Next(lines[k].Length + 1)];
                    break;
                default:
                    lines.Insert(k, $"M  CHG  1 {random.Next(-3, 60),3} {random.Next(-5, 5),3}");
                    break;
            }

            var result = MolfileReader.Read(string.Join('\n', lines));
            Assert.True(result.Succeeded || result.Problems.Any(p => p.Severity == ProblemSeverity.Error));
        }
    }

    private static string Mutate(string s, Random random)
    {
        var chars = s.ToList();
        for (var e = random.Next(1, 4); e > 0; e--)
        {
            var pos = random.Next(chars.Count + 1);
            switch (random.Next(3))
            {
                case 0 when chars.Count > 0:
                    chars.RemoveAt(Math.Min(pos, chars.Count - 1));
                    break;
                case 1:
                    chars.Insert(pos, Alphabet[random.Next(Alphabet.Length)]);
                    break;
                default:
                    if (chars.Count > 0)
                    {
                        chars[Math.Min(pos, chars.Count - 1)] = Alphabet[random.Next(Alphabet.Length)];
                    }

                    break;
            }
        }

        return new string([.. chars]);
    }
}
