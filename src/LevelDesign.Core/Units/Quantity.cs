namespace LevelDesign.Core.Units;

/// <summary>
/// A parsed value in the base unit of its kind, plus the unit text the user typed ("" for a bare number),
/// so it can be written back in the same unit (e.g. a device file keeps "85 MHz" rather than "0.085").
/// </summary>
public readonly record struct Quantity(double BaseValue, UnitKind Kind, string UnitText)
{
    /// <summary>The value written in the unit the user typed, or an engineering prefix if none.</summary>
    public override string ToString() => QuantityFormatter.Format(BaseValue, Kind, UnitText);
}
