namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign solve</c>, as typed.</summary>
public sealed record SolveArguments : DeviceArguments
{
    /// <summary>--vary: the range BIAS=START:STOP[:SCAN] to search.</summary>
    public string[]? Vary { get; init; }

    /// <summary>--target: QUANTITY=VALUE.</summary>
    public string? Target { get; init; }

    /// <summary>--link: other biases or parameters moved with the axis.</summary>
    public string[]? Links { get; init; }

    /// <summary>--levels: dressed states solved at each scan point.</summary>
    public int? Levels { get; init; }

    /// <summary>--json: the roots as JSON.</summary>
    public bool Json { get; init; }

    /// <summary>--purity: roots whose states are less pure than this are listed as hybridized.</summary>
    public double? Purity { get; init; }
}
