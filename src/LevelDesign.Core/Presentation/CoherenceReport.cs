using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.Analysis;

namespace LevelDesign.Core.Presentation;

/// <summary>The coherence budget as a terminal table, JSON, and (along a sweep) CSV and JSON rows.</summary>
public static class CoherenceReport
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public const string Caution =
        "Model estimates from the noise and loss figures below (defaults are common practice, not measurements); confirm by measurement.";

    public const string Combination =
        "T1 = 1/ΣΓ1; T_φ = 1/ΣΓ_φ; T2 = 1/(1/(2T1) + 1/T_φ); rates of separate channels are added (conservative for the Gaussian 1/f decays); " +
        "the dominant channel has the largest share of 1/T2 (relaxation counted as Γ1/2)";

    public static string Table(string device, IReadOnlyList<CoherenceBudget> budgets, CoherenceInputs inputs)
    {
        var b = new StringBuilder();
        b.AppendLine($"coherence budget of {device}");
        b.AppendLine(Caution);
        b.AppendLine("inputs: " + string.Join(", ", inputs.Describe().Select(i => $"{i.Name} {i.Value.ToString("G3", Inv)}{(i.Unit.Length > 0 ? " " + i.Unit : "")}")));
        foreach (var budget in budgets)
        {
            b.AppendLine();
            b.AppendLine($"{budget.Qubit}: f01 {budget.DressedF01.ToString("F6", Inv)} GHz, purity of |1⟩ {budget.Purity.ToString("F4", Inv)}");
            b.AppendLine($"  {"channel",-38} {"adds to",-8} {"rate (1/s)",12} {"limit (µs)",12}");
            double total = 1 / budget.T2Seconds;
            var hidden = budget.Channels.Where(c => Negligible(c, total)).ToArray();
            foreach (var c in budget.Channels.Except(hidden))
            {
                b.AppendLine($"  {c.Name,-38} {(c.Kind == CoherenceChannelKind.Relaxation ? "1/T1" : "1/T_φ"),-8} {Rate(c.RatePerSecond),12} {Micro(c.LimitSeconds),12}");
                b.AppendLine($"      {c.Formula}  [{c.Source}]");
                b.AppendLine($"      {c.Detail}");
            }
            if (hidden.Length > 0)
                b.AppendLine($"  ({hidden.Length} channel(s) below {NegligibleShare:G1} of 1/T2 not shown: {string.Join(", ", hidden.Select(c => c.Name))}; see --json)");
            b.AppendLine($"  T1 {Micro(budget.T1Seconds)} µs   T_φ {Micro(budget.TPhiSeconds)} µs   T2 {Micro(budget.T2Seconds)} µs");
            b.AppendLine($"  limited most by: T1 {budget.DominantT1?.Name ?? "none"}; T2 {budget.DominantT2?.Name ?? "none"}");
        }
        b.AppendLine();
        b.AppendLine(Combination + ".");
        b.AppendLine(Conventions.LimitsOfModel);
        return b.ToString();
    }

    /// <summary>The table leaves out channels with less than this share of 1/T2 (JSON keeps every channel).</summary>
    public const double NegligibleShare = 1e-4;

    private static bool Negligible(CoherenceChannel c, double totalT2Rate) =>
        double.IsFinite(c.RatePerSecond) && totalT2Rate > 0 && c.T2Rate < NegligibleShare * totalT2Rate;

    public static JsonObject Json(string device, JsonObject applied, IReadOnlyList<CoherenceBudget> budgets, CoherenceInputs inputs) => new()
    {
        ["device"] = device,
        ["applied"] = applied,
        ["note"] = Caution,
        ["inputs"] = Inputs(inputs),
        ["qubits"] = Qubits(budgets),
        ["combination"] = Combination,
        ["limits_of_model"] = Conventions.LimitsOfModel,
    };

    public static JsonArray Inputs(CoherenceInputs inputs) =>
        new(inputs.Describe().Select(i => (JsonNode)new JsonObject
        {
            ["name"] = i.Name, ["value"] = JsonValues.Number(i.Value), ["unit"] = i.Unit, ["meaning"] = i.Meaning,
        }).ToArray());

    public static JsonArray Qubits(IReadOnlyList<CoherenceBudget> budgets) =>
        new(budgets.Select(budget => (JsonNode)new JsonObject
        {
            ["qubit"] = budget.Qubit,
            ["f01_ghz"] = JsonValues.Number(budget.DressedF01),
            ["purity"] = JsonValues.Number(budget.Purity),
            ["t1_us"] = JsonValues.Number(budget.T1Seconds * 1e6),
            ["tphi_us"] = JsonValues.Number(budget.TPhiSeconds * 1e6),
            ["t2_us"] = JsonValues.Number(budget.T2Seconds * 1e6),
            ["dominant_t1"] = budget.DominantT1?.Name,
            ["dominant_t2"] = budget.DominantT2?.Name,
            ["channels"] = new JsonArray(budget.Channels.Select(c => (JsonNode)new JsonObject
            {
                ["name"] = c.Name,
                ["adds_to"] = c.Kind == CoherenceChannelKind.Relaxation ? "1/T1" : "1/T_phi",
                ["rate_per_s"] = JsonValues.Number(c.RatePerSecond),
                ["limit_us"] = JsonValues.Number(c.LimitSeconds * 1e6),
                ["formula"] = c.Formula,
                ["source"] = c.Source,
                ["detail"] = c.Detail,
            }).ToArray()),
        }).ToArray());

    /// <summary>One row per sweep point: the axis values, then f01, T1, T_φ, T2 (µs) and the T2-dominant channel of each qubit.</summary>
    public static string Csv(IReadOnlyList<string> axisPaths, IReadOnlyList<(IReadOnlyList<double> Axis, IReadOnlyList<CoherenceBudget> Budgets)> rows,
        CoherenceInputs inputs)
    {
        var b = new StringBuilder();
        b.AppendLine("# " + Caution);
        b.AppendLine("# inputs: " + string.Join("; ", inputs.Describe().Select(i => $"{i.Name} = {i.Value.ToString("R", Inv)} {i.Unit}".TrimEnd())));
        b.AppendLine("# " + Combination);
        var qubits = rows.Count > 0 ? rows[0].Budgets.Select(x => x.Qubit).ToArray() : [];
        b.AppendLine(string.Join(",", axisPaths.Concat(qubits.SelectMany(q => new[] { $"{q}.f01_ghz", $"{q}.t1_us", $"{q}.tphi_us", $"{q}.t2_us", $"{q}.dominant_t2" }))));
        foreach (var (axis, budgets) in rows)
        {
            var cells = axis.Select(v => v.ToString("R", Inv)).ToList();
            foreach (var q in budgets)
                cells.AddRange([q.DressedF01.ToString("R", Inv), Cell(q.T1Seconds * 1e6), Cell(q.TPhiSeconds * 1e6), Cell(q.T2Seconds * 1e6), Quote(q.DominantT2?.Name ?? "")]);
            b.AppendLine(string.Join(",", cells));
        }
        return b.ToString();
    }

    public static JsonObject SweepJson(string device, IReadOnlyList<string> axisPaths,
        IReadOnlyList<(IReadOnlyList<double> Axis, IReadOnlyList<CoherenceBudget> Budgets)> rows, CoherenceInputs inputs, bool completed) => new()
    {
        ["device"] = device,
        ["completed"] = completed,
        ["note"] = Caution,
        ["inputs"] = Inputs(inputs),
        ["axes"] = new JsonArray(axisPaths.Select(p => (JsonNode)JsonValue.Create(p)!).ToArray()),
        ["points"] = new JsonArray(rows.Select(r => (JsonNode)new JsonObject
        {
            ["axis_values"] = new JsonArray(r.Axis.Select(v => JsonValues.Number(v)).ToArray()),
            ["qubits"] = Qubits(r.Budgets),
        }).ToArray()),
        ["combination"] = Combination,
        ["limits_of_model"] = Conventions.LimitsOfModel,
    };

    private static string Cell(double x) => double.IsFinite(x) ? x.ToString("R", Inv) : (double.IsPositiveInfinity(x) ? "inf" : "");

    private static string Quote(string s) => s.Contains(',') || s.Contains('"') ? "\"" + s.Replace("\"", "\"\"") + "\"" : s;

    private static string Rate(double r) => double.IsFinite(r) ? r.ToString("G4", Inv) : "n/a";

    private static string Micro(double seconds) =>
        double.IsPositiveInfinity(seconds) ? "∞" : double.IsFinite(seconds) ? (seconds * 1e6).ToString("G4", Inv) : "n/a";
}
