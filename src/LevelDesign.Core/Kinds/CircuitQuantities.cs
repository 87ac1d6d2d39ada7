using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// Reading the energies several kinds share, each given directly or in circuit form: E_C from ec, capacitance or the
/// device's capacitance matrix; E_J from ej, ic or rn; E_L from el or inductance; a flux. Every range problem is
/// reported at the key that causes it.
/// </summary>
public static class CircuitQuantities
{
    public static bool Positive(double x) => x > 0 && double.IsFinite(x);
    public static bool NonNegative(double x) => x >= 0 && double.IsFinite(x);

    public static readonly KindKey[] ChargingKeys = [new("ec", UnitKind.Frequency), new("capacitance", UnitKind.Capacitance, "ec")];

    public static readonly KindKey[] JosephsonKeys = [new("ej", UnitKind.Frequency), new("ic", UnitKind.Current, "ej"), new("rn", UnitKind.Resistance, "ej")];

    /// <summary>E_C from ec, capacitance or the device's capacitance matrix — exactly one of them.</summary>
    public static double? ChargingEnergy(TableReader r, double? fromMatrix, bool required)
    {
        bool hasEc = r.Has("ec"), hasC = r.Has("capacitance");
        if (fromMatrix is double m)
        {
            if (hasEc || hasC)
            {
                r.Error(hasEc ? "ec" : "capacitance", "this element's charging energy already comes from [capacitance_matrix]; remove this key or the element from the matrix nodes");
                return null;
            }
            return m;
        }
        if (hasEc && hasC)
        {
            r.Error("capacitance", "give either ec or capacitance, not both");
            return null;
        }
        if (hasC)
            return r.Checked("capacitance", UnitKind.Capacitance, Positive, "capacitance must be > 0") is double c
                ? CircuitConversions.ChargingEnergyGHz(c) : null;
        if (hasEc) return r.Checked("ec", UnitKind.Frequency, Positive, "E_C must be > 0");
        if (required) r.Missing("ec", "charging energy, e.g. ec = \"215 MHz\" or capacitance = \"90 fF\"");
        return null;
    }

    /// <summary>E_J of one junction from ej, ic or rn (suffix "1"/"2" for the SQUID's junctions).</summary>
    public static double? Josephson(TableReader r, string suffix, bool required)
    {
        string ej = "ej" + suffix, ic = "ic" + suffix, rn = "rn" + suffix;
        var given = new[] { ej, ic, rn }.Where(r.Has).ToList();
        if (given.Count > 1)
        {
            r.Error(given[1], $"give only one of {ej}, {ic}, {rn}");
            return null;
        }
        if (given.Count == 0)
        {
            if (required) r.Missing(ej, $"Josephson energy, e.g. {ej} = \"15 GHz\", {ic} = \"30 nA\" or {rn} = \"8.5 kΩ\"");
            return null;
        }
        if (given[0] == ej) return r.Checked(ej, UnitKind.Frequency, NonNegative, "E_J must be ≥ 0");
        if (given[0] == ic)
            return r.Checked(ic, UnitKind.Current, NonNegative, "critical current must be ≥ 0") is double i
                ? CircuitConversions.JosephsonEnergyFromCriticalCurrent(i) : null;
        return r.Checked(rn, UnitKind.Resistance, Positive, "normal-state resistance must be > 0") is double ohm
            ? CircuitConversions.JosephsonEnergyFromNormalResistance(ohm) : null;
    }

    public static double Flux(TableReader r) => r.Checked("flux", UnitKind.Flux, double.IsFinite, "flux must be finite") ?? 0;

    public static double OffsetCharge(TableReader r) => r.Checked("ng", UnitKind.Dimensionless, double.IsFinite, "ng must be finite") ?? 0;
}
