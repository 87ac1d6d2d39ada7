using LevelDesign.Core.Presentation;
using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Model;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The 2χ matrix (qubit rows × resonator columns), the ZZ and J_eff matrices, per-element transitions in MHz, and the
/// coherence budget's T1/T2 when it has been estimated.
/// </summary>
public static class ShiftsText
{
    /// <param name="width">Columns of the page: conventions wrap, and columns narrow to their contents.</param>
    public static IReadOnlyList<TextLine> Build(DerivedQuantities q, string where, IReadOnlyList<ConvergenceEntry>? convergence = null, Device? device = null,
        string? convergenceProblem = null, int width = 100, IReadOnlyList<CoherenceBudget>? coherence = null,
        double purityThreshold = Conventions.DefaultPurityThreshold)
    {
        var lines = new List<TextLine>();
        lines.AddRange(Wrapped($"At {where}; all in MHz", width, heading: true));
        lines.AddRange(Wrapped(string.Create(CultureInfo.InvariantCulture, $"! = read from a state below purity {purityThreshold:0.##} (hybridized labels)"), width));

        lines.Add(new TextLine(""));
        lines.Add(new TextLine("2χ  qubit ↓ × resonator →", Heading: true));
        lines.AddRange(Wrapped(Conventions.DispersiveShift, width));
        lines.AddRange(Matrix(q.DispersiveShifts.Select(p => p.First).Distinct().ToList(),
            q.DispersiveShifts.Select(p => p.Second).Distinct().ToList(), q.DispersiveShifts, symmetric: false, purityThreshold));

        lines.Add(new TextLine(""));
        lines.Add(new TextLine("ZZ  ζ/h", Heading: true));
        lines.AddRange(Wrapped(Conventions.ZZ, width));
        var qubits = q.ZZ.SelectMany(p => new[] { p.First, p.Second }).Distinct().ToList();
        lines.AddRange(Matrix(qubits, qubits, q.ZZ, symmetric: true, purityThreshold));

        if (q.EffectiveHamiltonians.Count > 0)
        {
            lines.Add(new TextLine(""));
            lines.Add(new TextLine("J_eff  effective exchange", Heading: true));
            lines.AddRange(Wrapped("J_eff = Re⟨10|H_eff|01⟩ of the least-action effective Hamiltonian (others in 0); * = ill-conditioned " +
                $"(a computational state below {BlockDiagonalisation.DefaultThreshold} on the computational states)", width));
            var pairs = q.EffectiveHamiltonians.Select(h => new PairValue(h.QubitA, h.QubitB, h.JEff)).ToList();
            var ids = pairs.SelectMany(p => new[] { p.First, p.Second }).Distinct().ToList();
            var flagged = q.EffectiveHamiltonians.Where(h => h.IllConditioned).Select(h => (h.QubitA, h.QubitB)).ToHashSet();
            lines.AddRange(Matrix(ids, ids, pairs, symmetric: true, purityThreshold, (r, c) => flagged.Contains((r, c)) || flagged.Contains((c, r))));
        }

        lines.Add(new TextLine(""));
        lines.AddRange(Transitions(q, width, purityThreshold));
        if (q.Purcell.Count > 0)
        {
            lines.Add(new TextLine(""));
            lines.Add(new TextLine("Purcell", Heading: true));
            lines.AddRange(Wrapped(Conventions.Purcell, width));
            foreach (var p in q.Purcell)
                lines.AddRange(Wrapped($"  {p.Qubit} via {p.Resonator}: γ = {FrequencyText.Format(p.RateGHz, FrequencyText.ShiftResolutionGHz)}, T1 limit {DurationText.Format(p.T1LimitSeconds)}{(p.Purity < purityThreshold ? " !" : "")}", width));
        }
        if (coherence is { Count: > 0 }) lines.AddRange(Coherence(coherence, width));
        if (convergence is not null && device is not null) lines.AddRange(Convergence(convergence, device, width));
        if (convergenceProblem is not null)
        {
            lines.Add(new TextLine(""));
            lines.Add(new TextLine("Truncation check at the file's biases", Heading: true));
            lines.AddRange(Wrapped("  not run: " + convergenceProblem, width, warning: true));
        }
        return lines;
    }

    private static IEnumerable<TextLine> Wrapped(string text, int width, bool heading = false, bool warning = false) =>
        TextFit.WrapLines(text, width, indent: "  ").Select(l => new TextLine(l, Warning: warning, Heading: heading));

    /// <summary>Dressed f01 (GHz), α and Lamb shift (MHz) per element; the element column is as wide as the longest id.</summary>
    private static IEnumerable<TextLine> Transitions(DerivedQuantities q, int width, double purityThreshold)
    {
        int idWidth = Math.Max(7, q.Transitions.Select(t => t.ElementId.Length).DefaultIfEmpty(0).Max());
        yield return new TextLine("Transitions (dressed)", Heading: true);
        foreach (var line in Wrapped(Conventions.Transitions, width)) yield return line;
        yield return new TextLine($"  {"element".PadRight(idWidth)} {"f01 GHz",11} {"α MHz",10} {"Lamb MHz",11}", Heading: true);
        foreach (var t in q.Transitions)
        {
            bool low = Math.Min(t.F01Purity, t.F12Purity) < purityThreshold;
            yield return new TextLine($"  {t.ElementId.PadRight(idWidth)} {Numbers.GHz(t.DressedF01),11} {Numbers.MHz(t.Anharmonicity, 2),10} {Numbers.MHz(t.LambShift, 3),11}{(low ? " !" : "")}", Warning: low);
        }
    }

    /// <summary>T1, T_φ, T2 and the limiting channel of each qubit, with the default noise figures.</summary>
    private static IEnumerable<TextLine> Coherence(IReadOnlyList<CoherenceBudget> budgets, int width)
    {
        yield return new TextLine("");
        foreach (var line in Wrapped("Coherence (model estimates; confirm by measurement)", width, heading: true)) yield return line;
        foreach (var line in Wrapped("noise and loss figures from [coherence] in the file or common-practice defaults; `leveldesign coherence` shows every channel", width))
            yield return line;
        int idWidth = Math.Max(7, budgets.Max(b => b.Qubit.Length));
        yield return new TextLine($"  {"qubit".PadRight(idWidth)} {"T1 µs",9} {"T2 µs",9}  limited by", Heading: true);
        foreach (var b in budgets)
            foreach (var line in Wrapped($"  {b.Qubit.PadRight(idWidth)} {Micro(b.T1Seconds),9} {Micro(b.T2Seconds),9}  {b.DominantT2?.Name ?? "—"}", width))
                yield return line;
    }

    private static string Micro(double seconds) =>
        double.IsPositiveInfinity(seconds) ? "∞" : double.IsFinite(seconds) ? (seconds * 1e6).ToString("G4", CultureInfo.InvariantCulture) : "n/a";

    /// <summary>Each key value's change when every cutoff is raised, in kHz; the other flagged values on one line.</summary>
    private static IEnumerable<TextLine> Convergence(IReadOnlyList<ConvergenceEntry> entries, Device device, int width)
    {
        yield return new TextLine("");
        yield return new TextLine("Truncation check at the file's biases", Heading: true);
        foreach (var line in Wrapped($"Δ = change when every cutoff is raised; ✗ when |Δ| > {TruncationConvergence.DefaultToleranceGHz * 1e6:0.#} kHz", width))
            yield return line;
        yield return new TextLine($"    {"key value",-17}{"MHz",11}{"Δ kHz",10}");
        foreach (var e in ConvergenceSummary.Key(entries, device))
            yield return new TextLine($"  {(e.Flagged ? "✗" : "✓")} {e.Quantity,-17}{Numbers.MHz(e.Value, 4),11}{Kilohertz(e.Change),10}", Warning: e.Flagged);
        var others = entries.Where(e => e.Flagged && !ConvergenceSummary.IsKey(e.Quantity, device)).ToList();
        if (others.Count > 0)
            foreach (var line in Wrapped("  not counted (margin levels): " + string.Join(", ", others.Select(e => $"{e.Quantity} {Kilohertz(e.Change)} kHz")), width))
                yield return line;
    }

    /// <summary>
    /// A matrix of values in MHz; columns are as wide as their widest entry (at most 12), so three or four
    /// fit a narrow page. Ids longer than the row-name column are cut with "…".
    /// </summary>
    private static IEnumerable<TextLine> Matrix(IReadOnlyList<string> rows, IReadOnlyList<string> columns, IReadOnlyList<PairValue> values, bool symmetric,
        double purityThreshold, Func<string, string, bool>? marked = null)
    {
        if (rows.Count == 0 || columns.Count == 0)
        {
            yield return new TextLine("  (no pairs in this device)");
            yield break;
        }
        string Cell(string r, string c)
        {
            if (symmetric && r == c) return "·";
            var v = values.FirstOrDefault(p => (p.First == r && p.Second == c) || (symmetric && p.First == c && p.Second == r));
            return v is null ? "" : Numbers.MHz(v.Value, 4) + (v.Purity < purityThreshold ? "!" : "") + (marked?.Invoke(r, c) == true ? "*" : "");
        }
        int cellWidth = Math.Min(12, 2 + Math.Max(columns.Max(c => Cut(c).Length), rows.SelectMany(r => columns.Select(c => Cell(r, c).Length)).Max()));
        yield return new TextLine("  " + new string(' ', 8) + string.Concat(columns.Select(c => Cut(c).PadLeft(cellWidth))));
        foreach (var r in rows)
            yield return new TextLine($"  {Cut(r),-8}" + string.Concat(columns.Select(c => Cell(r, c).PadLeft(cellWidth))));
    }

    private static string Kilohertz(double ghz) =>
        double.IsFinite(ghz) ? (ghz * 1e6).ToString("+0.0;−0.0;0.0", CultureInfo.InvariantCulture) : "n/a";

    private static string Cut(string id) => id.Length <= 8 ? id : id[..7] + "…";
}
