using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Analysis;

/// <summary>dω/dΦ of an element's dressed f01 with respect to a parameter (GHz per unit), by central differences.</summary>
public static class FluxSensitivity
{
    public static double Slope(DeviceSolver solver, Device device, string parameterPath, string elementId, double step = 1e-4)
    {
        double x = device.GetParameter(parameterPath);
        double Frequency(double value)
        {
            var spectrum = solver.Solve(device.WithParameter(parameterPath, value));
            int i = device.IndexOf(elementId);
            return spectrum.EnergyOfExcitation((i, 1)) - spectrum.EnergyOfExcitation();
        }
        return (Frequency(x + step) - Frequency(x - step)) / (2 * step);
    }
}
