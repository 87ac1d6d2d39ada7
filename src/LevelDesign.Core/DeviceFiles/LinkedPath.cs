namespace LevelDesign.Core.DeviceFiles;

/// <summary>A path moved with an axis: value = Scale·axis value + Shift.</summary>
public sealed record LinkedPath(string Path, double Scale, double Shift);
