using LevelDesign.Core.DeviceFiles;
using LevelDesign.Commands;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Ui.Compute;

/// <summary>A parameter fit typed in the target prompt: what may move (with where each is written in the file) and the targets.</summary>
public sealed record FitRequest(IReadOnlyList<FitParameter> Parameters, IReadOnlyList<FitField> Fields, IReadOnlyList<FitTarget> Targets);
