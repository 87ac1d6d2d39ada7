using System.Diagnostics;
using System.Globalization;
using System.Text;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Bench;

/// <summary>
/// --write-matrix FILE.toml OUT [COUNT]: the composite Hamiltonian of a device file at its file's bias values, as a
/// Matrix Market file (OUT.mtx, lower triangle, GHz; "real symmetric", or "complex hermitian" when complex), and
/// the lowest COUNT eigenvalues (default 83, absolute GHz) of this tool's in-process solve of that matrix (OUT.levels),
/// with the solve's wall and processor time (median of 5, after one run to compile). For the side-by-side with
/// SciPy's sparse eigsh (tests/reference/eigsh_side_by_side.py).
/// </summary>
internal static class MatrixExport
{
    public static void Run(string devicePath, string outPrefix, int count)
    {
        var document = DeviceDocument.Load(devicePath, new DeviceLoadOptions(AllowLarge: true)).Document
                       ?? throw new InvalidOperationException($"{devicePath} did not load");
        var solver = new DeviceSolver();
        var problem = solver.Prepare(document.Device);
        var h = problem.Hamiltonian;
        bool real = h.IsReal;
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"%%MatrixMarket matrix coordinate {(real ? "real symmetric" : "complex hermitian")}\n");
        text.Append(CultureInfo.InvariantCulture, $"% {document.Device.Name}: composite Hamiltonian in GHz (bare ground at 0), lower triangle\n");
        text.Append(CultureInfo.InvariantCulture, $"{h.Dimension} {h.Dimension} {h.StoredEntries}\n");
        foreach (var (row, column, value) in h.LowerEntries())
        {
            // Matrix Market wants the lower triangle (row ≥ column), 1-based
            int r = Math.Max(row, column) + 1, c = Math.Min(row, column) + 1;
            var v = row >= column ? value : System.Numerics.Complex.Conjugate(value);
            text.Append(CultureInfo.InvariantCulture, $"{r} {c} {v.Real:R}");
            text.Append(real ? "\n" : string.Create(CultureInfo.InvariantCulture, $" {v.Imaginary:R}\n"));
        }
        File.WriteAllText(outPrefix + ".mtx", text.ToString());

        solver.Solve(problem, count);   // compile before timing
        var wall = new double[5];
        var cpu = new double[5];
        DressedSpectrum? spectrum = null;
        for (int r = 0; r < wall.Length; r++)
        {
            var processor = Process.GetCurrentProcess().TotalProcessorTime;
            var clock = Stopwatch.StartNew();
            spectrum = solver.Solve(problem, count);
            wall[r] = clock.Elapsed.TotalSeconds;
            cpu[r] = (Process.GetCurrentProcess().TotalProcessorTime - processor).TotalSeconds;
        }
        Array.Sort(wall);
        Array.Sort(cpu);
        File.WriteAllLines(outPrefix + ".levels", spectrum!.Energies.Select(e => (e + spectrum.GroundEnergy).ToString("R", CultureInfo.InvariantCulture)));
        Console.WriteLine($"{devicePath}: {h.Dimension:N0} states, {h.StoredEntries:N0} stored entries ({(real ? "real" : "complex")}) → {outPrefix}.mtx");
        Console.WriteLine($"in-process solve of the lowest {count}: {wall[2]:F3} s wall, {cpu[2]:F3} s processor (median of 5; fastest {wall[0]:F3} s); " +
                          $"largest residual {spectrum.MaxResidual:E1} GHz; {spectrum.SolverName}");
    }
}
