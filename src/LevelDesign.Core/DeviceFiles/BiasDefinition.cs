using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// A named knob moving one parameter (e.g. "qa.flux"). The lab control value maps linearly:
/// parameter = (control − Offset) / Period, so Period is control units per Φ0 for a flux.
/// Control values are in the base unit of <see cref="ControlKind"/> (a plain number, or e.g. amperes for "2.1 mA").
/// </summary>
public sealed record BiasDefinition(string Name, string Target, double Value, double Period = 1, double Offset = 0)
{
    /// <summary>The kind of the control value, set by the units written in the file (plain numbers: dimensionless).</summary>
    public UnitKind ControlKind { get; init; } = UnitKind.Dimensionless;

    public double ToParameter(double control) => (control - Offset) / Period;
    public double ToControl(double parameter) => parameter * Period + Offset;

    /// <summary>Reads a control value typed by a user ("0.31", "1.2 mA") in this bias's kind.</summary>
    public bool TryParseControl(string text, out double control, out string error)
    {
        var kind = ControlKind == UnitKind.Dimensionless ? UnitKind.Flux : ControlKind;
        // A dimensionless control accepts a plain number; flux parsing also allows "Φ0" for clarity.
        return QuantityParser.TryParseModelValue(text, kind, out control, out error);
    }
}
