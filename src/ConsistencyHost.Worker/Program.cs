using ConsistencyHost.Worker;

// The rule worker. Started only by the host (see ConsistencyHost.Isolation.WorkerLauncher); run by hand it
// waits for a secret on standard input and is of no use. With --compile NAME it compiles one source plugin and exits.
if (args is [SourceCompileMode.Flag, var assemblyName])
{
    return await SourceCompileMode.RunAsync(assemblyName);
}

var arguments = WorkerArguments.Parse(args);
if (arguments.Problem is not null)
{
    await Console.Error.WriteLineAsync($"consistencyhost worker: {arguments.Problem}");
    return 2;
}

var secret = await Console.In.ReadLineAsync();
if (string.IsNullOrEmpty(secret))
{
    await Console.Error.WriteLineAsync("consistencyhost worker: no secret on standard input; this program is started by the host, not by hand");
    return 2;
}

return await WorkerApp.RunAsync(arguments, secret);
