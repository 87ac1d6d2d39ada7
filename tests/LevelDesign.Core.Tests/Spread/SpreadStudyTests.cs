using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Spread;
using LevelDesign.Core.Spread.Export;
using MathNet.Numerics.Distributions;
using Xunit;

namespace LevelDesign.Core.Tests.Spread;

public sealed class SpreadStudyTests
{
    private const double Ec = 0.2, Ej0 = 30.0, RelativeSigma = 0.03;

    /// <summary>A fixed-frequency transmon alone, E_J drawn normally with a relative σ, and one frequency rule.</summary>
    private static DeviceDocument Transmon(string sigma, string rule, int samples = 2000, int seed = 11)
    {
        string text = $"""
            [device]
            name = "one"

            [elements.q]
            kind = "transmon"
            ec = "{Ec} GHz"
            ej = "{Ej0} GHz"
            ng = 0.0
            levels = 6

            [biases.charge]
            target = "q.ng"
            value = 0.0

            [points.here]
            charge = 0.0

            [spread]
            samples = {samples}
            seed = {seed}

            [spread.junction]
            parameter = "q.ej"
            sigma = "{sigma}"

            [rules]
            low = "{rule}"
            """;
        var result = DeviceDocument.Parse(text, "one.toml");
        Assert.True(result.Ok, string.Join("\n", result.Errors));
        return result.Document!;
    }

    private static SpreadRun Run(DeviceDocument document, ShardRange? range = null, int threads = 2) =>
        SpreadRunner.RunAsync(document, document.Spread!, range ?? ShardRange.Whole(document.Spread!.Samples), threads).GetAwaiter().GetResult();

    /// <summary>f01 ≈ sqrt(8 E_J E_C) − E_C (Koch et al., Phys. Rev. A 76, 042319 (2007), Eq. 2.11 ff.).</summary>
    private static double KochF01(double ej) => Math.Sqrt(8 * ej * Ec) - Ec;

    [Fact]
    public void FailureFractionOfAFrequencyRuleMatchesTheNormalCdfThroughKochsFormula()
    {
        // threshold: the Koch frequency of E_J drawn 0.5σ low, so P(fail) = P(f01 < F) = P(E_J < E_J*) = Φ(−0.5)
        double threshold = KochF01(Ej0 * (1 - 0.5 * RelativeSigma));
        double ejStar = Math.Pow(threshold + Ec, 2) / (8 * Ec);   // Koch's formula inverted: f01(E_J*) = F
        double expected = Normal.CDF(0, 1, (ejStar / Ej0 - 1) / RelativeSigma);
        Assert.Equal(Normal.CDF(0, 1, -0.5), expected, 12);

        const int n = 3000;
        var document = Transmon("3%", $"q.f01 > {threshold * 1e3:R} MHz at here", n);
        var run = Run(document);
        double failed = run.Outcomes.Count(o => !o.Pass) / (double)n;

        // The asymptotic formula is not exact: its error at the nominal E_J (EJ/EC = 150) shifts the threshold in E_J by
        // δf / (df/dE_J), i.e. the failure probability by φ(z)·δE_J/(σ E_J0). That error is small (checked) and allowed for.
        double exactNominal = new RuleEvaluator(document, document.Spread!.Rules).Evaluate(document.Device).Figures[0];
        double formulaError = exactNominal - KochF01(Ej0);
        Assert.True(Math.Abs(formulaError) < 0.01, $"Koch's formula is off by {formulaError * 1e3:F2} MHz at EJ/EC = 150");
        double slope = Math.Sqrt(2 * Ec / Ej0);   // d f01 / d E_J of the formula
        double shift = Normal.PDF(0, 1, -0.5) * Math.Abs(formulaError) / slope / (RelativeSigma * Ej0);
        double samplingError = Math.Sqrt(expected * (1 - expected) / n);
        Assert.True(Math.Abs(failed - expected) <= 4 * samplingError + shift,
            $"failure fraction {failed:F4}, Φ(−0.5) = {expected:F4}, sampling σ {samplingError:F4}, formula allowance {shift:F4}");
    }

    [Theory]
    [InlineData(-50.0, 1.0)]   // threshold below the nominal f01: every identical chip passes
    [InlineData(50.0, 0.0)]    // above it: every chip fails
    public void WithoutSpreadTheYieldIsExactlyWhatTheNominalDeviceGives(double offsetMHz, double yield)
    {
        double threshold = KochF01(Ej0) * 1e3 + offsetMHz;
        var document = Transmon("0%", $"q.f01 > {threshold:R} MHz at here", 40);
        var run = Run(document);
        var summary = SpreadSummary.Of(document.Spread!, run.Outcomes);
        Assert.Equal(40, summary.Samples);
        Assert.Equal(yield, summary.Yield);
        Assert.All(run.Outcomes, o => Assert.Equal(Ej0, o.Values[0]));
    }

    [Fact]
    public void TheSameSeedGivesTheSameSamplesAndAnotherSeedOthers()
    {
        string rule = $"q.f01 > {KochF01(Ej0) * 1e3:R} MHz at here";
        var a = Run(Transmon("3%", rule, 30, seed: 5), threads: 1);
        var b = Run(Transmon("3%", rule, 30, seed: 5), threads: 2);
        var c = Run(Transmon("3%", rule, 30, seed: 6), threads: 2);
        Assert.Equal(Text(a), Text(b));
        Assert.NotEqual(a.Outcomes.Select(o => o.Values[0]), c.Outcomes.Select(o => o.Values[0]));
    }

    [Fact]
    public void ShardsTogetherHoldExactlyTheSamplesOfOneRun()
    {
        var document = Transmon("3%", $"q.f01 > {KochF01(Ej0) * 1e3:R} MHz at here", 25);
        var whole = Run(document);
        var parts = Enumerable.Range(1, 3).Select(i => Run(document, new ShardRange(i, 3, 25), threads: 1)).ToList();
        Assert.Equal(new long[] { 0, 8, 16 }, parts.Select(p => p.Range.First));
        Assert.Equal(Text(whole), Text(new SpreadRun(whole.Range, parts.SelectMany(p => p.Outcomes).ToList(), true)));
    }

    [Fact]
    public void DrawsDependOnlyOnSeedIndexAndNameAndAreStandardNormal()
    {
        Assert.Equal(SampleNoise.Normal(3, 17, "g/q.ej"), SampleNoise.Normal(3, 17, "g/q.ej"));
        Assert.NotEqual(SampleNoise.Normal(3, 17, "g/q.ej"), SampleNoise.Normal(3, 18, "g/q.ej"));
        var z = Enumerable.Range(0, 20000).Select(i => SampleNoise.Normal(1, i, "x")).ToArray();
        // mean and variance of 20,000 standard normals: σ of the mean 0.007, of the variance 0.01
        Assert.InRange(z.Average(), -0.03, 0.03);
        Assert.InRange(z.Select(x => x * x).Average(), 0.96, 1.04);
    }

    [Fact]
    public void ASharedFactorCorrelatesTheMembersOfAGroup()
    {
        var text = Transmon("1%", "q.f01 > 1 GHz at here").Text
            .Replace("[elements.q]", "[elements.p]\nkind = \"transmon\"\nec = \"0.2 GHz\"\nej = \"30 GHz\"\nlevels = 4\n\n[elements.q]")
            .Replace("parameter = \"q.ej\"\nsigma = \"1%\"", "parameters = [\"q.ej\", \"p.ej\"]\nsigma = \"1%\"\nshared = \"3%\"");
        var document = DeviceDocument.Parse(text, "two.toml").Document!;
        var sampler = new SpreadSampler(document.Device, document.Spread!);
        var draws = Enumerable.Range(0, 2000).Select(i => sampler.Draw(i).Deviations).ToArray();
        double r = Correlation(draws.Select(d => d[0]).ToArray(), draws.Select(d => d[1]).ToArray());
        // members share 3% of their sqrt(3² + 1²)% spread: correlation 9/10
        Assert.InRange(r, 0.87, 0.93);
    }

    private static double Correlation(double[] x, double[] y)
    {
        double mx = x.Average(), my = y.Average();
        double sxy = x.Zip(y, (a, b) => (a - mx) * (b - my)).Sum(), sxx = x.Sum(a => (a - mx) * (a - mx)), syy = y.Sum(b => (b - my) * (b - my));
        return sxy / Math.Sqrt(sxx * syy);
    }

    private static string Text(SpreadRun run)
    {
        var header = new SpreadStudyHeader("v", "f", "d", "h", "e", 1, run.Outcomes.Count, [("low", "x")], ["q.ej"], [0.0]);
        return SpreadResultFile.Write(header, null, true, 0, DateTimeOffset.UnixEpoch, run.Outcomes, null, "");
    }
}
