"""Writes, for the first N molecules of a .smi file that RDKit parses, three SMILES of the same molecule:
RDKit's own atom order, a random atom order, and Kekule form (random order), each with the output atom order
(RDKit atom indices, _smilesAtomOutputOrder) so a reader can map atoms back.

Output, one line per molecule, tab-separated:
  name  smiles0  order0  smiles1  order1  smiles2  order2  ranks
ranks: Chem.CanonicalRankAtoms(breakTies=False, includeChirality=False) by RDKit atom index, so a reader can
compare classes up to the molecule's symmetry (which of two symmetric atoms is "first" is arbitrary).
"""
import random
import sys

from rdkit import Chem, RDLogger


def written(mol, **options):
    text = Chem.MolToSmiles(mol, canonical=False, **options)
    order = list(mol.GetPropsAsDict(True, True)["_smilesAtomOutputOrder"])
    return text, ",".join(str(i) for i in order)


def main(path, count):
    RDLogger.DisableLog("rdApp.*")
    random.seed(16)
    done = 0
    with open(path, encoding="utf-8") as handle:
        for number, line in enumerate(handle, 1):
            parts = line.split()
            mol = Chem.MolFromSmiles(parts[0]) if parts else None
            if mol is None:
                continue
            name = parts[1] if len(parts) > 1 else str(number)
            base = written(mol)
            shuffled = list(range(mol.GetNumAtoms()))
            random.shuffle(shuffled)
            renumbered = Chem.RenumberAtoms(mol, shuffled)
            randomised = written(renumbered)
            # map renumbered indices back to mol indices
            back = [shuffled[int(i)] for i in randomised[1].split(",")] if randomised[1] else []
            kek = Chem.Mol(renumbered)
            Chem.Kekulize(kek, clearAromaticFlags=True)
            kekule = written(kek, kekuleSmiles=True)
            kback = [shuffled[int(i)] for i in kekule[1].split(",")] if kekule[1] else []
            ranks = ",".join(str(r) for r in Chem.CanonicalRankAtoms(mol, breakTies=False, includeChirality=False))
            sys.stdout.write("\t".join([name, base[0], base[1], randomised[0], ",".join(map(str, back)), kekule[0], ",".join(map(str, kback)), ranks]) + "\n")
            done += 1
            if done >= count:
                break


if __name__ == "__main__":
    main(sys.argv[1], int(sys.argv[2]))
