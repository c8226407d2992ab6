using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Intake;

/// <summary>Reads a JCAMP-DX peak table into a spectrum.</summary>
internal static class JcampIntake
{
    public static Spectrum ReadOne(string text, string field) =>
        throw new EntryInputException(field, "JCAMP-DX cannot be read by this version yet; send structured peaks or reported text");
}
