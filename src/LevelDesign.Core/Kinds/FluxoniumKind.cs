using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;
using static LevelDesign.Core.Kinds.CircuitQuantities;

namespace LevelDesign.Core.Kinds;

/// <summary>A fluxonium in its harmonic-oscillator basis.</summary>
public sealed class FluxoniumKind : ElementKindInfo
{
    public override string Name => "fluxonium";
    public override Type ElementType => typeof(Fluxonium);
    public override int Order => 30;
    public override char InsertLetter => 'f';
    public override string HamiltonianText => "4E_C n² + ½E_L φ² − E_J cos(φ − 2πΦ/Φ0)";
    public override string KeysText => "`ec` or `capacitance`; `ej`, `ic` or `rn`; `el` or `inductance`; `flux` (0)";
    public override IReadOnlyList<KindKey> Keys { get; } =
        [.. ChargingKeys, .. JosephsonKeys, new("el", UnitKind.Frequency), new("inductance", UnitKind.Inductance, "el"), new("flux", UnitKind.Flux)];

    /// <summary>
    /// A dense solve of the oscillator basis grows as n³ (measured 2.3 s at 400 and 8.8 s at 1000 for `spectrum`,
    /// Debug build on the 2-core dev machine): 600 stays above the automatic growth (400).
    /// </summary>
    public override int? MaxBasisSize => 600;
    public override string NewElementValues => "ec = \"1 GHz\"\nej = \"4 GHz\"\nel = \"1 GHz\"\nflux = 0.5\n";

    public override Element? Read(ElementInput input)
    {
        var r = input.Reader;
        double? ec = ChargingEnergy(r, input.EcFromMatrix, true);
        double? ej = Josephson(r, "", true);
        double flux = Flux(r);
        double? el;
        if (r.Has("el") && r.Has("inductance"))
        {
            r.Error("inductance", "give either el or inductance, not both");
            return null;
        }
        if (r.Has("inductance"))
            el = r.Checked("inductance", UnitKind.Inductance, Positive, "inductance must be > 0") is double l
                ? CircuitConversions.InductiveEnergyGHz(l) : null;
        else
            el = r.Checked("el", UnitKind.Frequency, Positive, "E_L must be > 0", true, "inductive energy, e.g. el = \"1 GHz\" or inductance = \"160 nH\"");
        return ec is double c && ej is double j && el is double l2 ? new Fluxonium(input.Id, c, j, l2, flux) : null;
    }
}
