using LevelDesign.Core.Kinds;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Which kind of quantity a model parameter or key holds, so text typed for it is read with the right unit and its
/// value is shown in one (the reader, the UI's form and every output use this one rule): the element kinds' own keys
/// (<see cref="ElementKindCatalog"/>), a bias's keys, and energies (GHz) for everything else (g, coefficient, a level
/// list's energy_N).
/// </summary>
public static class ParameterKinds
{
    public static UnitKind Of(string parameterName) => parameterName switch
    {
        "value" or "period" or "offset" => UnitKind.Dimensionless,
        "capacitance" => UnitKind.Capacitance,
        _ => ElementKindCatalog.UnitOf(parameterName) ?? UnitKind.Frequency,
    };

    /// <summary>The kind of the last segment of a path ("qa.flux" → flux).</summary>
    public static UnitKind OfPath(string path) => Of(path[(path.LastIndexOf('.') + 1)..]);
}
