using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Text;

namespace LevelDesign.Tests.Ui;

public class TargetOfferTextTests
{
    private static readonly ShownUnit Milliamp = ShownUnit.FromText("0.15 mA", UnitKind.Current)!;
    private static readonly TargetRequest ZeroZz = new("zz:qa:qb", 0, "qc_flux", 0, 1e-3);

    [Fact]
    public void A_missed_target_says_how_close_it_came_and_where_in_the_files_unit()
    {
        var result = new TargetSearchResult([], new TargetApproach(0.15e-3, -37.6e-6, 0.98));
        string text = TargetOfferText.Missed(ZeroZz, result, Milliamp, 0.9);
        Assert.Contains("zz:qa:qb = 0 Hz is not reached for qc_flux", text);
        Assert.Contains("closest: -37.600 kHz (-37.600 kHz off)", text);
        Assert.Contains("at 0.15 mA", text);
        Assert.DoesNotContain("hybridized", text);
        // a closest point read from hybridized labels says so; label jumps without a root are counted
        var hybrid = new TargetSearchResult([new TargetRoot("zz:qa:qb", 0, 0.5e-3, double.NaN, double.NaN, false)], new TargetApproach(0.5e-3, 2e-6, 0.6));
        string jumpy = TargetOfferText.Missed(ZeroZz, hybrid, Milliamp, 0.9);
        Assert.Contains("1 label jump, no root", jumpy);
        Assert.Contains("! hybridized, purity 0.60", jumpy);
    }

    [Fact]
    public void Offers_mark_jumps_and_hybridized_roots_and_stop_at_nine()
    {
        var roots = Enumerable.Range(0, 12).Select(i => new TargetRoot("zz:qa:qb", 0, i * 1e-4, 0, 0, i != 1) { Purity = i == 2 ? 0.5 : 1 }).ToList();
        var offers = TargetOfferText.Offers(ZeroZz, roots, Milliamp, 0.9);
        Assert.Equal(9, offers.Count);
        Assert.StartsWith("[1] 0 mA", offers[0]);
        Assert.EndsWith("(jump, not a root)", offers[1]);
        Assert.EndsWith("! hybridized, purity 0.50", offers[2]);
    }
}
