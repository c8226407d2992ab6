using System.Globalization;
using BenchmarkDotNet.Attributes;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Benchmarks.Text;

/// <summary>
/// Reading one typical 25-signal 1H line, against a trivial scan of the same line measured in the same run:
/// the ratio of the two is what bench/baseline.json guards, since absolute times swing with machine load.
/// </summary>
[BenchmarkCategory("text")]
public class ReportedTextBenchmarks
{
    /// <summary>
    /// 25 signals in journal style, built from the strychnine and Boc-Phe-Leu-OMe lists of the entry mix
    /// (a parsing workload, not one compound's spectrum).
    /// </summary>
    public const string TypicalLine =
        "1H NMR (400 MHz, CDCl3) δ 8.09 (d, J = 7.9 Hz, 1H), 7.29 (t, J = 7.3 Hz, 2H), 7.24 (td, J = 7.7, 1.2 Hz, 1H), 7.19 (d, J = 7.1 Hz, 2H), 7.09 (td, J = 7.5, 1.0 Hz, 1H), 6.28 (d, J = 8.1 Hz, 1H, NH), 5.89 (m, 1H), 4.98 (br s, 1H), 4.57 (td, J = 8.5, 5.0 Hz, 1H), 4.28 (dt, J = 8.4, 3.3 Hz, 1H), 4.14 (dd, J = 13.8, 7.0 Hz, 1H), 4.05 (dd, J = 13.8, 5.8 Hz, 1H), 3.86 (d, J = 10.5 Hz, 1H), 3.70 (s, 3H, OCH3), 3.12 (dd, J = 17.4, 8.5 Hz, 1H), 3.03 (dd, J = 13.8, 7.3 Hz, 1H), 2.73 (d, J = 14.8 Hz, 1H), 2.67 (dd, J = 17.4, 3.3 Hz, 1H), 2.36 (dt, J = 14.3, 4.3 Hz, 1H), 1.87 (m, 2H), 1.62–1.52 (m, 2H), 1.40 (s, 9H), 1.27 (dt, J = 10.4, 3.3 Hz, 1H), 0.90 (d, J = 6.2 Hz, 3H), 0.88 (d, J = 6.3 Hz, 3H).";

    [GlobalSetup]
    public void Setup()
    {
        var read = ReportedTextReader.Read(TypicalLine);
        if (!read.Succeeded || read.Spectra.Count != 1 || read.Spectra[0].Signals.Count != 25)
        {
            throw new InvalidOperationException("the typical line must read as one spectrum of 25 signals");
        }
    }

    /// <summary>The reader on the line (strict mode, the engine's mode).</summary>
    [Benchmark]
    public int Read() => ReportedTextReader.Read(TypicalLine).Spectra[0].Signals.Count;

    /// <summary>
    /// A trivial pass over the same characters: every number parsed as a double and summed. A floor for any
    /// reader that looks at each character and converts each number once.
    /// </summary>
    [Benchmark(Baseline = true)]
    public double TrivialScan()
    {
        var span = TypicalLine.AsSpan();
        var sum = 0.0;
        var i = 0;
        while (i < span.Length)
        {
            if (!char.IsAsciiDigit(span[i])) { i++; continue; }
            var start = i;
            while (i < span.Length && (char.IsAsciiDigit(span[i]) || span[i] == '.')) i++;
            if (double.TryParse(span[start..i], NumberStyles.Float, CultureInfo.InvariantCulture, out var value)) sum += value;
        }

        return sum;
    }
}
