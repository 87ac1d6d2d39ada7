using System.Globalization;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Spread;

/// <summary>
/// Reads one rule written as a short sentence (quantities use the `solve`/`fit` syntax, values the file's unit syntax):
/// <code>
/// qa.f01 - qb.f01 &gt; 300 MHz at idle            a bound at a named point ('&lt;' for an upper bound)
/// zz:qa:qb within 20 kHz at idle                 |value| ≤ 20 kHz
/// qa.f01 between 5.4 GHz and 5.7 GHz along coupler_scan   at every point of a named sweep
/// purity qa.f01 &gt; 0.99 along coupler_scan       lowest purity of the labelled states the quantity is read from
/// no crossing qa1 qc1 gap &gt; 1 MHz along coupler_scan    fails when such a crossing has a gap above 1 MHz
/// root zz:qa:qb = 0 by qc_flux 0.15 mA to 1.05 mA         the target is met somewhere in the range
/// </code>
/// Names of points, sweeps and biases are checked against the file; quantity names are checked when the study
/// starts (they depend on the solved device).
/// </summary>
public static class SpreadRuleParser
{
    public const string Syntax =
        "e.g. \"qa.f01 - qb.f01 > 300 MHz at idle\", \"zz:qa:qb within 20 kHz at idle\", \"qa.f01 between 5.4 GHz and 5.7 GHz along SWEEP\", " +
        "\"purity qa.f01 > 0.99 along SWEEP\", \"no crossing qa1 qc1 gap > 1 MHz along SWEEP\", \"root zz:qa:qb = 0 by BIAS LOW to HIGH\"";

    public static SpreadRule? Parse(string name, string text, DeviceDocument document, out string? error)
    {
        error = null;
        string t = string.Join(' ', text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries));
        try
        {
            if (t.StartsWith("root ", StringComparison.Ordinal)) return Root(name, text, t[5..], document);
            if (t.StartsWith("no crossing ", StringComparison.Ordinal)) return Crossing(name, text, t[12..], document);
            bool purity = t.StartsWith("purity ", StringComparison.Ordinal);
            return Bound(name, text, purity ? t[7..] : t, purity, document);
        }
        catch (FormatException e)
        {
            error = $"'{text}': {e.Message}";
            return null;
        }
    }

    private static SpreadRule Bound(string name, string text, string t, bool purity, DeviceDocument document)
    {
        var (body, point, sweep) = Where(t, document);
        SpreadComparison comparison;
        string left, right;
        if (Split(body, " within ") is var (l1, r1)) { comparison = SpreadComparison.Within; (left, right) = (l1, r1); }
        else if (Split(body, " between ") is var (l2, r2)) { comparison = SpreadComparison.Between; (left, right) = (l2, r2); }
        else if (SplitOperator(body) is var (l3, op, r3)) { comparison = op == '>' ? SpreadComparison.Above : SpreadComparison.Below; (left, right) = (l3, r3); }
        else throw new FormatException("write QUANTITY > VALUE, QUANTITY < VALUE, QUANTITY within LIMIT or QUANTITY between LOW and HIGH, then 'at POINT' or 'along SWEEP'");
        var quantity = Expression(left);
        double low = double.NegativeInfinity, high = double.PositiveInfinity;
        UnitKind kind = purity ? UnitKind.Dimensionless : UnitKind.Frequency;
        switch (comparison)
        {
            case SpreadComparison.Above: low = Value(right, kind); break;
            case SpreadComparison.Below: high = Value(right, kind); break;
            case SpreadComparison.Within:
                high = Value(right.TrimStart('±'), kind);
                if (!(high >= 0)) throw new FormatException("the limit of 'within' is a size (not negative), e.g. within 20 kHz");
                break;
            default:
                if (Split(right, " and ") is not var (a, b)) throw new FormatException("write 'between LOW and HIGH', e.g. between 5.4 GHz and 5.7 GHz");
                (low, high) = (Value(a, kind), Value(b, kind));
                if (!(low < high)) throw new FormatException("'between LOW and HIGH' needs LOW below HIGH");
                break;
        }
        if (purity && (low > 1 || high < 0)) throw new FormatException("a purity bound lies between 0 and 1");
        return new SpreadRule(name, text, purity ? SpreadRuleKind.Purity : SpreadRuleKind.Bound)
            { Quantity = quantity, Comparison = comparison, Low = low, High = high, Point = point, Sweep = sweep };
    }

    private static SpreadRule Crossing(string name, string text, string t, DeviceDocument document)
    {
        var (body, point, sweep) = Where(t, document);
        if (sweep is null) throw new FormatException($"a crossing rule looks along a sweep: end it with 'along SWEEP' (sweeps: {Names(document.Sweeps.Select(s => s.Name))})");
        var words = body.Split(' ');
        if (words.Length < 5 || words[2] != "gap" || words[3] != ">")
            throw new FormatException("write 'no crossing STATE STATE gap > VALUE along SWEEP', e.g. no crossing qa1 qc1 gap > 1 MHz along coupler_scan");
        double gap = Value(string.Join(' ', words[4..]), UnitKind.Frequency);
        if (!(gap >= 0)) throw new FormatException("the gap limit is a size (not negative)");
        if (document.Sweeps.First(s => s.Name == sweep).Axes.Count != 1) throw new FormatException($"sweep '{sweep}' has two axes; crossings are searched along a 1-D sweep");
        return new SpreadRule(name, text, SpreadRuleKind.NoCrossing) { StateA = words[0], StateB = words[1], MaxGapGHz = gap, Sweep = sweep };
    }

    private static SpreadRule Root(string name, string text, string t, DeviceDocument document)
    {
        if (Split(t, " by ") is not var (goal, range)) throw new FormatException("write 'root QUANTITY = VALUE by BIAS LOW to HIGH', e.g. root zz:qa:qb = 0 by qc_flux 0.15 mA to 1.05 mA");
        if (Split(goal, "=") is not var (left, value)) throw new FormatException("write 'root QUANTITY = VALUE by BIAS LOW to HIGH'");
        var quantity = Expression(left);
        double target = Value(value, UnitKind.Frequency);
        int space = range.IndexOf(' ');
        if (space < 0 || Split(range[(space + 1)..], " to ") is not var (lowText, highText))
            throw new FormatException("after 'by' give BIAS LOW to HIGH, e.g. by qc_flux 0.15 mA to 1.05 mA");
        string bias = range[..space];
        var definition = document.Bias(bias) ?? throw new FormatException($"no bias '{bias}'{EditDistance.Suggestion(bias, document.Biases.Select(b => b.Name))} (biases: {Names(document.Biases.Select(b => b.Name))})");
        if (!definition.TryParseControl(lowText, out double low, out string e1)) throw new FormatException("LOW: " + e1);
        if (!definition.TryParseControl(highText, out double high, out string e2)) throw new FormatException("HIGH: " + e2);
        if (low == high) throw new FormatException("LOW and HIGH must differ");
        return new SpreadRule(name, text, SpreadRuleKind.Root) { Quantity = quantity, RootTarget = target, RootBias = bias, RootLow = low, RootHigh = high };
    }

    /// <summary>Splits off a trailing "at POINT" or "along SWEEP", checking that the name exists.</summary>
    private static (string Body, string? Point, string? Sweep) Where(string t, DeviceDocument document)
    {
        int at = t.LastIndexOf(" at ", StringComparison.Ordinal), along = t.LastIndexOf(" along ", StringComparison.Ordinal);
        if (at < 0 && along < 0) throw new FormatException("say where the rule holds: end it with 'at POINT' or 'along SWEEP'");
        if (at > along)
        {
            string point = t[(at + 4)..].Trim();
            if (!document.Points.Any(p => p.Name == point))
                throw new FormatException($"no operating point '{point}'{EditDistance.Suggestion(point, document.Points.Select(p => p.Name))} (points: {Names(document.Points.Select(p => p.Name))})");
            return (t[..at].Trim(), point, null);
        }
        string sweep = t[(along + 7)..].Trim();
        if (!document.Sweeps.Any(s => s.Name == sweep))
            throw new FormatException($"no sweep '{sweep}'{EditDistance.Suggestion(sweep, document.Sweeps.Select(s => s.Name))} (sweeps: {Names(document.Sweeps.Select(s => s.Name))})");
        return (t[..along].Trim(), null, sweep);
    }

    private static QuantityExpression Expression(string text) =>
        QuantityExpression.Parse(text, null, out string? problem) ?? throw new FormatException(problem ?? "no quantity");

    private static double Value(string text, UnitKind kind)
    {
        string s = text.Trim();
        if (kind == UnitKind.Dimensionless)
            return double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double p) && double.IsFinite(p)
                ? p : throw new FormatException($"'{s}': a purity is a plain number, e.g. 0.99");
        return QuantityParser.TryParse(s, kind, out double v, out string error) ? v : throw new FormatException(error);
    }

    private static (string, string)? Split(string t, string separator)
    {
        int i = t.IndexOf(separator, StringComparison.Ordinal);
        return i < 0 ? null : (t[..i].Trim(), t[(i + separator.Length)..].Trim());
    }

    /// <summary>The first '&gt;' or '&lt;' (with an optional '=' after it, which reads the same: a bound on a continuous quantity).</summary>
    private static (string, char, string)? SplitOperator(string t)
    {
        int i = t.IndexOfAny(['>', '<']);
        if (i < 0) return null;
        int after = i + 1 < t.Length && t[i + 1] == '=' ? i + 2 : i + 1;
        return (t[..i].Trim(), t[i], t[after..].Trim());
    }

    private static string Names(IEnumerable<string> names)
    {
        var list = names.ToList();
        return list.Count == 0 ? "none in this file" : string.Join(", ", list);
    }
}
