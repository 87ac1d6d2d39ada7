using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Tests.Physics;

/// <summary>
/// The up-front limit of the grown charge basis: what it refuses really needs more than the cap, what it accepts
/// near the cap converges, and the refusal names the key to lower.
/// </summary>
public class ChargeBasisLimitTests
{
    [Fact]
    public void A_ratio_just_under_the_bound_converges_within_the_cap()
    {
        // E_C = 1 kHz, E_J = 100 GHz: E_J/E_C = 1e8, under the bound for 4 levels (≈ 1.5e8)
        double ec = 1e-6, ej = 100;
        Assert.True(ej / ec < ChargeBasisLimit.MaxRatio(ej, 4));
        Assert.Null(ChargeBasisLimit.Problem(ec, ej, 4, "ej"));
        var spectrum = new Transmon("q", ec, ej).Diagonalise(4);
        Assert.True((spectrum.Basis.Size - 1) / 2 <= ChargeBasisLimit.MaxCharge);
        // the estimate is at least the half-width the growth reached (it is the refusal's safety side)
        Assert.True(ChargeBasisLimit.RequiredCharge(ec, ej, 4) >= (spectrum.Basis.Size - 1) / 2);
    }

    [Fact]
    public void A_ratio_over_the_bound_really_needs_more_than_the_cap_and_is_refused_naming_ej()
    {
        // E_J/E_C = 1e9 at E_J = 1 THz: twice the cap's reach by the estimate
        double ec = 1e-6, ej = 1000;
        Assert.True(ej / ec > ChargeBasisLimit.MaxRatio(ej, 4));
        // grown without the cap's refusal, the basis goes past |n| = 400 before the levels stop moving
        var grown = BasisConvergence.Solve("q", 4, null, ChargeBasisLimit.StartCharge(4), 4, 800, m => ChargeBasis.Build(ec, ej, 0, m));
        Assert.True((grown.Basis.Size - 1) / 2 > ChargeBasisLimit.MaxCharge);

        var e = Assert.Throws<ElementLimitException>(() => new Transmon("q", ec, ej).Diagonalise(4));
        Assert.Equal("ej", e.Parameter);
        Assert.Contains("E_J/E_C = 1E+09", e.Message);
        Assert.Contains("lower ej", e.Message);
    }

    [Fact]
    public void An_e_j_beyond_double_precision_at_1_hz_is_refused_and_an_explicit_basis_is_not_limited()
    {
        var e = Assert.Throws<ElementLimitException>(() => new TunableTransmon("q", 0.2, 1e7, 0, 0).Diagonalise(4));
        Assert.Equal("ej_sum", e.Parameter);
        Assert.Contains("lower ej_sum", e.Message);
        // just above the measured limit the growth indeed never settles (measured: 1e7 GHz fails for 4 levels)
        Assert.Throws<InvalidOperationException>(() =>
            BasisConvergence.Solve("q", 4, null, 10, 4, ChargeBasisLimit.MaxCharge, m => ChargeBasis.Build(0.2, 1e7, 0, m)));
        // a basis size the user gives is solved once, as given
        Assert.Equal(201, new Transmon("q", 0.2, 1e7).Diagonalise(4, basisSize: 201).Basis.Size);
    }

    [Fact]
    public void More_levels_than_the_growth_can_converge_are_refused_at_levels()
    {
        var e = Assert.Throws<ElementLimitException>(() => new Transmon("q", 0.2, 15).Diagonalise(395));
        Assert.Equal("levels", e.Parameter);
    }

    [Theory]
    [InlineData("ej = \"1 THz\"", "ej")]
    [InlineData("ic = \"0.2 mA\"", "ic")]   // circuit form: the key that gives E_J is named
    public void The_reader_reports_the_limit_at_the_key_that_gives_e_j(string line, string key)
    {
        string text = $"[device]\nname = \"t\"\n\n[elements.q]\nkind = \"transmon\"\nec = \"1 kHz\"\n{line}\nlevels = 4\n";
        var result = DeviceDocument.Parse(text, "q.toml");
        Assert.False(result.Ok);
        var error = Assert.Single(result.Errors);
        Assert.Equal((7, 1, $"elements.q.{key}"), (error.Line, error.Column, error.Field));
        Assert.Contains("beyond what a charge basis", error.Message);
    }
}
