using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// A crossing found by Core's <see cref="CrossingFinder"/>, placed on the screen: its labels as designers read
/// them, the sweep point nearest its bias (where Enter puts the cursor) and the mid-gap frequency there.
/// </summary>
public sealed record CrossingMark(Crossing Crossing, string LabelA, string LabelB, int PointIndex, double FrequencyGHz)
{
    public static IReadOnlyList<CrossingMark> From(IReadOnlyList<Crossing> crossings, SweepResult sweep)
    {
        var points = sweep.Points;
        if (points.Count == 0) return [];
        return crossings.Select(c =>
        {
            int nearest = Enumerable.Range(0, points.Count).MinBy(i => Math.Abs(points[i].AxisValues[0] - c.Bias));
            var spectrum = points[nearest].Spectrum;
            double a = spectrum.EnergyOf(c.StateA.ToArray()), b = spectrum.EnergyOf(c.StateB.ToArray());
            return new CrossingMark(c, Core.Presentation.StateNames.Of(spectrum.Device, c.StateA), Core.Presentation.StateNames.Of(spectrum.Device, c.StateB), nearest, 0.5 * (a + b));
        }).ToList();
    }
}
