using LevelDesign.Core.Spread;
using Xunit;

namespace LevelDesign.Core.Tests.Spread;

public sealed class WilsonIntervalTests
{
    [Fact]
    public void AtZeroSuccessesTheUpperEndIsZSquaredOverNPlusZSquared()
    {
        // with p̂ = 0 the formula of Wilson, JASA 22, 209 (1927) reduces to [0, z²/(n + z²)] exactly
        const double z = WilsonInterval.Z95;
        var (low, high) = WilsonInterval.Of(0, 20);
        Assert.Equal(0, low);
        Assert.Equal(z * z / (20 + z * z), high, 14);
        var (allLow, allHigh) = WilsonInterval.Of(20, 20);
        Assert.Equal(1 - high, allLow, 14);
        Assert.Equal(1, allHigh);
    }

    [Theory]
    // Newcombe, Statistics in Medicine 17, 857 (1998), Table I, method 3 (score interval without continuity correction);
    // values from memory, to the 4 decimals printed there
    [InlineData(81, 263, 0.2553, 0.3662)]
    [InlineData(15, 148, 0.0624, 0.1605)]
    [InlineData(0, 20, 0.0000, 0.1611)]
    [InlineData(1, 29, 0.0061, 0.1718)]
    public void MatchesPublishedScoreIntervals(int successes, int trials, double low, double high)
    {
        var (l, h) = WilsonInterval.Of(successes, trials);
        Assert.Equal(low, l, 4);
        Assert.Equal(high, h, 4);
    }
}
