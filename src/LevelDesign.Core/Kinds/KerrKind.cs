using LevelDesign.Core.Elements;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Units;
using static LevelDesign.Core.Kinds.CircuitQuantities;

namespace LevelDesign.Core.Kinds;

/// <summary>A weakly anharmonic (Kerr) oscillator given by its frequency and anharmonicity.</summary>
public sealed class KerrKind : ElementKindInfo
{
    public override string Name => "kerr";
    public override Type ElementType => typeof(KerrOscillator);
    public override int Order => 40;
    public override char InsertLetter => 'k';
    public override string InsertName => "kerr oscillator";
    public override string HamiltonianText => "ω a†a + (α/2) a†a†aa";
    public override string KeysText => "`frequency`, `anharmonicity`; optional `ec` or `capacitance` (sets the charge scale)";
    public override IReadOnlyList<KindKey> Keys { get; } =
        [new("frequency", UnitKind.Frequency), new("anharmonicity", UnitKind.Frequency), .. ChargingKeys];
    public override string NewElementValues => "frequency = \"5 GHz\"\nanharmonicity = \"-200 MHz\"\n";

    public override Element? Read(ElementInput input)
    {
        var r = input.Reader;
        double? f = r.Checked("frequency", UnitKind.Frequency, Positive, "frequency must be > 0", true);
        double? alpha = r.Checked("anharmonicity", UnitKind.Frequency, double.IsFinite, "anharmonicity must be finite", true);
        double? ec = ChargingEnergy(r, input.EcFromMatrix, false);
        if (f is double w && alpha is double a && input.Levels is int n && a < 0 && (n - 2) * -a >= w)
        {
            r.Error("levels", $"with anharmonicity {QuantityFormatter.Format(a, UnitKind.Frequency)} the Kerr ladder turns down before level {n - 1}; keep at most {(int)Math.Ceiling(w / -a)} levels");
            return null;
        }
        return f is double w2 && alpha is double a2 ? new KerrOscillator(input.Id, w2, a2, ec) : null;
    }
}
