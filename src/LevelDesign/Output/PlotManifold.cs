using LevelDesign.Core.Sweeps;
using ScottPlot;

namespace LevelDesign.Output;

/// <summary>
/// Restricts a spectrum plot to one excitation manifold (labels whose levels add up to 1, or to 2): branches of
/// other manifolds are removed after the plot is built, and the axes are fitted again.
/// </summary>
public static class PlotManifold
{
    /// <summary>Total excitation of a label written "|0,1,0⟩"; −1 when the text is not a label.</summary>
    public static int Excitations(string label)
    {
        string inner = label.Trim('|', '⟩');
        int sum = 0;
        foreach (string part in inner.Split(','))
        {
            if (!int.TryParse(part, out int level)) return -1;
            sum += level;
        }
        return sum;
    }

    public static IReadOnlyList<Crossing> Crossings(IReadOnlyList<Crossing> crossings, int? manifold) =>
        manifold is int m ? crossings.Where(c => c.StateA.Sum() == m && c.StateB.Sum() == m).ToArray() : crossings;

    public static void Apply(Plot plot, int? manifold)
    {
        if (manifold is not int m) return;
        foreach (var line in plot.GetPlottables().OfType<ScottPlot.Plottables.Scatter>().ToArray())
            if (line.LegendText is string text && Excitations(text) is int e && e >= 0 && e != m)
                plot.Remove(line);
        plot.Axes.AutoScale();
    }
}
