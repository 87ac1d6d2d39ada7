using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>Which kind of quantity a model parameter holds, so text typed for it is read with the right unit.</summary>
public static class ParameterKinds
{
    public static UnitKind Of(string parameterName) => parameterName switch
    {
        "flux" => UnitKind.Flux,
        "ng" or "asymmetry" => UnitKind.Dimensionless,
        "capacitance" => UnitKind.Capacitance,
        _ => UnitKind.Frequency,
    };
}
