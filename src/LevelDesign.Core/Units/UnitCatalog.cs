namespace LevelDesign.Core.Units;

/// <summary>Every unit spelling the parser knows, and the lookup of "prefix + unit" text.</summary>
internal static class UnitCatalog
{
    public static readonly IReadOnlyList<UnitDefinition> Units =
    [
        // Frequency base is GHz, so 1 Hz = 1e-9 base units.
        new("Hz", UnitKind.Frequency, -9, "Hz"),
        // Energies are accepted for frequency fields through E/h; the factor e/h is not a power of ten.
        new("eV", UnitKind.Frequency, 0, "eV", PhysicalConstants.GigahertzPerElectronVolt),
        new("F", UnitKind.Capacitance, 0, "F"),
        new("H", UnitKind.Inductance, 0, "H"),
        new("A", UnitKind.Current, 0, "A"),
        new("\u03A9", UnitKind.Resistance, 0, "\u03A9"), // Greek capital omega
        new("\u2126", UnitKind.Resistance, 0, "\u03A9"), // ohm sign, looks identical
        new("Ohm", UnitKind.Resistance, 0, "\u03A9"),
        new("ohm", UnitKind.Resistance, 0, "\u03A9"),
        new("V", UnitKind.Voltage, 0, "V"),
        new("\u03A60", UnitKind.Flux, 0, "\u03A60"),     // Φ0
        new("\u03A6\u2080", UnitKind.Flux, 0, "\u03A60"), // Φ₀ with subscript zero
        new("Phi0", UnitKind.Flux, 0, "\u03A60"),
        new("s", UnitKind.Time, 0, "s"),
    ];

    /// <summary>Unit written by the formatter when it chooses for itself.</summary>
    public static UnitDefinition? DefaultFor(UnitKind kind) =>
        kind == UnitKind.Dimensionless ? null : Units.First(u => u.Kind == kind);

    /// <summary>
    /// Splits text such as "kOhm" into prefix and unit. A whole-word unit wins over a prefix
    /// reading, which keeps spellings like "Phi0" from being looked at as prefix + "hi0".
    /// </summary>
    public static bool TryResolve(string text, out SiPrefix prefix, out UnitDefinition unit)
    {
        foreach (var u in Units)
            if (u.Symbol == text)
            {
                prefix = SiPrefix.None;
                unit = u;
                return true;
            }

        if (text.Length >= 2 && SiPrefix.FromSymbol(text[0]) is { } p)
        {
            string rest = text[1..];
            foreach (var u in Units)
                if (u.Symbol == rest)
                {
                    prefix = p;
                    unit = u;
                    return true;
                }
        }

        prefix = SiPrefix.None;
        unit = null!;
        return false;
    }

    /// <summary>Spellings of <paramref name="kind"/> equal to <paramref name="text"/> ignoring case, e.g. "ghz" → "GHz".</summary>
    public static IReadOnlyList<string> CaseInsensitiveMatches(string text, UnitKind kind)
    {
        var found = new List<string>();
        foreach (var u in Units.Where(u => u.Kind == kind))
            foreach (var p in SiPrefix.Accepted.Prepend(SiPrefix.None))
            {
                string candidate = p.Symbol + u.Symbol;
                if (string.Equals(candidate, text, StringComparison.OrdinalIgnoreCase) && !found.Contains(candidate))
                    found.Add(candidate);
            }
        return found;
    }
}
