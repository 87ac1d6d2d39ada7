using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.DeviceFiles.Source;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// What a kind reads an element from: its id, the reader over its table (which reports every problem at its key),
/// E_C from the device's capacitance matrix if the element is a node of it, the kept levels and a separate
/// [elements.ID.operators] table.
/// </summary>
public sealed record ElementInput(string Id, TableReader Reader, double? EcFromMatrix, int? Levels, SourceTable? Operators);
