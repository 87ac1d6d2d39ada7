using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// Recomputes with every cutoff raised (<see cref="Truncation.Raised"/>) and reports the change of each derived
/// quantity; a change above the tolerance (default 1 kHz) is flagged.
/// </summary>
public static class TruncationConvergence
{
    public const double DefaultToleranceGHz = 1e-6;

    public static IReadOnlyList<ConvergenceEntry> Check(DeviceSolver solver, Device device, double toleranceGHz = DefaultToleranceGHz)
    {
        var raisedDevice = device with { Truncation = device.Truncation.Raised(device.Elements) };
        // a module's raised truncation can be many times its own (a 3×3 lattice: 46k → 325k states): refuse, not exhaust memory
        double raisedCount = CompositeSizeEstimate.Count(raisedDevice, 1e12);
        double bytes = CompositeSizeEstimate.PathBytes(raisedCount, device.Couplers.Count, solver.IterativeMinimumDimension);
        if (bytes > CompositeSizeEstimate.DefaultLimitBytes)
            throw new InvalidOperationException(
                $"convergence check not run: the raised truncation has {CompositeSizeEstimate.CountText(raisedCount)} states " +
                $"(about {bytes / (1L << 30):N1} GiB); check by hand with a smaller module or a raised max_excitations alone");
        var baseValues = DerivedQuantities.From(solver.Solve(device)).Named();
        var raisedValues = DerivedQuantities.From(solver.Solve(raisedDevice)).Named();
        var entries = new List<ConvergenceEntry>();
        foreach (var (name, value) in baseValues)
        {
            double raised = raisedValues.TryGetValue(name, out double r) ? r : double.NaN;
            bool flagged = double.IsNaN(value) != double.IsNaN(raised) || Math.Abs(raised - value) > toleranceGHz;
            entries.Add(new ConvergenceEntry(name, value, raised, flagged));
        }
        return entries;
    }
}
