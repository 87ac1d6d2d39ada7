using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;
using static LevelDesign.Core.Kinds.CircuitQuantities;

namespace LevelDesign.Core.Kinds;

/// <summary>A fixed-frequency transmon in the charge basis.</summary>
public sealed class TransmonKind : ElementKindInfo
{
    public override string Name => "transmon";
    public override Type ElementType => typeof(Transmon);
    public override int Order => 10;
    public override char InsertLetter => 't';
    public override string HamiltonianText => "4E_C(n − n_g)² − E_J cos φ";
    public override string KeysText => "`ec` or `capacitance`; `ej`, `ic` or `rn`; `ng` (0)";
    public override IReadOnlyList<KindKey> Keys { get; } = [.. ChargingKeys, .. JosephsonKeys, new("ng", UnitKind.Dimensionless)];
    public override int? MaxBasisSize => 1001;
    public override string NewElementValues => "ec = \"200 MHz\"\nej = \"16 GHz\"\n";

    public override Element? Read(ElementInput input)
    {
        var r = input.Reader;
        double? ec = ChargingEnergy(r, input.EcFromMatrix, true);
        double? ej = Josephson(r, "", true);
        double ng = OffsetCharge(r);
        return ec is double c && ej is double j ? new Transmon(input.Id, c, j, ng) : null;
    }
}
