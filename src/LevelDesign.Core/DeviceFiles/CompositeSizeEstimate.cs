using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Estimates the composite dimension D and the dense matrix size before anything is built, so a truncation that
/// would exhaust memory is refused with numbers instead of crashing. Levels and the excitation cap give an exact
/// count cheaply; a bare-energy window needs each element's bare energies, which are computed only when the
/// cheap bound is too large.
/// </summary>
public static class CompositeSizeEstimate
{
    /// <summary>Refuse dense matrices above this many bytes (1 GiB) unless allowed.</summary>
    public const long DefaultLimitBytes = 1L << 30;

    public static long DenseBytes(long dimension) => dimension * dimension * 16; // complex double, the worst case

    /// <summary>Number of product states kept by per-element levels and the excitation cap (saturates at long.MaxValue/2).</summary>
    public static long UpperBound(Device device)
    {
        var t = device.Truncation;
        int maxEx = t.MaxExcitations ?? int.MaxValue;
        int cap = (int)Math.Min(maxEx, device.Elements.Sum(e => (long)t.LevelsOf(e.Id) - 1));
        var ways = new double[cap + 1];
        ways[0] = 1;
        foreach (var e in device.Elements)
        {
            int levels = t.LevelsOf(e.Id);
            var next = new double[cap + 1];
            for (int s = 0; s <= cap; s++)
                if (ways[s] > 0)
                    for (int l = 0; l < levels && s + l <= cap; l++) next[s + l] += ways[s];
            ways = next;
        }
        double total = ways.Sum();
        return total >= long.MaxValue / 2 ? long.MaxValue / 2 : (long)total;
    }

    /// <summary>
    /// D itself when it is at most <paramref name="limit"/>, else a number above the limit. Uses the bare-energy window
    /// (diagonalising each element alone) only when the level/excitation count exceeds the limit.
    /// </summary>
    public static long Dimension(Device device, long limit)
    {
        long bound = UpperBound(device);
        if (bound <= limit || device.Truncation.MaxBareEnergyGHz is not double window) return bound;
        double[][] energies;
        try
        {
            energies = device.Elements.Select(e =>
            {
                var s = e.Diagonalise(device.Truncation.LevelsOf(e.Id), device.Truncation.BasisSizeOf(e.Id));
                return s.Energies.Select(x => x - s.Energies[0]).ToArray();
            }).ToArray();
        }
        catch (Exception ex) when (ex is InvalidOperationException or ArgumentException)
        {
            return bound;
        }
        long count = 0;
        int maxEx = device.Truncation.MaxExcitations ?? int.MaxValue;
        Count(0, 0, 0);
        return count;

        void Count(int element, int excitations, double energy)
        {
            if (count > limit) return;
            if (element == energies.Length) { count++; return; }
            for (int l = 0; l < energies[element].Length; l++)
            {
                if (excitations + l > maxEx || energy + energies[element][l] > window + 1e-12) break;
                Count(element + 1, excitations + l, energy + energies[element][l]);
                if (count > limit) return;
            }
        }
    }

    /// <summary>The largest D whose dense complex matrix fits in <paramref name="bytes"/>.</summary>
    public static long MaxDimension(long bytes) => (long)Math.Sqrt(bytes / 16.0);
}
