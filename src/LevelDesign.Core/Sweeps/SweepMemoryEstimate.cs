using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// What a whole sweep holds at its peak, on the path it takes, so one that would not fit is refused before any point
/// is solved, with what to lower. Each worker holds one point's solve (sparse matrix, search space and result, or a
/// dense matrix for small points) and its warm-start history (three earlier points: vectors and matrices). Vectors
/// and weights are kept for every point when they fit in <see cref="KeptVectorsBudgetBytes"/> (or when asked);
/// otherwise only the points in flight hold them (<see cref="InFlightPerWorker"/> per worker) and every point keeps
/// only its energies, labels and derived quantities.
/// </summary>
public static class SweepMemoryEstimate
{
    /// <summary>
    /// All points keep their vectors while these take at most this much (the 201-point reference sweep: 56 MB); above
    /// it (the 101-point line4 sweep: 0.6 GB, the 51-point lattice sweep: 2.7 GB) points keep only what tables need.
    /// </summary>
    public const long KeptVectorsBudgetBytes = 256L << 20;

    /// <summary>How far (in points per worker) solving may run ahead of labelling when points do not keep vectors.</summary>
    public const int InFlightPerWorker = 2;

    /// <summary>
    /// The runtime, the code and the young generation of the collector (blocking workstation GC: a large gen0): the
    /// peak of a 2-point sweep of a small device.
    /// </summary>
    private const double RuntimeBytes = 200L << 20;

    /// <summary>Bytes per stored lower-triangle entry of one point's matrix: complex values, the solver's real CSR copy (both triangles) and assembly scratch.</summary>
    private const int MatrixBytesPerEntry = 16 + 2 * 12 + 12;

    /// <summary>Bytes of one point's vectors (complex when the matrix needs a gauge) and weights.</summary>
    public static double VectorBytes(double dimension, int count, bool complex) => dimension * count * ((complex ? 16 : 8) + 8);

    /// <summary>Whether the sweep keeps every point's vectors (see <see cref="SweepOptions.KeepVectors"/>).</summary>
    public static bool KeepsVectors(bool? asked, long points, double dimension, int count, bool complex) =>
        asked ?? points * VectorBytes(dimension, count, complex) <= KeptVectorsBudgetBytes;

    /// <param name="storedEntries">Stored lower-triangle entries of one point's matrix.</param>
    /// <param name="iterativeMinimumDimension">Below this dimension points are solved densely.</param>
    public static double Bytes(double dimension, double storedEntries, int count, long points, int workers, bool keepVectors,
        bool complex, int iterativeMinimumDimension)
    {
        double matrix = storedEntries * MatrixBytesPerEntry;
        double vectors = VectorBytes(dimension, count, complex);
        double solve = dimension < iterativeMinimumDimension
            ? CompositeSizeEstimate.DenseBytes((long)dimension) + matrix
            : CompositeSizeEstimate.IterativeBytes(dimension, 0, count) + matrix;
        // warm starts read the three points before (their vectors, and the matrices their problems still hold)
        double perWorker = solve + 3 * (vectors + matrix);
        double held = keepVectors ? points * vectors : (InFlightPerWorker + 1) * workers * vectors;
        // every point: its basis's bare energies and the bare → dressed index (12 bytes a state), energies, labels with
        // their top components, derived quantities
        double compact = points * (dimension * 12 + count * 400 + 16_384);
        return workers * perWorker + held + compact + RuntimeBytes;
    }

    /// <summary>
    /// Null when the sweep fits in <paramref name="limitBytes"/>, else the refusal: the estimate, the limit and what to
    /// lower (points only when the kept vectors are what does not fit).
    /// </summary>
    public static string? Refusal(double dimension, double storedEntries, int count, long points, int workers, bool keepVectors,
        bool complex, int iterativeMinimumDimension, long limitBytes)
    {
        double bytes = Bytes(dimension, storedEntries, count, points, workers, keepVectors, complex, iterativeMinimumDimension);
        if (bytes <= limitBytes) return null;
        double one = Bytes(dimension, storedEntries, count, 1, workers, keepVectors, complex, iterativeMinimumDimension);
        double perPoint = Bytes(dimension, storedEntries, count, 2, workers, keepVectors, complex, iterativeMinimumDimension) - one;
        long fitting = one > limitBytes ? 0 : 1 + (long)((limitBytes - one) / perPoint);
        string lower = fitting >= 2
            ? $"use at most {fitting:N0} points, fewer levels or states, or a smaller truncation"
            : "lower the number of states computed (--states, --levels), the truncation (levels, max_excitations) or the workers";
        return $"this sweep would need about {Size(bytes)} ({points:N0} points × {dimension:N0} states, {count} computed each, " +
               $"{workers} at once{(keepVectors ? ", every point keeping its eigenvectors" : "")}; limit {Size(limitBytes)}); {lower}";
    }

    private static string Size(double bytes) => bytes >= 1L << 30 ? $"{bytes / (1L << 30):N1} GiB" : $"{bytes / (1L << 20):N0} MiB";
}
