using ConsistencyHost.Contract.V1;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>Requests used by the end-to-end tests (invented entry ids; real compounds).</summary>
internal static class Requests
{
    /// <summary>4'-Methoxyacetophenone; the 1H spectrum lacks its solvent (values typical, from memory).</summary>
    public static CheckEntryRequest MissingSolvent(string entryId = "AIS-LQ-E001")
    {
        var request = new CheckEntryRequest { EntryId = entryId, Structure = new Structure { Smiles = "COc1ccc(cc1)C(C)=O" } };
        var spectrum = new SpectrumInput { Nucleus = "1H", FrequencyMhz = 400, Peaks = new PeakList() };
        spectrum.Peaks.Peaks.Add(new Peak { ShiftPpm = 3.87, Multiplicity = "s", ProtonCount = 3 });
        request.Spectra.Add(spectrum);
        return request;
    }

    /// <summary>The same compound with a complete header.</summary>
    public static CheckEntryRequest Complete(string entryId = "AIS-LQ-E002")
    {
        var request = MissingSolvent(entryId);
        request.Spectra[0].Solvent = "CDCl3";
        return request;
    }

    /// <summary>A spectrum whose nucleus the host does not know.</summary>
    public static CheckEntryRequest UnknownNucleus(string entryId = "AIS-LQ-E003")
    {
        var request = Complete(entryId);
        request.Spectra[0].Nucleus = "77Se";
        return request;
    }
}
