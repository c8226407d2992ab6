using ConsistencyHost.Cli.CommandLine;
using ConsistencyHost.Cli.Commands;
using ConsistencyHost.Engine;
using ConsistencyHost.Server.Hosting;

namespace ConsistencyHost.Cli;

/// <summary>Entry point: one command with subcommands. Usage problems exit with 2 and say why on stderr.</summary>
public static class Program
{
    private const string Help =
        "consistencyhost - checks NMR and HRMS data reported for a structure\n\n" +
        "usage:\n  consistencyhost " + CheckCommand.Usage + "\n  consistencyhost " + RulesCommand.Usage +
        "\n  consistencyhost " + ServeCommand.Usage + "\n  consistencyhost " + EnvironmentsCommand.Usage +
        "\n  consistencyhost " + PeaksCommand.Usage + "\n  consistencyhost " + ProfilesCommand.Usage +
        "\n  consistencyhost " + BatchCommand.Usage + "\n  consistencyhost --version\n";

    public static async Task<int> Main(string[] args)
    {
        var stdout = Console.Out;
        try
        {
            return args.Length == 0 ? Usage() : await Dispatch(args[0], args[1..], stdout);
        }
        catch (UsageException error)
        {
            await Console.Error.WriteLineAsync("error: " + error.Message);
            return ExitCodes.UnusableInput;
        }
    }

    private static async Task<int> Dispatch(string command, string[] rest, TextWriter stdout) => command switch
    {
        "check" => CheckCommand.Run(rest, stdout),
        "rules" => RulesCommand.Run(rest, stdout),
        "serve" => await ServeCommand.RunAsync(rest, stdout),
        "environments" => EnvironmentsCommand.Run(rest, stdout),
        "peaks" => PeaksCommand.Run(rest, stdout),
        "profiles" => ProfilesCommand.Run(rest, stdout),
        "batch" => await BatchCommand.RunAsync(rest, stdout),
        "help" or "--help" or "-h" => Print(stdout),
        "--version" => PrintVersion(stdout),
        _ => throw new UsageException($"unknown command '{command}'; expected check, rules, serve, environments, peaks, profiles or batch"),
    };

    private static int Print(TextWriter stdout)
    {
        stdout.Write(Help);
        return ExitCodes.Ok;
    }

    /// <summary>
    /// The host's and the engine's versions, the same strings a running host gives in ListRules (the command line
    /// is the host: <c>serve</c> runs it in this process).
    /// </summary>
    private static int PrintVersion(TextWriter stdout)
    {
        stdout.Write($"consistencyhost {ServerApp.Version}\nengine {BuildVersion.Engine}\n");
        return ExitCodes.Ok;
    }

    private static int Usage()
    {
        Console.Error.Write(Help);
        return ExitCodes.UnusableInput;
    }
}
