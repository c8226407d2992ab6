using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Intake;

/// <summary>Reads reported characterisation text into spectra (the journal-text reader lands here).</summary>
internal static class ReportedTextIntake
{
    public static IReadOnlyList<Spectrum> Read(string text, string field) =>
        throw new EntryInputException(field, "reported text cannot be read yet by this version; send structured peaks");

    public static Spectrum ReadOne(string text, string field) =>
        throw new EntryInputException(field, "reported text cannot be read yet by this version; send structured peaks");
}

/// <summary>Reads a JCAMP-DX peak table into a spectrum (the JCAMP-DX reader lands here).</summary>
internal static class JcampIntake
{
    public static Spectrum ReadOne(string text, string field) =>
        throw new EntryInputException(field, "JCAMP-DX cannot be read yet by this version; send structured peaks");
}
