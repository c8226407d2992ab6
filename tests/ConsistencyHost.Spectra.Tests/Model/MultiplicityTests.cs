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

    [Theory]
    [InlineData("dx")]
    [InlineData("brd s")]
    [InlineData("")]
    [InlineData("singlett")]
    public void TryParse_NotAMultiplicity_ReturnsFalse(string text) => Assert.False(Multiplicity.TryParse(text, out _));

    [Fact]
    public void Equals_SpellingsOfOneReading_AreEqual() => Assert.Equal(Multiplicity.Parse("bs"), Multiplicity.Parse("br s"));
}
