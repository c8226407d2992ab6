using System.Globalization;
using ConsistencyHost.Spectra.Reported;

namespace ConsistencyHost.Spectra.Tests.Reported;

public sealed class TextCursorTests
{
    // Oracle: the runtime's correctly rounded double.Parse (IEEE 754 round-to-nearest).
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(3)]
    public void TryNumber_SeededDecimals_EqualsDoubleParse(int seed)
    {
        var random = new Random(seed);
        for (var i = 0; i < 20_000; i++)
        {
            var digits = random.Next(1, 19);
            var text = string.Concat(Enumerable.Range(0, digits).Select(_ => (char)('0' + random.Next(10))));
            var point = random.Next(digits + 1);
            if (point > 0 && point < digits) text = text.Insert(point, ".");
            var cursor = new TextCursor(text);
            Assert.True(cursor.TryNumber(false, out var value, out _));
            Assert.Equal(double.Parse(text, CultureInfo.InvariantCulture), value);
            Assert.Equal(text.Length, cursor.Pos);
        }
    }

    [Theory]
    [InlineData("7,26", true, 7.26, 4)]
    [InlineData("7,26", false, 7.0, 1)]
    [InlineData("-62.8", false, -62.8, 5)]
    [InlineData("−113.5", false, -113.5, 6)]
    [InlineData("7.", false, 7.0, 1)]
    public void TryNumber_Forms_ReadExpectedValueAndLength(string text, bool decimalComma, double expected, int length)
    {
        var cursor = new TextCursor(text);
        Assert.True(cursor.TryNumber(decimalComma, out var value, out _));
        Assert.Equal((expected, length), (value, cursor.Pos));
    }
}
