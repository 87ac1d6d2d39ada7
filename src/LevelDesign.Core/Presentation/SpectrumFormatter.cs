using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// Writes one computed point (dressed states and derived quantities) as JSON, a terminal table or CSV cells.
/// Shared by spectrum and sweep, and by later commands that report points.
/// </summary>
public static class SpectrumFormatter
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;


    /// <summary>Each coupler's fixed coefficient, where a g was converted, and g at this point.</summary>
    public static JsonArray Couplings(DressedSpectrum s)
    {
        var list = new JsonArray();
        foreach (var c in s.Couplers)
            list.AddNode(new JsonObject
            {
                ["id"] = c.Id,
                ["coefficient_ghz"] = JsonValues.Number(c.CoefficientGHz),
                ["converted_at"] = c.ConvertedAt?.PointName,
                ["g_here_ghz"] = JsonValues.Number(c.GHereGHz),
            });
        return list;
    }

    /// <summary>The lowest <paramref name="shown"/> dressed states with labels, energies, purity and top components.</summary>
    public static JsonArray States(DressedSpectrum s, int shown)
    {
        var states = new JsonArray();
        for (int k = 0; k < Math.Min(shown, s.Count); k++)
        {
            var label = s.Labels[k];
            var components = new JsonArray();
            foreach (var c in label.Components)
                components.AddNode(new JsonObject
                {
                    ["label"] = Core.Presentation.StateNames.Json(s, c.BareIndex),
                    ["text"] = Core.Presentation.StateNames.OfBare(s, c.BareIndex),
                    ["percent"] = JsonValues.Number(100 * c.Weight),
                });
            states.AddNode(new JsonObject
            {
                ["index"] = k,
                ["label"] = Core.Presentation.StateNames.Json(s, label.BareIndex),
                ["text"] = Core.Presentation.StateNames.OfBare(s, label.BareIndex),
                ["energy_ghz"] = JsonValues.Number(s.Energies[k]),
                ["purity"] = JsonValues.Number(label.Purity),
                ["ambiguous"] = label.Ambiguous,
                ["components"] = components,
            });
        }
        return states;
    }

    public static JsonObject Derived(DerivedQuantities d, double purityThreshold = Core.Analysis.Conventions.DefaultPurityThreshold)
    {
        JsonNode? Low(double purity) => purity < purityThreshold;
        var transitions = new JsonArray();
        foreach (var t in d.Transitions)
            transitions.AddNode(new JsonObject
            {
                ["element"] = t.ElementId,
                ["bare_f01_ghz"] = JsonValues.Number(t.BareF01),
                ["f01_ghz"] = JsonValues.Number(t.DressedF01),
                ["bare_f12_ghz"] = JsonValues.Number(t.BareF12),
                ["f12_ghz"] = JsonValues.Number(t.DressedF12),
                ["anharmonicity_ghz"] = JsonValues.Number(t.Anharmonicity),
                ["lamb_shift_ghz"] = JsonValues.Number(t.LambShift),
                ["f01_purity"] = JsonValues.Number(t.F01Purity),
                ["f12_purity"] = JsonValues.Number(t.F12Purity),
                ["f01_hybridized"] = Low(t.F01Purity),
                ["f12_hybridized"] = Low(t.F12Purity),
            });
        var chi = new JsonArray();
        foreach (var c in d.DispersiveShifts)
            chi.AddNode(new JsonObject { ["qubit"] = c.First, ["resonator"] = c.Second, ["chi2_ghz"] = JsonValues.Number(c.Value),
                ["purity"] = JsonValues.Number(c.Purity), ["hybridized"] = Low(c.Purity) });
        var zz = new JsonArray();
        foreach (var z in d.ZZ)
            zz.AddNode(new JsonObject { ["first"] = z.First, ["second"] = z.Second, ["zz_ghz"] = JsonValues.Number(z.Value),
                ["purity"] = JsonValues.Number(z.Purity), ["hybridized"] = Low(z.Purity) });
        var purcell = new JsonArray();
        foreach (var p in d.Purcell)
            purcell.AddNode(new JsonObject
            {
                ["qubit"] = p.Qubit,
                ["resonator"] = p.Resonator,
                ["kappa_ghz"] = JsonValues.Number(p.KappaGHz),
                ["resonator_weight"] = JsonValues.Number(p.ResonatorWeight),
                ["rate_ghz"] = JsonValues.Number(p.RateGHz),
                ["t1_limit_s"] = JsonValues.Number(p.T1LimitSeconds),
                ["purity"] = JsonValues.Number(p.Purity),
                ["hybridized"] = Low(p.Purity),
            });
        return new JsonObject
        {
            ["purity_threshold"] = JsonValues.Number(purityThreshold),
            ["transitions"] = transitions, ["dispersive_shifts"] = chi, ["zz"] = zz, ["purcell"] = purcell,
        };
    }

    /// <summary>The whole report of one point: states, derived quantities, conventions, solver, limits.</summary>
    public static JsonObject Report(string deviceName, DressedSpectrum s, int shown, JsonObject? at = null,
        double purityThreshold = Core.Analysis.Conventions.DefaultPurityThreshold)
    {
        var o = new JsonObject { ["device"] = deviceName };
        if (at is not null) o["at"] = at;
        o["composite_dimension"] = s.Dimension;
        o["states"] = States(s, shown);
        o["derived"] = Derived(DerivedQuantities.From(s), purityThreshold);
        o["couplings"] = Couplings(s);
        o["conventions"] = Core.Presentation.ConventionsText.Json();
        o["eigensolver"] = EigenSolvers.Describe();
        o["computed"] = Computed(s);
        o["limits_of_model"] = Core.Analysis.Conventions.LimitsOfModel;
        return o;
    }

    /// <summary>A readable terminal table: energies in GHz, α and Lamb shift in MHz, small shifts by FrequencyText, times by DurationText.</summary>
    public static string Table(string deviceName, DressedSpectrum s, int shown, double purityThreshold = Core.Analysis.Conventions.DefaultPurityThreshold)
    {
        string Flag(double purity) => purity < purityThreshold ? " !" : "";
        string P(double purity) => double.IsFinite(purity) ? purity.ToString("0.0000", Inv) : "—";
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
                .Select(c => $"{Core.Presentation.StateNames.OfBare(s, c.BareIndex)} {100 * c.Weight:0.0}%"));
            b.AppendLine(string.Create(Inv, $"{k,3}  {Core.Presentation.StateNames.OfBare(s, label.BareIndex) + (label.Ambiguous ? " ?" : ""),-16} {s.Energies[k],12:0.000000} {label.Purity,7:0.0000}  {components}"));
        }
        b.AppendLine();
        b.AppendLine("Transitions (" + Core.Analysis.Conventions.Transitions + "; " + Core.Analysis.Conventions.LambShift + ")");
        b.AppendLine($"{"element",-10} {"f01 GHz",12} {"f12 GHz",12} {"α MHz",10} {"Lamb MHz",10} {"purity 01",10} {"purity 012",10}");
        foreach (var t in d.Transitions)
            b.AppendLine(string.Create(Inv, $"{t.ElementId,-10} {Num(t.DressedF01, 1, "0.000000"),12} {Num(t.DressedF12, 1, "0.000000"),12} {Num(t.Anharmonicity, 1e3, "0.000"),10} {Num(t.LambShift, 1e3, "0.000"),10} {P(t.F01Purity),10} {P(t.F12Purity),10}{Flag(Math.Min(t.F01Purity, t.F12Purity))}"));
        if (d.DispersiveShifts.Count > 0)
        {
            b.AppendLine();
            b.AppendLine("Dispersive shifts (" + Core.Analysis.Conventions.DispersiveShift + ")");
            foreach (var c in d.DispersiveShifts) b.AppendLine(string.Create(Inv, $"  2χ {c.First}–{c.Second}: {FrequencyText.Format(c.Value, FrequencyText.ShiftResolutionGHz)}   purity {P(c.Purity)}{Flag(c.Purity)}"));
        }
        if (d.ZZ.Count > 0)
        {
            b.AppendLine();
            b.AppendLine("ZZ (" + Core.Analysis.Conventions.ZZ + ")");
            foreach (var z in d.ZZ) b.AppendLine(string.Create(Inv, $"  ζ {z.First}–{z.Second}: {FrequencyText.Format(z.Value, FrequencyText.ShiftResolutionGHz)}   purity {P(z.Purity)}{Flag(z.Purity)}"));
        }
        if (d.Purcell.Count > 0)
        {
            b.AppendLine();
            b.AppendLine("Purcell estimates (" + Core.Analysis.Conventions.Purcell + ")");
            foreach (var p in d.Purcell)
                b.AppendLine(string.Create(Inv, $"  {p.Qubit} via {p.Resonator}: γ = {FrequencyText.Format(p.RateGHz, FrequencyText.ShiftResolutionGHz)}, T1 limit {DurationText.Format(p.T1LimitSeconds)}   purity {P(p.Purity)}{Flag(p.Purity)}"));
        }
        b.AppendLine();
        b.AppendLine(string.Create(Inv, $"Purity ({Core.Analysis.Conventions.QuantityPurity}; threshold here {purityThreshold:G3})"));
        if (s.Couplers.Count > 0)
        {
            b.AppendLine();
            b.AppendLine("Couplings (" + Core.Analysis.Conventions.Coupling + ")");
            foreach (var c in s.Couplers)
                b.AppendLine(string.Create(Inv, $"  {c.Id,-12} coefficient {FrequencyText.Format(c.CoefficientGHz)}{(c.ConvertedAt is { } at ? $" (g converted at the {at.PointName} point)" : "")}, g here {FrequencyText.Format(c.GHereGHz)}"));
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
            string components = string.Join("; ", label.Components.Select(c => string.Create(Inv, $"{Core.Presentation.StateNames.OfBare(s, c.BareIndex)} {100 * c.Weight:0.###}%")));
            b.Append(string.Create(Inv, $"{k},{CsvCells.Text(Core.Presentation.StateNames.OfBare(s, label.BareIndex))},{s.Energies[k]:R},{label.Purity:R},{label.Ambiguous.ToString().ToLowerInvariant()},{CsvCells.Text(components)}\n"));
        }
        return b.ToString();
    }

}
