namespace LevelDesign.Plots;

/// <summary>Axis captions with units for parameter paths (flux in Φ0, offset charge in 2e, energies in GHz).</summary>
public static class AxisUnits
{
    public static string Caption(string path)
    {
        string name = path.Contains('.') ? path[(path.LastIndexOf('.') + 1)..] : path;
        string unit = name switch
        {
            "flux" => "Φ0",
            "ng" => "2e",
            "asymmetry" => "",
            "capacitance" => "F",
            _ => "GHz",
        };
        return unit.Length == 0 ? path : $"{path} ({unit})";
    }
}
