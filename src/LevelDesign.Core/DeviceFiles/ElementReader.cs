using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads one [elements.ID] table into an <see cref="Element"/>, converting circuit quantities to energies
/// (capacitance → E_C, critical current or normal resistance → E_J, inductance → E_L). Every range problem is
/// reported at the value that causes it.
/// </summary>
public static class ElementReader
{
    public sealed record Result(Element? Element, int? Levels, int? BasisSize);

    public static Result Read(string id, SourceTable table, SourceTable? operators, ErrorList errors, double? ecFromMatrix)
    {
        string path = "elements." + id;
        var kindEntry = table.Find("kind");
        if (kindEntry is null)
        {
            errors.At(table, path + ".kind", $"missing required value 'kind' (one of: {string.Join(", ", ElementKinds.Keys.Values)})");
            return new Result(null, null, null);
        }
        string kindText = kindEntry.Value.Text ?? "";
        if (kindEntry.Value.Kind != SourceValueKind.String || !ElementKinds.TryParse(kindText, out var kind))
        {
            errors.At(kindEntry.Value, path + ".kind",
                $"unknown element kind '{kindText}'{EditDistance.Suggestion(kindText, ElementKinds.Keys.Values)} (expected one of: {string.Join(", ", ElementKinds.Keys.Values)})");
            return new Result(null, null, null);
        }
        int before = errors.Count;
        var r = new TableReader(table, path, errors, ElementKeys.For(kind).ToHashSet());
        int? levels = r.Integer("levels", 2, 1000);
        int? basis = ElementKeys.For(kind).Contains("basis_size") ? r.Integer("basis_size", 3, MaxBasisSize(kind)) : null;
        Element? element = kind switch
        {
            ElementKind.Transmon => Transmon(id, r, ecFromMatrix),
            ElementKind.TunableTransmon => Tunable(id, r, ecFromMatrix),
            ElementKind.Fluxonium => Fluxonium(id, r, ecFromMatrix),
            ElementKind.KerrOscillator => Kerr(id, r, ecFromMatrix, levels),
            ElementKind.Resonator => Resonator(id, r, ecFromMatrix),
            ElementKind.LevelList => LevelListReader.Read(id, r, operators, levels),
            _ => null,
        };
        if (errors.Count > before) element = null;
        return new Result(element, levels, basis);
    }

    /// <summary>
    /// Largest explicit basis_size: a dense solve of the fluxonium's oscillator basis grows as n³ (measured 2.3 s at
    /// 400 and 8.8 s at 1000 for `spectrum`, Debug build on the 2-core dev machine); the charge bases are cheaper per
    /// state but keep n² operator matrices (4001 took 21 s and 0.9 GB). Both stay above the automatic growth (400).
    /// </summary>
    public static int MaxBasisSize(ElementKind kind) => kind == ElementKind.Fluxonium ? 600 : 1001;

    private static bool Positive(double x) => x > 0 && double.IsFinite(x);
    private static bool NonNegative(double x) => x >= 0 && double.IsFinite(x);

    /// <summary>E_C from ec, capacitance or the device's capacitance matrix — exactly one of them.</summary>
    internal static double? ChargingEnergy(TableReader r, double? fromMatrix, bool required)
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
    private static double? Josephson(TableReader r, string suffix, bool required)
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

    private static double Flux(TableReader r) => r.Checked("flux", UnitKind.Flux, double.IsFinite, "flux must be finite") ?? 0;

    private static Element? Transmon(string id, TableReader r, double? ecFromMatrix)
    {
        double? ec = ChargingEnergy(r, ecFromMatrix, true);
        double? ej = Josephson(r, "", true);
        double ng = r.Checked("ng", UnitKind.Dimensionless, double.IsFinite, "ng must be finite") ?? 0;
        return ec is double c && ej is double j ? new Transmon(id, c, j, ng) : null;
    }

    private static Element? Tunable(string id, TableReader r, double? ecFromMatrix)
    {
        double? ec = ChargingEnergy(r, ecFromMatrix, true);
        double ng = r.Checked("ng", UnitKind.Dimensionless, double.IsFinite, "ng must be finite") ?? 0;
        double flux = Flux(r);
        double? ejSum, asymmetry;
        bool pair = new[] { "ej1", "ej2", "ic1", "ic2", "rn1", "rn2" }.Any(r.Has);
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
        return ec is double c && ejSum is double s && asymmetry is double d ? new TunableTransmon(id, c, s, d, flux, ng) : null;
    }

    private static Element? Fluxonium(string id, TableReader r, double? ecFromMatrix)
    {
        double? ec = ChargingEnergy(r, ecFromMatrix, true);
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
        return ec is double c && ej is double j && el is double l2 ? new Fluxonium(id, c, j, l2, flux) : null;
    }

    private static Element? Kerr(string id, TableReader r, double? ecFromMatrix, int? levels)
    {
        double? f = r.Checked("frequency", UnitKind.Frequency, Positive, "frequency must be > 0", true);
        double? alpha = r.Checked("anharmonicity", UnitKind.Frequency, double.IsFinite, "anharmonicity must be finite", true);
        double? ec = ChargingEnergy(r, ecFromMatrix, false);
        if (f is double w && alpha is double a && levels is int n && a < 0 && (n - 2) * -a >= w)
        {
            r.Error("levels", $"with anharmonicity {QuantityFormatter.Format(a, UnitKind.Frequency)} the Kerr ladder turns down before level {n - 1}; keep at most {(int)Math.Ceiling(w / -a)} levels");
            return null;
        }
        return f is double w2 && alpha is double a2 ? new KerrOscillator(id, w2, a2, ec) : null;
    }

    private static Element? Resonator(string id, TableReader r, double? ecFromMatrix)
    {
        double? f = r.Checked("frequency", UnitKind.Frequency, Positive, "frequency must be > 0", true);
        double? kappa = r.Checked("kappa", UnitKind.Frequency, NonNegative, "κ must be ≥ 0");
        double? ec = ChargingEnergy(r, ecFromMatrix, false);
        return f is double w ? new Resonator(id, w, ec, kappa) : null;
    }
}
