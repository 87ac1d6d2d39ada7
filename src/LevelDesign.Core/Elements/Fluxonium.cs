namespace LevelDesign.Core.Elements;

/// <summary>Fluxonium: H = 4E_C n² + ½E_L φ² − E_J cos(φ − 2πΦ/Φ0), Φ in Φ0.</summary>
public sealed record Fluxonium(string Id, double Ec, double Ej, double El, double Flux) : Element(Id)
{

    public override IReadOnlyList<string> BiasParameters => ["flux"];

    public override IReadOnlyList<string> OperatorNames { get; } = ["n", "phi", "cos_phi", "sin_phi", "a", "adag"];

    public override IReadOnlyDictionary<string, double> Parameters =>
        new Dictionary<string, double> { ["ec"] = Ec, ["ej"] = Ej, ["el"] = El, ["flux"] = Flux };

    public override Element WithParameter(string name, double value) => name switch
    {
        "ec" => this with { Ec = value },
        "ej" => this with { Ej = value },
        "el" => this with { El = value },
        "flux" => this with { Flux = value },
        _ => throw UnknownParameter(name),
    };

    public override BareSpectrum Diagonalise(int levels, int? basisSize = null) =>
        LadderOperators.Add(OscillatorBasis.Solve(Id, Ec, Ej, El, Flux, levels, basisSize));

    public override IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        if (!(Ec > 0) || !double.IsFinite(Ec)) problems.Add("ec must be a positive finite energy");
        if (!(Ej >= 0) || !double.IsFinite(Ej)) problems.Add("ej must be a finite energy ≥ 0");
        if (!(El > 0) || !double.IsFinite(El)) problems.Add("el must be a positive finite energy");
        if (!double.IsFinite(Flux)) problems.Add("flux must be finite");
        return problems;
    }
}
