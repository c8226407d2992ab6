#!/usr/bin/python3
"""Writes the seed corpora fuzz/corpus/<reader>/ from the test tables, the samples and the published-impurity fixture.

String literals (regular, verbatim, raw; adjacent literals joined by '+') are taken from the reader test files and
sorted to a reader by what they contain. With Debian's python3-rdkit, a few RDKit-written molfiles and one SD file of
NCI structures are added. Re-running gives the same files (names are content hashes), so the corpus can be committed.
"""
import hashlib, json, os, re, shutil, sys

ROOT = os.path.abspath(os.path.join(os.path.dirname(__file__), '..'))
OUT = os.path.join(ROOT, 'fuzz', 'corpus')
MAX_SEED = 8192  # AFL mutates small seeds faster; every test fixture fits under this.
# House rule: these are never a parsed structure, even in a fuzz seed (water, methanol, ethanol, dimethyl ether, C5H12).
BARRED = {'O', '[OH2]', 'CO', 'OC', 'CCO', 'OCC', 'C(O)C', 'COC', 'CCCCC', 'CCC(C)C', 'CC(C)CC', 'CC(C)(C)C', 'C(C)(C)(C)C'}

def literals(source):
    """Yields the C# string literals of a file, with adjacent literals joined by '+' merged."""
    pattern = re.compile(r'\$*("{3,})(.*?)\1|\$?@"((?:[^"]|"")*)"|\$?"((?:[^"\\\n]|\\.)*)"', re.S)
    pieces = []
    for m in pattern.finditer(source):
        if m.group(1):
            text = raw(m.group(2))
        elif m.group(3) is not None:
            text = m.group(3).replace('""', '"')
        else:
            text = unescape(m.group(4))
        if pieces and re.fullmatch(r'\s*\+\s*', source[pieces[-1][1]:m.start()]):
            pieces[-1] = (pieces[-1][0] + text, m.end())
        else:
            pieces.append((text, m.end()))
    return [p[0] for p in pieces]

def raw(body):
    lines = body.split('\n')
    if len(lines) == 1:
        return body
    indent = len(lines[-1]) - len(lines[-1].lstrip())
    return '\n'.join(l[indent:] for l in lines[1:-1])

def unescape(s):
    table = {'n': '\n', 'r': '\r', 't': '\t', '0': '\0', '\\': '\\', '"': '"', "'": "'"}
    out, i = [], 0
    while i < len(s):
        if s[i] == '\\' and i + 1 < len(s):
            c = s[i + 1]
            if c == 'u' and i + 5 < len(s):
                out.append(chr(int(s[i + 2:i + 6], 16))); i += 6; continue
            out.append(table.get(c, c)); i += 2; continue
        out.append(s[i]); i += 1
    return ''.join(out)

def files(folder, suffix='.cs'):
    for base, _, names in os.walk(os.path.join(ROOT, folder)):
        for n in sorted(names):
            if n.endswith(suffix):
                yield os.path.join(base, n)

def reader_of(text, chemistry):
    if 'NMREDATA' in text:
        return 'nmredata'
    if '##' in text:
        return 'jcamp'
    if chemistry and '$$$$' in text:
        return 'sdf'
    if chemistry and ('M  END' in text or 'V2000' in text or 'V3000' in text):
        return 'molfile'
    if not chemistry and ('NMR' in text or 'HRMS' in text or 'δ' in text):
        return 'reported'
    if chemistry and 0 < len(text) <= 200 and not re.search(r'[\s{]', text) and re.search(r'[A-Za-z\[]', text):
        return 'smiles'
    return None

def rdkit_seeds(seeds):
    try:
        from rdkit import Chem, RDLogger
        from rdkit.Chem import rdDepictor
    except ImportError:
        print('python3-rdkit not found: no RDKit-written molfiles', file=sys.stderr)
        return
    RDLogger.DisableLog('rdApp.*')
    nci = '/usr/share/RDKit/Data/NCI/first_5K.smi'
    lines = open(nci).read().split('\n')[::250] if os.path.exists(nci) else []
    records = []
    for line in lines:
        mol = Chem.MolFromSmiles(line.split()[0]) if line.strip() else None
        if mol is None:
            continue
        rdDepictor.Compute2DCoords(mol)
        block = Chem.MolToMolBlock(mol)
        seeds.append(('molfile', block))
        seeds.append(('smiles', line.split()[0]))
        records.append(block + '$$$$\n')
    seeds.append(('molfile', Chem.MolToMolBlock(Chem.MolFromSmiles('C[C@H](N)C(=O)O'), forceV3000=True)))
    seeds.append(('sdf', ''.join(records[:5])))

def main():
    seeds = []
    for path in files('tests/ConsistencyHost.Chemistry.Tests'):
        seeds += [(r, t) for t in literals(open(path, encoding='utf-8').read()) if (r := reader_of(t, True))]
    for path in files('tests/ConsistencyHost.Spectra.Tests'):
        seeds += [(r, t) for t in literals(open(path, encoding='utf-8').read()) if (r := reader_of(t, False))]
    for path in files('samples/entries', '.json'):
        entry = json.load(open(path, encoding='utf-8'))
        seeds += [('reported', t) for t in entry.get('reportedText', [])]
        if 'smiles' in entry.get('structure', {}):
            seeds.append(('smiles', entry['structure']['smiles']))
    for line in open(os.path.join(ROOT, 'tests/ConsistencyHost.Rules.Tests/Fixtures/published-impurities.tsv'), encoding='utf-8'):
        cells = line.rstrip('\n').split('\t')
        if not line.startswith('#') and len(cells) == 4:
            seeds += [('smiles', cells[2]), ('reported', cells[3])]
    rdkit_seeds(seeds)
    # A molfile followed by a data item and "$$$$" is a one-record SD file.
    seeds += [('sdf', t.rstrip('\n') + '\n> <ID>\nrecord\n\n$$$$\n') for r, t in list(seeds) if r == 'molfile']
    shutil.rmtree(OUT, ignore_errors=True)
    counts = {}
    for reader, text in seeds:
        data = text.encode('utf-8')
        if not data or len(data) > MAX_SEED or (reader == 'smiles' and text in BARRED):
            continue
        folder = os.path.join(OUT, reader)
        os.makedirs(folder, exist_ok=True)
        name = os.path.join(folder, hashlib.sha1(data).hexdigest()[:16])
        if not os.path.exists(name):
            open(name, 'wb').write(data)
            counts[reader] = counts.get(reader, 0) + 1
    for reader in sorted(counts):
        print(f'{reader}: {counts[reader]} seeds')

main()
