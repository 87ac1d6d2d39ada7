using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// The data of the spectrum view: the first axis values and the branches (energy-ordered levels) in the chosen manifold.
/// Frequencies are dressed energies above the dressed ground, i.e. transition frequencies from the ground.
/// </summary>
public sealed class SpectrumSeries
{
    private SpectrumSeries(string axisName, double[] axis, IReadOnlyList<Branch> branches)
    {
        AxisName = axisName;
        Axis = axis;
        Branches = branches;
    }

    public string AxisName { get; }
    public double[] Axis { get; }
    public IReadOnlyList<Branch> Branches { get; }

    /// <summary>A series from ready branches (used by exports and tests).</summary>
    public static SpectrumSeries Of(string axisName, double[] axis, IReadOnlyList<Branch> branches) => new(axisName, axis, branches);

    /// <summary>
    /// Branches as the plots draw them: at every point the dressed levels whose character is in the manifold, in
    /// energy order, so branch k runs smoothly through every avoided crossing instead of jumping across the gap where a
    /// label hands over. Each branch is named by its character at the last point, where its name is drawn.
    /// </summary>
    public static SpectrumSeries From(SweepResult result, Manifold manifold)
    {
        var points = result.Points;
        var axis = points.Select(p => p.AxisValues[0]).ToArray();
        var branches = new List<(double[] Frequencies, string Label, int Excitations)>();
        for (int i = 0; i < points.Count; i++)
        {
            var s = points[i].Spectrum;
            int b = 0;
            for (int k = 0; k < s.Count; k++)   // energies ascend with k
            {
                int excitations = s.LabelLevels(k).Sum();
                if (!manifold.Admits(excitations)) continue;
                if (b == branches.Count)
                {
                    var values = new double[points.Count];
                    Array.Fill(values, double.NaN);
                    branches.Add((values, "", 0));
                }
                branches[b].Frequencies[i] = s.Energies[k];
                branches[b] = (branches[b].Frequencies, Core.Presentation.StateNames.OfDressed(s, k), excitations);
                b++;
            }
        }
        return new SpectrumSeries(result.Plan.Axes[0].Path, axis, branches.Select(x => new Branch(x.Label, x.Excitations, x.Frequencies)).ToList());
    }
}
