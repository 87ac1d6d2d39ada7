using System.Diagnostics;
using System.Text;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Bench;

/// <summary>
/// Scale mode (--scale): module-sized devices, one point each with the default states, in process. Per size: product
/// states, non-zeros, states computed, preparation and solve time (wall) and processor time of both (all threads; less
/// disturbed by other work on a shared machine), largest residual, memory, and the largest
/// |E(iterative) − E(dense)| where a dense solve is feasible (up to 1,500 states; 4,400 with --with-dense).
/// Whole commands are timed separately (docs/performance.md).
/// </summary>
internal static class Scale
{
    public static void Run(bool withDense)
    {
        int denseUpTo = withDense ? 4_400 : 1_500;
        var cases = new List<(string Name, Device Device)>
        {
            ("3-qubit line, ≤4 exc", Line(3, 4)),
            ("4-qubit line, ≤4 exc", File("devices/line4.toml", 4)),
            ("4-qubit line, ≤5 exc", File("devices/line4.toml", 5)),
            ("6-qubit line, ≤4 exc", Line(6, 4)),
            ("3×3 lattice, ≤3 exc", File("devices/lattice3x3.toml", 3)),
            ("3×3 lattice, ≤4 exc", File("devices/lattice3x3.toml", 4)),
        };
        new DeviceSolver().Solve(Line(2, 3));   // compile before timing
        Console.WriteLine($"{"module",-22} {"states",8} {"non-zeros",10} {"computed",8} {"prepare s",9} {"solve s",8} {"cpu s",7} {"residual",9} {"alloc MB",9} {"peak MB",8}  dense agreement");
        foreach (var (name, device) in cases)
        {
            GC.Collect();
            long allocated = GC.GetTotalAllocatedBytes(precise: true);
            var solver = new DeviceSolver();
            var cpu = Process.GetCurrentProcess().TotalProcessorTime;
            var clock = Stopwatch.StartNew();
            var problem = solver.Prepare(device);
            double prepare = clock.Elapsed.TotalSeconds;
            clock.Restart();
            var spectrum = solver.Solve(problem);
            double solve = clock.Elapsed.TotalSeconds;
            double cpuSeconds = (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalSeconds;
            double allocMb = (GC.GetTotalAllocatedBytes(precise: true) - allocated) / 1048576.0;
            double peakMb = Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0;
            int nonZeros = problem.Hamiltonian.StoredEntries * 2 - problem.Basis.Dimension;
            string agreement = "not feasible";
            if (problem.Basis.Dimension <= denseUpTo)
            {
                clock.Restart();
                var dense = new DeviceSolver { IterativeMinimumDimension = int.MaxValue }.Solve(problem, spectrum.Count);
                double worst = spectrum.Energies.Zip(dense.Energies, (a, b) => Math.Abs(a - b)).Max();
                agreement = $"{worst:E1} GHz (dense {clock.Elapsed.TotalSeconds:F2} s, {dense.SolverName})";
            }
            Console.WriteLine($"{name,-22} {problem.Basis.Dimension,8:N0} {nonZeros,10:N0} {spectrum.Count,8} {prepare,9:F2} {solve,8:F2} {cpuSeconds,7:F2} {spectrum.MaxResidual,9:E1} {allocMb,9:F0} {peakMb,8:F0}  {agreement}");
            Console.WriteLine($"{"",22} {spectrum.SolverName}; {spectrum.Selection?.Description}");
        }
    }

    private static Device File(string path, int maxExcitations)
    {
        var document = DeviceDocument.Load(path, new DeviceLoadOptions(AllowLarge: true)).Document
            ?? throw new InvalidOperationException($"{path} did not load (run from the repository root)");
        return document.Device with { Truncation = document.Device.Truncation with { MaxExcitations = maxExcitations } };
    }

    /// <summary>An n-qubit line like devices/line4.toml (qubits alternating low/high, a tunable coupler per edge, a resonator each, exchange couplings).</summary>
    public static Device Line(int qubits, int maxExcitations)
    {
        var result = DeviceDocument.Parse(LineToml(qubits, maxExcitations), $"line{qubits}.toml", new DeviceLoadOptions(AllowLarge: true));
        return result.Document?.Device ?? throw new InvalidOperationException(string.Join("\n", result.Errors));
    }

    /// <summary>The device file of <see cref="Line"/>, for timing whole commands on it (--write-line N FILE).</summary>
    public static string LineToml(int qubits, int maxExcitations)
    {
        var toml = new StringBuilder($"[device]\nname = \"line{qubits}\"\n[truncation]\nmax_excitations = {maxExcitations}\ndefault_levels = 6\n");
        for (int q = 0; q < qubits; q++)
        {
            toml.Append($"[elements.q{q}x]\nkind = \"tunable_transmon\"\nec = \"{(q % 2 == 0 ? 215 - q : 205 + q)} MHz\"\n");
            toml.Append($"ej_sum = \"{(q % 2 == 0 ? 19.0 - 0.2 * q : 16.0 - 0.2 * q)} GHz\"\nasymmetry = 0.3\nflux = 0.0\n");
            toml.Append($"[elements.r{q}x]\nkind = \"resonator\"\nfrequency = \"{7.0 + 0.1 * q:0.00} GHz\"\nkappa = \"1 MHz\"\nlevels = 5\n");
            toml.Append($"[couplers.q{q}x_r{q}x]\nkind = \"exchange\"\nbetween = [\"q{q}x\", \"r{q}x\"]\ng = \"90 MHz\"\n");
            if (q == qubits - 1) continue;
            toml.Append($"[elements.c{q}x]\nkind = \"tunable_transmon\"\nec = \"120 MHz\"\nej_sum = \"{44 + q} GHz\"\nasymmetry = 0.0\nflux = 0.0\n");
            foreach (int end in new[] { q, q + 1 })
                toml.Append($"[couplers.q{end}x_c{q}x]\nkind = \"exchange\"\nbetween = [\"q{end}x\", \"c{q}x\"]\ng = \"100 MHz\"\n");
            toml.Append($"[couplers.q{q}x_q{q + 1}x]\nkind = \"exchange\"\nbetween = [\"q{q}x\", \"q{q + 1}x\"]\ng = \"7 MHz\"\n");
        }
        return toml.ToString();
    }
}
