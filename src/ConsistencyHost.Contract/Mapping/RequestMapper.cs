using ConsistencyHost.Contract.V1;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Contract.Mapping;

/// <summary>
/// Maps an engine submission back onto the wire request: the host sends an entry to a worker process this
/// way, and the worker reads it with <see cref="SubmissionMapper"/> and the same intake as the host. Every
/// field <see cref="SubmissionMapper"/> reads is written, so the round trip keeps what intake sees.
/// </summary>
public static class RequestMapper
{
    /// <summary>Maps one submission.</summary>
    public static CheckEntryRequest ToRequest(EntrySubmission submission)
    {
        var request = new CheckEntryRequest
        {
            EntryId = submission.EntryId,
            Structure = ToStructure(submission.Structure),
            Profile = submission.Profile ?? "",
            NmredataRecord = submission.NmredataRecord ?? "",
        };
        request.ReportedText.AddRange(submission.ReportedText);
        request.Spectra.AddRange(submission.Spectra.Select(ToSpectrum));
        if (submission.Formula is not null || submission.Hrms.Count > 0)
        {
            request.Claims = new Claims { Formula = submission.Formula ?? "" };
            request.Claims.Hrms.AddRange(submission.Hrms.Select(ToHrms));
        }

        return request;
    }

    private static Structure? ToStructure(StructureSource? source) => source?.Format switch
    {
        StructureFormat.Smiles => new Structure { Smiles = source.Text },
        StructureFormat.Molfile => new Structure { Molfile = source.Text },
        _ => null,
    };

    private static SpectrumInput ToSpectrum(SpectrumSubmission spectrum)
    {
        var input = new SpectrumInput
        {
            Nucleus = spectrum.Nucleus ?? "",
            FrequencyMhz = spectrum.FrequencyMHz,
            Solvent = spectrum.Solvent ?? "",
            TemperatureK = spectrum.TemperatureK,
        };
        if (spectrum.Signals is { } signals)
        {
            input.Peaks = new PeakList();
            input.Peaks.Peaks.AddRange(signals.Select(ToPeak));
        }
        else if (spectrum.ReportedText is { } text)
        {
            input.ReportedText = text;
        }
        else if (spectrum.JcampDx is { } jcamp)
        {
            input.JcampDx = jcamp;
        }

        return input;
    }

    private static Peak ToPeak(Signal signal)
    {
        var peak = new Peak
        {
            ShiftPpm = signal.ShiftPpm,
            RangeLowPpm = signal.RangeLowPpm,
            RangeHighPpm = signal.RangeHighPpm,
            Multiplicity = signal.Multiplicity,
            ProtonCount = signal.ProtonCount,
            Integral = signal.Integral,
            CarbonCount = signal.CarbonCount,
        };
        peak.CouplingsHz.AddRange(signal.Couplings.Select(c => c.Hz));
        peak.Notes.AddRange(signal.Notes);
        peak.Assignments.AddRange(signal.Assignments);
        return peak;
    }

    private static V1.HrmsClaim ToHrms(Spectra.Model.HrmsClaim claim) => new()
    {
        Ionisation = claim.Ionisation ?? "",
        Ion = claim.IonLabel ?? "",
        IonFormula = claim.IonFormula,
        CalculatedMz = claim.CalculatedMz,
        FoundMz = claim.FoundMz,
    };
}
