namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign describe</c>, as typed.</summary>
public sealed record DescribeArguments : DeviceArguments
{
    /// <summary>--json: the model as JSON instead of tables.</summary>
    public bool Json { get; init; }
}
