using System.Diagnostics;
using LevelDesign.Bench;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Sweeps;

// Benchmarks only: figures are printed, never asserted. Run: dotnet run -c Release --project src/LevelDesign.Bench
Console.WriteLine(EigenSolvers.Describe());
Console.WriteLine($"cores: {Environment.ProcessorCount}");
var device = ReferenceDevice.Build();
var axis = new SweepAxis("c.flux", 0.0, 0.45, 201, []);
var resolve = ParameterResolver.ForPaths(device, [axis]);
var plan = new SweepPlan([axis]);

if (Array.IndexOf(args, "--write-line") is int at and >= 0 && at + 2 < args.Length)
{
    File.WriteAllText(args[at + 2], Scale.LineToml(int.Parse(args[at + 1]), 4));
    return;
}
if (Array.IndexOf(args, "--write-matrix") is int m and >= 0 && m + 2 < args.Length)
{
    MatrixExport.Run(args[m + 1], args[m + 2], m + 3 < args.Length ? int.Parse(args[m + 3]) : 83);
    return;
}
if (Array.IndexOf(args, "--count-cost") is int cc and >= 0 && cc + 1 < args.Length)
{
    CountCost.Run(args[cc + 1], args.Skip(cc + 2).TakeWhile(a => !a.StartsWith("--")).Select(int.Parse).ToArray());
    return;
}
if (args.Contains("--scale"))
{
    Scale.Run(args.Contains("--with-dense"));
    return;
}
// --- convergence of the cutoffs: ZZ and 2χ when every cutoff is raised
{
    var solver = new DeviceSolver();
    var baseQ = DerivedQuantities.From(solver.Solve(device)).Named();
    var raised = device with { Truncation = ReferenceDevice.Build(8, 7).Truncation };
    var raisedQ = DerivedQuantities.From(solver.Solve(raised)).Named();
    var p = solver.Prepare(device);
    Console.WriteLine($"composite dimension {p.Basis.Dimension}, dressed states per point {solver.DefaultCount(p)}, stored entries {p.Hamiltonian.StoredEntries}");
    foreach (string name in new[] { "zz:qa:qb", "chi2:qa:ra", "chi2:qb:rb" })
        Console.WriteLine($"  {name} = {baseQ[name] * 1e6:F3} kHz; change when raised to 8 levels / 7 excitations: {(raisedQ[name] - baseQ[name]) * 1e6:F4} kHz");
}

// median of three runs: single runs on a 2-core machine vary by tens of percent
double Seconds(Action action)
{
    var times = new double[3];
    for (int r = 0; r < times.Length; r++)
    {
        var sw = Stopwatch.StartNew();
        action();
        times[r] = sw.Elapsed.TotalSeconds;
    }
    Array.Sort(times);
    return times[1];
}

SweepResult Sweep(SweepOptions options) => SweepRunner.RunAsync(resolve, plan, options).GetAwaiter().GetResult();

if (args.Contains("--loop"))
{
    // serial sweeps to attach a sampling profiler to (dotnet-trace collect -- dotnet LevelDesign.Bench.dll --loop)
    for (int r = 0; r < 12; r++) Sweep(new SweepOptions { Parallelism = 1 });
    return;
}
if (args.Contains("--cpu"))
{
    // processor time of serial sweeps, configurations interleaved: less disturbed than wall time when other work
    // shares the cores
    var cpuConfigurations = new (string Name, SweepOptions Options)[]
    {
        ("native LAPACK for fallbacks", new SweepOptions { Parallelism = 1 }),
        ("managed only", new SweepOptions { Parallelism = 1, Solver = new DeviceSolver(EigenSolvers.Managed) }),
    };
    var cpu = cpuConfigurations.Select(_ => new List<double>()).ToArray();
    for (int round = 0; round < 6; round++)
        for (int c = 0; c < cpuConfigurations.Length; c++)
        {
            var before = Process.GetCurrentProcess().TotalProcessorTime;
            Sweep(cpuConfigurations[c].Options);
            if (round > 0) cpu[c].Add((Process.GetCurrentProcess().TotalProcessorTime - before).TotalSeconds);
        }
    for (int c = 0; c < cpuConfigurations.Length; c++)
    {
        double middle = cpu[c].Order().ElementAt(cpu[c].Count / 2);
        Console.WriteLine($"serial sweep, {cpuConfigurations[c].Name}: processor time median {middle:F3} s ({middle / axis.Count * 1e3:F2} ms per point)");
    }
    return;
}
if (args.Contains("--profile"))
{
    var biases = Enumerable.Range(0, 60).Select(i => SweepGrid.Value(axis, i)).ToArray();
    Profile.Run(resolve, biases);   // the first run includes compilation
    Profile.Run(resolve, biases);
    return;
}

// warm-up (JIT, native library load)
Sweep(new SweepOptions { Parallelism = 2 });
Sweep(new SweepOptions { Parallelism = 1, Solver = new DeviceSolver(EigenSolvers.Managed) });

// Configurations are interleaved, five rounds, medians reported: this machine's speed drifts by tens of percent
// within a minute, so back-to-back blocks of one configuration would bias the ratios.
var configurations = new (string Name, SweepOptions Options)[]
{
    ("2 workers", new SweepOptions { Parallelism = 2 }),
    ("1 worker", new SweepOptions { Parallelism = 1 }),
    ("2 workers, managed", new SweepOptions { Parallelism = 2, Solver = new DeviceSolver(EigenSolvers.Managed) }),
    ("1 worker, managed", new SweepOptions { Parallelism = 1, Solver = new DeviceSolver(EigenSolvers.Managed) }),
    ("2 workers, dense", new SweepOptions { Parallelism = 2, Iterative = false }),
};
var samples = configurations.Select(_ => new List<double>()).ToArray();
var processor = configurations.Select(_ => new List<double>()).ToArray();
const int rounds = 5;
for (int round = 0; round < rounds; round++)
    for (int c = 0; c < configurations.Length; c++)
    {
        var sw = Stopwatch.StartNew();
        var cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
        Sweep(configurations[c].Options);
        samples[c].Add(sw.Elapsed.TotalSeconds);
        processor[c].Add((Process.GetCurrentProcess().TotalProcessorTime - cpuBefore).TotalSeconds);
    }
double Median(List<double> values) { var v = values.Order().ToArray(); return v[v.Length / 2]; }
var median = samples.Select(Median).ToArray();
var medianProcessor = processor.Select(Median).ToArray();
double sweep2 = median[0];
double peakAfterSweeps = Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0;

// allocation and collections of one sweep, and where the time of a 2-worker sweep goes
long allocatedBefore = GC.GetTotalAllocatedBytes(precise: true);
int gen0 = GC.CollectionCount(0), gen2 = GC.CollectionCount(2);
var pause = GC.GetTotalPauseDuration();
var clock = Stopwatch.StartNew();
double solvedAt = 0;
var iterative = SweepRunner.RunAsync(resolve, plan, new SweepOptions { Parallelism = 2 }, new TimedProgress(clock, t => solvedAt = t, axis.Count))
    .GetAwaiter().GetResult();
double finishedAt = clock.Elapsed.TotalSeconds;
double allocatedMb = (GC.GetTotalAllocatedBytes(precise: true) - allocatedBefore) / 1048576.0;
string collections = $"{GC.CollectionCount(0) - gen0} gen0 / {GC.CollectionCount(2) - gen2} gen2, paused {(GC.GetTotalPauseDuration() - pause).TotalMilliseconds:F0} ms";

// accuracy: every level of every point against the dense path
var dense = Sweep(new SweepOptions { Parallelism = 2, Iterative = false });
double worst = 0;
int denseFallbacks = 0;
for (int i = 0; i < iterative.Points.Count; i++)
{
    var a = iterative.Points[i].Spectrum;
    if (!a.SolverName.StartsWith("block Davidson", StringComparison.Ordinal)) denseFallbacks++;
    for (int level = 0; level < a.Energies.Length; level++)
        worst = Math.Max(worst, Math.Abs(a.Energies[level] - dense.Points[i].Spectrum.Energies[level]));
}

Console.WriteLine($"sweep, 201 points, labels + derived quantities, iterative (medians of {rounds} interleaved rounds):");
Console.WriteLine($"  2 workers: {median[0]:F3} s   1 worker: {median[1]:F3} s   parallel speed-up {median[1] / median[0]:F2}x");
Console.WriteLine($"  processor time (all threads, medians): 2 workers {medianProcessor[0]:F3} s, 1 worker {medianProcessor[1]:F3} s");
Console.WriteLine($"  no native LAPACK anywhere (managed fallback solves): 2 workers {median[2]:F3} s   1 worker {median[3]:F3} s   speed-up {median[3] / median[2]:F2}x");
Console.WriteLine($"  2 workers, same pipeline with dense {EigenSolvers.Active.Name} instead of iterative: {median[4]:F3} s");
Console.WriteLine($"  one 2-worker sweep: points solved after {solvedAt:F3} s, labelled and finished at {finishedAt:F3} s; allocated {allocatedMb:F0} MB, {collections}");
Console.WriteLine($"  largest |E(iterative) − E(dense)| over all {iterative.Points.Count} points and levels: {worst:E1} GHz ({denseFallbacks} points fell back to dense)");
Console.WriteLine($"  peak working set after the sweeps: {peakAfterSweeps:F0} MB");
if (args.Contains("--sweeps-only")) return;

// --- the same matrices, dense
var problems = new List<CompositeProblem>();
var prepSolver = new DeviceSolver();
double prepare = Seconds(() => { for (int i = 0; i < axis.Count; i++) problems.Add(prepSolver.Prepare(resolve([SweepGrid.Value(axis, i)]))); });
int n = problems[0].Basis.Dimension, k = prepSolver.DefaultCount(problems[0]);
double EigenOnly(IEigenSolver eigen, IEnumerable<CompositeProblem> set)
{
    double seconds = 0;
    foreach (var p in set)
    {
        var m = p.Hamiltonian.ToDenseReal();   // densifying is not timed: only the solve
        seconds += Seconds(() => eigen.LowestReal(m, n, k));
    }
    return seconds;
}
double denseNative = EigenSolvers.Native is IEigenSolver native ? EigenOnly(native, problems) : double.NaN;
const int managedSample = 10;   // the plain managed solve is slow: time a sample and scale to 201
double denseManaged = EigenOnly(EigenSolvers.Managed, problems.Where((_, i) => i % 20 == 0).Take(managedSample)) * axis.Count / managedSample;
Console.WriteLine($"same 201 matrices, lowest {k} of {n}, eigen solve only, serial:");
Console.WriteLine($"  dense native LAPACK: {denseNative:F3} s ({denseNative / axis.Count * 1e3:F1} ms/point)   ratio to iterative sweep (2 workers): {denseNative / sweep2:F1}x");
Console.WriteLine($"  dense managed (MathNet), scaled from {managedSample}: {denseManaged:F3} s   ratio: {denseManaged / sweep2:F1}x");
Console.WriteLine($"  preparing the 201 problems alone (bare solves cached, basis, assembly): {prepare:F3} s");

// --- core engine: whole spectrum of one point, each eigensolver path, total vs eigen solve alone
foreach (var (label, solverPath) in new[] { ("native", EigenSolvers.Native), ("managed", (IEigenSolver?)EigenSolvers.Managed) })
{
    if (solverPath is null) { Console.WriteLine($"engine ({label}): unavailable — {EigenSolvers.NativeUnavailableReason}"); continue; }
    var engine = new DeviceSolver(solverPath);
    engine.Solve(device, n);
    const int repeats = 3;
    double total = Seconds(() => { for (int r = 0; r < repeats; r++) engine.Solve(device, n); }) / repeats;
    var matrix = engine.Prepare(device).Hamiltonian.ToDenseReal();
    double eigenOnly = Seconds(() => { for (int r = 0; r < repeats; r++) solverPath.LowestReal(matrix, n, n); }) / repeats;
    double totalK = Seconds(() => { for (int r = 0; r < repeats; r++) engine.Solve(device); }) / repeats;
    double eigenK = Seconds(() => { for (int r = 0; r < repeats; r++) solverPath.LowestReal(matrix, n, k); }) / repeats;
    Console.WriteLine($"engine ({label}), all {n} states: total {total * 1e3:F1} ms, eigen alone {eigenOnly * 1e3:F1} ms, overhead {(total / eigenOnly - 1) * 100:F0}%");
    Console.WriteLine($"engine ({label}), lowest {k}: total {totalK * 1e3:F1} ms, eigen alone {eigenK * 1e3:F1} ms, overhead {(totalK / eigenK - 1) * 100:F0}%");
}

Console.WriteLine($"peak working set: {Process.GetCurrentProcess().PeakWorkingSet64 / 1048576.0:F0} MB");
