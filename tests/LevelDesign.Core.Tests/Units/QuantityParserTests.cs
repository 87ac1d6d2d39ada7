using LevelDesign.Core.Units;

namespace LevelDesign.Core.Tests.Units;

public class QuantityParserTests
{
    // Expected values are SI prefix definitions (exact powers of ten), so equality is exact: the parser
    // must return the double nearest the typed decimal, i.e. the same double as the C# literal.
    [Theory]
    [InlineData("5.1 GHz", UnitKind.Frequency, 5.1)]
    [InlineData("85 MHz", UnitKind.Frequency, 0.085)]
    [InlineData("5.1GHz", UnitKind.Frequency, 5.1)]
    [InlineData("  5.1 GHz  ", UnitKind.Frequency, 5.1)]
    [InlineData("-0.2 GHz", UnitKind.Frequency, -0.2)]
    [InlineData("4.75", UnitKind.Frequency, 4.75)]          // bare number in a frequency field means GHz
    [InlineData("250 kHz", UnitKind.Frequency, 0.00025)]
    [InlineData("7e9 Hz", UnitKind.Frequency, 7.0)]
    [InlineData("92 fF", UnitKind.Capacitance, 92e-15)]
    [InlineData("+1.5 pF", UnitKind.Capacitance, 1.5e-12)]
    [InlineData("12 nH", UnitKind.Inductance, 12e-9)]
    [InlineData("30 nA", UnitKind.Current, 30e-9)]
    [InlineData("30 uA", UnitKind.Current, 30e-6)]
    [InlineData("30 \u00B5A", UnitKind.Current, 30e-6)]   // micro sign
    [InlineData("30 \u03BCA", UnitKind.Current, 30e-6)]   // Greek mu
    [InlineData("8.5 k\u03A9", UnitKind.Resistance, 8500.0)]
    [InlineData("8.5 k\u2126", UnitKind.Resistance, 8500.0)] // ohm sign
    [InlineData("8.5 kOhm", UnitKind.Resistance, 8500.0)]
    [InlineData("8.5 kohm", UnitKind.Resistance, 8500.0)]
    [InlineData("50 Ohm", UnitKind.Resistance, 50.0)]
    [InlineData("1.2 mV", UnitKind.Voltage, 1.2e-3)]
    [InlineData("20 ns", UnitKind.Time, 20e-9)]
    [InlineData("0.31", UnitKind.Flux, 0.31)]
    [InlineData("0.31 \u03A60", UnitKind.Flux, 0.31)]     // Φ0
    [InlineData("0.31 Phi0", UnitKind.Flux, 0.31)]
    [InlineData("-0.5", UnitKind.Dimensionless, -0.5)]
    [InlineData(".25", UnitKind.Dimensionless, 0.25)]
    [InlineData("1E-3", UnitKind.Dimensionless, 0.001)]
    public void AcceptsAndReturnsBaseUnitExactly(string text, UnitKind kind, double expected)
    {
        Assert.True(QuantityParser.TryParse(text, kind, out double value, out string error), error);
        Assert.Equal(expected, value);
        Assert.Equal("", error);
    }

    [Fact]
    public void PrefixScalingHasNoFloatingPointNoise()
    {
        // Naive 12 * 1e-9 is 1.2000000000000002e-8 (see FACTS.md on UnitsNet); we must give the literal.
        Assert.Equal(12e-9, QuantityParser.Parse("12 nH", UnitKind.Inductance));
        Assert.Equal(5.1, QuantityParser.Parse("5.1 GHz", UnitKind.Frequency));
        Assert.Equal(0.085, QuantityParser.Parse("85 MHz", UnitKind.Frequency));
        Assert.Equal(0.3, QuantityParser.Parse("300 MHz", UnitKind.Frequency));
        Assert.Equal(7e-15, QuantityParser.Parse("7 fF", UnitKind.Capacitance));
    }

    [Fact]
    public void ElectronVoltsAreConvertedThroughEOverH()
    {
        // 1 eV / h = 241798.9242 GHz (CODATA 2018 e/h, from memory; exact from SI 2019 e, h).
        double value = QuantityParser.Parse("1.2e-3 eV", UnitKind.Frequency);
        Assert.Equal(1.2e-3 * 241798.9242084918, value, 1e-9);
        Assert.Equal(180e-6 * 241798.9242084918, QuantityParser.Parse("180 \u00B5eV", UnitKind.Frequency), 1e-9);
    }

    [Fact]
    public void WrongKindSaysWhatItIsAndWhatWasExpected()
    {
        Assert.False(QuantityParser.TryParse("85 fF", UnitKind.Frequency, out _, out string error));
        Assert.Equal("\"85 fF\" is a capacitance, but this field is a frequency (expected e.g. \"5.1 GHz\" or \"85 MHz\")", error);
    }

    [Fact]
    public void BareNumberForCapacitanceAsksForUnits()
    {
        Assert.False(QuantityParser.TryParse("92", UnitKind.Capacitance, out _, out string error));
        Assert.Contains("units are required", error);
        Assert.Contains("\"92 fF\"", error);
    }

    [Theory]
    [InlineData("85 fF", UnitKind.Frequency, "is a capacitance")]
    [InlineData("12 nX", UnitKind.Inductance, "unknown unit \"nX\"")]
    [InlineData("GHz", UnitKind.Frequency, "does not start with a number")]
    [InlineData("", UnitKind.Frequency, "empty value")]
    [InlineData("   ", UnitKind.Capacitance, "empty value")]
    [InlineData(null, UnitKind.Capacitance, "empty value")]
    [InlineData("nan", UnitKind.Frequency, "not a finite number")]
    [InlineData("NaN GHz", UnitKind.Frequency, "not a finite number")]
    [InlineData("-Infinity", UnitKind.Dimensionless, "not a finite number")]
    [InlineData("inf", UnitKind.Flux, "not a finite number")]
    [InlineData("1e999", UnitKind.Frequency, "out of range")]
    [InlineData("1e99999999999999 F", UnitKind.Capacitance, "out of range")]
    [InlineData("1e-400 F", UnitKind.Capacitance, "too small")]
    [InlineData("5,1 GHz", UnitKind.Frequency, "e.g. \"5.1 GHz\"")]
    [InlineData("5 G Hz", UnitKind.Frequency, "unknown unit")]
    [InlineData("5 ghz", UnitKind.Frequency, "did you mean \"GHz\"")]
    [InlineData("0.31 GHz", UnitKind.Flux, "is a frequency, but this field is a flux")]
    [InlineData("0.5 \u03A60", UnitKind.Dimensionless, "this field is a plain number")]
    [InlineData("1 V", UnitKind.Frequency, "is a voltage")]
    [InlineData("12", UnitKind.Inductance, "has no unit")]
    [InlineData("30", UnitKind.Current, "has no unit")]
    [InlineData("5.1 GHz x", UnitKind.Frequency, "unknown unit")]
    [InlineData("0x10", UnitKind.Dimensionless, "unknown unit")]
    [InlineData("1.2.3", UnitKind.Dimensionless, "unknown unit")]
    [InlineData("--1", UnitKind.Dimensionless, "does not start with a number")]
    [InlineData("5 m", UnitKind.Frequency, "unknown unit \"m\"")]
    public void RejectsWithExplanation(string? text, UnitKind kind, string expectedFragment)
    {
        Assert.False(QuantityParser.TryParse(text, kind, out double value, out string error));
        Assert.Equal(0.0, value);
        Assert.Contains(expectedFragment, error);
    }

    [Fact]
    public void ParseThrowsFormatExceptionWithTheSameMessage()
    {
        var ex = Assert.Throws<FormatException>(() => QuantityParser.Parse("85 fF", UnitKind.Frequency));
        Assert.StartsWith("\"85 fF\" is a capacitance", ex.Message);
    }

    [Fact]
    public void TryParseQuantityKeepsTheTypedUnit()
    {
        Assert.True(QuantityParser.TryParseQuantity("85 MHz", UnitKind.Frequency, out var q, out _));
        Assert.Equal(new Quantity(0.085, UnitKind.Frequency, "MHz"), q);
        Assert.Equal("85 MHz", q.ToString());

        Assert.True(QuantityParser.TryParseQuantity("5.1", UnitKind.Frequency, out var bare, out _));
        Assert.Equal("", bare.UnitText);
        Assert.Equal("5.1 GHz", bare.ToString());
    }

    [Fact]
    public void NegativeZeroIsReturnedAsPlainZero()
    {
        double value = QuantityParser.Parse("-0 GHz", UnitKind.Frequency);
        Assert.False(double.IsNegative(value));
    }

    [Fact]
    public void UnitKindHasHumanWords()
    {
        Assert.Equal("frequency", UnitKind.Frequency.HumanName());
        Assert.Equal("an inductance", UnitKind.Inductance.WithArticle());
        Assert.Equal("a capacitance", UnitKind.Capacitance.WithArticle());
        foreach (UnitKind kind in Enum.GetValues<UnitKind>())
        {
            Assert.False(string.IsNullOrEmpty(kind.HumanName()));
            // Every example offered in a message must itself parse for that kind.
            foreach (string example in kind.ExampleText().Split(" or "))
                Assert.True(QuantityParser.TryParse(example.Trim('"'), kind, out _, out string error), error);
        }
    }
}
