namespace LevelDesign.Core.DeviceFiles;

/// <summary>One sweep axis: Path from Start to Stop in Count points, with linked paths moved along.</summary>
public sealed record SweepAxis(string Path, double Start, double Stop, int Count, IReadOnlyList<LinkedPath> Links);
