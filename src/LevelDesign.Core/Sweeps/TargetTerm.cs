using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// Reads a target QUANTITY=VALUE: QUANTITY is a derived quantity name ("qa.f01", "qa.anharmonicity", "chi2:qa:ra",
/// "zz:qa:qb", "purcell:qa:ra", "jeff:qa:qb"; every one is a frequency) or a sum of them ("qa.f01 - qb.f01"), VALUE a
/// frequency in the file's unit syntax ("5.25 GHz", "5250MHz", "-120kHz"; a bare number is GHz). Used by `solve`,
/// `fit` and the terminal UI alike.
/// </summary>
public static class TargetTerm
{
    public static (string Quantity, double ValueGHz) Parse(string text, IReadOnlyCollection<string> available)
    {
        int eq = text.IndexOf('=');
        if (eq <= 0) throw new InputTermException($"{text}: write QUANTITY=VALUE, e.g. qa.f01=5.25GHz or zz:qa:qb=0");
        var expression = QuantityExpression.Parse(text[..eq], available, out string? problem)
            ?? throw new InputTermException($"{text}: {problem} (quantities of this device: {string.Join(", ", available.OrderBy(x => x, StringComparer.Ordinal))}; a difference or sum such as qa.f01 - qb.f01 works too)");
        if (!QuantityParser.TryParse(text[(eq + 1)..], UnitKind.Frequency, out double value, out string error))
            throw new InputTermException($"{text}: {error}");
        return (expression.ToString(), value);
    }
}
