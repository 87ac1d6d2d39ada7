using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Sweeps;

/// <summary>
/// A large sweep keeps only energies, labels and derived quantities of each point (its vectors are dropped once the
/// neighbours' labels are carried), and the whole sweep is sized before any solve.
/// </summary>
public class SweepMemoryTests
{
    // 1,287 product states (above the single-point iterative threshold), complex in a real gauge
    private static readonly Model.Device Module = SweepDevices.FiveElements(levels: 9, maxExcitations: 8);
    private static readonly SweepAxis CouplerFlux = new("c.flux", 0.2, 0.44, 9, []);

    private static Task<SweepResult> Sweep(SweepOptions options, LabelMode labels = LabelMode.ByCharacter) =>
        SweepRunner.RunAsync(ParameterResolver.ForPaths(Module, [CouplerFlux]), new SweepPlan([CouplerFlux], labels), options);

    [Theory]
    [InlineData(LabelMode.ByCharacter)]
    [InlineData(LabelMode.ByOrder)]
    public async Task Dropping_the_vectors_changes_no_result(LabelMode labels)
    {
        var kept = await Sweep(new SweepOptions { KeepVectors = true }, labels);
        var dropped = await Sweep(new SweepOptions { KeepVectors = false }, labels);
        Assert.True(kept.Completed && dropped.Completed);
        Assert.Equal(kept.Points.Count, dropped.Points.Count);
        for (int i = 0; i < kept.Points.Count; i++)
        {
            var (a, b) = (kept.Points[i], dropped.Points[i]);
            Assert.True(a.Spectrum.HasVectors);
            Assert.False(b.Spectrum.HasVectors);
            Assert.Null(b.Spectrum.RealVectors ?? (object?)b.Spectrum.ComplexVectors);
            Assert.Equal(a.Spectrum.Count, b.Spectrum.Count);
            Assert.Equal(a.Ambiguous, b.Ambiguous);
            for (int k = 0; k < a.Spectrum.Count; k++)
            {
                // the two runs walk the sweep in different orders (warm starts differ): equal to the solver's accuracy
                Assert.Equal(a.Spectrum.Energies[k], b.Spectrum.Energies[k], 1e-9);
                Assert.Equal(a.Spectrum.Labels[k].BareIndex, b.Spectrum.Labels[k].BareIndex);
                Assert.Equal(a.Spectrum.Labels[k].Purity, b.Spectrum.Labels[k].Purity, 1e-6);
            }
            Assert.Equal(a.Quantities.Keys.Order(), b.Quantities.Keys.Order());
            foreach (var (name, value) in a.Quantities)
                if (double.IsFinite(value)) Assert.Equal(value, b.Quantities[name], 1e-9);
                else Assert.Equal(double.IsNaN(value), double.IsNaN(b.Quantities[name]));
            // what the UI reads at the cursor is what the sweep derived while the vectors were there
            Assert.Equal(a.Derived.Named()["zz:qa:qb"], b.Derived.Named()["zz:qa:qb"], 1e-9);
        }
        // matrix elements need the vectors: a clear refusal, not a crash
        var e = Assert.Throws<InvalidOperationException>(() => Analysis.DressedMatrixElements.Between(dropped.Points[0].Spectrum, "qa", "n", 0, 1));
        Assert.Contains("not kept", e.Message);
    }

    [Fact]
    public async Task A_sweep_that_would_not_fit_is_refused_before_any_solve_naming_what_to_lower()
    {
        int reported = 0;
        var progress = new Progress<SweepProgress>(_ => Interlocked.Increment(ref reported));
        var limit = 300L << 20;   // one worker's solve of 1,287 states fits, the vectors of 200 points (about 150 MB) with it do not
        var axis = new SweepAxis("c.flux", 0.2, 0.44, 200, []);
        var e = await Assert.ThrowsAsync<SweepTooLargeException>(() => SweepRunner.RunAsync(ParameterResolver.ForPaths(Module, [axis]),
            new SweepPlan([axis]), new SweepOptions { KeepVectors = true, MemoryLimitBytes = limit }, progress));
        Assert.Contains("200 points", e.Message);
        Assert.Contains("use at most", e.Message);
        Assert.Contains("limit 300 MiB", e.Message);
        Assert.Contains("it would also take about", e.Message);   // one point fits, so it was timed
        Assert.Equal(0, reported);

        // without kept vectors the points are not what fills memory: fewer states or a smaller truncation is
        var tiny = 100L << 20;
        e = await Assert.ThrowsAsync<SweepTooLargeException>(() => SweepRunner.RunAsync(ParameterResolver.ForPaths(Module, [axis]),
            new SweepPlan([axis]), new SweepOptions { KeepVectors = false, MemoryLimitBytes = tiny }));
        Assert.Contains("lower the number of states computed", e.Message);

        // the same sweep without kept vectors fits the 300 MiB
        Assert.Null(SweepMemoryEstimate.Refusal(1287, 12_000, 40, 200, 2, keepVectors: false, complex: true, 800, limit));
    }

    /// <summary>
    /// The estimate against peak memory measured on whole `sweep` commands (Release, `/usr/bin/time -v`, maximum
    /// resident set; docs/performance.md, "Sweeps of modules"): devices/line4.toml, 101 points (4,364 states, 22,105
    /// stored entries, 86 computed): 521 MB; devices/lattice3x3.toml (46,376 states, about 292k stored entries, 72
    /// computed), 9 points: 1,570 MB, 51 points: 2,173 MB. The resident peak also holds garbage the collector has not
    /// yet reclaimed, so the estimate is asked to be within 0.6–1.5× of it, not equal.
    /// </summary>
    [Theory]
    [InlineData(4_364, 22_105, 86, 101, 521)]
    [InlineData(46_376, 292_000, 72, 9, 1_570)]
    [InlineData(46_376, 292_000, 72, 51, 2_173)]
    public void Estimate_is_near_the_measured_peak_of_module_sweeps(int dimension, int storedEntries, int count, int points, double measuredMB)
    {
        bool keep = SweepMemoryEstimate.KeepsVectors(null, points, dimension, count, complex: false);
        Assert.False(keep);   // these sweeps keep no vectors: that is what brought the lattice's 4.3 GB down
        double estimateMB = SweepMemoryEstimate.Bytes(dimension, storedEntries, count, points, 2, keep, complex: false, 800) / 1e6;
        Assert.InRange(estimateMB, 0.6 * measuredMB, 1.5 * measuredMB);
    }

    [Fact]
    public void The_reference_sweep_keeps_its_vectors()
    {
        // 201 points × 462 states × 38 computed: 56 MB of vectors and weights, under the budget
        Assert.True(SweepMemoryEstimate.KeepsVectors(null, 201, 462, 38, complex: true));
    }
}
