namespace LevelDesign.Core.Elements;

/// <summary>Flux-tunable transmon with a two-junction SQUID: a transmon with E_J = E_J(Φ) of <see cref="SquidJosephsonEnergy"/>.</summary>
public sealed record TunableTransmon(string Id, double Ec, double EjSum, double Asymmetry, double Flux, double Ng = 0) : Element(Id)
{

    public override IReadOnlyList<string> BiasParameters => ["flux", "ng"];

    public override IReadOnlyList<string> OperatorNames { get; } = ["n", "cos_phi", "sin_phi", "a", "adag"];

    public double EffectiveEj => SquidJosephsonEnergy.At(EjSum, Asymmetry, Flux);

    public override IReadOnlyDictionary<string, double> Parameters =>
        new Dictionary<string, double> { ["ec"] = Ec, ["ej_sum"] = EjSum, ["asymmetry"] = Asymmetry, ["flux"] = Flux, ["ng"] = Ng };

    public override Element WithParameter(string name, double value) => name switch
    {
        "ec" => this with { Ec = value },
        "ej_sum" => this with { EjSum = value },
        "asymmetry" => this with { Asymmetry = value },
        "flux" => this with { Flux = value },
        "ng" => this with { Ng = value },
        _ => throw UnknownParameter(name),
    };

    public override BareSpectrum Diagonalise(int levels, int? basisSize = null) =>
        LadderOperators.Add(ChargeBasis.Solve(Id, Ec, EffectiveEj, Ng, levels, basisSize, "ej_sum"));

    public override IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        if (!(Ec > 0) || !double.IsFinite(Ec)) problems.Add("ec must be a positive finite energy");
        if (!(EjSum >= 0) || !double.IsFinite(EjSum)) problems.Add("ej_sum must be a finite energy ≥ 0");
        if (!(Math.Abs(Asymmetry) <= 1)) problems.Add("asymmetry d must lie in [−1, 1]");
        if (!double.IsFinite(Flux)) problems.Add("flux must be finite");
        if (!double.IsFinite(Ng)) problems.Add("ng must be finite");
        return problems;
    }
}
