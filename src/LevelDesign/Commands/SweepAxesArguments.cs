namespace LevelDesign.Commands;

/// <summary>
/// The options of a command that computes along a sweep: its axes from --vary or a file's --sweep, moved with --link
/// (read by <see cref="SweepSetup.Create"/>).
/// </summary>
public abstract record SweepAxesArguments : DeviceArguments
{
    /// <summary>--vary: the axes BIAS=START:STOP:COUNT as typed (how many a command takes is its own).</summary>
    public string[]? Vary { get; init; }

    /// <summary>--link: other biases or parameters moved with an axis.</summary>
    public string[]? Links { get; init; }

    /// <summary>--sweep: a sweep defined in the file ([sweeps.NAME]).</summary>
    public string? SweepName { get; init; }
}
