using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// A two-axis sweep laid out as a grid for the map page: the value of one quantity at every (i, j) of the first and
/// second axis, whether it was read from hybridized labels, and which sweep point sits at each cell (−1 where none
/// was computed, e.g. after a cancelled sweep). Points are placed by their axis values, not by their order.
/// </summary>
public sealed class MapGrid
{
    public SweepAxis X { get; }
    public SweepAxis Y { get; }
    public QuantitySeries Quantity { get; }
    public double[,] Values { get; }
    public bool[,] Hybridized { get; }
    private readonly int[,] _point;

    private MapGrid(SweepAxis x, SweepAxis y, QuantitySeries quantity)
    {
        (X, Y, Quantity) = (x, y, quantity);
        Values = new double[x.Count, y.Count];
        Hybridized = new bool[x.Count, y.Count];
        _point = new int[x.Count, y.Count];
        for (int i = 0; i < x.Count; i++)
            for (int j = 0; j < y.Count; j++) (Values[i, j], _point[i, j]) = (double.NaN, -1);
    }

    public static MapGrid From(SweepResult sweep, string quantity, double purityThreshold)
    {
        if (sweep.Plan.Axes.Count != 2) throw new ArgumentException("a map needs a two-axis sweep");
        var grid = new MapGrid(sweep.Plan.Axes[0], sweep.Plan.Axes[1], QuantitySeries.From(sweep, quantity));
        for (int k = 0; k < sweep.Points.Count; k++)
        {
            var p = sweep.Points[k];
            int i = IndexOn(grid.X, p.AxisValues[0]), j = IndexOn(grid.Y, p.AxisValues[1]);
            grid.Values[i, j] = grid.Quantity.Values[k];
            grid.Hybridized[i, j] = !grid.Quantity.IsPurity && grid.Quantity.Purities[k] < purityThreshold;
            grid._point[i, j] = k;
        }
        return grid;
    }

    /// <summary>The sweep point at a cell, or −1.</summary>
    public int PointAt(int i, int j) => _point[i, j];

    /// <summary>The value of an axis at its k-th grid step.</summary>
    public static double ValueAt(SweepAxis axis, int k) => axis.Start + (axis.Stop - axis.Start) * k / Math.Max(1, axis.Count - 1);

    /// <summary>The grid step of an axis value (values are start + k·step, so rounding recovers k).</summary>
    public static int IndexOn(SweepAxis axis, double value) =>
        axis.Count <= 1 || axis.Stop == axis.Start ? 0
            : Math.Clamp((int)Math.Round((value - axis.Start) / (axis.Stop - axis.Start) * (axis.Count - 1)), 0, axis.Count - 1);

    /// <summary>What the map shades unless the designer chose: the first ZZ, else the first f01, else the first quantity.</summary>
    public static string DefaultQuantity(SweepResult sweep)
    {
        var available = QuantitySeries.Available(sweep);
        return available.FirstOrDefault(n => n.StartsWith("zz:", StringComparison.Ordinal))
               ?? available.FirstOrDefault(n => n.EndsWith(".f01", StringComparison.Ordinal)) ?? available.FirstOrDefault() ?? "";
    }
}
