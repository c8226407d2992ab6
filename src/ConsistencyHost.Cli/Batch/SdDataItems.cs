namespace ConsistencyHost.Cli.Batch;

/// <summary>
/// Data items of a plain SD record that <c>batch</c> reads (documented in README and docs/batch.md). Each holds
/// text as reported in the notebook; several lines are joined with a space. Other data items (registry numbers,
/// yields, …) are not characterisation data and are not read.
/// </summary>
internal static class SdDataItems
{
    /// <summary>The notebook's entry id; default: the record's title line, else "FILE record N".</summary>
    public const string EntryId = "ENTRY_ID";

    /// <summary>The 1H line as reported, e.g. "1H NMR (400 MHz, CDCl3) δ 7.26 (m, 5H), …".</summary>
    public const string Proton = "NMR_1H";

    /// <summary>The 13C line as reported.</summary>
    public const string Carbon = "NMR_13C";

    /// <summary>The HRMS line as reported, e.g. "HRMS (ESI) m/z: [M+H]+ calcd for C9H11O2 151.0754; found 151.0751."</summary>
    public const string Hrms = "HRMS";

    /// <summary>The molecular formula the entry states.</summary>
    public const string Formula = "FORMULA";

    /// <summary>Tags of this prefix make the record an NMReDATA record, passed whole to the engine.</summary>
    public const string NmredataPrefix = "NMREDATA_";

    /// <summary>Items whose text is reported characterisation data, in the order they are passed on.</summary>
    public static readonly string[] ReportedText = [Proton, Carbon, Hrms];
}
