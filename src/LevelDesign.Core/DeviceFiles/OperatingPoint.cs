namespace LevelDesign.Core.DeviceFiles;

/// <summary>A named set of bias control values, e.g. the idle point.</summary>
public sealed record OperatingPoint(string Name, IReadOnlyDictionary<string, double> BiasValues);
