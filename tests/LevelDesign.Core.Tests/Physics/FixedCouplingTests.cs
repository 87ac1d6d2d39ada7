using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>A coupler given as g is converted once, at the reference point, and its coefficient is fixed hardware.</summary>
public class FixedCouplingTests
{
    private const string QubitOnResonator = """
        [elements.q]
        kind = "tunable_transmon"
        ec = "200 MHz"
        ej_sum = "20 GHz"
        asymmetry = 0.0
        flux = 0.0
        levels = 4

        [elements.r]
        kind = "resonator"
        frequency = "7 GHz"
        levels = 3

        [couplers.qr]
        kind = "capacitive"
        between = ["q", "r"]
        g = "50 MHz"
        {0}

        [biases.q_flux]
        target = "q.flux"
        value = 0.0

        [points.low]
        q_flux = 0.3
        """;

    private static DeviceDocument Load(string extra = "")
    {
        var result = DeviceDocument.Parse(QubitOnResonator.Replace("{0}", extra), "qr.toml");
        return result.Document ?? throw new InvalidOperationException(string.Join("; ", result.Errors));
    }

    private static ResolvedCoupler Coupler(Device device) => new DeviceSolver().Prepare(device).Couplers.Single();

    /// <summary>
    /// With a fixed coefficient, g follows the transmon's charge matrix element, which in the transmon limit is
    /// |⟨0|n|1⟩| = (E_J/8E_C)^{1/4}/√2 (Koch et al., PRA 76, 042319 (2007), Eq. 3.4), so g(Φ)/g(0) ≈ (E_J(Φ)/E_J(0))^{1/4}
    /// for a symmetric SQUID. The form is the leading term of an expansion in ξ = sqrt(8E_C/E_J); the first neglected
    /// term, measured with numpy at E_J/E_C = 50–300, is about ξ/16 of the matrix element. We allow ξ(Φ)/16 on the ratio
    /// (the corrections at the two fluxes partly cancel). A g held fixed instead would give a ratio of 1 (8–18% off).
    /// </summary>
    [Theory]
    [InlineData(0.25)]
    [InlineData(0.35)]
    public void G_follows_the_charge_matrix_element_as_flux_moves(double flux)
    {
        var document = Load();
        var at0 = Coupler(document.Device);
        var atFlux = Coupler(document.At(new Dictionary<string, double> { ["q_flux"] = flux }));
        Assert.Equal(at0.CoefficientGHz, atFlux.CoefficientGHz, 15);
        Assert.Equal(0.050, at0.GHereGHz, 12);
        double ejRatio = Math.Abs(Math.Cos(Math.PI * flux));
        double xi = Math.Sqrt(8 * 0.2 / (20 * ejRatio));
        double expected = Math.Pow(ejRatio, 0.25);
        double ratio = atFlux.GHereGHz / at0.GHereGHz;
        Assert.True(Math.Abs(ratio / expected - 1) < xi / 16, $"g ratio {ratio} vs (E_J(Φ)/E_J(0))^1/4 = {expected}, allowed {xi / 16}");
    }

    [Fact]
    public void G_at_names_the_point_of_conversion()
    {
        var document = Load("g_at = \"low\"");
        var coupler = Coupler(document.Device);
        Assert.Equal("low", coupler.ConvertedAt!.PointName);
        Assert.Equal(0.050, Coupler(document.AtPoint("low")).GHereGHz, 12);
        Assert.True(coupler.GHereGHz > 0.050, "at zero flux E_J is larger, so is the charge matrix element");
    }

    [Fact]
    public void A_g_at_naming_no_point_is_reported_at_its_line()
    {
        var result = DeviceDocument.Parse(QubitOnResonator.Replace("{0}", "g_at = \"lo\""), "qr.toml");
        var error = Assert.Single(result.Errors);
        Assert.Equal("couplers.qr.g_at", error.Field);
        Assert.Equal(18, error.Line);
        Assert.Contains("did you mean 'low'", error.Message);
    }

    /// <summary>
    /// A fabricated parameter changed (as a fit does) re-converts g for that design at the reference point: the designer
    /// gave g for the device as drawn, at its reference biases.
    /// </summary>
    [Fact]
    public void Changing_a_junction_re_converts_g_at_the_reference_point()
    {
        var document = Load();
        var changed = document.Device.WithParameter("q.ej_sum", 25.0);
        Assert.Equal(0.050, Coupler(changed).GHereGHz, 12);
        var changedAtFlux = changed.WithParameter("q.flux", 0.3);
        Assert.Equal(Coupler(changed).CoefficientGHz, Coupler(changedAtFlux).CoefficientGHz, 15);
    }

    [Fact]
    public void Symmetric_squid_at_half_flux_computes()
    {
        var device = Load().At(new Dictionary<string, double> { ["q_flux"] = 0.5 });
        var spectrum = new DeviceSolver().Solve(device);
        Assert.True(spectrum.Count > 3);
        Assert.Equal(0, Coupler(device).GHereGHz, 12);   // E_J = 0 at n_g = 0: the charge states do not mix, ⟨0|n|1⟩ = 0
    }

    [Fact]
    public void A_g_that_cannot_be_converted_at_the_reference_point_is_reported_at_its_key()
    {
        string text = QubitOnResonator.Replace("{0}", "").Replace("[biases.q_flux]\ntarget = \"q.flux\"\nvalue = 0.0", "[biases.q_flux]\ntarget = \"q.flux\"\nvalue = 0.5");
        var result = DeviceDocument.Parse(text, "qr.toml");
        Assert.Null(result.Document);
        var error = Assert.Single(result.Errors);
        Assert.Equal("couplers.qr.g", error.Field);
        Assert.Equal(17, error.Line);
        Assert.Contains("g_at", error.Message);
    }
}
