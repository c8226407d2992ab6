using Google.Protobuf;
using ConsistencyHost.Engine.Intake;
using ConsistencyHost.LoadGenerator.Entries;
using ConsistencyHost.Sdk.Entries;

namespace ConsistencyHost.LoadGenerator.Tests;

public sealed class WorkloadTests
{
    [Fact]
    public void FromEntryMix_EchoPayload_IsTheCheckRequestsBytes()
    {
        var workload = Workload.FromEntryMix();

        Assert.Equal(workload.Checks.Count, workload.Echoes.Count);
        for (var i = 0; i < workload.Checks.Count; i++)
        {
            Assert.Equal(workload.Checks[i].ToByteArray(), workload.Echoes[i].Payload.ToByteArray());
        }
    }

    [Fact]
    public void ToRequest_SmilesFormulaAndText_CarriesEachIntoItsField()
    {
        var request = Workload.ToRequest(new EntrySubmission
        {
            EntryId = "AIS-LQ-0001",
            Structure = new StructureSource(StructureFormat.Smiles, "CCOC(=O)C"),
            Formula = "C4H8O2",
            ReportedText = ["1H NMR (400 MHz, CDCl3) δ 4.12 (q, J = 7.1 Hz, 2H), 2.05 (s, 3H), 1.26 (t, J = 7.1 Hz, 3H)."],
        });

        Assert.Equal("AIS-LQ-0001", request.EntryId);
        Assert.Equal("CCOC(=O)C", request.Structure.Smiles);
        Assert.Equal("C4H8O2", request.Claims.Formula);
        Assert.Single(request.ReportedText);
    }

    [Fact]
    public void ToRequest_Molfile_IsRefusedNamingTheEntry()
    {
        var submission = new EntrySubmission { EntryId = "AIS-LQ-0002", Structure = new StructureSource(StructureFormat.Molfile, "\n\n\n  0  0  0  0  0  0  0  0  0  0999 V2000\nM  END\n") };

        var error = Assert.Throws<InvalidOperationException>(() => Workload.ToRequest(submission));

        Assert.StartsWith("entry AIS-LQ-0002: the load generator maps SMILES, formula and reported text only", error.Message, StringComparison.Ordinal);
    }
}
