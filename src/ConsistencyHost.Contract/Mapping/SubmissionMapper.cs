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
        Formula = request.Claims?.Formula,
        Profile = request.Profile,
    };

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
