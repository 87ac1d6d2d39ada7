using LevelDesign.Core.Model;

namespace LevelDesign.Core.Spread;

/// <summary>
/// One drawn chip: its index, the device with every spread parameter at its drawn value, and per spread path (in
/// <see cref="SpreadDefinition.Paths"/> order) the drawn value and its deviation in units of that path's total σ.
/// </summary>
public sealed record SpreadSample(long Index, Device Device, IReadOnlyList<double> Values, IReadOnlyList<double> Deviations);
