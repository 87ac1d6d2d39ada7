using LevelDesign.Core.Couplers;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Kinds;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads one [couplers.ID] table: kind, the two elements it links, optional operators and form, and exactly one
/// strength (g, coefficient, or a coupling capacitance for a capacitive coupler).
/// </summary>
public static class CouplerReader
{
    public static readonly IReadOnlyList<string> Keys = ["kind", "between", "operators", "form", "g", "g_at", "coefficient", "capacitance"];

    /// <param name="declared">Every element id of the file, also those whose table had errors (already reported).</param>
    public static Coupler? Read(string id, SourceTable table, ErrorList errors, IReadOnlyDictionary<string, Element> elements,
        IReadOnlySet<string>? declared = null)
    {
        string path = "couplers." + id;
        int before = errors.Count;
        var r = new TableReader(table, path, errors, Keys.ToHashSet());
        string? kindText = r.Choice("kind", CouplerKindInfo.Names, required: true);
        var between = r.TextArray("between", 2, required: true, "the two element ids, e.g. between = [\"qa\", \"ra\"]");
        var operators = r.TextArray("operators", 2);
        string? formText = r.Choice("form", ["full", "exchange"]);
        if (kindText is null || between is null) return null;
        var kind = CouplerKindInfo.Named(kindText)!.Kind;
        if (CouplerKindInfo.Of(kind).NeedsOperators && operators is null && !r.Has("operators"))
            r.Missing("operators", "a custom coupler names one operator of each element, e.g. operators = [\"n\", \"phi\"]");

        for (int side = 0; side < 2; side++)
        {
            var (name, value) = between[side];
            if (!elements.TryGetValue(name, out var element))
            {
                // an element whose own table failed a check still exists for references: its error is already reported
                if (declared?.Contains(name) == true) continue;
                errors.At(value, path + ".between", $"no element '{name}'{EditDistance.Suggestion(name, elements.Keys)} (elements: {string.Join(", ", elements.Keys)})");
                continue;
            }
            if (operators is not null && !element.OperatorNames.Contains(operators[side].Text))
                errors.At(operators[side].Value, path + ".operators",
                    $"element '{name}' has no operator '{operators[side].Text}'{EditDistance.Suggestion(operators[side].Text, element.OperatorNames)} (it offers: {string.Join(", ", element.OperatorNames)})");
        }
        if (between[0].Text == between[1].Text)
            errors.At(between[1].Value, path + ".between", $"a coupler links two different elements, but both are '{between[0].Text}'");

        var strengths = new[] { "g", "coefficient", "capacitance" }.Where(r.Has).ToList();
        CouplingStrength? strength = null;
        if (strengths.Count == 0)
            r.Missing("g", "the coupling strength: g = \"90 MHz\", coefficient = \"20 MHz\" or (capacitive) capacitance = \"4 fF\"");
        else if (strengths.Count > 1)
            r.Error(strengths[1], $"give only one coupling strength, found both {strengths[0]} and {strengths[1]}");
        else if (strengths[0] == "g")
        {
            if (r.Checked("g", UnitKind.Frequency, double.IsFinite, "g must be finite") is double g) strength = new CouplingStrength.TargetG(g);
        }
        else if (strengths[0] == "coefficient")
        {
            if (r.Checked("coefficient", UnitKind.Frequency, double.IsFinite, "coefficient must be finite") is double c) strength = new CouplingStrength.Coefficient(c);
        }
        else if (kind != CouplerKind.Capacitive)
            r.Error("capacitance", $"a coupling capacitance is only meaningful for a capacitive coupler, not {kindText}");
        else if (r.Checked("capacitance", UnitKind.Capacitance, x => x > 0 && double.IsFinite(x), "capacitance must be > 0") is double cg)
        {
            strength = new CouplingStrength.Capacitance(cg);
            foreach (var (name, value) in between)
                if (elements.TryGetValue(name, out var e) && !e.Parameters.ContainsKey("ec"))
                    errors.At(value, path + ".capacitance", $"element '{name}' has no charging energy (ec or capacitance), so a coupling capacitance cannot be converted; give g or coefficient");
        }

        if (r.Has("g_at") && strength is not CouplingStrength.TargetG && strengths.Count == 1)
            r.Error("g_at", "g_at names the point where a g is converted; this coupler is not given by g");
        if (errors.Count > before || strength is null) return null;
        var coupler = Coupler.Create(id, kind, between[0].Text, between[1].Text, strength, operators?[0].Text, operators?[1].Text);
        if (formText is not null) coupler = coupler with { Form = formText == "exchange" ? CouplerForm.Exchange : CouplerForm.Full };
        // Default operators of the kind must exist on both elements too (e.g. 'phi' on a transmon does not).
        foreach (var (name, op, value) in new[] { (coupler.ElementA, coupler.OperatorA, between[0].Value), (coupler.ElementB, coupler.OperatorB, between[1].Value) })
            if (elements.TryGetValue(name, out var e) && !e.OperatorNames.Contains(op))
            {
                errors.At(value, path + ".kind", $"a {kindText} coupler uses operator '{op}', which element '{name}' does not have (it offers: {string.Join(", ", e.OperatorNames)}); pick another kind or give operators = [...]");
                return null;
            }
        return coupler;
    }
}
