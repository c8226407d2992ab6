using ConsistencyHost.Engine.Reports;
using ConsistencyHost.Sdk.Entries;
using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Engine.Intake;

/// <summary>
/// Turns a submission into the immutable <see cref="Entry"/> rules see, reading every text it carries.
/// Unusable input throws <see cref="EntryInputException"/> naming the field and what was expected.
/// </summary>
public sealed class EntryIntake(IntakeLimits limits)
{
    /// <summary>Builds the entry or throws <see cref="EntryInputException"/>; reads text strictly when the submission asks.</summary>
    public Entry Build(EntrySubmission submission) => Build(submission, submission.StrictText ? null : []);

    /// <summary>
    /// Builds the entry or throws <see cref="EntryInputException"/>. With <paramref name="textNotes"/> reported text is
    /// read leniently and each unreadable fragment is added there as a finding; null reads strictly.
    /// </summary>
    public Entry Build(EntrySubmission submission, List<ReportedFinding>? textNotes)
    {
        CheckSizes(submission);
        var spectra = new List<Spectrum>();
        for (var i = 0; i < submission.Spectra.Count; i++)
        {
            spectra.Add(ReadSpectrum(submission.Spectra[i], $"spectra[{i}]", textNotes));
        }

        var hrms = new List<HrmsClaim>(submission.Hrms);
        for (var i = 0; i < submission.ReportedText.Count; i++)
        {
            var read = ReportedTextIntake.Read(submission.ReportedText[i], $"reported_text[{i}]", textNotes);
            spectra.AddRange(read.Spectra);
            hrms.AddRange(read.Hrms);
        }

        var structure = submission.Structure;
        if (submission.NmredataRecord is { } nmredata)
        {
            CheckLength(nmredata, "nmredata_record");
            var record = NmredataIntake.ReadOne(nmredata, "nmredata_record");
            spectra.AddRange(record.Spectra);
            structure ??= record.MolfileText.Length > 0 ? new StructureSource(StructureFormat.Molfile, record.MolfileText) : null;
        }

        return new Entry
        {
            EntryId = submission.EntryId,
            Structure = structure,
            Molecule = structure is not null ? StructureIntake.Read(structure, limits.MaxAtoms) : null,
            Spectra = spectra,
            Claims = new EntryClaims
            {
                Formula = string.IsNullOrWhiteSpace(submission.Formula) ? null : submission.Formula.Trim(),
                Hrms = hrms,
            },
        };
    }

    private Spectrum ReadSpectrum(SpectrumSubmission input, string field, List<ReportedFinding>? textNotes)
    {
        var forms = (input.Signals is null ? 0 : 1) + (input.ReportedText is null ? 0 : 1) + (input.JcampDx is null ? 0 : 1);
        if (forms != 1)
        {
            throw new EntryInputException(field, "give exactly one of peaks, reported_text or jcamp_dx");
        }

        NumericRanges.CheckConditions(input, field);

        if (input.ReportedText is not null || input.JcampDx is not null)
        {
            var text = input.ReportedText ?? input.JcampDx!;
            var name = input.ReportedText is not null ? "reported_text" : "jcamp_dx";
            CheckLength(text, $"{field}.{name}");
            var read = input.ReportedText is not null
                ? ReportedTextIntake.ReadOne(text, $"{field}.{name}", textNotes)
                : JcampIntake.ReadOne(text, $"{field}.{name}");
            return Merge(read, input);
        }

        if (input.Signals!.Count > limits.MaxSignalsPerSpectrum)
        {
            throw new EntryInputException($"{field}.peaks", $"has {input.Signals.Count} peaks; the limit is {limits.MaxSignalsPerSpectrum}");
        }

        var nucleus = NucleusNames.Parse(input.Nucleus);
        if (nucleus == Nucleus.Unknown)
        {
            throw new EntryInputException($"{field}.nucleus", $"'{input.Nucleus}' is not a supported nucleus; expected 1H, 13C, 19F or 31P");
        }

        CheckSignals(input.Signals, $"{field}.peaks");
        return Merge(new Spectrum { Nucleus = nucleus, Signals = input.Signals }, input);
    }

    /// <summary>Values given beside the data win over values read from it; the nucleus must agree.</summary>
    private static Spectrum Merge(Spectrum read, SpectrumSubmission input) => read with
    {
        FrequencyMHz = input.FrequencyMHz ?? read.FrequencyMHz,
        Solvent = string.IsNullOrWhiteSpace(input.Solvent) ? read.Solvent : input.Solvent.Trim(),
        TemperatureK = input.TemperatureK ?? read.TemperatureK,
    };

    private static void CheckSignals(IReadOnlyList<Signal> signals, string field)
    {
        for (var i = 0; i < signals.Count; i++)
        {
            var s = signals[i];
            var hasRange = s.RangeLowPpm is not null && s.RangeHighPpm is not null;
            if (s.ShiftPpm is null && !hasRange)
            {
                throw new EntryInputException($"{field}[{i}]", "needs shift_ppm or both range_low_ppm and range_high_ppm");
            }

            var values = new[] { s.ShiftPpm, s.RangeLowPpm, s.RangeHighPpm };
            if (values.Any(v => v is { } x && (!double.IsFinite(x) || x < -100 || x > 1000)))
            {
                throw new EntryInputException($"{field}[{i}]", "has a shift outside -100..1000 ppm or not a finite number");
            }

            NumericRanges.CheckPeak(s, $"{field}[{i}]");
        }
    }

    private void CheckSizes(EntrySubmission submission)
    {
        if (submission.EntryId.Length > limits.MaxEntryIdLength)
        {
            throw new EntryInputException("entry_id", $"is {submission.EntryId.Length} characters; the limit is {limits.MaxEntryIdLength}");
        }

        if (submission.Structure is { } structure)
        {
            if (string.IsNullOrWhiteSpace(structure.Text))
            {
                throw new EntryInputException(StructureField(structure), "is empty; expected a structure");
            }

            if (structure.Format == StructureFormat.Smiles && structure.Text.Length > limits.MaxSmilesLength)
            {
                throw new EntryInputException(StructureField(structure), $"is {structure.Text.Length} characters; the limit for a SMILES is {limits.MaxSmilesLength}");
            }

            if (structure.Text.Length > limits.MaxStructureLength)
            {
                throw new EntryInputException(StructureField(structure), $"is {structure.Text.Length} characters; the limit is {limits.MaxStructureLength}");
            }
        }

        // Name the field that carries the excess, so 30,000 text blocks are not reported under "spectra".
        if (submission.Spectra.Count + submission.ReportedText.Count > limits.MaxSpectra)
        {
            var field = submission.ReportedText.Count > submission.Spectra.Count ? "reported_text" : "spectra";
            throw new EntryInputException(field,
                $"the entry has {submission.Spectra.Count} spectra and {submission.ReportedText.Count} text blocks; the limit is {limits.MaxSpectra} together");
        }

        for (var i = 0; i < submission.Hrms.Count; i++)
        {
            NumericRanges.CheckHrms(submission.Hrms[i], $"claims.hrms[{i}]");
        }

        for (var i = 0; i < submission.ReportedText.Count; i++)
        {
            CheckLength(submission.ReportedText[i], $"reported_text[{i}]");
        }
    }

    private void CheckLength(string text, string field)
    {
        if (text.Length > limits.MaxTextLength)
        {
            throw new EntryInputException(field, $"is {text.Length} characters; the limit is {limits.MaxTextLength}");
        }
    }

    internal static string StructureField(StructureSource structure) =>
        structure.Format == StructureFormat.Smiles ? "structure.smiles" : "structure.molfile";
}
