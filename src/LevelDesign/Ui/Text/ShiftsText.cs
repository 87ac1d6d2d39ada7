using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Model;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Ui.Text;

/// <summary>The 2χ matrix (qubit rows × resonator columns), the ZZ matrix and per-element transitions, in MHz.</summary>
public static class ShiftsText
{
    public static IReadOnlyList<TextLine> Build(DerivedQuantities q, string where, IReadOnlyList<ConvergenceEntry>? convergence = null, Device? device = null,
        string? convergenceProblem = null)
    {
        var lines = new List<TextLine> { new($"At {where}; all in MHz", Heading: true) };

        lines.Add(new TextLine(""));
        lines.Add(new TextLine("2χ  qubit ↓ × resonator →", Heading: true));
        lines.Add(new TextLine(Conventions.DispersiveShift));
        lines.AddRange(Matrix(q.DispersiveShifts.Select(p => p.First).Distinct().ToList(),
            q.DispersiveShifts.Select(p => p.Second).Distinct().ToList(), q.DispersiveShifts, symmetric: false));

        lines.Add(new TextLine(""));
        lines.Add(new TextLine("ZZ  ζ/h", Heading: true));
        lines.Add(new TextLine(Conventions.ZZ));
        var qubits = q.ZZ.SelectMany(p => new[] { p.First, p.Second }).Distinct().ToList();
        lines.AddRange(Matrix(qubits, qubits, q.ZZ, symmetric: true));

        lines.Add(new TextLine(""));
        lines.Add(new TextLine("Transitions (GHz)        f01 dressed    α (MHz)   Lamb (MHz)", Heading: true));
        lines.Add(new TextLine(Conventions.Transitions));
        foreach (var t in q.Transitions)
            lines.Add(new TextLine($"  {t.ElementId,-22} {Numbers.GHz(t.DressedF01),11} {Numbers.MHz(t.Anharmonicity, 2),10} {Numbers.MHz(t.LambShift, 3),12}"));
        if (q.Purcell.Count > 0)
        {
            lines.Add(new TextLine(""));
            lines.Add(new TextLine("Purcell", Heading: true));
            lines.Add(new TextLine(Conventions.Purcell));
            foreach (var p in q.Purcell)
                lines.Add(new TextLine($"  {p.Qubit} via {p.Resonator}: γ = {Numbers.MHz(p.RateGHz, 6)} MHz"));
        }
        if (convergence is not null && device is not null) lines.AddRange(Convergence(convergence, device));
        if (convergenceProblem is not null)
        {
            lines.Add(new TextLine(""));
            lines.Add(new TextLine("Truncation check at the file's biases", Heading: true));
            lines.Add(new TextLine("  not run: " + convergenceProblem, Warning: true));
        }
        return lines;
    }

    /// <summary>Each key value's change when every cutoff is raised, in kHz; the other flagged values on one line.</summary>
    private static IEnumerable<TextLine> Convergence(IReadOnlyList<ConvergenceEntry> entries, Device device)
    {
        yield return new TextLine("");
        yield return new TextLine("Truncation check at the file's biases", Heading: true);
        yield return new TextLine($"Δ = change when every cutoff is raised; ✗ when |Δ| > {TruncationConvergence.DefaultToleranceGHz * 1e6:0.#} kHz");
        yield return new TextLine($"    {"key value",-17}{"MHz",11}{"Δ kHz",10}");
        foreach (var e in ConvergenceSummary.Key(entries, device))
            yield return new TextLine($"  {(e.Flagged ? "✗" : "✓")} {e.Quantity,-17}{Numbers.MHz(e.Value, 4),11}{Kilohertz(e.Change),10}", Warning: e.Flagged);
        var others = entries.Where(e => e.Flagged && !ConvergenceSummary.IsKey(e.Quantity, device)).ToList();
        if (others.Count > 0)
            yield return new TextLine("  not counted (margin levels): " + string.Join(", ", others.Select(e => $"{e.Quantity} {Kilohertz(e.Change)} kHz")));
    }

    private static IEnumerable<TextLine> Matrix(IReadOnlyList<string> rows, IReadOnlyList<string> columns, IReadOnlyList<PairValue> values, bool symmetric)
    {
        if (rows.Count == 0 || columns.Count == 0)
        {
            yield return new TextLine("  (no pairs in this device)");
            yield break;
        }
        yield return new TextLine("  " + new string(' ', 8) + string.Concat(columns.Select(c => $"{Cut(c),12}")));
        foreach (var r in rows)
        {
            var cells = columns.Select(c =>
            {
                if (symmetric && r == c) return $"{"·",12}";
                var v = values.FirstOrDefault(p => (p.First == r && p.Second == c) || (symmetric && p.First == c && p.Second == r));
                return v is null ? $"{"",12}" : $"{Numbers.MHz(v.Value, 4),12}";
            });
            yield return new TextLine($"  {Cut(r),-8}" + string.Concat(cells));
        }
    }

    private static string Kilohertz(double ghz) =>
        double.IsFinite(ghz) ? (ghz * 1e6).ToString("+0.0;−0.0;0.0", CultureInfo.InvariantCulture) : "n/a";

    private static string Cut(string id) => id.Length <= 8 ? id : id[..7] + "…";
}
