using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// Derivatives of dressed f01 values with respect to a parameter (flux in Φ0, or any other), taken numerically from
/// the composite model so that couplings and dressing are included.
/// </summary>
public static class FluxSensitivity
{
    /// <summary>dω/dΦ of one element's dressed f01 (GHz per unit), by central differences.</summary>
    public static double Slope(DeviceSolver solver, Device device, string parameterPath, string elementId, double step = 1e-4) =>
        Derivatives(solver, device, parameterPath, [elementId], step)[0].First;

    /// <summary>First and second derivatives of each listed element's dressed f01, with the step checked at 2h.</summary>
    public static FrequencyDerivatives[] Derivatives(DeviceSolver solver, Device device, string parameterPath,
        IReadOnlyList<string> elementIds, double step, CancellationToken cancellation = default)
    {
        double x = device.GetParameter(parameterPath);
        var indices = elementIds.Select(device.IndexOf).ToArray();
        double[] Frequencies(double value)
        {
            cancellation.ThrowIfCancellationRequested();
            var spectrum = SolveLowest(solver, device.WithParameter(parameterPath, value));
            return indices.Select(i => spectrum.EnergyOfExcitation((i, 1)) - spectrum.EnergyOfExcitation()).ToArray();
        }
        // the five solves are independent; the solver and its caches are shared safely
        var f = new double[5][];
        try
        {
            Parallel.For(0, 5, Eigen.ComputeCores.Options(cancellation), o => f[o] = Frequencies(x + (o - 2) * step));
        }
        catch (AggregateException e)
        {
            // callers expect the solver's own exception (e.g. a device invalid at the shifted flux), not a wrapper
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            throw;
        }
        return indices.Select((_, q) => FrequencyDerivatives.From(parameterPath, step, f[0][q], f[1][q], f[2][q], f[3][q], f[4][q])).ToArray();
    }

    /// <summary>
    /// Solves for the states an f01 needs: every product state with at most one excitation, those below the highest of
    /// them, and a margin of four (fewer than the default count, which reaches two excitations).
    /// </summary>
    public static DressedSpectrum SolveLowest(DeviceSolver solver, Device device)
    {
        var problem = solver.Prepare(device);
        var basis = problem.Basis;
        double highest = 0;
        for (int i = 0; i < basis.Dimension; i++)
            if (basis.States[i].Sum() <= 1) highest = Math.Max(highest, basis.BareEnergies[i]);
        int count = 0;
        for (int i = 0; i < basis.Dimension; i++) if (basis.BareEnergies[i] <= highest + 1e-9) count++;
        return solver.Solve(problem, Math.Min(basis.Dimension, count + 4));
    }
}
