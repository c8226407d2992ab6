#!/usr/bin/env python3
"""Figures of bench/streaming.sh: attaches /usr/bin/time figures to a watched batch, then (--mode) computes the
peak ratios, writes bench/results/streaming/summary.json, regenerates the figures section of docs/streaming.md
(full mode) and exits 1 when a ratio breaks the margin."""
import datetime
import json
import os
import pathlib
import re
import subprocess
import sys

RESULTS = pathlib.Path("bench/results/streaming")
DOC = pathlib.Path("docs/streaming.md")
BEGIN, END = "<!-- figures:begin (bench/streaming.sh --full) -->", "<!-- figures:end -->"
MARGIN = 1.10  # peak at the later checkpoint may exceed the earlier one by at most 10 %
RUNS = [("call", "CheckEntries call (bench grpc client)"), ("batch-embedded", "`consistencyhost batch`, embedded engine"),
        ("batch-server", "`consistencyhost batch --server`")]


def attach_time(result_path, time_path, out_dir):
    result = json.loads(pathlib.Path(result_path).read_text())
    text = pathlib.Path(time_path).read_text()
    peak = re.search(r"Maximum resident set size \(kbytes\): (\d+)", text)
    status = re.search(r"Exit status: (\d+)", text)
    result["wholeRunPeakKiB"] = int(peak.group(1)) if peak else None
    result["exitStatus"] = int(status.group(1)) if status else None
    result["outputBytes"] = {p.name: p.stat().st_size for p in pathlib.Path(out_dir).iterdir() if p.is_file()}
    pathlib.Path(result_path).write_text(json.dumps(result, indent=2) + "\n")


def peak_at(checkpoints, entries):
    hits = [c for c in checkpoints if c["entries"] == entries]
    return hits[0]["peakKiB"] if hits else None


def series(name, result):
    """(label, checkpoints) pairs of one run: the call's host, or a batch's CLI and (with --server) host."""
    if name == "call":
        return [("host", result["checkpoints"])]
    pairs = [("CLI", result["cli"])]
    if result.get("host"):
        pairs.append(("host", result["host"]))
    return pairs


def machine():
    model = next((l.split(":", 1)[1].strip() for l in open("/proc/cpuinfo") if l.startswith("model name")), "unknown CPU")
    sdk = subprocess.run(["dotnet", "--version"], capture_output=True, text=True).stdout.strip()
    return {"date": datetime.datetime.now(datetime.timezone.utc).strftime("%Y-%m-%d %H:%M UTC"), "cores": os.cpu_count(),
            "cpu": model, "load1": os.getloadavg()[0], "dotnetSdk": sdk}


def summarise(mode):
    total = 10_000 if mode == "short" else 100_000
    early, late = (5_000, 10_000) if mode == "short" else (10_000, 100_000)
    rows, failures = [], []
    for name, title in RUNS:
        path = RESULTS / f"{name}.json"
        if not path.exists():
            continue
        result = json.loads(path.read_text())
        for label, points in series(name, result):
            a, b = peak_at(points, early), peak_at(points, late)
            ratio = b / a if a and b else None
            rows.append({"run": name, "title": title, "process": label, "earlyEntries": early, "lateEntries": late,
                         "earlyPeakKiB": a, "latePeakKiB": b, "ratio": ratio, "seconds": result["seconds"],
                         "wholeRunPeakKiB": result.get("wholeRunPeakKiB") if label == "CLI" else None,
                         "outputBytes": result.get("outputBytes")})
            if ratio is None or ratio > MARGIN:
                failures.append(f"{name} {label}: peak {b} KiB at {late} vs {a} KiB at {early} (ratio {ratio}, margin {MARGIN})")
    summary = {"mode": mode, "entries": total, "margin": MARGIN, "machine": machine(), "rows": rows, "failures": failures}
    (RESULTS / "summary.json").write_text(json.dumps(summary, indent=2) + "\n")
    return summary


def mib(kib):
    return f"{kib / 1024:,.1f}" if kib else "–"


def render(summary):
    m = summary["machine"]
    lines = [BEGIN, "",
             f"Run: `{summary['mode']}` mode, {m['date']}; {m['cores']} cores ({m['cpu']}), 1-min load average "
             f"{m['load1']:.2f} at the end (shared machine: rates are indicative, peaks are not affected by load); "
             f".NET SDK {m['dotnetSdk']}; {summary['entries']:,} generated entries (NCI structures cycled, invented peak "
             "lists; an SD file for `batch`, the same entries as requests for the call).", "",
             "| run | process | peak at 10k (MiB) | peak at 100k (MiB) | 100k / 10k | entries/s |",
             "| --- | --- | ---: | ---: | ---: | ---: |"]
    for r in summary["rows"]:
        ratio = f"{r['ratio']:.3f}" if r["ratio"] else "–"
        lines.append(f"| {r['title']} | {r['process']} | {mib(r['earlyPeakKiB'])} | {mib(r['latePeakKiB'])} | {ratio} | "
                     f"{summary['entries'] / r['seconds']:,.0f} |")
    lines += ["", "Peak = VmHWM from `/proc/PID/status` (the highest resident set since the process started), sampled when the "
              "10,000th and the 100,000th reply had arrived (for `batch`: when reports.jsonl had that many lines).", ""]
    for r in summary["rows"]:
        if r["wholeRunPeakKiB"]:
            sizes = ", ".join(f"{k} {v / 1e6:,.0f} MB" for k, v in sorted(r["outputBytes"].items()))
            lines.append(f"- {r['title']}: whole-run peak by `/usr/bin/time -v` {mib(r['wholeRunPeakKiB'])} MiB "
                         f"(includes writing report.html at the end); files written: {sizes}.")
    verdict = "within" if not summary["failures"] else "NOT within"
    lines += ["", f"Every ratio is {verdict} the {summary['margin']:.2f} margin (target: peaks within 10 %).", "", END]
    return "\n".join(lines)


def main():
    if sys.argv[1] == "--attach-time":
        attach_time(*sys.argv[2:5])
        return 0
    mode = sys.argv[2]
    summary = summarise(mode)
    for r in summary["rows"]:
        print(f"{r['run']:15} {r['process']:5} peak {mib(r['earlyPeakKiB'])} MiB at {r['earlyEntries']}, "
              f"{mib(r['latePeakKiB'])} MiB at {r['lateEntries']}: ratio {r['ratio'] or float('nan'):.3f}")
    if mode == "full":
        text = DOC.read_text()
        start, end = text.index(BEGIN), text.index(END) + len(END)
        DOC.write_text(text[:start] + render(summary) + text[end:])
        print(f"wrote {DOC}")
    for f in summary["failures"]:
        print(f"streaming: {f}", file=sys.stderr)
    return 1 if summary["failures"] else 0


if __name__ == "__main__":
    sys.exit(main())
