using ConsistencyHost.Fuzzing;
using SharpFuzz;

// Usage: ConsistencyHost.Fuzzing <reader>                 under afl-fuzz (input on stdin or AFL's shared memory)
//        ConsistencyHost.Fuzzing <reader> --replay PATH…  runs saved inputs (files or folders) in-process
if (args.Length == 0 || !Harnesses.All.TryGetValue(args[0], out var harness))
{
    Console.Error.WriteLine($"usage: ConsistencyHost.Fuzzing <{string.Join('|', Harnesses.All.Keys)}> [--replay PATH...]");
    return 2;
}

if (args.Length > 1 && args[1] == "--replay")
{
    return Replay.Run(harness, args[2..], Console.Out);
}

// Out of process: a stack overflow or a fatal error in the reader is reported to AFL as a crash too.
Fuzzer.OutOfProcess.Run(stream => harness(InputText.Decode(stream)));
return 0;
