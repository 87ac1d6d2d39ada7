using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// The data of the spectrum view: the first axis values and one branch per bare label in the chosen manifold.
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

    public static SpectrumSeries From(SweepResult result, Manifold manifold)
    {
        var points = result.Points;
        var axis = points.Select(p => p.AxisValues[0]).ToArray();
        // Keyed by the label text: bare indices are not stable across points (the basis is ordered by bare energy).
        var byLabel = new Dictionary<string, Branch>();
        for (int i = 0; i < points.Count; i++)
        {
            var s = points[i].Spectrum;
            for (int k = 0; k < s.Count; k++)
            {
                int bare = s.Labels[k].BareIndex;
                int excitations = s.Basis.States[bare].Sum();
                if (!manifold.Admits(excitations)) continue;
                string label = Core.Presentation.StateNames.OfBare(s, bare);
                if (!byLabel.TryGetValue(label, out var branch))
                {
                    var values = new double[points.Count];
                    Array.Fill(values, double.NaN);
                    branch = new Branch(label, excitations, values);
                    byLabel[label] = branch;
                }
                branch.Frequencies[i] = s.Energies[k];
            }
        }
        var ordered = byLabel.Values.OrderBy(b => b.Frequencies.Where(double.IsFinite).DefaultIfEmpty(double.MaxValue).Min()).ToList();
        return new SpectrumSeries(result.Plan.Axes[0].Path, axis, ordered);
    }
}
