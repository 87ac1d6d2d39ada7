namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// A named knob moving one parameter (e.g. "qa.flux"). The lab control value maps linearly:
/// parameter = (control − Offset) / Period, so Period is control units per Φ0 for a flux.
/// </summary>
public sealed record BiasDefinition(string Name, string Target, double Value, double Period = 1, double Offset = 0)
{
    public double ToParameter(double control) => (control - Offset) / Period;
    public double ToControl(double parameter) => parameter * Period + Offset;
}
