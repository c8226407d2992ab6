using ConsistencyHost.Spectra.Model;

namespace ConsistencyHost.Spectra.Tests.Model;

public sealed class MultiplicityTests
{
    // Source: reference notes §5.3 vocabulary (derived from Acta Chim. Slov. and PMC tables); line counts by the
    // n + 1 rule (Common practice).
    [Theory]
    [InlineData("s", "s", "", 0)]
    [InlineData("d", "d", "2", 1)]
    [InlineData("dd", "dd", "2,2", 2)]
    [InlineData("td", "td", "3,2", 2)]
    [InlineData("ddd", "ddd", "2,2,2", 3)]
    [InlineData("dq", "dq", "2,4", 2)]
    [InlineData("qd", "qd", "4,2", 2)]
    [InlineData("tt", "tt", "3,3", 2)]
    [InlineData("quint", "quint", "5", 1)]
    [InlineData("p", "quint", "5", 1)]
    [InlineData("pent", "quint", "5", 1)]
    [InlineData("quintet", "quint", "5", 1)]
    [InlineData("sext", "sext", "6", 1)]
    [InlineData("sept", "sept", "7", 1)]
    [InlineData("hept", "sept", "7", 1)]
    [InlineData("br s", "br s", "", 0)]
    [InlineData("bs", "br s", "", 0)]
    [InlineData("br. s", "br s", "", 0)]
    [InlineData("ls", "br s", "", 0)]
    [InlineData("br. t", "br t", "3", 1)]
    [InlineData("app t", "app t", "3", 1)]
    [InlineData("apparent q", "app q", "4", 1)]
    [InlineData("dquint", "dquint", "2,5", 2)]
    // Common practice (issue 13): pseudo-triplets are apparent triplets, never a quintet of triplets.
    [InlineData("pt", "app t", "3", 1)]
    [InlineData("ps t", "app t", "3", 1)]
    [InlineData("ps. t", "app t", "3", 1)]
    [InlineData("pseudo-t", "app t", "3", 1)]
    [InlineData("pseudo t", "app t", "3", 1)]
    [InlineData("pseudo-triplet", "app t", "3", 1)]
    // Common practice: splittings written with blanks or "of".
    [InlineData("sept d", "septd", "7,2", 2)]
    [InlineData("sept of d", "septd", "7,2", 2)]
    [InlineData("d of d", "dd", "2,2", 2)]
    [InlineData("doublet of doublets", "dd", "2,2", 2)]
    [InlineData("triplet of doublets", "td", "3,2", 2)]
    // Common practice: broad with the blank left out (published corpus rows si-027, si-095).
    [InlineData("bd", "br d", "2", 1)]
    [InlineData("brd", "br d", "2", 1)]
    [InlineData("brt", "br t", "3", 1)]
    public void Parse_FirstOrderText_GivesComponentsAndJCount(string text, string canonical, string lines, int jCount)
    {
        var m = Multiplicity.Parse(text);
        Assert.Equal(canonical, m.Canonical);
        Assert.Equal(lines, string.Join(',', m.Components));
        Assert.Equal(jCount, m.ExpectedCouplingCount());
    }

    // Common practice: m and second-order labels carry no first-order J count.
    [Theory]
    [InlineData("m", false, null)]
    [InlineData("multiplet", false, null)]
    [InlineData("overlapped", false, null)]
    [InlineData("br", false, null)]
    [InlineData("ABq", true, "ABq")]
    [InlineData("AB", true, "AB")]
    [InlineData("ABX", true, "ABX")]
    [InlineData("AA'BB'", true, "AA'BB'")]
    public void Parse_NonFirstOrder_HasNoJCount(string text, bool secondOrder, string? label)
    {
        var m = Multiplicity.Parse(text);
        Assert.True(m.IsRecognised);
        Assert.Null(m.ExpectedCouplingCount());
        Assert.Equal(secondOrder, m.SecondOrderLabel is not null);
        Assert.Equal(label, m.SecondOrderLabel);
    }

    // Common practice: a partly resolved pattern (doublet of multiplets …) keeps its resolved splittings but, like m,
    // implies no first-order J count.
    [Theory]
    [InlineData("dm", "dm", "2", false)]
    [InlineData("tm", "tm", "3", false)]
    [InlineData("qm", "qm", "4", false)]
    [InlineData("ddm", "ddm", "2,2", false)]
    [InlineData("br dm", "br dm", "2", true)]
    public void Parse_PartlyResolved_KeepsSplittingsWithoutJCount(string text, string canonical, string lines, bool broad)
    {
        var m = Multiplicity.Parse(text);
        Assert.True(m.IsRecognised && m.IsMultiplet);
        Assert.Equal((canonical, lines, broad), (m.Canonical, string.Join(',', m.Components), m.IsBroad));
        Assert.Null(m.ExpectedCouplingCount());
    }

    [Theory]
    [InlineData("dx")]
    [InlineData("ps")]
    [InlineData("pseudo-x")]
    [InlineData("d of")]
    [InlineData("brd s")]
    [InlineData("")]
    [InlineData("singlett")]
    public void TryParse_NotAMultiplicity_ReturnsFalse(string text) => Assert.False(Multiplicity.TryParse(text, out _));

    [Fact]
    public void Equals_SpellingsOfOneReading_AreEqual() => Assert.Equal(Multiplicity.Parse("bs"), Multiplicity.Parse("br s"));
}
