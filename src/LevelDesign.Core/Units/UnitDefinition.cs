namespace LevelDesign.Core.Units;

/// <summary>
/// One unit spelling. 1 <see cref="Symbol"/> = <see cref="NonDecimalFactor"/> × 10^<see cref="BaseExponent"/>
/// base units of <see cref="Kind"/>. Keeping the power of ten separate lets decimal units scale exactly.
/// </summary>
internal sealed record UnitDefinition(
    string Symbol,
    UnitKind Kind,
    int BaseExponent,
    string CanonicalSymbol,
    double NonDecimalFactor = 1.0)
{
    /// <summary>True when the unit is an exact power of ten of the base unit (everything but eV).</summary>
    public bool IsDecimal => NonDecimalFactor == 1.0;
}
