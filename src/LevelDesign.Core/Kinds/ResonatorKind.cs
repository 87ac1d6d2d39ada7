using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;
using static LevelDesign.Core.Kinds.CircuitQuantities;

namespace LevelDesign.Core.Kinds;

/// <summary>A linear resonator (readout or bus), with an optional linewidth for Purcell estimates.</summary>
public sealed class ResonatorKind : ElementKindInfo
{
    public override string Name => "resonator";
    public override Type ElementType => typeof(Resonator);
    public override int Order => 50;
    public override char InsertLetter => 'r';
    public override string HamiltonianText => "ω a†a";
    public override string KeysText => "`frequency`; optional `kappa` (κ/2π, for Purcell); optional `ec` or `capacitance`";
    public override IReadOnlyList<KindKey> Keys { get; } =
        [new("frequency", UnitKind.Frequency), new("kappa", UnitKind.Frequency), .. ChargingKeys];
    public override string NewElementValues => "frequency = \"7 GHz\"\nkappa = \"1 MHz\"\n";

    public override Element? Read(ElementInput input)
    {
        var r = input.Reader;
        double? f = r.Checked("frequency", UnitKind.Frequency, Positive, "frequency must be > 0", true);
        double? kappa = r.Checked("kappa", UnitKind.Frequency, NonNegative, "κ must be ≥ 0");
        double? ec = ChargingEnergy(r, input.EcFromMatrix, false);
        return f is double w ? new Resonator(input.Id, w, ec, kappa) : null;
    }
}
