namespace ConsistencyHost.StreamBench.Generation;

/// <summary>
/// One generated entry's content: a real structure (from the NCI set) with invented peak lists. These are
/// demo data made to put load on the host, not characterisation data of the compound.
/// </summary>
/// <param name="Name">Where the structure came from ("first_5K.smi line N").</param>
/// <param name="Molfile">The structure as a V2000 molfile.</param>
/// <param name="ProtonLine">A journal-style 1H line: one signal per NMR-equivalent hydrogen class.</param>
/// <param name="CarbonLine">A journal-style 13C line: one line per carbon class.</param>
/// <param name="Formula">The molecular formula (Hill order).</param>
internal sealed record DemoEntry(string Name, string Molfile, string ProtonLine, string CarbonLine, string Formula);
