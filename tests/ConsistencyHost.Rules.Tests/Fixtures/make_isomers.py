#!/usr/bin/python3
"""Writes positional-isomers.tsv: for each row of published-si-entries.tsv, up to three constitutional
isomers with the same formula, made by moving one ring substituent to another ring CH, by swapping two
different substituents on one ring, or by moving a methyl branch along an sp3 chain.

These are "wrong structure drawn for the data" seeds: the published text stays the same and the
isomer replaces the structure. Run with /usr/bin/python3 (Debian python3-rdkit).
"""
from pathlib import Path

from rdkit import Chem, RDLogger
from rdkit.Chem.rdMolDescriptors import CalcMolFormula

RDLogger.DisableLog("rdApp.*")
HERE = Path(__file__).resolve().parent
ENTRIES = HERE / "published-si-entries.tsv"
OUTPUT = HERE / "positional-isomers.tsv"
MAX_PER_ENTRY = 3

# Short names for common substituents (fragment SMILES rooted at the ring-bonded atom).
GROUP_NAMES = {"C": "Me", "OC": "OMe", "O": "OH", "F": "F", "Cl": "Cl", "Br": "Br", "I": "I", "N": "NH2",
               "C#N": "CN", "C(F)(F)F": "CF3", "[N+](=O)[O-]": "NO2", "C(C)=O": "Ac", "C=O": "CHO",
               "NC(C)=O": "NHAc", "C(=O)OC": "CO2Me", "C(=O)OCC": "CO2Et", "OC(F)(F)F": "OCF3",
               "c1ccccc1": "Ph", "CC": "Et", "C(C)(C)C": "tBu", "C(C)C": "iPr", "SC": "SMe"}


def branch_atoms(mol, root, parent):
    """Atoms reachable from root without passing through parent."""
    seen, stack = {parent, root}, [root]
    while stack:
        for neighbour in mol.GetAtomWithIdx(stack.pop()).GetNeighbors():
            if neighbour.GetIdx() not in seen:
                seen.add(neighbour.GetIdx())
                stack.append(neighbour.GetIdx())
    return seen - {parent}


def group_name(mol, root, parent):
    atoms = sorted(branch_atoms(mol, root, parent))
    smiles = Chem.MolFragmentToSmiles(mol, atoms, rootedAtAtom=root, canonical=True, isomericSmiles=False)
    return GROUP_NAMES.get(smiles, smiles)


def takes_substituent(atom):
    return atom.GetSymbol() == "C" and atom.GetIsAromatic() and atom.GetTotalNumHs() > 0


def ring_substituents(mol, ring):
    """(ring atom, substituent root) pairs for single bonds leaving a ring, substituent not in the ring."""
    ring_set = set(ring)
    pairs = []
    for idx in ring:
        atom = mol.GetAtomWithIdx(idx)
        if atom.GetSymbol() != "C":
            continue
        for bond in atom.GetBonds():
            other = bond.GetOtherAtomIdx(idx)
            if other in ring_set or bond.GetBondType() != Chem.BondType.SINGLE or bond.IsInRing():
                continue
            pairs.append((idx, other))
    return pairs


def locants(ring, reference, anchor, target):
    """Locants of anchor and target with the reference atom as 1, numbered in the direction that gives
    the anchor the lower locant (SSSR rings come out in bond order, so list order is ring order)."""
    start, size = ring.index(reference), len(ring)
    forward = {idx: (ring.index(idx) - start) % size + 1 for idx in ring}
    backward = {idx: (start - ring.index(idx)) % size + 1 for idx in ring}
    numbering = forward if forward[anchor] <= backward[anchor] else backward
    return numbering[anchor], numbering[target]


def reference_for(mol, ring, pairs, anchor):
    """Position 1 for a move: another substituent on the ring, else a ring heteroatom, else a fusion atom."""
    for other_anchor, root in pairs:
        if other_anchor != anchor:
            return other_anchor, group_name(mol, root, other_anchor)
    for idx in ring:
        if mol.GetAtomWithIdx(idx).GetSymbol() != "C":
            return idx, f"ring {mol.GetAtomWithIdx(idx).GetSymbol()}"
    ring_info = mol.GetRingInfo()
    for idx in ring:
        if idx != anchor and ring_info.NumAtomRings(idx) > 1:
            return idx, "ring-fusion C"
    return anchor, "its own position"


def rebond(mol, moves):
    """Applies (old atom, new atom, substituent root) moves; returns canonical SMILES or None."""
    product = rebonded(mol, moves)
    return Chem.MolToSmiles(product) if product else None


def rebonded(mol, moves):
    """The edited molecule (atom indices kept) or None when it cannot be sanitised."""
    editable = Chem.RWMol(mol)
    for old, new, root in moves:
        editable.RemoveBond(old, root)
        editable.AddBond(new, root, Chem.BondType.SINGLE)
    for atom in editable.GetAtoms():
        atom.SetNoImplicit(False)
        if atom.GetSymbol() == "C":
            atom.SetNumExplicitHs(0)
    try:
        product = editable.GetMol()
        Chem.SanitizeMol(product)
        return product
    except (Chem.rdchem.KekulizeException, Chem.rdchem.AtomValenceException, ValueError):
        return None


def ring_moves(mol):
    for ring in [list(r) for r in Chem.GetSymmSSSR(mol) if mol.GetAtomWithIdx(r[0]).GetIsAromatic()]:
        pairs = ring_substituents(mol, ring)
        for anchor, root in pairs:
            reference, ref_name = reference_for(mol, ring, pairs, anchor)
            for target in ring:
                if target != anchor and takes_substituent(mol.GetAtomWithIdx(target)):
                    before, after = locants(ring, reference, anchor, target)
                    how = f"{group_name(mol, root, anchor)} moved {before}→{after} (1 = {ref_name})"
                    yield rebond(mol, [(anchor, target, root)]), how


def swaps(mol):
    for ring in [list(r) for r in Chem.GetSymmSSSR(mol) if mol.GetAtomWithIdx(r[0]).GetIsAromatic()]:
        pairs = ring_substituents(mol, ring)
        for i, (a1, r1) in enumerate(pairs):
            for a2, r2 in pairs[i + 1:]:
                n1, n2 = group_name(mol, r1, a1), group_name(mol, r2, a2)
                if n1 != n2:
                    yield rebond(mol, [(a1, a2, r1), (a2, a1, r2)]), f"{n1} and {n2} swapped"


def is_chain_carbon(atom):
    return atom.GetSymbol() == "C" and not atom.IsInRing() and atom.GetHybridization() == Chem.HybridizationType.SP3


def chain_smiles(mol, start):
    """The acyclic fragment holding start (carbons and heteroatoms, up to the rings), as SMILES."""
    seen, stack = {start}, [start]
    while stack:
        for neighbour in mol.GetAtomWithIdx(stack.pop()).GetNeighbors():
            if neighbour.GetIdx() not in seen and not neighbour.IsInRing():
                seen.add(neighbour.GetIdx())
                stack.append(neighbour.GetIdx())
    return Chem.MolFragmentToSmiles(mol, sorted(seen), isomericSmiles=False)


def chain_moves(mol):
    for methyl in mol.GetAtoms():
        if not (is_chain_carbon(methyl) and methyl.GetDegree() == 1 and methyl.GetTotalNumHs() == 3):
            continue
        holder = methyl.GetNeighbors()[0]
        if not is_chain_carbon(holder):
            continue
        for target in holder.GetNeighbors():
            if target.GetIdx() != methyl.GetIdx() and is_chain_carbon(target) and target.GetTotalNumHs() > 0:
                product = rebonded(mol, [(holder.GetIdx(), target.GetIdx(), methyl.GetIdx())])
                if product:
                    how = (f"CH3 branch moved along the chain: {chain_smiles(mol, holder.GetIdx())}"
                           f" → {chain_smiles(product, holder.GetIdx())}")
                    yield Chem.MolToSmiles(product), how


def isomers(smiles):
    mol = Chem.MolFromSmiles(smiles)
    original, formula = Chem.MolToSmiles(mol), CalcMolFormula(mol)
    found = {}
    # One of each kind first, then more ring moves, so the seeds stay varied.
    sources = [ring_moves(mol), swaps(mol), chain_moves(mol)]
    buckets = [[(s, h) for s, h in source if s] for source in sources]
    order = [b[0] for b in buckets if b] + [item for b in buckets for item in b[1:]]
    for candidate, how in order:
        check = Chem.MolFromSmiles(candidate)
        if check is None or candidate == original or candidate in found:
            continue
        if CalcMolFormula(check) != formula:
            continue
        found[candidate] = how
        if len(found) == MAX_PER_ENTRY:
            break
    return found


def read_entries():
    for line in ENTRIES.read_text(encoding="utf-8").splitlines():
        if line and not line.startswith("#"):
            cells = line.split("\t")
            yield cells[0], cells[3]


HEADER = """\
# Positional isomers of the published-si-entries.tsv structures: "wrong structure drawn for the data" seeds.
# Each row keeps the entry's published text (look it up by id) and swaps in an isomer of the same formula.
# Built by make_isomers.py (RDKit {rdkit}) from the SMILES in published-si-entries.tsv, which were drawn
#   from the documents' compound names: a ring substituent moved to another aromatic CH of the same ring
#   (locants counted from another substituent on that ring, shorter way round), two different
#   substituents on one ring swapped, or a methyl branch moved along an sp3 chain. Canonical SMILES,
#   deduplicated, never the original, same molecular formula (checked); at most {most} per entry.
# Entries: {entries}; with isomers: {with_isomers}; isomers: {count} ({kinds})
# Columns: id\tisomer_smiles\thow
"""


def main():
    import rdkit
    rows, entries = [], 0
    for entry_id, smiles in read_entries():
        entries += 1
        rows += [(entry_id, s, how) for s, how in isomers(smiles).items()]
    kinds = {"ring move": sum("moved" in h and "branch" not in h for *_, h in rows),
             "swap": sum("swapped" in h for *_, h in rows), "chain": sum("branch" in h for *_, h in rows)}
    header = HEADER.format(rdkit=rdkit.__version__, most=MAX_PER_ENTRY, entries=entries,
                           with_isomers=len({r[0] for r in rows}), count=len(rows),
                           kinds=", ".join(f"{k} {v}" for k, v in kinds.items()))
    OUTPUT.write_text(header + "".join("\t".join(r) + "\n" for r in rows), encoding="utf-8")
    print(f"{entries} entries, {len({r[0] for r in rows})} with isomers, {len(rows)} isomers, {kinds}")


if __name__ == "__main__":
    main()
