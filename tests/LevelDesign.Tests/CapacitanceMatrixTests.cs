using System.Text.Json.Nodes;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests;

/// <summary>
/// describe --json of devices/capmatrix.toml against a hand calculation from its Maxwell matrix.
///
/// Constants: e = 1.602176634e-19 C and h = 6.62607015e-34 J·s, exact since the SI 2019 redefinition (CODATA 2018).
/// Nodes (qa, qb, r), matrix in fF, as written in the file:
///     C = [[88, −0.5, −6], [−0.5, 80, −0.4], [−6, −0.4, 400]]
/// With node charges n in Cooper pairs, H/h = 2e² nᵀC⁻¹n/h, so
///     E_C,i = e²(C⁻¹)_ii/(2h)          (coefficient of n_i² is 4E_C,i)
///     coupling_ij = 4e²(C⁻¹)_ij/h      (coefficient of n_i n_j, each pair once).
/// C⁻¹ = adj(C)/det(C) by cofactors (computed below in plain arithmetic, not with a library).
/// E_J of qb from R_n = 12 kΩ: Ambegaokar–Baratoff I_c = πΔ/(2eR_n) with Δ = 180 µeV, E_J/h = I_c/(4πe)
/// (Δ = 180 µeV for aluminium is common practice, as in the file's comment).
/// </summary>
public sealed class CapacitanceMatrixTests
{
    private const double E = 1.602176634e-19, H = 6.62607015e-34, FemtoFarad = 1e-15;

    private static double[,] Inverse3(double[,] c)
    {
        double Cof(int i, int j)
        {
            int r0 = i == 0 ? 1 : 0, r1 = i == 2 ? 1 : 2, c0 = j == 0 ? 1 : 0, c1 = j == 2 ? 1 : 2;
            double minor = c[r0, c0] * c[r1, c1] - c[r0, c1] * c[r1, c0];
            return ((i + j) % 2 == 0 ? 1 : -1) * minor;
        }
        double det = c[0, 0] * Cof(0, 0) + c[0, 1] * Cof(0, 1) + c[0, 2] * Cof(0, 2);
        var inv = new double[3, 3];
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++) inv[i, j] = Cof(j, i) / det;
        return inv;
    }

    [Fact]
    public void DescribeAgreesWithHandCalculationFromTheMatrix()
    {
        var c = new double[,] { { 88, -0.5, -6 }, { -0.5, 80, -0.4 }, { -6, -0.4, 400 } };
        for (int i = 0; i < 3; i++) for (int j = 0; j < 3; j++) c[i, j] *= FemtoFarad;
        var inv = Inverse3(c);
        double Ec(int i) => E * E * inv[i, i] / (2 * H) / 1e9;
        double Coupling(int i, int j) => 4 * E * E * inv[i, j] / H / 1e9;

        var run = Executable.Run("describe", Path.Combine(RepositoryPaths.Devices, "capmatrix.toml"), "--json");
        Assert.True(run.ExitCode == 0, run.ToString());
        var json = JsonNode.Parse(run.Stdout)!;
        var elements = json["elements"]!.AsArray();
        string[] ids = ["qa", "qb", "r"];
        for (int i = 0; i < 3; i++)
        {
            var element = elements.Single(e => (string)e!["id"]! == ids[i])!;
            Assert.Equal(Ec(i), (double)element["parameters"]!["ec"]!, 1e-12);
        }
        // Sanity of the hand numbers themselves: a lone 88 fF node would have E_C = 19.3702/88 GHz ≈ 0.2201 GHz.
        Assert.InRange(Ec(0), 0.219, 0.222);

        var couplers = json["couplers"]!.AsArray();
        foreach (var (i, j) in new[] { (0, 1), (0, 2), (1, 2) })
        {
            var coupler = couplers.Single(x => (string)x!["id"]! == $"cmatrix_{ids[i]}_{ids[j]}")!;
            Assert.Equal(Coupling(i, j), (double)coupler["coefficient_ghz"]!, 1e-12);
            Assert.Equal("full", (string)coupler["form"]!);
            Assert.Equal(ids[i], (string)coupler["elements"]![0]!);
            Assert.Equal("n", (string)coupler["operators"]![0]!);
            Assert.Equal("n", (string)coupler["operators"]![1]!);
        }

        double ic = Math.PI * 180e-6 / (2 * 12e3); // Δ/e in volts = 180 µV
        double ejQb = ic / (4 * Math.PI * E) / 1e9;
        var qb = elements.Single(e => (string)e!["id"]! == "qb")!;
        Assert.Equal(ejQb, (double)qb["parameters"]!["ej"]!, 1e-9);
        Assert.Equal("charge", (string)qb["basis"]!["kind"]!);
        Assert.Equal(6, (int)qb["levels_kept"]!);   // as written in devices/capmatrix.toml
    }
}
