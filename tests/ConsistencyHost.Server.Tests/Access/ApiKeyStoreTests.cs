using ConsistencyHost.Server.Access;

namespace ConsistencyHost.Server.Tests.Access;

public sealed class ApiKeyStoreTests
{
    private static readonly ApiKeyStore Store = new([
        new("eln-prod", "prod-0123456789abcdef0123456789abcdef"),
        new("eln-test", "test-0123456789abcdef0123456789abcdef"),
    ]);

    [Theory]
    [InlineData("prod-0123456789abcdef0123456789abcdef", "eln-prod")]
    [InlineData("test-0123456789abcdef0123456789abcdef", "eln-test")]
    public void ClientOf_ConfiguredKey_NamesItsClient(string key, string client) => Assert.Equal(client, Store.ClientOf(key));

    [Theory]
    [InlineData("prod-0123456789abcdef0123456789abcdeF")]
    [InlineData("prod-0123456789abcdef0123456789abcdef ")]
    [InlineData("prod-0123456789abcdef")]
    [InlineData("")]
    public void ClientOf_AnythingElse_IsNull(string key) => Assert.Null(Store.ClientOf(key));
}
