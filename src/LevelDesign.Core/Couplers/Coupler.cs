namespace LevelDesign.Core.Couplers;

/// <summary>A link between one operator of element A and one operator of element B.</summary>
public sealed record Coupler(
    string Id,
    string ElementA,
    string OperatorA,
    string ElementB,
    string OperatorB,
    CouplerKind Kind,
    CouplerForm Form,
    CouplingStrength Strength)
{
    /// <summary>Default operators and form for a kind: capacitive n·n, inductive φ·φ, exchange a with RWA.</summary>
    public static Coupler Create(string id, CouplerKind kind, string elementA, string elementB, CouplingStrength strength,
        string? operatorA = null, string? operatorB = null)
    {
        var (opA, opB, form) = kind switch
        {
            CouplerKind.Capacitive => ("n", "n", CouplerForm.Full),
            CouplerKind.Inductive => ("phi", "phi", CouplerForm.Full),
            CouplerKind.Exchange => ("a", "a", CouplerForm.Exchange),
            _ => (operatorA ?? throw new ArgumentException("a custom coupler names both operators"),
                  operatorB ?? throw new ArgumentException("a custom coupler names both operators"), CouplerForm.Full),
        };
        return new Coupler(id, elementA, operatorA ?? opA, elementB, operatorB ?? opB, kind, form, strength);
    }

    /// <summary>A copy whose g (if given as g) is converted at <paramref name="at"/>.</summary>
    public Coupler WithGReference(GReference at) =>
        Strength is CouplingStrength.TargetG g ? this with { Strength = g with { At = at } } : this;

    public double? CoefficientIfGiven => Strength is CouplingStrength.Coefficient c ? c.GHz : null;

    /// <summary>A copy with the strength replaced by a plain coefficient (used by sweeps of "coefficient").</summary>
    public Coupler WithCoefficient(double ghz) => this with { Strength = new CouplingStrength.Coefficient(ghz) };

    /// <summary>A copy with a numeric parameter changed: coefficient, g or capacitance (farad).</summary>
    public Coupler WithParameter(string name, double value) => name switch
    {
        "coefficient" => WithCoefficient(value),
        "g" => this with { Strength = new CouplingStrength.TargetG(value, (Strength as CouplingStrength.TargetG)?.At) },
        "capacitance" => this with { Strength = new CouplingStrength.Capacitance(value) },
        _ => throw new ArgumentException($"coupler '{Id}' has no parameter '{name}' (it has: coefficient, g, capacitance)"),
    };

    public double GetParameter(string name) => (name, Strength) switch
    {
        ("coefficient", CouplingStrength.Coefficient c) => c.GHz,
        ("g", CouplingStrength.TargetG g) => g.GHz,
        ("capacitance", CouplingStrength.Capacitance c) => c.Farad,
        _ => throw new ArgumentException($"coupler '{Id}' is not given by '{name}'"),
    };
}
