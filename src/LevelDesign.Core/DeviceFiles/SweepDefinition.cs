namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// A named sweep kept in the file: one or two axes; each axis moves a bias or parameter path from Start to Stop
/// in Count points, and may drag linked paths along linearly (linked = Scale·value + Shift).
/// </summary>
public sealed record SweepDefinition(string Name, IReadOnlyList<SweepAxis> Axes);
