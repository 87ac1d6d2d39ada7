using System.Globalization;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// A target quantity: one derived quantity name ("qa.f01") or a sum of them with signs and factors
/// ("qa.f01 - qb.f01", "qa.f01 + qb.f01 - 2*qc.f01"). A minus between terms has a space before it, so ids that contain
/// '-' stay whole. Its value is the weighted sum; its purity the lowest purity of its terms.
/// </summary>
public sealed record QuantityExpression(IReadOnlyList<(double Factor, string Name)> Terms)
{
    public bool IsSingle => Terms.Count == 1 && Terms[0].Factor == 1;

    /// <summary>Reads an expression; null with a reason when it cannot be read or names an unknown quantity.</summary>
    public static QuantityExpression? Parse(string text, IReadOnlyCollection<string>? known, out string? error)
    {
        error = null;
        var terms = new List<(double, string)>();
        string t = text.Trim();
        if (t.Length == 0) { error = "no quantity given"; return null; }
        int i = 0;
        double sign = 1;
        if (t[0] is '+' or '-') { sign = t[0] == '-' ? -1 : 1; i = 1; }
        while (i < t.Length)
        {
            // a term runs to the next '+' or to a '-' with a space before it (ids may contain '-', never '+')
            int end = i;
            while (end < t.Length && !(end > i && (t[end] == '+' || (t[end] == '-' && char.IsWhiteSpace(t[end - 1]))))) end++;
            string term = t[i..end].Trim();
            double factor = 1;
            int star = term.IndexOf('*');
            if (star >= 0)
            {
                if (!double.TryParse(term[..star].Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out factor) || !double.IsFinite(factor))
                {
                    error = $"'{term}': a factor is a plain number, e.g. 2*qc.f01";
                    return null;
                }
                term = term[(star + 1)..].Trim();
            }
            if (term.Length == 0 || term.Any(char.IsWhiteSpace))
            {
                error = $"'{text.Trim()}': write quantities joined by ' + ' or ' - ', e.g. qa.f01 - qb.f01";
                return null;
            }
            if (known is not null && !known.Contains(term))
            {
                error = $"no quantity '{term}'{DeviceFiles.EditDistance.Suggestion(term, known)}";
                return null;
            }
            terms.Add((sign * factor, term));
            if (end >= t.Length) break;
            sign = t[end] == '-' ? -1 : 1;
            i = end + 1;
        }
        return new QuantityExpression(terms);
    }

    public double Value(IReadOnlyDictionary<string, double> quantities) =>
        Terms.Sum(term => term.Factor * QuantityLookup.Value(quantities, term.Name));

    /// <summary>The lowest purity of the terms (NaN when one is unknown).</summary>
    public double Purity(IReadOnlyDictionary<string, double> purities) =>
        Terms.Select(term => purities.GetValueOrDefault(term.Name, double.NaN)).Aggregate(double.PositiveInfinity, (a, b) => double.IsNaN(b) ? double.NaN : Math.Min(a, b));

    /// <summary>The expression written back in one canonical form ("qa.f01 - qb.f01").</summary>
    public override string ToString()
    {
        var b = new System.Text.StringBuilder();
        for (int k = 0; k < Terms.Count; k++)
        {
            var (factor, name) = Terms[k];
            double size = Math.Abs(factor);
            string body = size == 1 ? name : $"{size.ToString("G", CultureInfo.InvariantCulture)}*{name}";
            b.Append(k == 0 ? (factor < 0 ? "-" : "") + body : (factor < 0 ? " - " : " + ") + body);
        }
        return b.ToString();
    }
}
