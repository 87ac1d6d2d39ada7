namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign spectrum</c>, as typed.</summary>
public sealed record SpectrumArguments : DeviceArguments
{
    /// <summary>--levels: dressed states listed, lowest first.</summary>
    public int? Levels { get; init; }

    /// <summary>--states: which states to compute (auto, neighbours, excitations:N, …).</summary>
    public string? States { get; init; }

    /// <summary>--json: the report as JSON.</summary>
    public bool Json { get; init; }

    /// <summary>--csv: the states as CSV.</summary>
    public bool Csv { get; init; }

    /// <summary>--purity: derived quantities read from states less pure than this are flagged.</summary>
    public double? Purity { get; init; }
}
