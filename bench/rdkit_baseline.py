#!/usr/bin/python3
"""RDKit on the NCI 5K set, timed like our perception benchmark: parse, add hydrogens, constitutional ranks.

Run with Debian's interpreter (/usr/bin/python3, python3-rdkit). Prints one JSON object: the median seconds
per whole set of each step over --repeats repetitions, and the number of molecules RDKit read.
"""
import argparse
import json
import statistics
import time

from rdkit import Chem, RDLogger, rdBase

NCI = "/usr/share/RDKit/Data/NCI/first_5K.smi"


def smiles_lines(path):
    with open(path) as handle:
        return [line.split()[0] for line in handle if line.strip()]


def timed(step):
    start = time.perf_counter()
    result = step()
    return time.perf_counter() - start, result


def one_repetition(lines):
    parse_s, mols = timed(lambda: [m for m in (Chem.MolFromSmiles(s) for s in lines) if m is not None])
    addhs_s, with_h = timed(lambda: [Chem.AddHs(m) for m in mols])
    rank_s, _ = timed(lambda: [Chem.CanonicalRankAtoms(m, breakTies=False) for m in with_h])
    return {"parse_s": parse_s, "addhs_s": addhs_s, "rank_s": rank_s,
            "total_s": parse_s + addhs_s + rank_s, "molecules": len(mols)}


def main():
    parser = argparse.ArgumentParser(description=__doc__)
    parser.add_argument("--repeats", type=int, default=5)
    args = parser.parse_args()
    RDLogger.DisableLog("rdApp.*")  # the six hypervalent NCI lines RDKit refuses would print errors
    lines = smiles_lines(NCI)
    one_repetition(lines)  # warm-up: imports, caches
    runs = [one_repetition(lines) for _ in range(args.repeats)]
    summary = {key: statistics.median(r[key] for r in runs) for key in ("parse_s", "addhs_s", "rank_s", "total_s")}
    summary.update(molecules=runs[0]["molecules"], lines=len(lines), repeats=args.repeats, rdkit=rdBase.rdkitVersion,
                   runs=[r["total_s"] for r in runs])
    print(json.dumps(summary))


if __name__ == "__main__":
    main()
