namespace ConsistencyHost.Spectra.Model;

/// <summary>
/// One high-resolution mass claim as written: "HRMS (ESI) m/z: [M + H]+ calcd for C10H14NO2 180.1019; found 180.1016".
/// </summary>
/// <param name="Ionisation">The ionisation named in parentheses ("ESI", "ESI-TOF", "APCI"); null when absent.</param>
/// <param name="IonLabel">The ion with blanks removed ("[M+H]+", "[M+Na]+", "M+•"); null when absent.</param>
/// <param name="IonFormula">The formula after "calcd for", exactly as written ("C10H14NO2", "C12H15NO3Na").</param>
/// <param name="CalculatedMz">The author's calculated m/z.</param>
/// <param name="FoundMz">The measured m/z; null when the line gives none.</param>
/// <param name="CalculatedDecimals">Decimal places written for the calculated value (rounding checks).</param>
/// <param name="FoundDecimals">Decimal places written for the found value; 0 when absent.</param>
/// <param name="SourceOffset">Character offset of "HRMS" in the source text.</param>
public sealed record HrmsClaim(
    string? Ionisation,
    string? IonLabel,
    string IonFormula,
    double CalculatedMz,
    double? FoundMz,
    int CalculatedDecimals,
    int FoundDecimals,
    int SourceOffset);
