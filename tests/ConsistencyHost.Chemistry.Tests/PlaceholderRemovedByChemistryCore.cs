namespace ConsistencyHost.Chemistry.Tests;

internal static class TestAssemblyMarker
{
}
