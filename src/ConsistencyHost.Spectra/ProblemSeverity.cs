namespace ConsistencyHost.Spectra;

/// <summary>How serious a problem found while reading reported data is.</summary>
public enum ProblemSeverity
{
    /// <summary>Read anyway (lenient mode, or a recoverable oddity); the result may be incomplete.</summary>
    Warning = 1,
    /// <summary>The input could not be read as written; the result must not be trusted.</summary>
    Error = 2,
}

/// <summary>Strict reading fails on any unreadable fragment; lenient reading keeps what it could read.</summary>
public enum ReadMode
{
    /// <summary>Every unreadable fragment is an error and the result carries no spectra.</summary>
    Strict = 0,
    /// <summary>Every unreadable fragment is a warning; whatever could be read is returned.</summary>
    Lenient = 1,
}
