using Microsoft.Extensions.DependencyInjection;

namespace ConsistencyHost.Engine;

/// <summary>Registers the embedded engine in a service collection.</summary>
public static class EngineServiceCollectionExtensions
{
    /// <summary>Adds a singleton <see cref="CheckEngine"/> built from <paramref name="options"/> on first use.</summary>
    public static IServiceCollection AddCheckEngine(this IServiceCollection services, Func<IServiceProvider, EngineOptions> options)
    {
        services.AddSingleton(provider => new CheckEngine(options(provider)));
        return services;
    }
}
