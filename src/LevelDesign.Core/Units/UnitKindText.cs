namespace LevelDesign.Core.Units;

/// <summary>Human words for a <see cref="UnitKind"/>, so parse errors read as plain sentences.</summary>
public static class UnitKindText
{
    /// <summary>Lower-case noun, e.g. "frequency", "capacitance".</summary>
    public static string HumanName(this UnitKind kind) => kind switch
    {
        UnitKind.Dimensionless => "plain number",
        UnitKind.Frequency => "frequency",
        UnitKind.Capacitance => "capacitance",
        UnitKind.Inductance => "inductance",
        UnitKind.Current => "current",
        UnitKind.Resistance => "resistance",
        UnitKind.Voltage => "voltage",
        UnitKind.Flux => "flux (in Φ0)",
        UnitKind.Time => "time",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };

    /// <summary>The noun with its indefinite article, e.g. "a frequency", "an inductance".</summary>
    public static string WithArticle(this UnitKind kind)
    {
        string name = kind.HumanName();
        return ("aeiou".Contains(name[0]) ? "an " : "a ") + name;
    }

    /// <summary>One or two quoted inputs the field would accept, e.g. "5.1 GHz" or "85 MHz" (quotes included).</summary>
    public static string ExampleText(this UnitKind kind) => kind switch
    {
        UnitKind.Dimensionless => "\"0.25\"",
        UnitKind.Frequency => "\"5.1 GHz\" or \"85 MHz\"",
        UnitKind.Capacitance => "\"92 fF\"",
        UnitKind.Inductance => "\"12 nH\"",
        UnitKind.Current => "\"30 nA\"",
        UnitKind.Resistance => "\"8.5 kΩ\" or \"8.5 kOhm\"",
        UnitKind.Voltage => "\"1.2 mV\"",
        UnitKind.Flux => "\"0.31\" or \"0.31 Φ0\"",
        UnitKind.Time => "\"20 ns\"",
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };

    /// <summary>Unit a designer most often types for this kind; used to suggest a fix for a bare number.</summary>
    internal static string TypicalUnit(this UnitKind kind) => kind switch
    {
        UnitKind.Frequency => "GHz",
        UnitKind.Capacitance => "fF",
        UnitKind.Inductance => "nH",
        UnitKind.Current => "nA",
        UnitKind.Resistance => "kΩ",
        UnitKind.Voltage => "mV",
        UnitKind.Flux => "Φ0",
        UnitKind.Time => "ns",
        _ => "",
    };
}
