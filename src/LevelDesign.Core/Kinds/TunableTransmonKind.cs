using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;
using static LevelDesign.Core.Kinds.CircuitQuantities;

namespace LevelDesign.Core.Kinds;

/// <summary>A transmon with a SQUID: E_J set by the flux through the loop.</summary>
public sealed class TunableTransmonKind : ElementKindInfo
{
    private static readonly string[] Junctions = ["ej1", "ej2", "ic1", "ic2", "rn1", "rn2"];

    public override string Name => "tunable_transmon";
    public override Type ElementType => typeof(TunableTransmon);
    public override int Order => 20;
    public override char InsertLetter => 'u';
    public override string HamiltonianText => "same with E_J(Φ) = E_JΣ·sqrt(cos²(πΦ/Φ0) + d²sin²(πΦ/Φ0))";
    public override string KeysText =>
        "`ec` or `capacitance`; `ej_sum` with `asymmetry` d (0), or `ej1`+`ej2`, `ic1`+`ic2`, `rn1`+`rn2` (d = (E_J2 − E_J1)/(E_J1 + E_J2)); `flux` (0); `ng` (0)";
    public override IReadOnlyList<KindKey> Keys { get; } =
    [
        .. ChargingKeys, new("ej_sum", UnitKind.Frequency), new("asymmetry", UnitKind.Dimensionless),
        .. Junctions.Select(k => new KindKey(k, k[0] == 'e' ? UnitKind.Frequency : k[0] == 'i' ? UnitKind.Current : UnitKind.Resistance, "ej_sum", "asymmetry")),
        new("flux", UnitKind.Flux), new("ng", UnitKind.Dimensionless),
    ];
    public override int? MaxBasisSize => 1001;
    public override string NewElementValues => "ec = \"200 MHz\"\nej_sum = \"20 GHz\"\nasymmetry = 0.3\nflux = 0.0\n";

    public override Element? Read(ElementInput input)
    {
        var r = input.Reader;
        double? ec = ChargingEnergy(r, input.EcFromMatrix, true);
        double ng = OffsetCharge(r);
        double flux = Flux(r);
        double? ejSum, asymmetry;
        bool pair = Junctions.Any(r.Has);
        if (pair && (r.Has("ej_sum") || r.Has("asymmetry")))
        {
            r.Error(r.Has("ej_sum") ? "ej_sum" : "asymmetry", "give either ej_sum with asymmetry, or the two junctions (ej1/ej2, ic1/ic2 or rn1/rn2), not both");
            return null;
        }
        if (pair)
        {
            double? ej1 = Josephson(r, "1", true), ej2 = Josephson(r, "2", true);
            if (ej1 is not double a || ej2 is not double b) return null;
            if (a + b <= 0)
            {
                r.Error("ej1", "the two junctions' E_J must not both be 0");
                return null;
            }
            (ejSum, asymmetry) = SquidJosephsonEnergy.FromJunctions(a, b);
        }
        else
        {
            ejSum = r.Checked("ej_sum", UnitKind.Frequency, NonNegative, "E_JΣ must be ≥ 0", true,
                "total Josephson energy of the SQUID, e.g. ej_sum = \"24 GHz\" (or give ej1 and ej2)");
            asymmetry = r.Checked("asymmetry", UnitKind.Dimensionless, x => Math.Abs(x) <= 1, "the SQUID asymmetry d must lie in [−1, 1]") ?? 0;
        }
        return ec is double c && ejSum is double s && asymmetry is double d ? new TunableTransmon(input.Id, c, s, d, flux, ng) : null;
    }
}
