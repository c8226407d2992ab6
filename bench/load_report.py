"""Writes docs/load.md from the JSON that bench/load.sh's run left in bench/results/load.

Usage: load_report.py --mode short|full --results bench/results/load --page docs/load.md
The findings and next steps are kept in bench/load-notes.md (written by people) and copied in verbatim.
"""
import argparse
import json
import os
import platform


def load(results, name):
    with open(os.path.join(results, name), encoding="utf-8") as f:
        return json.load(f)


def cpu_model():
    try:
        with open("/proc/cpuinfo", encoding="utf-8") as f:
            return next(l.split(":", 1)[1].strip() for l in f if l.startswith("model name"))
    except (OSError, StopIteration):
        return platform.processor() or "unknown CPU"


def n(value, digits=1):
    return "–" if value is None else f"{value:,.{digits}f}"


def load_note(summary):
    start = summary["machine"]["loadAverage1m"]
    return f"load average {n(start, 2)} at the start, {n(summary['loadAverage1mAtEnd'], 2)} at the end"


def compare_section(c, host):
    e, k = c["echo"], c["check"]
    t = c["targets"]
    lines = [
        "## Echo against CheckEntry (`compare`)",
        "",
        f"One host, {c['concurrency']} calls in flight (closed loop), {len(c['phases'])} alternating phases of "
        f"{n(c['phaseSeconds'])} s (echo, check, echo, …) after a warm-up; {load_note(c)}. The echo payload is the "
        f"serialised check request ({n(c['checkRequestBytes'], 0)} bytes on average; echo request "
        f"{n(c['echoRequestBytes'], 0)} bytes). Throughput is the median over each kind's phases; latencies are "
        "nearest-rank percentiles over all its calls.",
        "",
        "| call | calls/s | p50 ms | p99 ms | max ms | calls | errors | host CPU ms per call |",
        "| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: |",
        f"| Echo | {n(e['callsPerSecond'])} | {n(e['p50Ms'], 2)} | {n(e['p99Ms'], 2)} | {n(e['maxMs'], 1)} | {e['calls']:,} | {e['errors']} | {n(c['echoHostCpuMsPerCall'], 3)} |",
        f"| CheckEntry | {n(k['callsPerSecond'])} | {n(k['p50Ms'], 2)} | {n(k['p99Ms'], 2)} | {n(k['maxMs'], 1)} | {k['calls']:,} | {k['errors']} | {n(c['checkHostCpuMsPerCall'], 3)} |",
        "",
        f"**Check / echo throughput: {c['checkToEchoThroughputRatio']:.3f}** (target ≥ {t['minCheckToEchoRatio']}, stretch "
        f"{t['stretchCheckToEchoRatio']}: {'met' if c['meetsRatioTarget'] else 'not met'}). Check p99 "
        f"{n(k['p99Ms'], 2)} ms (target < {t['maxP99Ms']:g} ms: {'met' if c['meetsP99Target'] else 'not met'}). "
        "Host CPU per call is the host process's user + system time during a phase (/proc/PID/stat) divided by its "
        "calls, median over the phases: unlike calls/s it hardly depends on how much of the machine the host got.",
        "",
        "| phase | kind | s | calls/s | p50 ms | p99 ms | host CPU ms per call |",
        "| ---: | --- | ---: | ---: | ---: | ---: | ---: |",
    ]
    for p in c["phases"]:
        f = p["figures"]
        lines.append(f"| {p['index']} | {p['kind']} | {n(p['seconds'])} | {n(f['callsPerSecond'])} | {n(f['p50Ms'], 2)} | {n(f['p99Ms'], 2)} | {n(p['hostCpuMsPerCall'], 3)} |")
    s = c["checkServerTimes"]
    lines += [
        "",
        "Where a check's time goes, from the host's own timings in the same run: the host logs each entry's engine time "
        "(event 1100, request mapped to reply mapped) and each reply carries every rule's elapsed time.",
        "",
        "| measure | ms per entry |",
        "| --- | ---: |",
        f"| client latency, p50 (whole call, {c['concurrency']} in flight) | {n(k['p50Ms'], 2)} |",
        f"| host engine time, mean / p50 / p99 ({host['entries']:,} entries, warm-up included) | "
        f"{n(host['engineMsMean'], 2)} / {n(host['engineMsP50'], 2)} / {n(host['engineMsP99'], 2)} |",
        f"| sum of the rules' elapsed times, mean | {n(s['rulesMsPerEntry'], 3)} |",
    ]
    for rule, ms in s["msPerEntryByRule"].items():
        lines.append(f"| rule `{rule}` | {n(ms, 3)} |")
    return lines


def curve_row(name, curve):
    if curve is None:
        return f"| {name} | – | – | – | – | – |"
    return (f"| {name} | {n(curve['firstMiB'])} | {n(curve['lastMiB'])} | {n(curve['maxMiB'])} | "
            f"{n(curve['slopeMiBPerMinute'], 2)} | {n(curve['slopeSecondHalfMiBPerMinute'], 2)} |")


def soak_section(s, csv_rows):
    k = s["check"]
    lines = [
        "## Soak (`soak`)",
        "",
        f"CheckEntry at a fixed arrival rate of {n(s['ratePerSecond'], 0)}/s (open loop: calls start on schedule whether "
        f"or not earlier ones returned; latency counts from the scheduled start) for {n(s['elapsedSeconds'], 0)} s on a "
        f"fresh host after a few seconds of one-at-a-time warm-up (memory is sampled from start-up, latency only after "
        f"the warm-up); {load_note(s)}. The rate is a quarter of the slowest check phase `compare` measured just before.",
        "",
        "| sent | lost | completed | errors | calls/s | p50 ms | p99 ms | max ms |",
        "| ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |",
        f"| {s['sent']:,} | {s['lost']} | {k['calls']:,} | {k['errors']} | {n(k['callsPerSecond'])} | {n(k['p50Ms'], 2)} | "
        f"{n(k['p99Ms'], 2)} | {n(k['maxMs'], 1)} |",
        "",
        f"Memory of the host process, {s['memorySamples']} samples (resident set from /proc/PID/status; managed heap "
        "after the last GC from `Diagnostics/GetProcessMemory`); slopes are least-squares fits, the second-half one "
        "after start-up growth (JIT, pools, tiered compilation) has settled.",
        "",
        "| series | first MiB | last MiB | max MiB | slope MiB/min | slope, second half, MiB/min |",
        "| --- | ---: | ---: | ---: | ---: | ---: |",
        curve_row("resident set (VmRSS)", s["resident"]),
        curve_row("managed heap", s["managedHeap"]),
        "",
        f"Generation-2 collections during the soak: {s['gen2Collections']}. The whole curve is "
        "`bench/results/load/soak-memory.csv`; every tenth sample:",
        "",
        "| s | RSS MiB | managed heap MiB | calls done |",
        "| ---: | ---: | ---: | ---: |",
    ]
    step = max(1, len(csv_rows) // 10)
    for row in csv_rows[::step] + ([csv_rows[-1]] if (len(csv_rows) - 1) % step else []):
        lines.append(f"| {row['seconds']} | {row['rss_mib']} | {row['managed_heap_mib'] or '–'} | {row['completed_calls']} |")
    return lines


def replicas_section(r):
    lines = [
        "## Replicas behind client-side round-robin (`replicas`)",
        "",
        f"The same {r['entries']:,} CheckEntry calls, {r['concurrency']} in flight, through one Grpc.Net.Client channel with "
        "a static resolver and the `round_robin` policy over the first 1, 2 and 3 hosts (each its own process on this "
        f"machine); {load_note(r)}. CPU seconds are each host's user + system time during the timed part "
        "(/proc/PID/stat), in host order.",
        "",
        "| replicas | entries/s | × one replica | p50 ms | p99 ms | errors | CPU s by host | host CPU-s per million entries |",
        "| ---: | ---: | ---: | ---: | ---: | ---: | --- | ---: |",
    ]
    for run in r["runs"]:
        f = run["figures"]
        cpu = " / ".join(n(c, 2) for c in run["cpuSecondsByReplica"])
        lines.append(f"| {run['replicas']} | {n(f['callsPerSecond'])} | {n(run['speedupOverOne'], 2)} | {n(f['p50Ms'], 2)} | "
                     f"{n(f['p99Ms'], 2)} | {f['errors']} | {cpu} | {n(run['cpuSecondsPerMillionEntries'], 0)} |")
    return lines


def read_csv(path):
    with open(path, encoding="utf-8") as f:
        header, *rows = [l.strip().split(",") for l in f if l.strip()]
    return [dict(zip(header, row)) for row in rows]


def main():
    parser = argparse.ArgumentParser()
    parser.add_argument("--mode", required=True)
    parser.add_argument("--results", required=True)
    parser.add_argument("--page", required=True)
    args = parser.parse_args()
    c, s, r = (load(args.results, f"{name}.json") for name in ("compare", "soak", "replicas"))
    host = load(args.results, "host-timings.json")
    with open(os.path.join(os.path.dirname(__file__), "load-notes.md"), encoding="utf-8") as f:
        notes = f.read().strip()
    page = [
        "# Load",
        "",
        "Generated by `bench/load.sh` — do not edit by hand; rerun it (`--short` for CI, `--full` for the 10-minute "
        "soak). The findings at the end are kept in `bench/load-notes.md`. Hosts are real processes "
        "(`consistencyhost serve --echo`, Release) on loopback; the load generator "
        "(`bench/ConsistencyHost.LoadGenerator`) runs on the same machine and competes with them for its cores.",
        "",
        f"Run: `{args.mode}` mode, {c['machine']['utcTime'].replace('T', ' ').rstrip('Z')} UTC; "
        f"{c['machine']['processorCount']} cores ({cpu_model()}), shared with other engineers' builds and tests, so "
        "absolute figures move with their load (the load averages are given per section); ratios measured within one "
        "section move much less.",
        "",
        *compare_section(c, host),
        "",
        *soak_section(s, read_csv(os.path.join(args.results, "soak-memory.csv"))),
        "",
        *replicas_section(r),
        "",
        notes,
        "",
    ]
    with open(args.page, "w", encoding="utf-8") as f:
        f.write("\n".join(page))


if __name__ == "__main__":
    main()
