using LevelDesign.Core.Presentation;

namespace LevelDesign.Core.Tests.Presentation;

public class FrequencyTextTests
{
    [Theory]
    [InlineData(-9.335818e-3, "zz:qa:qb", "-9.335818 MHz")]     // never "-9335.818 kHz"
    [InlineData(-11.975123e-6, "zz:qa:qb", "-11.975 kHz")]
    [InlineData(5.12345678, "qa.f01", "5.123457 GHz")]
    [InlineData(-0.2123456, "qa.anharmonicity", "-212.346 MHz")]
    [InlineData(-1.792654e-3, "chi2:qa:ra", "-1.792654 MHz")]
    [InlineData(4.2e-9, "zz:qa:qb", "4 Hz")]
    [InlineData(1e-13, "zz:qa:qb", "0 Hz")]
    public void Prefix_by_magnitude_and_digits_by_the_quantitys_resolution(double ghz, string quantity, string text) =>
        Assert.Equal(text, FrequencyText.Of(quantity, ghz));

    [Fact]
    public void Non_finite_values_are_a_dash() => Assert.Equal("—", FrequencyText.Format(double.NaN));
}

public class DurationTextTests
{
    [Theory]
    [InlineData(3.9639e-5, "39.6 µs")]
    [InlineData(3.317e-3, "3.32 ms")]
    [InlineData(1.2, "1.20 s")]
    [InlineData(2.5e-7, "250 ns")]
    [InlineData(double.PositiveInfinity, "no limit")]
    public void Three_significant_digits_and_a_prefix(double seconds, string text) => Assert.Equal(text, DurationText.Format(seconds));
}
