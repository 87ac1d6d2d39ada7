using System.Globalization;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Tests.Units;

public class QuantityFormatterTests
{
    [Theory]
    [InlineData(0.085, UnitKind.Frequency, "MHz", "85 MHz")]
    [InlineData(0.085, UnitKind.Frequency, null, "85 MHz")]
    [InlineData(5.1, UnitKind.Frequency, null, "5.1 GHz")]
    [InlineData(5.1, UnitKind.Frequency, "", "5.1 GHz")]
    [InlineData(5.1, UnitKind.Frequency, "MHz", "5100 MHz")]
    [InlineData(-0.2, UnitKind.Frequency, null, "-200 MHz")]
    [InlineData(-0.2, UnitKind.Frequency, "GHz", "-0.2 GHz")]
    [InlineData(0.0, UnitKind.Frequency, null, "0 GHz")]
    [InlineData(12e-9, UnitKind.Inductance, null, "12 nH")]
    [InlineData(92e-15, UnitKind.Capacitance, null, "92 fF")]
    [InlineData(30e-9, UnitKind.Current, null, "30 nA")]
    [InlineData(8500.0, UnitKind.Resistance, null, "8.5 k\u03A9")]
    [InlineData(8500.0, UnitKind.Resistance, "kOhm", "8.5 kOhm")]
    [InlineData(20e-9, UnitKind.Time, null, "20 ns")]
    [InlineData(0.31, UnitKind.Flux, null, "0.31 \u03A60")]
    [InlineData(0.31, UnitKind.Flux, "Phi0", "0.31 Phi0")]
    [InlineData(0.25, UnitKind.Dimensionless, null, "0.25")]
    [InlineData(1.5e-7, UnitKind.Dimensionless, null, "1.5e-7")]
    [InlineData(123456789.0, UnitKind.Dimensionless, null, "123456789")]
    [InlineData(1e-20, UnitKind.Capacitance, null, "0.00001 fF")]   // below femto: stays in fF
    public void WritesReadableUnits(double value, UnitKind kind, string? preferred, string expected)
    {
        Assert.Equal(expected, QuantityFormatter.Format(value, kind, preferred));
    }

    [Fact]
    public void HidesBinaryRoundingNoise()
    {
        // 0.1 + 0.2 = 0.30000000000000004 in doubles; twelve significant digits hide that.
        Assert.Equal("300 MHz", QuantityFormatter.Format(0.1 + 0.2, UnitKind.Frequency));
        Assert.Equal("12 nH", QuantityFormatter.Format(12 * 1e-9, UnitKind.Inductance));
    }

    [Fact]
    public void WritesElectronVoltsWhenAsked()
    {
        // e/h = 241798.9242084918 GHz/eV (SI 2019 exact e, h).
        double ghz = 1.2e-3 * 241798.9242084918;
        Assert.Equal("1.2 meV", QuantityFormatter.Format(ghz, UnitKind.Frequency, "meV"));
    }

    [Fact]
    public void RejectsUnitOfAnotherKindOrUnknownOrNonFinite()
    {
        var wrongKind = Assert.Throws<ArgumentException>(() => QuantityFormatter.Format(5.1, UnitKind.Frequency, "fF"));
        Assert.Contains("capacitance", wrongKind.Message);
        Assert.Throws<ArgumentException>(() => QuantityFormatter.Format(5.1, UnitKind.Frequency, "nX"));
        Assert.Throws<ArgumentException>(() => QuantityFormatter.Format(0.3, UnitKind.Dimensionless, "GHz"));
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityFormatter.Format(double.NaN, UnitKind.Frequency));
        Assert.Throws<ArgumentOutOfRangeException>(() => QuantityFormatter.Format(double.PositiveInfinity, UnitKind.Capacitance));
    }

    private static readonly UnitKind[] AllKinds = Enum.GetValues<UnitKind>();

    // Decimal spellings per kind for the preferred-unit round trips (eV is tested separately: not a power of ten).
    private static readonly Dictionary<UnitKind, string[]> Spellings = new()
    {
        [UnitKind.Dimensionless] = [""],
        [UnitKind.Frequency] = ["", "Hz", "kHz", "MHz", "GHz", "THz", "mHz"],
        [UnitKind.Capacitance] = ["F", "fF", "pF", "nF", "uF"],
        [UnitKind.Inductance] = ["H", "pH", "nH", "\u00B5H", "mH"],
        [UnitKind.Current] = ["A", "pA", "nA", "uA", "mA"],
        [UnitKind.Resistance] = ["\u03A9", "Ohm", "kOhm", "k\u03A9", "M\u03A9", "mohm"],
        [UnitKind.Voltage] = ["V", "nV", "\u00B5V", "mV", "kV"],
        [UnitKind.Flux] = ["", "\u03A60", "Phi0", "mPhi0"],
        [UnitKind.Time] = ["s", "ps", "ns", "us", "ms"],
    };

    [Fact]
    public void RandomValuesRoundTripAtTwelveDigits()
    {
        // Property: parse(format(x)) equals x rounded to 12 significant digits (.NET "E11" rounding),
        // for every kind, with automatic and with preferred units, over 40 decades. Fixed seed.
        var random = new Random(20260611);
        for (int trial = 0; trial < 20000; trial++)
        {
            UnitKind kind = AllKinds[random.Next(AllKinds.Length)];
            double x = RandomValue(random);
            string[] spellings = Spellings[kind];
            string? preferred = random.Next(3) == 0 ? null : spellings[random.Next(spellings.Length)];

            string text = QuantityFormatter.Format(x, kind, preferred);
            Assert.True(QuantityParser.TryParse(text, kind, out double back, out string error), $"{x:R} {kind} -> \"{text}\": {error}");
            double expected = double.Parse(x.ToString("E11", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            Assert.True(expected == back, $"{x:R} {kind} {preferred} -> \"{text}\" -> {back:R}, expected {expected:R}");
        }
    }

    [Fact]
    public void ShortDecimalValuesRoundTripExactly()
    {
        // Property: a value typed with at most 12 digits (the usual case) comes back as the very same double.
        var random = new Random(7);
        for (int trial = 0; trial < 20000; trial++)
        {
            UnitKind kind = AllKinds[random.Next(AllKinds.Length)];
            long mantissa = random.NextInt64(-999_999_999_999, 1_000_000_000_000) / (long)Math.Pow(10, random.Next(12));
            int exponent = random.Next(-20, 21);
            double x = double.Parse($"{mantissa}e{exponent}", CultureInfo.InvariantCulture);
            string[] spellings = Spellings[kind];
            string? preferred = random.Next(3) == 0 ? null : spellings[random.Next(spellings.Length)];

            string text = QuantityFormatter.Format(x, kind, preferred);
            double back = QuantityParser.Parse(text, kind);
            Assert.True(x == back, $"{mantissa}e{exponent} {kind} {preferred} -> \"{text}\" -> {back:R}");
        }
    }

    [Fact]
    public void ElectronVoltRoundTripIsCloseButNotExact()
    {
        // eV needs one multiplication by e/h each way, so allow a few ulps beyond 12-digit rounding.
        var random = new Random(11);
        for (int trial = 0; trial < 2000; trial++)
        {
            double ghz = RandomValue(random);
            string unit = new[] { "eV", "meV", "\u00B5eV", "neV" }[random.Next(4)];
            double back = QuantityParser.Parse(QuantityFormatter.Format(ghz, UnitKind.Frequency, unit), UnitKind.Frequency);
            Assert.Equal(ghz, back, Math.Abs(ghz) * 1e-11);
        }
    }

    private static double RandomValue(Random random)
    {
        double magnitude = Math.Pow(10, random.NextDouble() * 40 - 20);
        return random.Next(2) == 0 ? magnitude : -magnitude;
    }
}
