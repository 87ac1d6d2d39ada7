using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Which kind of quantity a model parameter or key holds, so text typed for it is read with the right unit and its
/// value is shown in one (the reader, the UI's form and every output use this one list).
/// </summary>
public static class ParameterKinds
{
    public static UnitKind Of(string parameterName) => parameterName switch
    {
        "flux" => UnitKind.Flux,
        "ng" or "asymmetry" or "value" or "period" or "offset" => UnitKind.Dimensionless,
        "capacitance" => UnitKind.Capacitance,
        "ic" or "ic1" or "ic2" => UnitKind.Current,
        "rn" or "rn1" or "rn2" => UnitKind.Resistance,
        "inductance" => UnitKind.Inductance,
        _ => UnitKind.Frequency,
    };

    /// <summary>The kind of the last segment of a path ("qa.flux" → flux).</summary>
    public static UnitKind OfPath(string path) => Of(path[(path.LastIndexOf('.') + 1)..]);
}
