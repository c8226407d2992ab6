namespace ConsistencyHost.Rules.MassFormula;

/// <summary>The stable finding codes of the mass-formula rule.</summary>
public static class MassFormulaCodes
{
    /// <summary>The calculated m/z equals ours without the electron correction (cation: +mₑ per charge; anion: −mₑ).</summary>
    public const string ElectronMassOmitted = "electron-mass-omitted";

    /// <summary>The ion formula written after "calcd for" is not the structure's formula plus the stated adduct.</summary>
    public const string IonFormulaMismatch = "ion-formula-mismatch";

    /// <summary>The calculated m/z matches neither the stated ion of the structure nor the written ion formula.</summary>
    public const string CalculatedMassMismatch = "calculated-mass-mismatch";

    /// <summary>The ion label could not be read, or does not fit the structure; the calculated value is not checked.</summary>
    public const string IonNotRecognised = "ion-not-recognised";

    /// <summary>The found m/z is further from the calculated m/z than the profile's window.</summary>
    public const string FoundOutsideWindow = "found-outside-window";

    /// <summary>The stated molecular formula differs from the structure's formula.</summary>
    public const string FormulaMismatch = "formula-mismatch";

    /// <summary>The stated molecular formula cannot be read.</summary>
    public const string FormulaUnreadable = "formula-unreadable";

    /// <summary>The ion formula written after "calcd for" cannot be read; only the m/z value is checked.</summary>
    public const string IonFormulaUnreadable = "ion-formula-unreadable";
}
