using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Spread;
using LevelDesign.Core.Sweeps;
using Xunit;

namespace LevelDesign.Core.Tests.Spread;

/// <summary>Every kind of rule on the demo device, against the engine it reuses (sweeps, crossing search, target search).</summary>
public sealed class RuleKindsTests
{
    private static readonly DeviceDocument Demo = DeviceDocument.Demo();

    private static SpreadRule Rule(string text) =>
        SpreadRuleParser.Parse("r", text, Demo, out string? error) ?? throw new InvalidOperationException(error);

    private static double Figure(SpreadRule rule)
    {
        var (figures, problems) = new RuleEvaluator(Demo, [rule]).Evaluate(Demo.Device);
        Assert.Null(problems[0]);
        return figures[0];
    }

    private static SweepResult Scan()
    {
        var axes = Demo.Sweeps.First(s => s.Name == "coupler_scan").Axes;
        return SweepRunner.RunAsync(v => Demo.Resolve(axes, v), new SweepPlan(axes), new SweepOptions { Parallelism = 1 }).GetAwaiter().GetResult();
    }

    [Fact]
    public void BoundsAlongASweepTakeTheWorstPoint()
    {
        var scan = Scan();
        double lowest = scan.Points.Min(p => p.Quantities["qa.f01"] - p.Quantities["qb.f01"]);
        var above = Rule("qa.f01 - qb.f01 > 100 MHz along coupler_scan");
        Assert.Equal(lowest, Figure(above));
        double lowestPurity = scan.Points.Min(p => p.QuantityPurities["qa.f01"]);
        var purity = Rule("purity qa.f01 > 0.95 along coupler_scan");
        Assert.Equal(lowestPurity, Figure(purity));
        Assert.False(purity.Passes(lowestPurity));   // the coupler crosses qa on this scan: qa1 is half coupler there
        Assert.InRange(lowestPurity, 0.3, 0.7);
    }

    [Fact]
    public void ACrossingRuleReportsTheLargestGapOfItsStates()
    {
        var scan = Scan();
        var axis = scan.Plan.Axes[0];
        var crossings = CrossingFinder.Find(scan, b => Demo.Resolve([axis], [b]), new CrossingOptions(), new DeviceSolver());
        var ids = Demo.Device.Elements.Select(e => e.Id).ToArray();
        double gap = crossings.Where(c => new[] { StateNames.Of(ids, c.StateA), StateNames.Of(ids, c.StateB) }.Order().SequenceEqual(["qa1", "qc1"]))
            .Max(c => c.GapGHz);
        var rule = Rule("no crossing qc1 qa1 gap > 1 MHz along coupler_scan");
        double figure = Figure(rule);
        Assert.Equal(gap, figure, 9);
        Assert.False(rule.Passes(figure));
        Assert.True(Rule("no crossing qa1 qc1 gap > 500 MHz along coupler_scan").Passes(figure));
        Assert.Equal(0, Figure(Rule("no crossing qa1 rb1 gap > 1 MHz along coupler_scan")));   // never meet on this scan
    }

    [Fact]
    public async Task ARootRuleFindsTheTargetSearchsRootOrNone()
    {
        var axis = new SweepAxis("qc_flux", 0.15e-3, 1.05e-3, 31, []);
        var roots = await TargetSolver.FindAllAsync(v => Demo.Resolve([axis], v), axis, "zz:qa:qb", 0, new SweepOptions { Parallelism = 1 });
        var rule = Rule("root zz:qa:qb = 0 by qc_flux 0.15 mA to 1.05 mA");
        Assert.Equal(roots.First(r => r.Refined).Bias, Figure(rule), 12);
        Assert.True(double.IsNaN(Figure(Rule("root zz:qa:qb = 50 MHz by qc_flux 0.15 mA to 1.05 mA"))));
    }

    [Theory]
    [InlineData("qa.f01 > 5 GHz", "'at POINT' or 'along SWEEP'")]
    [InlineData("qa.f01 > 5 GHz at nowhere", "no operating point 'nowhere'")]
    [InlineData("qa.f01 > 5 GHz along nope", "no sweep 'nope'")]
    [InlineData("qa.f01 > 5 fF at idle", "fF")]
    [InlineData("qa.f01 between 6 GHz and 5 GHz at idle", "LOW below HIGH")]
    [InlineData("no crossing qa1 qc1 at idle", "along SWEEP")]
    [InlineData("root zz:qa:qb = 0 by nobias 0 to 1", "no bias 'nobias'")]
    [InlineData("purity qa.f01 > 2 at idle", "between 0 and 1")]
    public void RulesThatCannotBeReadSayWhy(string text, string fragment)
    {
        Assert.Null(SpreadRuleParser.Parse("r", text, Demo, out string? error));
        Assert.Contains(fragment, error);
    }
}
