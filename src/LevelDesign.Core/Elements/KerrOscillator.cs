namespace LevelDesign.Core.Elements;

/// <summary>Kerr (Duffing) oscillator: H = ω a†a + (α/2) a†a†aa. Optional E_C sets the physical charge scale.</summary>
public sealed record KerrOscillator(string Id, double Frequency, double Anharmonicity, double? Ec = null) : Element(Id)
{

    public override IReadOnlyList<string> OperatorNames { get; } = ["a", "adag", "number", "n", "phi"];

    public override IReadOnlyDictionary<string, double> Parameters
    {
        get
        {
            var p = new Dictionary<string, double> { ["frequency"] = Frequency, ["anharmonicity"] = Anharmonicity };
            if (Ec is double ec) p["ec"] = ec;
            return p;
        }
    }

    public override Element WithParameter(string name, double value) => name switch
    {
        "frequency" => this with { Frequency = value },
        "anharmonicity" => this with { Anharmonicity = value },
        "ec" => this with { Ec = value },
        _ => throw UnknownParameter(name),
    };

    public override BareSpectrum Diagonalise(int levels, int? basisSize = null) =>
        FockOscillator.Build(Id, Frequency, Anharmonicity, Ec, levels);

    public override IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        if (!(Frequency > 0) || !double.IsFinite(Frequency)) problems.Add("frequency must be a positive finite frequency");
        if (!double.IsFinite(Anharmonicity)) problems.Add("anharmonicity must be finite");
        if (Ec is double ec && !(ec > 0 && double.IsFinite(ec))) problems.Add("ec must be a positive finite energy");
        return problems;
    }
}
