"""Probe-substitution oracle for CH2 topicity (nmr-methods.md §2.3, Algorithm B, with RDKit).

For each molecule of a .smi file: add H, embed in 3D (ETKDG, fixed seed), assign stereo from 3D, and write the
heavy-atom SMILES with that configuration. For every carbon with exactly two H, replace each H by 2H in turn,
re-assign stereo from 3D and compare canonical isomeric SMILES: identical → homotopic; identical after
inverting every tetrahedral centre → enantiotopic; otherwise diastereotopic.
Output per molecule: name, SMILES (non-canonical, atom order as written), then position:verdict pairs where
position is the atom's place in that SMILES and verdict is E (equivalent: homotopic or enantiotopic) or D.
A fourth column does the same for carbons: every carbon of each constitutional class (CanonicalRankAtoms
without chirality) is labelled 13C in turn and grouped by its canonical (or mirrored) SMILES; written as
"p q r:sizes" with the sub-class sizes joined by '+'. Positions count non-hydrogen atoms only (RDKit keeps an
[H] that carries double-bond stereo; our reader folds it).
"""
import sys

from rdkit import Chem, RDLogger
from rdkit.Chem import AllChem


def is_plain_hydrogen(atom):
    return atom.GetAtomicNum() == 1 and atom.GetIsotope() == 0


def canonical(mol):
    return Chem.MolToSmiles(Chem.RemoveHs(mol), isomericSmiles=True)


def mirrored(mol):
    copy = Chem.Mol(mol)
    for atom in copy.GetAtoms():
        tag = atom.GetChiralTag()
        if tag == Chem.ChiralType.CHI_TETRAHEDRAL_CW:
            atom.SetChiralTag(Chem.ChiralType.CHI_TETRAHEDRAL_CCW)
        elif tag == Chem.ChiralType.CHI_TETRAHEDRAL_CCW:
            atom.SetChiralTag(Chem.ChiralType.CHI_TETRAHEDRAL_CW)
    return canonical(copy)


def labelled(mol, hydrogen):
    copy = Chem.Mol(mol)
    copy.GetAtomWithIdx(hydrogen).SetIsotope(2)
    Chem.AssignStereochemistryFrom3D(copy, replaceExistingTags=True)
    return copy


def verdicts(mh):
    result = {}
    for atom in mh.GetAtoms():
        hs = [n.GetIdx() for n in atom.GetNeighbors() if n.GetAtomicNum() == 1]
        if atom.GetAtomicNum() != 6 or len(hs) != 2:
            continue
        a, b = labelled(mh, hs[0]), labelled(mh, hs[1])
        same = canonical(a) == canonical(b) or mirrored(a) == canonical(b)
        result[atom.GetIdx()] = "E" if same else "D"
    return result


def carbon_partitions(mh):
    """Per constitutional class of carbons: members and the sizes of their stereo-aware sub-classes. Sizes, not
    pairings, are compared: which of two diastereotopic methyls on one CH is which is arbitrary."""
    heavy_ranks = list(Chem.CanonicalRankAtoms(mh, breakTies=False, includeChirality=False))
    classes = {}
    for atom in mh.GetAtoms():
        if atom.GetAtomicNum() == 6:
            classes.setdefault(heavy_ranks[atom.GetIdx()], []).append(atom.GetIdx())
    result = []
    for members in classes.values():
        if len(members) < 2:
            continue
        groups = {}
        for member in members:
            labelled_copy = isotope_labelled(mh, member)
            key = min(canonical(labelled_copy), mirrored(labelled_copy))
            groups[key] = groups.get(key, 0) + 1
        result.append((members, sorted(groups.values())))
    return result


def isotope_labelled(mol, atom):
    copy = Chem.Mol(mol)
    copy.GetAtomWithIdx(atom).SetIsotope(13)
    Chem.AssignStereochemistryFrom3D(copy, replaceExistingTags=True)
    return copy


def main(path):
    RDLogger.DisableLog("rdApp.*")
    for number, line in enumerate(open(path, encoding="utf-8"), 1):
        parts = line.split()
        mol = Chem.MolFromSmiles(parts[0]) if parts else None
        if mol is None:
            continue
        mh = Chem.AddHs(mol)
        if AllChem.EmbedMolecule(mh, randomSeed=42) != 0:
            continue
        Chem.AssignStereochemistryFrom3D(mh)
        heavy = Chem.RemoveHs(mh)
        smiles = Chem.MolToSmiles(heavy, canonical=False)
        written = list(heavy.GetPropsAsDict(True, True)["_smilesAtomOutputOrder"])
        order = [i for i in written if not is_plain_hydrogen(heavy.GetAtomWithIdx(i))]
        pairs = ",".join(f"{order.index(i)}:{v}" for i, v in sorted(verdicts(mh).items()))
        carbons = ",".join(" ".join(str(order.index(m)) for m in members) + ":" + "+".join(map(str, sizes))
                           for members, sizes in carbon_partitions(mh))
        name = parts[1] if len(parts) > 1 else str(number)
        sys.stdout.write(f"{name}\t{smiles}\t{pairs}\t{carbons}\n")


if __name__ == "__main__":
    main(sys.argv[1])
