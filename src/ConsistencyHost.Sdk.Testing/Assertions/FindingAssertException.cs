namespace ConsistencyHost.Sdk.Testing.Assertions;

/// <summary>A failed <see cref="FindingAssert"/> check.</summary>
public sealed class FindingAssertException(string message) : Exception(message);
