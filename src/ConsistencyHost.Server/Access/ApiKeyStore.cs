using System.Security.Cryptography;
using System.Text;

namespace ConsistencyHost.Server.Access;

/// <summary>
/// The configured API keys, held only as SHA-256 hashes, each with its client's name. A presented key is hashed
/// and compared with every stored hash in constant time, so that neither the comparison nor which key matched
/// shows in the time a refusal takes.
/// </summary>
/// <remarks>
/// Hashing first gives both sides one length, which <see cref="CryptographicOperations.FixedTimeEquals"/> needs
/// to be constant-time; a key of at least 32 random characters leaves nothing to gain from the unsalted hash.
/// </remarks>
public sealed class ApiKeyStore
{
    private readonly (string Client, byte[] Hash)[] _keys;

    /// <summary>Stores <paramref name="keys"/> (client name → key) as hashes.</summary>
    public ApiKeyStore(IEnumerable<KeyValuePair<string, string>> keys) =>
        _keys = [.. keys.Select(pair => (pair.Key, Hash(pair.Value)))];

    /// <summary>No keys: the key check is off.</summary>
    public static ApiKeyStore Empty { get; } = new([]);

    /// <summary>How many keys are configured.</summary>
    public int Count => _keys.Length;

    /// <summary>The client whose key <paramref name="presented"/> is, or null.</summary>
    public string? ClientOf(string presented)
    {
        var hash = Hash(presented);
        string? client = null;
        foreach (var (name, stored) in _keys)
        {
            // No early exit: every stored hash is compared whatever matched before.
            if (CryptographicOperations.FixedTimeEquals(hash, stored)) client = name;
        }

        return client;
    }

    private static byte[] Hash(string key) => SHA256.HashData(Encoding.UTF8.GetBytes(key));
}
