namespace LevelDesign.Core.Units;

/// <summary>An SI prefix as typed (<see cref="Symbol"/>) and the power of ten it stands for.</summary>
internal sealed record SiPrefix(string Symbol, int Exponent)
{
    /// <summary>No prefix.</summary>
    public static readonly SiPrefix None = new("", 0);

    /// <summary>
    /// Prefixes the parser accepts. Micro has three spellings: the micro sign U+00B5, Greek mu U+03BC
    /// (both produced by common keyboards/fonts) and ASCII "u" for plain terminals.
    /// </summary>
    public static readonly IReadOnlyList<SiPrefix> Accepted =
    [
        new("f", -15), new("p", -12), new("n", -9),
        new("\u00B5", -6), new("\u03BC", -6), new("u", -6),
        new("m", -3), new("k", 3), new("M", 6), new("G", 9), new("T", 12),
    ];

    /// <summary>The spelling written by the formatter for each engineering exponent (micro sign for µ).</summary>
    public static SiPrefix? ForOutput(int exponent) => exponent switch
    {
        0 => None,
        -6 => Accepted[3],
        _ => Accepted.FirstOrDefault(p => p.Exponent == exponent),
    };

    public static SiPrefix? FromSymbol(char symbol) =>
        Accepted.FirstOrDefault(p => p.Symbol.Length == 1 && p.Symbol[0] == symbol);
}
