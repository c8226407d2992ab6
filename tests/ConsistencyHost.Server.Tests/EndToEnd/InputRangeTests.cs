using ConsistencyHost.Contract.V1;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// Numbers a broken export can carry (NaN, infinities, negatives), a malformed SMILES and too many text blocks are
/// refused through the real host with INVALID_ARGUMENT and the path of the field at fault, never checked as if valid.
/// </summary>
public sealed class InputRangeTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);

    private static readonly (string Field, Action<CheckEntryRequest> Break)[] Cases =
    [
        ("spectra[0].frequency_mhz", r => r.Spectra[0].FrequencyMhz = double.NaN),
        ("spectra[0].frequency_mhz", r => r.Spectra[0].FrequencyMhz = -400),
        ("spectra[0].temperature_k", r => r.Spectra[0].TemperatureK = -25),
        ("spectra[0].temperature_k", r => r.Spectra[0].TemperatureK = double.PositiveInfinity),
        ("spectra[0].peaks[0].proton_count", r => r.Spectra[0].Peaks.Peaks[0].ProtonCount = -3),
        ("spectra[0].peaks[0].integral", r => r.Spectra[0].Peaks.Peaks[0].Integral = double.NaN),
        ("spectra[0].peaks[0].couplings_hz[1]", r => r.Spectra[0].Peaks.Peaks[0].CouplingsHz.Add([7.1, double.NaN])),
        ("spectra[0].peaks[0].carbon_count", r => r.Spectra[0].Peaks.Peaks[0].CarbonCount = -1),
        ("claims.hrms[0].found_mz", r => r.Claims = new Claims { Hrms = { new HrmsClaim { Ion = "[M+H]+", IonFormula = "C9H11O2", CalculatedMz = 151.0754, FoundMz = double.NaN } } }),
        // Empty nested branches: RDKit (python3-rdkit) refuses this SMILES too; read leniently it would be ethane.
        ("structure.smiles", r => r.Structure.Smiles = "C(((((C)))))"),
        // 40 text blocks and one spectrum: the excess is in reported_text, so that is the field named.
        ("reported_text", r => r.ReportedText.Add(Enumerable.Repeat("1H NMR (400 MHz, CDCl3) δ 3.87 (s, 3H).", 40))),
    ];

    [Fact]
    public async Task CheckEntry_OutOfRangeOrMalformedField_IsInvalidArgumentNamingTheField()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);
        var wrong = new List<string>();

        foreach (var (field, breakIt) in Cases)
        {
            var request = Requests.Complete();
            breakIt(request);
            try
            {
                await client.CheckEntryAsync(request, deadline: DateTime.UtcNow + CallTimeout);
                wrong.Add($"{field}: accepted");
            }
            catch (RpcException error) when (error.StatusCode == StatusCode.InvalidArgument)
            {
                if (error.Trailers.GetValue("field") != field || !error.Status.Detail.StartsWith($"{field}: ", StringComparison.Ordinal))
                {
                    wrong.Add($"{field}: got field '{error.Trailers.GetValue("field")}', '{error.Status.Detail}'");
                }
            }
        }

        Assert.True(wrong.Count == 0, string.Join(Environment.NewLine, wrong));
    }

    [Fact]
    public async Task CheckEntry_ValuesInsideTheRanges_AreAccepted()
    {
        await using var host = await RunningHost.StartAsync(["ConsistencyHost.Rules.SpectrumMetadata"]);
        var client = new EntryCheck.EntryCheckClient(host.Channel);
        var request = Requests.Complete();
        request.Spectra[0].TemperatureK = 298;
        request.Spectra[0].Peaks.Peaks[0].CouplingsHz.Add(0.0);

        var reply = await client.CheckEntryAsync(request, deadline: DateTime.UtcNow + CallTimeout);

        Assert.Equal("AIS-LQ-E002", reply.EntryId);
    }
}
