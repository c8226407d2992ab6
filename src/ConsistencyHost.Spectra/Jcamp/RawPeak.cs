namespace ConsistencyHost.Spectra.Jcamp;

/// <summary>One tuple as stored, before XFACTOR/YFACTOR and unit conversion.</summary>
internal sealed record RawPeak(int Line, int Column, double X, double? Y, double? W, string? M, string? Assignment);
