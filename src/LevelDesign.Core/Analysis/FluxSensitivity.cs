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
            var spectrum = solver.Solve(device.WithParameter(parameterPath, value));
            return indices.Select(i => spectrum.EnergyOfExcitation((i, 1)) - spectrum.EnergyOfExcitation()).ToArray();
        }
        var offsets = new[] { -2, -1, 0, 1, 2 };
        var f = offsets.Select(o => Frequencies(x + o * step)).ToArray();
        return indices.Select((_, q) => FrequencyDerivatives.From(parameterPath, step, f[0][q], f[1][q], f[2][q], f[3][q], f[4][q])).ToArray();
    }
}
