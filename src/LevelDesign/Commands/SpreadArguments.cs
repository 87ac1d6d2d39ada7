namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign spread</c>, as typed (a study draws its own chips, so it has no --at or --point).</summary>
public sealed record SpreadArguments
{
    /// <summary>FILE: the device file with its [spread] and [rules].</summary>
    public required string Path { get; init; }

    /// <summary>--samples: the number of drawn chips, in place of the file's.</summary>
    public int? Samples { get; init; }

    /// <summary>--seed: the seed of the random numbers, in place of the file's.</summary>
    public int? Seed { get; init; }

    /// <summary>--rule NAME=TEXT: rules used instead of the file's [rules].</summary>
    public string[]? Rules { get; init; }

    /// <summary>--shard I/N: compute only this block of samples.</summary>
    public string? Shard { get; init; }

    /// <summary>--out: the folder for the study's files, shards or Slurm scripts.</summary>
    public string? Output { get; init; }

    /// <summary>--json: the summary as JSON.</summary>
    public bool Json { get; init; }

    /// <summary>--threads: samples computed at once.</summary>
    public int? Threads { get; init; }

    /// <summary>--slurm TASKS: write a job array instead of computing.</summary>
    public int? Slurm { get; init; }

    /// <summary>--allow-large: compute even when the matrix is estimated not to fit in memory.</summary>
    public bool AllowLarge { get; init; }
}
