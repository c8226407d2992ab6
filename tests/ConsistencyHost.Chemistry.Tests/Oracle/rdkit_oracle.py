"""Prints RDKit's formula, exact mass and symmetry-class ranks for each molecule of a .smi file.

Output, one line per input line, tab-separated:
  name  OK  formula  exact_mass  ranks(comma-separated, atom order of the input)
  name  FAIL
Ranks come from Chem.CanonicalRankAtoms(mol, breakTies=False, includeChirality=False): the
constitutional (stereo-free) refined partition that our HeavyAtomClasses are compared with.

With "sdf" as first argument it writes instead, for every molecule RDKit parses, a V2000 molfile with
2D coordinates and wedges (Chem.MolToMolBlock after rdDepictor.Compute2DCoords) and the input line number
as data item <LINE>, for the molfile round-trip test.
"""
import sys

from rdkit import Chem, RDLogger
from rdkit.Chem import Descriptors, rdDepictor, rdMolDescriptors


def main(path):
    RDLogger.DisableLog("rdApp.*")
    out = sys.stdout
    with open(path, encoding="utf-8") as handle:
        for number, line in enumerate(handle, 1):
            parts = line.split()
            if not parts:
                continue
            name = parts[1] if len(parts) > 1 else str(number)
            mol = Chem.MolFromSmiles(parts[0])
            if mol is None:
                out.write(f"{name}\tFAIL\n")
                continue
            formula = rdMolDescriptors.CalcMolFormula(mol)
            mass = Descriptors.ExactMolWt(mol)
            ranks = Chem.CanonicalRankAtoms(mol, breakTies=False, includeChirality=False)
            out.write(f"{name}\tOK\t{formula}\t{mass:.8f}\t{','.join(str(r) for r in ranks)}\n")


def sdf(path):
    RDLogger.DisableLog("rdApp.*")
    out = sys.stdout
    with open(path, encoding="utf-8") as handle:
        for number, line in enumerate(handle, 1):
            parts = line.split()
            mol = Chem.MolFromSmiles(parts[0]) if parts else None
            if mol is None:
                continue
            rdDepictor.Compute2DCoords(mol)
            out.write(Chem.MolToMolBlock(mol))
            out.write(f"> <LINE>\n{number}\n\n$$$$\n")


if __name__ == "__main__":
    if sys.argv[1] == "sdf":
        sdf(sys.argv[2])
    else:
        main(sys.argv[1])
