namespace LevelDesign.Core.Units;

/// <summary>
/// What a field holds; the parser checks a typed unit against it. Each kind has one base unit
/// in which parsed values are returned (see <see cref="QuantityParser"/>).
/// </summary>
public enum UnitKind
{
    /// <summary>A plain number (offset charge in 2e, ratios, counts); no unit allowed. Base: 1.</summary>
    Dimensionless,

    /// <summary>Frequency or energy E/h. Accepts Hz and eV. Base: GHz (not Hz), the scale of all our energies.</summary>
    Frequency,

    /// <summary>Capacitance. Base: F.</summary>
    Capacitance,

    /// <summary>Inductance. Base: H.</summary>
    Inductance,

    /// <summary>Current. Base: A.</summary>
    Current,

    /// <summary>Resistance, written Ω, Ohm or ohm. Base: Ω.</summary>
    Resistance,

    /// <summary>Voltage. Base: V.</summary>
    Voltage,

    /// <summary>Magnetic flux bias in units of the flux quantum; bare number or Φ0/Phi0. Base: Φ0.</summary>
    Flux,

    /// <summary>Time. Base: s.</summary>
    Time,
}
