namespace ConsistencyHost.Spectra.Tests;

/// <summary>Seeded random edits (delete, insert, replace, truncate) of well-formed inputs, for robustness properties.</summary>
internal sealed class SeededMutations(int seed, string alphabet)
{
    private readonly Random random = new(seed);

    public string Mutate(string text)
    {
        var chars = text.ToList();
        for (var edits = random.Next(1, 8); edits > 0; edits--)
        {
            var pos = random.Next(chars.Count + 1);
            switch (random.Next(3))
            {
                case 0 when pos < chars.Count: chars.RemoveAt(pos); break;
                case 1: chars.Insert(pos, alphabet[random.Next(alphabet.Length)]); break;
                default: if (pos < chars.Count) chars[pos] = alphabet[random.Next(alphabet.Length)]; break;
            }
        }
        var mutated = new string([.. chars]);
        return random.Next(10) == 0 ? mutated[..random.Next(mutated.Length)] : mutated;
    }
}
