using LevelDesign.Core.Analysis;

namespace LevelDesign.Commands;

/// <summary>The options of <c>leveldesign coherence</c>, as typed; with --vary or --sweep it tabulates along the sweep instead of one point.</summary>
public sealed record CoherenceArguments : SweepAxesArguments
{
    /// <summary>--json: the budget or the table as JSON.</summary>
    public bool Json { get; init; }

    /// <summary>--csv: a sweep's table as CSV.</summary>
    public bool Csv { get; init; }

    /// <summary>--out: the file for a sweep's table.</summary>
    public string? Output { get; init; }

    /// <summary>
    /// The noise and loss options (<see cref="CoherenceOptions"/>) put over the file's [coherence] inputs; read once the
    /// file is loaded, so a bad value is reported after the file's own problems.
    /// </summary>
    public required Func<CoherenceInputs, CoherenceInputs> Inputs { get; init; }
}
