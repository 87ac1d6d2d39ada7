namespace LevelDesign.Core.Elements;

/// <summary>
/// Harmonic resonator H = ω a†a. <see cref="Kappa"/> (GHz, energy-decay rate/2π) enables Purcell estimates.
/// </summary>
public sealed record Resonator(string Id, double Frequency, double? Ec = null, double? Kappa = null) : Element(Id)
{

    public override bool IsQubitLike => false;

    public override IReadOnlyList<string> OperatorNames { get; } = ["a", "adag", "number", "n", "phi"];

    public override IReadOnlyDictionary<string, double> Parameters
    {
        get
        {
            var p = new Dictionary<string, double> { ["frequency"] = Frequency };
            if (Ec is double ec) p["ec"] = ec;
            if (Kappa is double k) p["kappa"] = k;
            return p;
        }
    }

    public override Element WithParameter(string name, double value) => name switch
    {
        "frequency" => this with { Frequency = value },
        "ec" => this with { Ec = value },
        "kappa" => this with { Kappa = value },
        _ => throw UnknownParameter(name),
    };

    public override BareSpectrum Diagonalise(int levels, int? basisSize = null) =>
        FockOscillator.Build(Id, Frequency, 0, Ec, levels);

    public override IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        if (!(Frequency > 0) || !double.IsFinite(Frequency)) problems.Add("frequency must be a positive finite frequency");
        if (Ec is double ec && !(ec > 0 && double.IsFinite(ec))) problems.Add("ec must be a positive finite energy");
        if (Kappa is double k && !(k >= 0 && double.IsFinite(k))) problems.Add("kappa must be a finite rate ≥ 0");
        return problems;
    }
}
