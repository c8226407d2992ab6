using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Nmredata;

/// <summary>An atom named by an assignment: atom <see cref="AtomNumber"/> itself, or the hydrogens on it ("H5").</summary>
public readonly record struct NmredataAtom(int AtomNumber, bool IsImplicitHydrogen)
{
    /// <inheritdoc />
    public override string ToString() => IsImplicitHydrogen ? "H" + AtomNumber : AtomNumber.ToString(System.Globalization.CultureInfo.InvariantCulture);
}

/// <summary>One NMREDATA_ASSIGNMENT line: label, shift (null for the 777.777 "unknown" marker) and atoms.</summary>
public sealed record NmredataAssignment(string Label, double? ShiftPpm, IReadOnlyList<NmredataAtom> Atoms, int Line);

/// <summary>One NMREDATA_J line: a coupling between two assignment labels.</summary>
public sealed record NmredataCoupling(string Label1, string Label2, double Hz, int? BondCount, int Line);

/// <summary>One SD record: the MOL block kept as text, and the NMReDATA tags read from it.</summary>
public sealed record NmredataRecord
{
    /// <summary>The MOL block up to and including "M  END", as raw molfile text.</summary>
    public string MolfileText { get; init; } = "";

    /// <summary>NMREDATA_VERSION ("1.1"); null when absent.</summary>
    public string? Version { get; init; }

    /// <summary>NMREDATA_FORMULA; null when absent.</summary>
    public string? Formula { get; init; }

    /// <summary>NMREDATA_SMILES; null when absent.</summary>
    public string? Smiles { get; init; }

    /// <summary>NMREDATA_SOLVENT, normalised when known ("CDCl3"), else as written.</summary>
    public string? Solvent { get; init; }

    /// <summary>NMREDATA_TEMPERATURE in kelvin.</summary>
    public double? TemperatureK { get; init; }

    /// <summary>NMREDATA_ASSIGNMENT lines.</summary>
    public IReadOnlyList<NmredataAssignment> Assignments { get; init; } = [];

    /// <summary>NMREDATA_J lines.</summary>
    public IReadOnlyList<NmredataCoupling> Couplings { get; init; } = [];

    /// <summary>Spectra from NMREDATA_1D_* tags, in file order.</summary>
    public IReadOnlyList<Spectrum> Spectra { get; init; } = [];

    /// <summary>The tag each spectrum came from ("NMREDATA_1D_1H", "NMREDATA_1D_13C#2"), parallel to <see cref="Spectra"/>.</summary>
    public IReadOnlyList<string> SpectrumTags { get; init; } = [];

    /// <summary>Every data item's logical lines by tag name, comments removed (2D tags, ID, LEVEL …).</summary>
    public IReadOnlyDictionary<string, IReadOnlyList<string>> Tags { get; init; } = new Dictionary<string, IReadOnlyList<string>>();

    /// <summary>The assignment for <paramref name="label"/>, or null.</summary>
    public NmredataAssignment? Assignment(string label) => Assignments.FirstOrDefault(a => a.Label == label);
}

/// <summary>What <see cref="NmredataReader"/> read.</summary>
public sealed record NmredataResult
{
    /// <summary>The records in file order.</summary>
    public IReadOnlyList<NmredataRecord> Records { get; init; } = [];

    /// <summary>Every problem, in line order.</summary>
    public IReadOnlyList<NmredataProblem> Problems { get; init; } = [];

    /// <summary>True when no problem is an error.</summary>
    public bool Succeeded => Problems.All(p => p.Severity != ProblemSeverity.Error);
}
