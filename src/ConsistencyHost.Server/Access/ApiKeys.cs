using Microsoft.Extensions.Configuration;

namespace ConsistencyHost.Server.Access;

/// <summary>
/// Reads <c>Server:ApiKeys</c>, a map of client name to key (<c>{"eln-prod": "&lt;key&gt;"}</c>, or the
/// environment variable <c>Server__ApiKeys__eln-prod</c>). Problems name the client, never the key.
/// </summary>
internal static class ApiKeys
{
    public static ApiKeyStore Read(IConfigurationSection section, List<string> problems)
    {
        var keys = new List<KeyValuePair<string, string>>();
        foreach (var child in section.GetChildren().OrderBy(c => c.Key, StringComparer.Ordinal))
        {
            if (child.Value is null || int.TryParse(child.Key, out _))
            {
                // A nested object, or an array (its items arrive as children "0", "1", …): not a name → key map.
                problems.Add(AccessMessages.KeysNotAMap(child.Key));
            }
            else if (child.Value.Length < AccessMessages.MinimumKeyLength)
            {
                problems.Add(AccessMessages.KeyTooShort(child.Key));
            }
            else if (keys.FirstOrDefault(k => string.Equals(k.Value, child.Value, StringComparison.Ordinal)) is { Key: { } first })
            {
                problems.Add(AccessMessages.DuplicateKey(first, child.Key));
            }
            else
            {
                keys.Add(new(child.Key, child.Value));
            }
        }

        return keys.Count == 0 ? ApiKeyStore.Empty : new ApiKeyStore(keys);
    }
}
