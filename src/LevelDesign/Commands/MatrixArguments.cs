namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign matrix</c>, as typed.</summary>
public sealed record MatrixArguments : DeviceArguments
{
    /// <summary>OPERATOR: ELEMENT.OPERATOR, e.g. qa.n.</summary>
    public required string Operator { get; init; }

    /// <summary>--states K: the lowest K dressed states.</summary>
    public int? Count { get; init; }

    /// <summary>--state I: dressed states by index, instead of --states.</summary>
    public int[]? Chosen { get; init; }

    /// <summary>--json: the matrix as JSON.</summary>
    public bool Json { get; init; }
}
