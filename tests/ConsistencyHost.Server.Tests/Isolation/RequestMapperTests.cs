using ConsistencyHost.Contract.Mapping;
using ConsistencyHost.Server.Tests.EndToEnd;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>The host sends a worker the submission mapped back onto the wire request; the worker maps it forward again.</summary>
public sealed class RequestMapperTests
{
    [Fact]
    public void ToRequest_SubmissionFromWire_RoundTripsToSameRequest()
    {
        var original = Requests.MissingSolvent("RT-1");
        original.ReportedText.Add("HRMS (ESI) m/z: [M+H]+ calcd for C9H11O2 151.0754; found 151.0752.");
        // Masses from NIST atomic masses (C9H10O2 + H+ = 151.0754, + Na+ = 173.0573); only the round trip is checked.
        original.Claims = new Contract.V1.Claims { Formula = "C9H10O2" };
        original.Claims.Hrms.Add(new Contract.V1.HrmsClaim { Ionisation = "ESI", Ion = "[M+Na]+", IonFormula = "C9H10NaO2", CalculatedMz = 173.0573, FoundMz = 173.0571 });
        original.Spectra.Add(new Contract.V1.SpectrumInput { Nucleus = "13C", FrequencyMhz = 101, Solvent = "CDCl3", ReportedText = "13C NMR δ 196.8, 163.5." });

        var roundTripped = RequestMapper.ToRequest(SubmissionMapper.ToSubmission(original));

        Assert.Equal(original, roundTripped);
    }
}
