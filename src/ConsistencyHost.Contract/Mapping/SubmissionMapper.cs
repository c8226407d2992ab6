using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Contract.Mapping;

/// <summary>Maps the wire request onto the engine's transport-neutral submission.</summary>
public static class SubmissionMapper
{
    /// <summary>Maps one request.</summary>
    public static EntrySubmission ToSubmission(CheckEntryRequest request) => new()
    {
        EntryId = request.EntryId,
        Structure = ToStructure(request.Structure),
        Spectra = [.. request.Spectra.Select(ToSpectrum)],
        ReportedText = [.. request.ReportedText],
        NmredataRecord = request.NmredataRecord.Length > 0 ? request.NmredataRecord : null,
        Formula = request.Claims?.Formula,
        Hrms = request.Claims is null ? [] : [.. request.Claims.Hrms.Select(ToHrms)],
        Profile = request.Profile,
        StrictText = request.StrictText,
    };

    private static Spectra.Model.HrmsClaim ToHrms(V1.HrmsClaim claim, int index) => new(
        Ionisation: claim.Ionisation.Length > 0 ? claim.Ionisation : null,
        IonLabel: claim.Ion.Length > 0 ? claim.Ion.Replace(" ", "", StringComparison.Ordinal) : null,
        IonFormula: claim.IonFormula,
        CalculatedMz: claim.CalculatedMz ?? throw new EntryInputException($"claims.hrms[{index}].calculated_mz", "is required; expected the calculated m/z as reported"),
        FoundMz: claim.FoundMz,
        CalculatedDecimals: Decimals(claim.CalculatedMz.Value),
        FoundDecimals: claim.FoundMz is { } found ? Decimals(found) : 0,
        SourceOffset: -1);

    /// <summary>Decimal places of the shortest text that round-trips the number (180.1019 → 4).</summary>
    private static int Decimals(double value)
    {
        var text = value.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        var dot = text.IndexOf('.', StringComparison.Ordinal);
        return dot < 0 || text.Contains('E', StringComparison.Ordinal) ? 0 : text.Length - dot - 1;
    }

    private static StructureSource? ToStructure(Structure? structure) => structure?.SourceCase switch
    {
        Structure.SourceOneofCase.Smiles => new StructureSource(StructureFormat.Smiles, structure.Smiles),
        Structure.SourceOneofCase.Molfile => new StructureSource(StructureFormat.Molfile, structure.Molfile),
        _ => null,
    };

    private static SpectrumSubmission ToSpectrum(SpectrumInput input) => new()
    {
        Nucleus = input.Nucleus,
        FrequencyMHz = input.FrequencyMhz,
        Solvent = input.Solvent,
        TemperatureK = input.TemperatureK,
        Signals = input.DataCase == SpectrumInput.DataOneofCase.Peaks ? [.. input.Peaks.Peaks.Select(ToSignal)] : null,
        ReportedText = input.DataCase == SpectrumInput.DataOneofCase.ReportedText ? input.ReportedText : null,
        JcampDx = input.DataCase == SpectrumInput.DataOneofCase.JcampDx ? input.JcampDx : null,
    };

    private static Signal ToSignal(Peak peak) => new()
    {
        ShiftPpm = peak.ShiftPpm,
        RangeLowPpm = peak.RangeLowPpm,
        RangeHighPpm = peak.RangeHighPpm,
        Multiplicity = peak.Multiplicity,
        Couplings = [.. peak.CouplingsHz.Select(hz => new Coupling(hz))],
        ProtonCount = peak.ProtonCount,
        Integral = peak.Integral,
        CarbonCount = peak.CarbonCount,
        Notes = [.. peak.Notes],
        Assignments = [.. peak.Assignments],
    };
}
