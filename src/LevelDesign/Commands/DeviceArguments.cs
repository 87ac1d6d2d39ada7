namespace LevelDesign.Commands;

/// <summary>
/// The options of a command that computes on one device file: the file, where on it to compute and the memory guard.
/// Each command's own record adds the rest, so its action reads as option → field.
/// </summary>
public abstract record DeviceArguments
{
    /// <summary>FILE: the device file.</summary>
    public required string Path { get; init; }

    /// <summary>--at: biases and parameter paths set on top of the point, as typed (e.g. qa_flux=0.1).</summary>
    public string[]? At { get; init; }

    /// <summary>--point: the named operating point of the file to start from.</summary>
    public string? Point { get; init; }

    /// <summary>--allow-large: compute even when the matrix is estimated not to fit in memory.</summary>
    public bool AllowLarge { get; init; }
}
