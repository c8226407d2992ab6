#!/usr/bin/python3
"""Fails when a guarded speed ratio of the last run falls more than the margin below the committed baseline.

Each ratio is 'reference time / our time' measured in one run (higher is better), so machine load cancels
to first order; the margin absorbs what is left."""
import json
import sys


def main(baseline_path, summary_path):
    with open(baseline_path) as handle:
        baseline = json.load(handle)
    try:
        with open(summary_path) as handle:
            current = json.load(handle)["guard"]
    except FileNotFoundError:
        print(f"{summary_path} not found: run bench/run.sh first (or pass --run)")
        return 2
    margin = baseline["margin"]
    failed = False
    for name, committed in baseline["ratios"].items():
        if name not in current:
            print(f"FAIL {name}: not measured in this run")
            failed = True
            continue
        floor = committed * (1 - margin)
        verdict = "ok  " if current[name] >= floor else "FAIL"
        failed |= verdict == "FAIL"
        print(f"{verdict} {name}: {current[name]:.4f} (baseline {committed:.4f}, floor {floor:.4f} at -{margin:.0%})")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main(*sys.argv[1:3]))
