using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Output;

/// <summary>
/// Writes one computed point (dressed states and derived quantities) as JSON, a terminal table or CSV cells.
/// Shared by spectrum and sweep, and by later commands that report points.
/// </summary>
public static class SpectrumFormatter
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static JsonObject Conventions() => new()
    {
        ["energies"] = Core.Analysis.Conventions.Energies,
        ["transitions"] = Core.Analysis.Conventions.Transitions,
        ["lamb_shift"] = Core.Analysis.Conventions.LambShift,
        ["dispersive_shift"] = Core.Analysis.Conventions.DispersiveShift,
        ["zz"] = Core.Analysis.Conventions.ZZ,
        ["purity"] = Core.Analysis.Conventions.Purity,
        ["purcell"] = Core.Analysis.Conventions.Purcell,
    };

    /// <summary>The lowest <paramref name="shown"/> dressed states with labels, energies, purity and top components.</summary>
    public static JsonArray States(DressedSpectrum s, int shown)
    {
        var states = new JsonArray();
        for (int k = 0; k < Math.Min(shown, s.Count); k++)
        {
            var label = s.Labels[k];
            var components = new JsonArray();
            foreach (var c in label.Components)
                components.Add(new JsonObject
                {
                    ["label"] = StateLabels.Json(s, c.BareIndex),
                    ["text"] = StateLabels.Text(s, c.BareIndex),
                    ["percent"] = JsonValues.Number(100 * c.Weight),
                });
            states.Add(new JsonObject
            {
                ["index"] = k,
                ["label"] = StateLabels.Json(s, label.BareIndex),
                ["text"] = StateLabels.Text(s, label.BareIndex),
                ["energy_ghz"] = JsonValues.Number(s.Energies[k]),
                ["purity"] = JsonValues.Number(label.Purity),
                ["ambiguous"] = label.Ambiguous,
                ["components"] = components,
            });
        }
        return states;
    }

    public static JsonObject Derived(DerivedQuantities d)
    {
        var transitions = new JsonArray();
        foreach (var t in d.Transitions)
            transitions.Add(new JsonObject
            {
                ["element"] = t.ElementId,
                ["bare_f01_ghz"] = JsonValues.Number(t.BareF01),
                ["f01_ghz"] = JsonValues.Number(t.DressedF01),
                ["bare_f12_ghz"] = JsonValues.Number(t.BareF12),
                ["f12_ghz"] = JsonValues.Number(t.DressedF12),
                ["anharmonicity_ghz"] = JsonValues.Number(t.Anharmonicity),
                ["lamb_shift_ghz"] = JsonValues.Number(t.LambShift),
            });
        var chi = new JsonArray();
        foreach (var c in d.DispersiveShifts)
            chi.Add(new JsonObject { ["qubit"] = c.First, ["resonator"] = c.Second, ["chi2_ghz"] = JsonValues.Number(c.Value) });
        var zz = new JsonArray();
        foreach (var z in d.ZZ)
            zz.Add(new JsonObject { ["first"] = z.First, ["second"] = z.Second, ["zz_ghz"] = JsonValues.Number(z.Value) });
        var purcell = new JsonArray();
        foreach (var p in d.Purcell)
            purcell.Add(new JsonObject
            {
                ["qubit"] = p.Qubit,
                ["resonator"] = p.Resonator,
                ["kappa_ghz"] = JsonValues.Number(p.KappaGHz),
                ["resonator_weight"] = JsonValues.Number(p.ResonatorWeight),
                ["rate_ghz"] = JsonValues.Number(p.RateGHz),
                ["t1_limit_s"] = JsonValues.Number(p.T1LimitSeconds),
            });
        return new JsonObject { ["transitions"] = transitions, ["dispersive_shifts"] = chi, ["zz"] = zz, ["purcell"] = purcell };
    }

    /// <summary>The whole report of one point: states, derived quantities, conventions, solver, limits.</summary>
    public static JsonObject Report(string deviceName, DressedSpectrum s, int shown, JsonObject? at = null)
    {
        var o = new JsonObject { ["device"] = deviceName };
        if (at is not null) o["at"] = at;
        o["composite_dimension"] = s.Dimension;
        o["states"] = States(s, shown);
        o["derived"] = Derived(DerivedQuantities.From(s));
        o["conventions"] = Conventions();
        o["eigensolver"] = EigenSolvers.Describe();
        o["computed"] = Computed(s);
        o["limits_of_model"] = Core.Analysis.Conventions.LimitsOfModel;
        return o;
    }

    /// <summary>A readable terminal table: energies in GHz, shifts in MHz, ZZ in kHz.</summary>
    public static string Table(string deviceName, DressedSpectrum s, int shown)
    {
        var b = new StringBuilder();
        var d = DerivedQuantities.From(s);
        b.AppendLine($"device {deviceName}: {s.Dimension} product states, {s.Count} dressed states computed");
        b.AppendLine(ComputedText(s));
        b.AppendLine();
        b.AppendLine("Dressed states (" + Core.Analysis.Conventions.Energies + ")");
        b.AppendLine($"{"#",3}  {"label",-16} {"energy GHz",12} {"purity",7}  components");
        for (int k = 0; k < Math.Min(shown, s.Count); k++)
        {
            var label = s.Labels[k];
            string components = string.Join(", ", label.Components.Where(c => c.Weight >= 0.001)
                .Select(c => $"{StateLabels.Text(s, c.BareIndex)} {100 * c.Weight:0.0}%"));
            b.AppendLine(string.Create(Inv, $"{k,3}  {StateLabels.Text(s, label.BareIndex) + (label.Ambiguous ? " ?" : ""),-16} {s.Energies[k],12:0.000000} {label.Purity,7:0.0000}  {components}"));
        }
        b.AppendLine();
        b.AppendLine("Transitions (" + Core.Analysis.Conventions.Transitions + "; " + Core.Analysis.Conventions.LambShift + ")");
        b.AppendLine($"{"element",-10} {"f01 GHz",12} {"f12 GHz",12} {"α MHz",10} {"Lamb MHz",10}");
        foreach (var t in d.Transitions)
            b.AppendLine(string.Create(Inv, $"{t.ElementId,-10} {Num(t.DressedF01, 1, "0.000000"),12} {Num(t.DressedF12, 1, "0.000000"),12} {Num(t.Anharmonicity, 1e3, "0.000"),10} {Num(t.LambShift, 1e3, "0.000"),10}"));
        if (d.DispersiveShifts.Count > 0)
        {
            b.AppendLine();
            b.AppendLine("Dispersive shifts (" + Core.Analysis.Conventions.DispersiveShift + ")");
            foreach (var c in d.DispersiveShifts) b.AppendLine(string.Create(Inv, $"  2χ {c.First}–{c.Second}: {Num(c.Value, 1e3, "0.0000")} MHz"));
        }
        if (d.ZZ.Count > 0)
        {
            b.AppendLine();
            b.AppendLine("ZZ (" + Core.Analysis.Conventions.ZZ + ")");
            foreach (var z in d.ZZ) b.AppendLine(string.Create(Inv, $"  ζ {z.First}–{z.Second}: {Num(z.Value, 1e6, "0.000")} kHz"));
        }
        if (d.Purcell.Count > 0)
        {
            b.AppendLine();
            b.AppendLine("Purcell estimates (" + Core.Analysis.Conventions.Purcell + ")");
            foreach (var p in d.Purcell)
                b.AppendLine(string.Create(Inv, $"  {p.Qubit} via {p.Resonator}: γ = {Num(p.RateGHz, 1e6, "0.000")} kHz, T1 limit {Num(p.T1LimitSeconds, 1e3, "0.000")} ms"));
        }
        b.AppendLine();
        b.AppendLine(EigenSolvers.Describe());
        b.AppendLine(Core.Analysis.Conventions.LimitsOfModel);
        return b.ToString();
    }

    /// <summary>What was computed and how, with the residual check of every computed state.</summary>
    public static JsonObject Computed(DressedSpectrum s) => new()
    {
        ["states"] = s.Count,
        ["selection"] = s.Selection?.Description,
        ["solver"] = s.SolverName,
        ["max_residual_ghz"] = JsonValues.Number(s.MaxResidual),
    };

    public static string ComputedText(DressedSpectrum s) => string.Create(Inv,
        $"computed: {s.Selection?.Description ?? $"the lowest {s.Count} states"}; {s.SolverName}; largest residual ‖Hx − Ex‖ {s.MaxResidual:0.0e+0} GHz");

    private static string Num(double x, double scale, string format) =>
        double.IsFinite(x) ? (x * scale).ToString(format, Inv) : "—";

    /// <summary>CSV header cells for the states of a point: index, label, energy, purity, top components.</summary>
    public static string StatesCsv(DressedSpectrum s, int shown)
    {
        var b = new StringBuilder("index,label,energy_ghz,purity,ambiguous,components\n");
        for (int k = 0; k < Math.Min(shown, s.Count); k++)
        {
            var label = s.Labels[k];
            string components = string.Join("; ", label.Components.Select(c => string.Create(Inv, $"{StateLabels.Text(s, c.BareIndex)} {100 * c.Weight:0.###}%")));
            b.Append(string.Create(Inv, $"{k},{Csv(StateLabels.Text(s, label.BareIndex))},{s.Energies[k]:R},{label.Purity:R},{label.Ambiguous.ToString().ToLowerInvariant()},{Csv(components)}\n"));
        }
        return b.ToString();
    }

    public static string Csv(string cell) =>
        cell.IndexOfAny([',', '"', '\n', ';']) >= 0 ? "\"" + cell.Replace("\"", "\"\"") + "\"" : cell;

    public static string CsvNumber(double x) => double.IsFinite(x) ? x.ToString("R", Inv) : "";
}
