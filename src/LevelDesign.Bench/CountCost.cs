using System.Diagnostics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Bench;

/// <summary>
/// --count-cost FILE [N ...]: what the neighbours' ZZ of a module costs with the lowest-N selection. Prints the product
/// states the default selection needs (each element's 1, each qubit's 2, |1,1⟩ of each neighbouring pair), the rank of
/// each in bare energy (what the lowest-N selection must reach), and the cold single-point solve time of the lowest N
/// states (wall and processor, and the largest residual) for each N: the bound on what a method computing only the
/// needed states (targeted interior eigenpairs) could save.
/// </summary>
internal static class CountCost
{
    public static void Run(string path, int[] counts)
    {
        var document = DeviceDocument.Load(path, new DeviceLoadOptions(AllowLarge: true)).Document
                       ?? throw new InvalidOperationException($"{path} did not load");
        var solver = new DeviceSolver();
        var problem = solver.Prepare(document.Device);
        var basis = problem.Basis;
        var (qubits, zz, _) = StateSelection.Graph(document.Device);
        var needed = new List<(string Name, int Index)>();
        for (int e = 0; e < document.Device.Elements.Count; e++) needed.Add(($"{document.Device.Elements[e].Id}:1", basis.IndexOfExcitation((e, 1))));
        foreach (int q in qubits) needed.Add(($"{document.Device.Elements[q].Id}:2", basis.IndexOfExcitation((q, 2))));
        foreach (var (a, b) in zz) needed.Add(($"{document.Device.Elements[a].Id}:1 {document.Device.Elements[b].Id}:1", basis.IndexOfExcitation((a, 1), (b, 1))));
        var rank = Enumerable.Range(0, basis.Dimension).OrderBy(j => basis.BareEnergies[j]).Select((j, r) => (j, r)).ToDictionary(x => x.j, x => x.r);
        var ranks = needed.Where(n => n.Index >= 0).Select(n => (n.Name, Rank: rank[n.Index], Energy: basis.BareEnergies[n.Index])).OrderBy(n => n.Rank).ToArray();
        var selected = solver.Select(problem);
        Console.WriteLine($"{path}: {basis.Dimension:N0} states; default selection {selected.Count} ({selected.Description})");
        Console.WriteLine($"needed product states: {ranks.Length}; bare-energy ranks {ranks[0].Rank}…{ranks[^1].Rank} " +
                          $"(highest: {ranks[^1].Name} at {ranks[^1].Energy:F3} GHz); not needed among the lowest {ranks[^1].Rank + 1}: {ranks[^1].Rank + 1 - ranks.Length}");
        Console.WriteLine("needed by rank: " + string.Join(", ", ranks.Select(r => $"{r.Name}#{r.Rank}")));
        solver.Solve(problem, Math.Min(8, basis.Dimension));   // compile before timing
        // Exchange (rotating-wave) couplings conserve the total excitation number, so the eigenvalues of the device cut
        // at 2 excitations (a few hundred states, solved densely) are exact eigenvalues of the full matrix: an exact
        // check of the iterative levels of a module too large for a dense solve.
        var cut = document.Device with { Truncation = document.Device.Truncation with { MaxExcitations = 2 } };
        var exactSolver = new DeviceSolver { IterativeMinimumDimension = int.MaxValue };
        var exactClock = Stopwatch.StartNew();
        var exactProblem = exactSolver.Prepare(cut);
        var exact = exactSolver.Solve(exactProblem, exactProblem.Basis.Dimension);
        Console.WriteLine($"dense solve of the device cut at 2 excitations ({exactProblem.Basis.Dimension} states, all levels): {exactClock.Elapsed.TotalSeconds:F3} s wall (prepared and solved; the first call compiles)");
        exactClock.Restart();
        exactSolver.Solve(exactSolver.Prepare(cut), exactProblem.Basis.Dimension);
        Console.WriteLine($"  again: {exactClock.Elapsed.TotalSeconds:F3} s wall");
        var exactLevels = exact.Energies.Select(e => e + exact.GroundEnergy).ToArray();
        foreach (int n in counts)
        {
            var process = Process.GetCurrentProcess();
            var cpu = process.TotalProcessorTime;
            var clock = Stopwatch.StartNew();
            var spectrum = solver.Solve(problem, n);
            double wall = clock.Elapsed.TotalSeconds;
            process.Refresh();
            // below the lowest 3-excitation bare energy every level belongs to the ≤ 2 blocks
            double threeFloor = Enumerable.Range(0, basis.Dimension).Where(j => basis.States[j].Sum() >= 3).Min(j => basis.BareEnergies[j]);
            var levels = spectrum.Energies.Select(e => e + spectrum.GroundEnergy).ToArray();
            int compared = levels.Count(e => e < threeFloor - 0.5);
            double worst = Enumerable.Range(0, Math.Min(compared, exactLevels.Length)).Max(k => Math.Abs(levels[k] - exactLevels[k]));
            Console.WriteLine($"lowest {n,4}: {wall,7:F2} s wall, {(process.TotalProcessorTime - cpu).TotalSeconds,7:F2} s processor, residual {spectrum.MaxResidual:E1} GHz; " +
                              $"|ΔE| against the dense ≤ 2-excitation solve ({exactProblem.Basis.Dimension} states) over {compared} levels: {worst:E1} GHz; load {File.ReadAllText("/proc/loadavg").Split(' ')[0]}");
        }
    }
}
