namespace ConsistencyHost.Spectra.Analysis.Interpretation;

/// <summary>What a reported signal is taken to be after interpretation.</summary>
public enum SignalRole
{
    /// <summary>A signal of the compound.</summary>
    Compound,
    /// <summary>The residual solvent line, reported among the compound's signals.</summary>
    ResidualSolvent,
    /// <summary>Water / HOD.</summary>
    Water,
    /// <summary>A group of a common impurity.</summary>
    Impurity,
    /// <summary>Marked by the author as another species (minor rotamer, minor isomer): not counted.</summary>
    MinorSpecies,
}
