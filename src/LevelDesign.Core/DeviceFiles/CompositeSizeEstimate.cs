using System.Globalization;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Estimates, before anything is built, the composite dimension D and the memory the eigen solve will take on the path
/// it will use, so a truncation that would exhaust memory is refused with numbers (in milliseconds) instead of
/// crashing. Small spaces are solved densely (a D×D matrix); large ones by the sparse iterative solver (the sparse
/// matrix, the search space and the kept vectors, all linear in D). Counting is overflow-safe and stops early.
/// </summary>
public static class CompositeSizeEstimate
{
    /// <summary>Refuse estimates above this many bytes (2 GiB) unless allowed.</summary>
    public const long DefaultLimitBytes = 2L << 30;

    /// <summary>Counts above this are reported as "more than" (no exact figure is needed to refuse them).</summary>
    private const double Astronomical = 1e18;

    /// <summary>
    /// Non-zeros per row and coupler assumed for the sparse matrix: a charge or flux operator in an element's eigenbasis
    /// connects a level mostly to its neighbours (measured: 4,313 states, 13 couplers, 121k non-zeros, 2.2 per row and
    /// coupler), so 4 leaves a margin.
    /// </summary>
    private const int NonZerosPerCoupler = 4;

    /// <summary>Bytes per stored non-zero while assembling and solving (pattern, slot map, complex and real values).</summary>
    private const int BytesPerNonZero = 60;

    /// <summary>
    /// States the guard assumes are computed on the iterative path: the default selection asks for at most about
    /// <see cref="StateSelection.AutoManifoldLimit"/> plus a margin (more with --levels or --states, checked again
    /// when solving).
    /// </summary>
    public const int NominalStates = StateSelection.AutoManifoldLimit + StateSelection.Margin;

    public static long DenseBytes(long dimension) => dimension * dimension * 16; // complex double, the worst case

    /// <summary>
    /// Memory of the iterative path for <paramref name="count"/> states: the search space (basis, products and scratch
    /// of 2·(count + 6) columns), Ritz vectors and corrections, the result (complex vectors and weights) and the matrix.
    /// </summary>
    public static double IterativeBytes(double dimension, double nonZeros, int count)
    {
        double columns = 3.0 * 2 * (count + 6) + 2.0 * (count + 6) + 2.0 * count + 3.0 * count;
        return dimension * columns * 8 + nonZeros * BytesPerNonZero;
    }

    /// <summary>Estimated bytes for the path a point of this size takes (dense below the iterative threshold).</summary>
    public static double PathBytes(double dimension, int couplers, int iterativeMinimumDimension)
    {
        if (dimension < iterativeMinimumDimension) return DenseBytes((long)dimension);
        return IterativeBytes(dimension, dimension * (1 + NonZerosPerCoupler * (double)couplers), (int)Math.Min(dimension, NominalStates));
    }

    /// <summary>
    /// Number of product states kept by per-element levels and the excitation cap, as a double (exact below 2^53);
    /// stops and returns a value above <paramref name="stopAbove"/> as soon as the count passes it (counts only grow as
    /// elements are added). Linear in elements × excitations (prefix sums), so 300 elements of 1000 levels take
    /// milliseconds.
    /// </summary>
    public static double Count(Device device, double stopAbove = Astronomical)
    {
        var t = device.Truncation;
        if (t.MaxExcitations is not int maxEx)
        {
            double product = 1;
            foreach (var e in device.Elements)
            {
                product *= t.LevelsOf(e.Id);
                if (product > stopAbove) return product;
            }
            return product;
        }
        long reach = 0;
        foreach (var e in device.Elements) reach = Math.Min(reach + t.LevelsOf(e.Id) - 1, maxEx);
        int cap = (int)Math.Min(maxEx, reach);
        var ways = new double[cap + 1];
        var prefix = new double[cap + 2];
        ways[0] = 1;
        foreach (var e in device.Elements)
        {
            int levels = t.LevelsOf(e.Id);
            for (int s = 0; s <= cap; s++) prefix[s + 1] = prefix[s] + ways[s];
            // states with total s after this element: those with s − l before it, 0 ≤ l < levels
            double total = 0;
            for (int s = 0; s <= cap; s++)
            {
                ways[s] = prefix[s + 1] - prefix[Math.Max(0, s - levels + 1)];
                total += ways[s];
            }
            if (total > stopAbove) return total;
        }
        return ways.Sum();
    }

    /// <summary>Number of product states kept by levels and the excitation cap (saturates at long.MaxValue/2).</summary>
    public static long UpperBound(Device device)
    {
        double total = Count(device);
        return total >= long.MaxValue / 2 ? long.MaxValue / 2 : (long)Math.Round(total);
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
            // identical elements (a module's repeated qubits) are diagonalised once
            var solved = new Dictionary<Elements.Element, double[]>();
            energies = device.Elements.Select(e =>
            {
                var key = e with { Id = "" };
                return solved.TryGetValue(key, out var known) ? known : solved[key] = LevelsWithin(e, device.Truncation, window);
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

    /// <summary>
    /// An element's excitation energies that can lie inside the window: a few levels first, all of them only when the
    /// highest of those is still inside (a thousand-level element is rarely diagonalised whole just to count).
    /// </summary>
    private static double[] LevelsWithin(Elements.Element e, Truncation t, double window)
    {
        int levels = t.LevelsOf(e.Id), first = Math.Min(levels, 8);
        var s = e.Diagonalise(first, t.BasisSizeOf(e.Id));
        var energies = s.Energies.Select(x => x - s.Energies[0]).ToArray();
        if (first == levels || energies[^1] > window) return energies;
        s = e.Diagonalise(levels, t.BasisSizeOf(e.Id));
        return s.Energies.Select(x => x - s.Energies[0]).ToArray();
    }

    /// <summary>"46,376" for a count known exactly, "more than 1e18" for one stopped early.</summary>
    public static string CountText(double count) =>
        count > Astronomical ? "more than " + Astronomical.ToString("0e0", CultureInfo.InvariantCulture)
        : count >= 1e15 ? count.ToString("0.###e0", CultureInfo.InvariantCulture)
        : count.ToString("N0", CultureInfo.InvariantCulture);

    /// <summary>The largest D whose dense complex matrix fits in <paramref name="bytes"/>.</summary>
    public static long MaxDimension(long bytes) => (long)Math.Sqrt(bytes / 16.0);

    /// <summary>
    /// The largest D whose estimated path fits in <paramref name="bytes"/> for a device with this many couplers (the
    /// estimate grows with D, so a bisection).
    /// </summary>
    public static long MaxDimension(long bytes, int couplers, int iterativeMinimumDimension)
    {
        long low = 1, high = 1L << 40;
        while (low < high)
        {
            long mid = low + (high - low + 1) / 2;
            if (PathBytes(mid, couplers, iterativeMinimumDimension) <= bytes) low = mid; else high = mid - 1;
        }
        return low;
    }
}
