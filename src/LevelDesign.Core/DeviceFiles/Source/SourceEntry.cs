namespace LevelDesign.Core.DeviceFiles.Source;

/// <summary>A key = value line inside a table, with the key's position.</summary>
public sealed record SourceEntry(string Key, int Line, int Column, SourceValue Value);
