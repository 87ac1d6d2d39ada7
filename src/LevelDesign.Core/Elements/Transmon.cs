namespace LevelDesign.Core.Elements;

/// <summary>Fixed-frequency transmon or Cooper-pair box: H = 4E_C(n − n_g)² − E_J cos φ.</summary>
public sealed record Transmon(string Id, double Ec, double Ej, double Ng = 0) : Element(Id)
{

    public override IReadOnlyList<string> BiasParameters => ["ng"];

    public override IReadOnlyList<string> OperatorNames { get; } = ["n", "cos_phi", "sin_phi", "a", "adag"];

    public override IReadOnlyDictionary<string, double> Parameters =>
        new Dictionary<string, double> { ["ec"] = Ec, ["ej"] = Ej, ["ng"] = Ng };

    public override Element WithParameter(string name, double value) => name switch
    {
        "ec" => this with { Ec = value },
        "ej" => this with { Ej = value },
        "ng" => this with { Ng = value },
        _ => throw UnknownParameter(name),
    };

    public override BareSpectrum Diagonalise(int levels, int? basisSize = null) =>
        LadderOperators.Add(ChargeBasis.Solve(Id, Ec, Ej, Ng, levels, basisSize, "ej"));

    public override IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        if (!(Ec > 0) || !double.IsFinite(Ec)) problems.Add("ec must be a positive finite energy");
        if (!(Ej >= 0) || !double.IsFinite(Ej)) problems.Add("ej must be a finite energy ≥ 0");
        if (!double.IsFinite(Ng)) problems.Add("ng must be finite");
        return problems;
    }
}
