#!/usr/bin/python3
"""Builds and checks published-si-entries.tsv (real published NMR/HRMS characterisation entries).

Build:  /usr/bin/python3 verify_si_entries.py            (reads published-si-candidates.txt, writes the TSV)
Check:  /usr/bin/python3 verify_si_entries.py --check    (re-checks every row of the TSV; exit 1 on a failure)
Report: /usr/bin/python3 verify_si_entries.py --report   (every candidate with each check's finding)

Checks per row, all against RDKit (/usr/bin/python3, Debian python3-rdkit):
  smiles   the SMILES parses;
  formula  the molecular formula equals the formula the text states ("calcd for", "requires",
           "Anal. Calcd for"), allowing the ion the authors name: M, [M+H]+, [M+Na]+, [M+K]+, [M-H]-, [M+NH4]+;
  h-sum    the 1H integrals add up to the structure's H count, or fall short only by exchangeable
           H (on O, N or S) that the authors left out (reported per row);
  c-lines  the number of 13C lines is at most the number of carbons;
  stereo   an (E)/(Z) or (R)/(S) descriptor in the label matches the SMILES' CIP labels;
  banned   the structure is not water, methanol, ethanol, dimethyl ether or a C5H12 isomer (house rule).
A row whose discrepancy is the authors' own stays only when its note carries the check's tag in
square brackets ([h-sum], [c-lines], [formula]) and says what the authors printed.
"""
import re
import sys
from collections import Counter
from pathlib import Path

from rdkit import Chem, RDLogger
from rdkit.Chem.rdMolDescriptors import CalcMolFormula

RDLogger.DisableLog("rdApp.*")
HERE = Path(__file__).resolve().parent
CANDIDATES = HERE / "published-si-candidates.txt"
OUTPUT = HERE / "published-si-entries.tsv"
COLUMNS = ["id", "source", "label", "smiles", "text", "note"]

# Ions the authors name beside a calculated mass: composition added to M.
ADDUCTS = {"M": {}, "M+H": {"H": 1}, "M+Na": {"Na": 1}, "M+K": {"K": 1}, "M-H": {"H": -1},
           "M+NH4": {"N": 1, "H": 4}, "M+Li": {"Li": 1}}
BANNED_SMILES = {"O", "CO", "CCO", "COC"}

H_START = re.compile(r"(?:1\s?H(?:\{[^}]*\})?[\s-]*NMR|\bd\s?H\b|δ\s?H\b|^H NMR|\bH NMR)")
C_START = re.compile(r"(?:13\s?C(?:\s?\{[^}]*\})?[\s-]*NMR|\bd\s?C\b|δ\s?C\b|\bC NMR)")
SECTION_END = re.compile(
    r"(?:HRMS|LRMS|\bGC\b|LR-MS|GC-MS|EI-MS|FAB|\bMS\b|m/z|19\s?F|31\s?P|Anal\.|\bIR\b|\bmp\b|Mp\b|\[α\])")
INTEGRAL = re.compile(r"(?<![\w.])(\d{1,2}(?:\.\d+)?)\s?(?:arom\.\s)?H(?![\w=])")
# Scanned-text misreadings seen in the corpus, undone only for these checks (the row text keeps them).
OCR_FIXES = [(re.compile(r"\bI\s?H\s?NMR"), "1H NMR"), (re.compile(r"\bBC\s?NMR"), "13C NMR"),
             (re.compile(r"(?<=[\s,(])lH\b"), "1H"), (re.compile("Η"), "H")]


def for_checks(text):
    for pattern, replacement in OCR_FIXES:
        text = pattern.sub(replacement, text)
    return text
SHIFT = re.compile(r"(?<![\w.])\d{1,3}\.(?:\d+|\s\d(?=\s|,|\(|$))")
FORMULA_CONTEXT = re.compile(
    r"(?:calc(?:d|ulated)?\.?|Calc(?:d)?\.?|requires|Anal\. Calcd|\bfor)[^0-9A-LN-Z\[]{0,40}"
    r"(\[?\(?(?:C\d*(?:[A-Z][a-z]?\d*)+)(?:\s?[+-]\s?(?:H|Na|K|NH4|Li))?\]?\)?)")
FORMULA_BEFORE = re.compile(r"\b(C\d+(?:[A-Z][a-z]?\d*)+)\s+requires")
ELEMENT = re.compile(r"([A-Z][a-z]?)(\d*)")


def read_candidates(path):
    blocks, current = [], {}
    for line in path.read_text(encoding="utf-8").splitlines():
        if line.startswith("#"):
            continue
        if not line.strip():
            if current:
                blocks.append(current)
            current = {}
            continue
        key, _, value = line.partition(": ")
        current[key.strip()] = value.strip()
    if current:
        blocks.append(current)
    return [dict(b, id=f"si-{i:03d}") for i, b in enumerate(blocks, start=1)]


def read_tsv(path):
    rows = []
    for line in path.read_text(encoding="utf-8").splitlines():
        if line.startswith("#") or not line.strip():
            continue
        cells = line.split("\t")
        rows.append(dict(zip(COLUMNS, cells + [""] * (len(COLUMNS) - len(cells)))))
    return rows


def composition(formula):
    counts = Counter()
    for element, digits in ELEMENT.findall(formula):
        counts[element] += int(digits) if digits else 1
    return counts


def stated_formulas(text):
    """Every formula the text names beside a calculated value, with the ion written inside it."""
    found = []
    for match in FORMULA_CONTEXT.finditer(text):
        token = match.group(1).strip("[]() ")
        ion = re.search(r"\s?([+-])\s?(NH4|Na|Li|K|H)$", token)
        counts = composition(token[: ion.start()] if ion else token)
        if ion:
            sign = 1 if ion.group(1) == "+" else -1
            for element, n in composition(ion.group(2)).items():
                counts[element] += sign * n
        found.append((match.group(1), counts))
    found += [(m.group(1), composition(m.group(1))) for m in FORMULA_BEFORE.finditer(text)]
    return found


def formula_check(mol, text):
    molecule = composition(CalcMolFormula(mol).replace("+", "").replace("-", ""))
    stated = stated_formulas(text)
    if not stated:
        return True, "no formula stated"
    for token, counts in stated:
        for ion, delta in ADDUCTS.items():
            expected = Counter(molecule)
            for element, n in delta.items():
                expected[element] += n
            if +expected == +counts:
                return True, f"{token.strip()} = {ion}"
    return False, f"stated {stated[0][0].strip()} vs structure {CalcMolFormula(mol)}"


def section(text, start_pattern, stop_pattern):
    start = start_pattern.search(text)
    if not start:
        return None
    rest = text[start.end():]
    stop = stop_pattern.search(rest)
    return rest[: stop.start()] if stop else rest


def proton_section(text):
    text = for_checks(text)
    return section(text, H_START, re.compile(C_START.pattern + "|" + SECTION_END.pattern))


def carbon_section(text):
    text = for_checks(text)
    return section(text, C_START, SECTION_END)


def strip_parentheses(text):
    previous = None
    while previous != text:
        previous, text = text, re.sub(r"\([^()]*\)", " ", text)
    return text


def exchangeable_h(mol):
    return sum(atom.GetTotalNumHs() for atom in mol.GetAtoms() if atom.GetSymbol() in ("O", "N", "S"))


def h_sum_check(mol, text):
    block = proton_section(text)
    if block is None:
        return True, "no 1H part"
    reported = round(sum(float(n) for n in INTEGRAL.findall(block)), 2)
    reported = int(reported) if reported == int(reported) else reported
    total = sum(atom.GetTotalNumHs() for atom in mol.GetAtoms())
    if reported == total:
        return True, f"{reported}/{total} H"
    missing = total - reported
    if 0 < missing <= exchangeable_h(mol):
        return True, f"{reported}/{total} H ({missing} exchangeable H not listed)"
    return False, f"integrals add to {reported}, structure has {total} H"


def c_lines_check(mol, text):
    block = carbon_section(text)
    if block is None:
        return True, "no 13C part"
    lines = len(SHIFT.findall(strip_parentheses(block)))
    carbons = sum(1 for atom in mol.GetAtoms() if atom.GetSymbol() == "C")
    if lines <= carbons:
        return True, f"{lines} lines / {carbons} C"
    return False, f"{lines} 13C lines for {carbons} carbons"


def stereo_check(mol, label):
    wanted = {d for group in re.findall(r"\(([0-9a-z,' ]*[EZRS])\)", label)
              for d in re.findall(r"(?:^|[\d,' ])([EZRS])(?=,|$)", group)}
    if not wanted:
        return True, "no descriptor"
    from rdkit.Chem import rdCIPLabeler
    rdCIPLabeler.AssignCIPLabels(mol)
    present = {b.GetProp("_CIPCode") for b in mol.GetBonds() if b.HasProp("_CIPCode")}
    present |= {a.GetProp("_CIPCode") for a in mol.GetAtoms() if a.HasProp("_CIPCode")}
    if wanted <= present:
        return True, "descriptor matches"
    return False, f"label says {sorted(wanted)}, SMILES gives {sorted(present) or 'none'}"


def banned(mol):
    canonical = Chem.MolToSmiles(mol)
    if canonical in {Chem.CanonSmiles(s) for s in BANNED_SMILES}:
        return True
    return CalcMolFormula(mol) == "C5H12"


def verify(row):
    """Returns (kept, reasons, details) for one row."""
    if row.get("exclude"):
        return False, ["excluded on reading"], {"excluded on reading": row["exclude"]}
    mol = Chem.MolFromSmiles(row.get("smiles", ""))
    if mol is None:
        return False, ["smiles"], {"smiles": "does not parse"}
    if banned(mol):
        return False, ["banned"], {"banned": "house rule: never a submitted structure"}
    note = row.get("note", "")
    details, reasons = {}, []
    checks = {"formula": formula_check(mol, row["text"]), "h-sum": h_sum_check(mol, row["text"]),
              "c-lines": c_lines_check(mol, row["text"]), "stereo": stereo_check(mol, row["label"])}
    for name, (ok, detail) in checks.items():
        details[name] = detail
        if not ok and f"[{name}]" not in note:
            reasons.append(name)
    return not reasons, reasons, details


SOLVENTS = [("CDCl3", r"CDCl\s?3?\b|chloroform-d|CDCl₃"), ("DMSO-d6", r"DMSO|d6-DMSO"),
            ("acetone-d6", r"acetone|\(CD3\)2CO|CD3COCD3"), ("CD3OD", r"CD3OD|methanol-d4|MeOD|CH3OH-d4"),
            ("CD2Cl2", r"CD2Cl2"),
            ("C6D6", r"C6D6|benzene-d6"), ("CD3CN", r"CD3CN"), ("D2O", r"D2O")]


def solvent_of(text):
    for name, pattern in SOLVENTS:
        if re.search(pattern, text):
            return name
    return "not stated"


HEADER = """\
# Published characterisation entries (1H NMR, 13C NMR, HRMS text as printed) with the structure each names.
# What: real entries copied from the supporting information and experimental sections of published
#   papers, as stored copies of public pages (address in `source`, with the citation the page shows).
#   Used to measure the spectrum model and the checker's false-alarm rate on real author text;
#   not to tune either. `text` keeps the authors' (and the PDF text layer's) spelling and quirks;
#   only mp/IR/Rf prose between the NMR parts was dropped, as each row's note says.
# SMILES: drawn by hand from the compound name printed in the document (never from the spectra);
#   compounds whose name did not fix the structure were left out.
# Built and verified by verify_si_entries.py (RDKit {rdkit}) from published-si-candidates.txt:
#   SMILES parses; formula = stated "calcd for" formula allowing the named ion; 1H integrals add to
#   the H count (or fall short only by exchangeable OH/NH); 13C lines <= carbons; E/Z and R/S in the
#   label match the SMILES. An authors' discrepancy stays only when the note tags and explains it.
# Candidates: {candidates}; kept: {kept}; rejected: {rejected}{reject_detail}
# Kept with an explained authors' discrepancy: {explained}
# Solvent mix of kept rows: {solvents}
# Columns: {columns}
"""


def build():
    import rdkit
    candidates = read_candidates(CANDIDATES)
    kept, rejected, explained = [], [], Counter()
    for row in candidates:
        ok, reasons, _ = verify(row)
        if ok:
            kept.append(row)
            explained.update(tag for tag in ("h-sum", "c-lines", "formula") if f"[{tag}]" in row.get("note", ""))
        else:
            rejected.append((row["id"], reasons))
    by_reason = Counter(reason for _, reasons in rejected for reason in reasons)
    detail = "".join(f"\n#   rejected for {reason}: {n} ({', '.join(i for i, r in rejected if reason in r)})"
                     for reason, n in sorted(by_reason.items()))
    detail += "".join(f"\n#     {row['id']} {row['label']}: {row['exclude']}" for row in candidates if row.get("exclude"))
    solvents = Counter(solvent_of(row["text"]) for row in kept)
    header = HEADER.format(rdkit=rdkit.__version__, candidates=len(candidates), kept=len(kept),
                           rejected=len(rejected), reject_detail=detail,
                           explained=", ".join(f"{k} {v}" for k, v in sorted(explained.items())) or "none",
                           solvents=", ".join(f"{k} {v}" for k, v in solvents.most_common()),
                           columns="\t".join(COLUMNS))
    lines = [header.rstrip("\n")] + ["\t".join(row.get(c, "") for c in COLUMNS) for row in kept]
    OUTPUT.write_text("\n".join(lines) + "\n", encoding="utf-8")
    print(f"{len(candidates)} candidates, {len(kept)} kept, {len(rejected)} rejected {dict(by_reason)}")
    for row_id, reasons in rejected:
        row = next(r for r in candidates if r["id"] == row_id)
        print(row_id, row["label"], verify(row)[2])


def check():
    failures = 0
    for row in read_tsv(OUTPUT):
        ok, reasons, details = verify(row)
        if not ok:
            failures += 1
            print(f"{row['id']} {row['label']}: {', '.join(f'{r}: {details.get(r, r)}' for r in reasons)}")
    print(f"{len(read_tsv(OUTPUT)) - failures} passed, {failures} failed")
    return 1 if failures else 0


def report():
    for row in read_candidates(CANDIDATES):
        ok, reasons, details = verify(row)
        print(row["id"], "OK " if ok else "BAD", row["label"][:50], details)


if __name__ == "__main__":
    if "--report" in sys.argv:
        sys.exit(report())
    if "--check" in sys.argv:
        sys.exit(check())
    build()
