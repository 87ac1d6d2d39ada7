namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign sweep</c>, as typed.</summary>
public sealed record SweepArguments : SweepAxesArguments
{
    /// <summary>--levels: labelled dressed states reported at each point.</summary>
    public int? Levels { get; init; }

    /// <summary>--states: which states to compute (auto, neighbours, excitations:N, …).</summary>
    public string? States { get; init; }

    /// <summary>--labels: 'character' or 'order'.</summary>
    public string? Labels { get; init; }

    /// <summary>--purity: the threshold below which a point is flagged.</summary>
    public double? Purity { get; init; }

    /// <summary>--json: the result as JSON (the default output is CSV).</summary>
    public bool Json { get; init; }

    /// <summary>--csv: the result as CSV.</summary>
    public bool Csv { get; init; }

    /// <summary>--out: the output file, or the folder of the shard files and Slurm scripts.</summary>
    public string? Output { get; init; }

    /// <summary>--shard I/N: compute only this run of points.</summary>
    public string? Shard { get; init; }

    /// <summary>--slurm TASKS: write a job array instead of computing.</summary>
    public int? Slurm { get; init; }
}
