namespace LevelDesign.Core.Elements;

/// <summary>
/// A few-level element of a device. Elements are immutable; a sweep makes new ones with
/// <see cref="WithParameter"/>. Parameters are numbers in GHz (energies), Φ0 (flux) or 2e (offset charge).
/// </summary>
public abstract record Element(string Id)
{
    /// <summary>Whether ZZ, 2χ and anharmonicity are reported for this element.</summary>
    public virtual bool IsQubitLike => true;

    /// <summary>The most levels this element can have (a level list has only its given states); null when unbounded.</summary>
    public virtual int? MaxLevels => null;

    /// <summary>Names of the operators that couplers may use.</summary>
    public abstract IReadOnlyList<string> OperatorNames { get; }

    /// <summary>Numeric parameters by symbol (ec, ej, flux, ...), for output and sweeps.</summary>
    public abstract IReadOnlyDictionary<string, double> Parameters { get; }

    /// <summary>
    /// Parameters set from outside the chip by a bias line (flux through a loop, gate offset charge), as opposed to
    /// fabricated ones: a coupling given as g is converted with these held at the reference point.
    /// </summary>
    public virtual IReadOnlyList<string> BiasParameters => [];

    /// <summary>A copy with one parameter changed; throws for an unknown name.</summary>
    public abstract Element WithParameter(string name, double value);

    /// <summary>
    /// Diagonalises the element alone and keeps the lowest <paramref name="levels"/> states.
    /// <paramref name="basisSize"/> overrides the automatic (converged) basis size.
    /// </summary>
    public abstract BareSpectrum Diagonalise(int levels, int? basisSize = null);

    /// <summary>Checks parameters; returns a list of problems (empty when valid).</summary>
    public abstract IReadOnlyList<string> Validate();

    protected Exception UnknownParameter(string name) =>
        new ArgumentException($"element '{Id}' has no parameter '{name}' (it has: {string.Join(", ", Parameters.Keys)})");
}
