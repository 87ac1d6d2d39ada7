using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>Every file in devices/ loads and computes; the demo is pair.toml; pair.toml's truncation is converged.</summary>
public sealed class ExampleDeviceTests
{
    public static TheoryData<string> Devices()
    {
        var data = new TheoryData<string>();
        foreach (var f in RepositoryPaths.DeviceFiles()) data.Add(Path.GetFileName(f));
        return data;
    }

    [Fact]
    public void AllFiveExamplesExist()
    {
        foreach (var name in new[] { "pair.toml", "single.toml", "fluxonium.toml", "defect.toml", "capmatrix.toml" })
            Assert.True(File.Exists(Path.Combine(RepositoryPaths.Devices, name)), name);
    }

    [Theory]
    [MemberData(nameof(Devices))]
    public void LoadsAndComputes(string name)
    {
        var result = DeviceDocument.Load(ExampleDevices.Path(name));
        Assert.True(result.Ok, string.Join("\n", result.Errors));
        var spectrum = new DeviceSolver().Solve(result.Document!.Device);
        Assert.Equal(0, spectrum.Energies[0]);
        var derived = DerivedQuantities.From(spectrum);
        var elements = result.Document.Device.Elements;
        // The design ranges the examples are meant to sit in (common practice for these devices).
        foreach (var t in derived.Transitions)
        {
            var element = elements.Single(e => e.Id == t.ElementId);
            Assert.True(double.IsFinite(t.DressedF01), $"{name}: {t.ElementId} f01 not found");
            if (element is Resonator) Assert.InRange(t.DressedF01, 6.5, 7.5);
            if (element is Transmon or TunableTransmon && element.Parameters["ec"] > 0.15)
            {
                Assert.InRange(t.DressedF01, 4.0, 6.0);
                Assert.InRange(t.Anharmonicity, -0.300, -0.200);
            }
        }
        // The lowest states of these weakly coupled devices are nearly bare.
        for (int k = 0; k < 3; k++) Assert.True(spectrum.Labels[k].Purity > 0.9, $"{name}: state {k} purity {spectrum.Labels[k].Purity}");
    }

    [Fact]
    public void DemoIsPairToml()
    {
        Assert.Equal(File.ReadAllText(Path.Combine(RepositoryPaths.Devices, "pair.toml")), DeviceDocument.DemoText());
        var demo = DeviceDocument.Demo();
        Assert.Equal("pair", demo.Device.Name);
        Assert.Equal(DeviceDocument.DemoPath, demo.Path);
    }

    [Fact]
    public void PairTruncationIsConvergedForFrequenciesAndZZ()
    {
        // Raising every cutoff (+2 levels, +1 excitation) must move f01 and ZZ by less than TruncationConvergence's
        // default tolerance of 1 kHz: the claim made in pair.toml's comment.
        var device = DeviceDocument.Demo().Device;
        var entries = TruncationConvergence.Check(new DeviceSolver(), device);
        foreach (var e in entries.Where(e => e.Quantity.EndsWith(".f01") || e.Quantity.StartsWith("zz:qa:qb")))
            Assert.False(e.Flagged, $"{e.Quantity}: {e.Value} → {e.RaisedValue} GHz");
    }

    [Fact]
    public void PairComputesWellUnderASecondPerPoint()
    {
        // Not a timing test of speed, a guard on the truncation size: the composite space is a few hundred states.
        var document = DeviceDocument.Demo();
        Assert.InRange(document.CompositeDimension, 50, 600);
    }

    [Fact]
    public void BiasMapsControlCurrentToFlux()
    {
        var document = DeviceDocument.Demo();
        var bias = document.Bias("qc_flux")!;
        // flux = (control − offset) / period with 0.75 mA, offset 0.15 mA, period 2.4 mA → 0.25 Φ0
        Assert.Equal(0.25, document.At(new Dictionary<string, double> { ["qc_flux"] = 0.75e-3 }).GetParameter("qc.flux"), 12);
        Assert.Equal(0.75e-3, bias.ToControl(0.25), 15);
        Assert.Equal(0.25, document.AtPoint("coupler_low").GetParameter("qc.flux"), 12);
    }

    [Fact]
    public void LargeTruncationIsRefusedUnlessAllowed()
    {
        string path = Path.Combine(RepositoryPaths.Malformed, "too_large.toml");
        string text = File.ReadAllText(path);
        var refused = DeviceDocument.Parse(text, path);
        var error = Assert.Single(refused.Errors);
        Assert.Contains("--allow-large", error.Message);
        Assert.Contains("GiB", error.Message);
        // 2 elements × 3 levels and 10 × 6 levels, no excitation cap: D = 3·3·6^10 = 544,195,584.
        Assert.Contains("544,195,584", error.Message);
        var allowed = DeviceDocument.Parse(text, path, new DeviceLoadOptions(AllowLarge: true));
        Assert.True(allowed.Ok, string.Join("\n", allowed.Errors));
    }

    [Fact]
    public void An_unclosed_quote_is_reported_once_at_its_opening_quote()
    {
        var result = DeviceDocument.Load(Path.Combine(RepositoryPaths.Malformed, "unclosed_quote.toml"));
        var error = Assert.Single(result.Errors);
        Assert.Equal((9, 6), (error.Line, error.Column));
        Assert.Contains("further syntax error", error.Message);
    }

    [Fact]
    public void MisspeltKeySuggestsTheNearestValidKey()
    {
        var result = DeviceDocument.Load(Path.Combine(RepositoryPaths.Malformed, "unknown_key_ejsum.toml"));
        Assert.Contains(result.Errors, e => e.Message.Contains("did you mean 'ej_sum'") && e.Field == "elements.qa.ejsum");
    }
}
