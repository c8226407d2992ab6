"""Reads a host's console log and summarises its own per-entry timing (event 1100, "Checked entry ... N ms").

The host times each CheckEntry from the request's mapping to the reply's (intake, perception, every rule,
stamping); the load generator times the whole call. Their difference is transport and waiting.
Usage: load_host_log.py HOST.log  -> JSON on stdout.
"""
import json
import math
import re
import sys

CHECKED = re.compile(r"Checked entry \S+ (?:\(request \S+\) )?with profile \S+: \d+ finding\(s\), highest \S+, ([0-9.]+) ms")


def nearest_rank(sorted_values, p):
    # Common practice: nearest-rank percentile (the same method as the load generator's).
    rank = max(1, math.ceil(p / 100 * len(sorted_values)))
    return sorted_values[rank - 1]


def main(path):
    with open(path, encoding="utf-8", errors="replace") as log:
        times = sorted(float(m.group(1)) for m in map(CHECKED.search, log) if m)
    if not times:
        sys.exit(f"{path}: no 'Checked entry' lines (event 1100); is the host logging at Information?")
    print(json.dumps({
        "entries": len(times),
        "engineMsMean": round(sum(times) / len(times), 3),
        "engineMsP50": nearest_rank(times, 50),
        "engineMsP99": nearest_rank(times, 99),
    }, indent=2))


if __name__ == "__main__":
    main(sys.argv[1])
