using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>Everything read from a valid device file, before it is wrapped in a <see cref="DeviceDocument"/>.</summary>
public sealed record DeviceFileContent(
    SourceDocument Source,
    Device Device,
    IReadOnlyList<BiasDefinition> Biases,
    IReadOnlyList<OperatingPoint> Points,
    IReadOnlyList<SweepDefinition> Sweeps,
    long CompositeDimension)
{
    /// <summary>Below this purity a quantity's labels count as hybridized ([device] purity_threshold; default 0.9).</summary>
    public double PurityThreshold { get; init; } = Analysis.Conventions.DefaultPurityThreshold;

    /// <summary>The [coherence] table's noise and loss figures (defaults where it is absent).</summary>
    public Analysis.CoherenceInputs Coherence { get; init; } = new();
}
