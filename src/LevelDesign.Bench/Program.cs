using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

var device = new Device("five",
    [
        new TunableTransmon("qa", 0.20, 22.0, 0.2, 0.05),
        new TunableTransmon("qb", 0.21, 20.0, 0.3, 0.1),
        new TunableTransmon("c", 0.18, 45.0, 0.0, 0.2),
        new Resonator("ra", 7.1),
        new Resonator("rb", 7.3),
    ],
    [
        Coupler.Create("g_qa_c", CouplerKind.Capacitive, "qa", "c", new CouplingStrength.TargetG(0.09)),
        Coupler.Create("g_qb_c", CouplerKind.Capacitive, "qb", "c", new CouplingStrength.TargetG(0.09)),
        Coupler.Create("g_qa_qb", CouplerKind.Capacitive, "qa", "qb", new CouplingStrength.TargetG(0.006)),
        Coupler.Create("g_qa_ra", CouplerKind.Capacitive, "qa", "ra", new CouplingStrength.TargetG(0.08)),
        Coupler.Create("g_qb_rb", CouplerKind.Capacitive, "qb", "rb", new CouplingStrength.TargetG(0.08)),
    ],
    new Truncation { DefaultLevels = 5, MaxExcitations = 4 });
var solver = new DeviceSolver();
var p = solver.Prepare(device);
int n = p.Basis.Dimension, k = DeviceSolver.DefaultDressedCount(p.Basis);
Console.WriteLine($"n={n} k={k}");
var dav = new BlockDavidson(EigenSolvers.Active);
var r = dav.TryLowest(p.Hamiltonian.ToCsrReal(), k);
Console.WriteLine(r is null ? "null" : $"ok {BlockDavidson.LastIterations}");
var p2 = solver.Prepare(device.WithParameter("c.flux", 0.22));
var map = Enumerable.Range(0, n).Select(j => p.Basis.IndexOf(p2.Basis.States[j])).ToArray();
var guess = new double[n * k];
for (int j = 0; j < n; j++) for (int c = 0; c < k; c++) guess[c * n + j] = r!.Vectors[c * n + map[j]];
var r2 = dav.TryLowest(p2.Hamiltonian.ToCsrReal(), k, guess, k);
Console.WriteLine(r2 is null ? "null" : $"ok {BlockDavidson.LastIterations}");
var axis = new LevelDesign.Core.DeviceFiles.SweepAxis("c.flux", 0.0, 0.45, 24, []);
var res = await LevelDesign.Core.Sweeps.SweepRunner.RunAsync(LevelDesign.Core.Sweeps.ParameterResolver.ForPaths(device, [axis]), new LevelDesign.Core.Sweeps.SweepPlan([axis]));
foreach (var pt in res.Points) Console.WriteLine($"{pt.AxisValues[0]:F3} {pt.Spectrum.SolverName} {pt.Spectrum.Dimension} {pt.Spectrum.Count} amb={pt.Ambiguous}");
