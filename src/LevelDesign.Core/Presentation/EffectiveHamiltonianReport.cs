using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.Analysis;

namespace LevelDesign.Core.Presentation;

/// <summary>The effective two-qubit Hamiltonians: Pauli terms, J_eff, ZZ, the 4×4 matrix and the purity of the states used.</summary>
public static class EffectiveHamiltonianReport
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public const string Method =
        "least-action block diagonalisation (Cederbaum, Schirmer & Meyer, J. Phys. A 22, 2427 (1989)): the polar factor W of " +
        "M = ⟨bare computational|labelled dressed⟩ maps the four dressed states onto |00⟩, |01⟩, |10⟩, |11⟩ (other elements in 0); H_eff = W·diag(E)·Wᴴ";

    public const string Terms =
        "H_eff = Σ h_PQ·P⊗Q (P on the first qubit), GHz; J_eff = h_XX + h_YY (J(σ⁺σ⁻ + σ⁻σ⁺)); counter-rotating K = h_XX − h_YY; " +
        "ζ = 4h_ZZ (= E11 − E10 − E01 + E00); f = −2h_ZI, −2h_IZ; residual = √(Σh²) of all other terms";

    public static string Table(string device, IReadOnlyList<QubitPairHamiltonian> pairs)
    {
        var b = new StringBuilder();
        b.AppendLine($"effective qubit Hamiltonians of {device}");
        b.AppendLine(Method);
        b.AppendLine(Terms);
        foreach (var h in pairs)
        {
            b.AppendLine();
            b.AppendLine($"{h.QubitA}–{h.QubitB}:");
            if (h.ComputationalWeights.Count == 0)
            {
                b.AppendLine("  not available: a computational state of this pair is not among the computed or kept states");
                continue;
            }
            b.AppendLine($"  J_eff {MHz(h.JEff)}   ζ {MHz(h.ZZ)}   |⟨10|H|01⟩| {MHz(h.ExchangeMagnitude)}   counter-rotating K {MHz(h.CounterRotating)}   residual {MHz(h.Residual)}");
            b.AppendLine($"  f({h.QubitA}) {h.FrequencyA.ToString("F6", Inv)} GHz   f({h.QubitB}) {h.FrequencyB.ToString("F6", Inv)} GHz");
            b.AppendLine("  Pauli terms (MHz): " + string.Join("  ", h.PauliTerms.Where(t => t.Key != "II" && Math.Abs(t.Value) > 1e-9)
                .Select(t => $"{t.Key} {(t.Value * 1e3).ToString("G6", Inv)}")));
            b.AppendLine("  state   weight on computational   purity");
            for (int k = 0; k < 4; k++)
                b.AppendLine($"  |{QubitPairHamiltonian.BasisLabels[k]}⟩    {h.ComputationalWeights[k].ToString("F4", Inv),8}                  {h.Purities[k].ToString("F4", Inv)}");
            if (h.IllConditioned)
                b.AppendLine($"  WARNING: ill-conditioned: a computational state keeps only {h.MinComputationalWeight.ToString("F3", Inv)} of its weight on the computational states (threshold {h.Threshold}); it is hybridized with non-computational states and these terms are not reliable");
        }
        b.AppendLine();
        b.AppendLine(Conventions.LimitsOfModel);
        return b.ToString();
    }

    public static JsonObject Json(string device, JsonObject applied, IReadOnlyList<QubitPairHamiltonian> pairs) => new()
    {
        ["device"] = device,
        ["applied"] = applied,
        ["method"] = Method,
        ["terms"] = Terms,
        ["pairs"] = new JsonArray(pairs.Select(h => (JsonNode)Pair(h)).ToArray()),
        ["limits_of_model"] = Conventions.LimitsOfModel,
    };

    public static JsonObject Pair(QubitPairHamiltonian h)
    {
        var terms = new JsonObject();
        foreach (var (k, v) in h.PauliTerms) terms[k] = JsonValues.Number(v);
        var real = new double[4, 4];
        var imag = new double[4, 4];
        for (int i = 0; i < 4; i++)
            for (int j = 0; j < 4; j++) { real[i, j] = h.Matrix[i, j].Real; imag[i, j] = h.Matrix[i, j].Imaginary; }
        return new JsonObject
        {
            ["qubits"] = new JsonArray(h.QubitA, h.QubitB),
            ["available"] = h.ComputationalWeights.Count > 0,
            ["jeff_ghz"] = JsonValues.Number(h.JEff),
            ["zz_ghz"] = JsonValues.Number(h.ZZ),
            ["exchange_magnitude_ghz"] = JsonValues.Number(h.ExchangeMagnitude),
            ["counter_rotating_ghz"] = JsonValues.Number(h.CounterRotating),
            ["residual_ghz"] = JsonValues.Number(h.Residual),
            ["f_first_ghz"] = JsonValues.Number(h.FrequencyA),
            ["f_second_ghz"] = JsonValues.Number(h.FrequencyB),
            ["pauli_ghz"] = terms,
            ["basis"] = new JsonArray(QubitPairHamiltonian.BasisLabels.Select(l => (JsonNode)JsonValue.Create(l)!).ToArray()),
            ["matrix_real_ghz"] = JsonValues.Matrix(real),
            ["matrix_imag_ghz"] = JsonValues.Matrix(imag),
            ["dressed_energies_ghz"] = new JsonArray(h.DressedEnergies.Select(e => JsonValues.Number(e)).ToArray()),
            ["computational_weights"] = new JsonArray(h.ComputationalWeights.Select(w => JsonValues.Number(w)).ToArray()),
            ["purities"] = new JsonArray(h.Purities.Select(p => JsonValues.Number(p)).ToArray()),
            ["threshold"] = h.Threshold,
            ["ill_conditioned"] = h.IllConditioned,
        };
    }

    private static string MHz(double ghz) => double.IsFinite(ghz) ? (ghz * 1e3).ToString("G6", Inv) + " MHz" : "n/a";
}
