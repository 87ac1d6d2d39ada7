using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Core.Sweeps;

/// <summary>
/// What to sweep: one or two axes (each a parameter path or bias name, with optional linked paths), the number
/// of dressed levels to keep per point, and the label mode.
/// </summary>
public sealed record SweepPlan(IReadOnlyList<SweepAxis> Axes, LabelMode Labels = LabelMode.ByCharacter, int? Levels = null);
