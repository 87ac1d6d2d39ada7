using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads [coherence]: the noise and loss figures of the coherence budget (q_cap, q_ind, flux_noise, charge_noise,
/// qubit_temperature, resonator_temperature, infrared_cutoff, measurement_time, flux_step). Keys left out keep their
/// common-practice defaults (<see cref="CoherenceInputs"/>); command-line options override the file.
/// </summary>
public static class CoherenceReader
{
    public static readonly IReadOnlyList<string> Keys = new CoherenceInputs().Describe().Select(d => d.Name).ToArray();

    public static CoherenceInputs Read(SourceTable? table, ErrorList errors)
    {
        var inputs = new CoherenceInputs();
        if (table is null) return inputs;
        var r = new TableReader(table, "coherence", errors, Keys.ToHashSet());
        if (Plain(r, "q_cap", positive: true) is double qc) inputs = inputs with { QCapacitive = qc };
        if (Plain(r, "q_ind", positive: true) is double qi) inputs = inputs with { QInductive = qi };
        if (r.Checked("flux_noise", UnitKind.Flux, x => x >= 0, "a noise amplitude ≥ 0 in Φ0") is double fn) inputs = inputs with { FluxNoise = fn };
        if (Plain(r, "charge_noise", positive: false) is double cn) inputs = inputs with { ChargeNoise = cn };
        if (Kelvin(r, "qubit_temperature") is double qt) inputs = inputs with { QubitTemperature = qt };
        if (Kelvin(r, "resonator_temperature") is double rt) inputs = inputs with { ResonatorTemperature = rt };
        if (r.Entry("infrared_cutoff") is SourceEntry ir && ir.Value.Kind != SourceValueKind.String)
            r.Error("infrared_cutoff", "write the cutoff with a unit, e.g. \"1 Hz\" (a bare number would mean GHz)");
        else if (r.Checked("infrared_cutoff", UnitKind.Frequency, x => x > 0, "a frequency > 0") is double f) inputs = inputs with { InfraredCutoffHz = f * 1e9 };
        if (r.Checked("measurement_time", UnitKind.Time, x => x > 0, "a time > 0") is double t) inputs = inputs with { MeasurementSeconds = t };
        if (r.Checked("flux_step", UnitKind.Flux, x => x > 0 && x < 0.05, "a step between 0 and 0.05 Φ0") is double s) inputs = inputs with { FluxStep = s };
        foreach (var problem in inputs.Validate()) errors.At(table, "coherence", problem);
        return inputs;
    }

    private static double? Plain(TableReader r, string key, bool positive)
    {
        if (r.Entry(key) is not SourceEntry e) return null;
        if (e.Value.Kind is not (SourceValueKind.Integer or SourceValueKind.Float) || !double.IsFinite(e.Value.Number)
            || (positive ? e.Value.Number <= 0 : e.Value.Number < 0))
        {
            r.Error(key, $"expected a plain number {(positive ? "> 0" : "≥ 0")}, e.g. {(key == "charge_noise" ? "1e-4" : "1e6")}, found {e.Value.Describe()}");
            return null;
        }
        return e.Value.Number;
    }

    /// <summary>"20 mK", "0.02 K" or a plain number in K.</summary>
    private static double? Kelvin(TableReader r, string key)
    {
        if (r.Entry(key) is not SourceEntry e) return null;
        double? value = e.Value.Kind switch
        {
            SourceValueKind.Integer or SourceValueKind.Float => e.Value.Number,
            SourceValueKind.String => ParseKelvin(e.Value.Text ?? ""),
            _ => null,
        };
        if (value is not double k || !double.IsFinite(k) || k < 0)
        {
            r.Error(key, $"expected a temperature ≥ 0 such as \"20 mK\" or \"0.05 K\", found {e.Value.Describe()}");
            return null;
        }
        return k;
    }

    private static double? ParseKelvin(string text)
    {
        string t = text.Trim();
        double scale = 1;
        if (t.EndsWith("mK", StringComparison.Ordinal)) { scale = 1e-3; t = t[..^2]; }
        else if (t.EndsWith('K')) t = t[..^1];
        return double.TryParse(t.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double v) ? v * scale : null;
    }
}
