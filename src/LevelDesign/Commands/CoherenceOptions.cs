using System.CommandLine;
using System.Globalization;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Units;

namespace LevelDesign.Commands;

/// <summary>
/// The noise and loss inputs of the coherence budget as options; each left out keeps the device file's [coherence] value
/// or else its common-practice default (<see cref="CoherenceInputs"/>). Temperatures take K or mK, times a time unit, the cutoff a frequency unit.
/// </summary>
public sealed class CoherenceOptions
{
    private static readonly CoherenceInputs Defaults = new();

    public Option<string?> QCap { get; } = new("--q-cap") { Description = $"capacitive quality factor 1/tan δ (default {Defaults.QCapacitive:G3}, common practice)" };
    public Option<string?> QInd { get; } = new("--q-ind") { Description = $"inductive quality factor of a fluxonium's inductance (default {Defaults.QInductive:G3}, common practice)" };
    public Option<string?> FluxNoise { get; } = new("--flux-noise") { Description = $"1/f flux-noise amplitude in Φ0 (default {Defaults.FluxNoise:G3}, common practice)" };
    public Option<string?> ChargeNoise { get; } = new("--charge-noise") { Description = $"1/f charge-noise amplitude in e (default {Defaults.ChargeNoise:G3}, common practice)" };
    public Option<string?> QubitTemperature { get; } = new("--qubit-temperature") { Description = "temperature of the qubits' loss baths, e.g. 20mK (default 20 mK, common practice)" };
    public Option<string?> ResonatorTemperature { get; } = new("--resonator-temperature") { Description = "temperature of the readout resonators' photons, e.g. 50mK (default 50 mK, common practice)" };
    public Option<string?> InfraredCutoff { get; } = new("--infrared-cutoff") { Description = "1/f infrared cutoff, e.g. 1Hz (default 1 Hz, common practice)" };
    public Option<string?> MeasurementTime { get; } = new("--measurement-time") { Description = "measurement time in the 1/f log factor, e.g. 10us (default 10 µs, common practice)" };
    public Option<string?> FluxStep { get; } = new("--flux-step") { Description = $"step of the numerical flux derivatives in Φ0 (default {Defaults.FluxStep:G3}; checked against twice the step)" };

    public IEnumerable<Option> All => [QCap, QInd, FluxNoise, ChargeNoise, QubitTemperature, ResonatorTemperature, InfraredCutoff, MeasurementTime, FluxStep];

    /// <summary>The file's inputs (<paramref name="fromFile"/>) with the given options on top, or a usage error naming the option.</summary>
    public CoherenceInputs Read(ParseResult parse, CoherenceInputs fromFile)
    {
        var inputs = fromFile;
        if (parse.GetValue(QCap) is string q) inputs = inputs with { QCapacitive = Number(QCap, q) };
        if (parse.GetValue(QInd) is string qi) inputs = inputs with { QInductive = Number(QInd, qi) };
        if (parse.GetValue(FluxNoise) is string fn) inputs = inputs with { FluxNoise = Parse(FluxNoise, fn, UnitKind.Flux) };
        if (parse.GetValue(ChargeNoise) is string cn) inputs = inputs with { ChargeNoise = Number(ChargeNoise, cn) };
        if (parse.GetValue(QubitTemperature) is string qt) inputs = inputs with { QubitTemperature = Kelvin(QubitTemperature, qt) };
        if (parse.GetValue(ResonatorTemperature) is string rt) inputs = inputs with { ResonatorTemperature = Kelvin(ResonatorTemperature, rt) };
        if (parse.GetValue(InfraredCutoff) is string ir && !ir.TrimEnd().EndsWith("Hz", StringComparison.Ordinal))
            throw new UsageException($"--infrared-cutoff {ir}: give a unit, e.g. 1Hz (a bare number would mean GHz)");
        if (parse.GetValue(InfraredCutoff) is string ir2) inputs = inputs with { InfraredCutoffHz = Parse(InfraredCutoff, ir2, UnitKind.Frequency) * 1e9 };
        if (parse.GetValue(MeasurementTime) is string mt) inputs = inputs with { MeasurementSeconds = Parse(MeasurementTime, mt, UnitKind.Time) };
        if (parse.GetValue(FluxStep) is string fs) inputs = inputs with { FluxStep = Parse(FluxStep, fs, UnitKind.Flux) };
        var problems = inputs.Validate();
        if (problems.Count > 0) throw new UsageException("coherence inputs: " + string.Join("; ", problems));
        return inputs;
    }

    private static double Parse(Option option, string text, UnitKind kind) =>
        QuantityParser.TryParse(text, kind, out double value, out string error) ? value : throw new UsageException($"{option.Name} {text}: {error}");

    private static double Number(Option option, string text) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v)
            ? v
            : throw new UsageException($"{option.Name} {text}: give a plain number, e.g. 1e6");

    /// <summary>"20mK", "20 mK", "0.02 K" or a bare number in K.</summary>
    private static double Kelvin(Option option, string text)
    {
        string t = text.Trim();
        double scale = 1;
        if (t.EndsWith("mK", StringComparison.Ordinal)) { scale = 1e-3; t = t[..^2]; }
        else if (t.EndsWith("K", StringComparison.Ordinal)) t = t[..^1];
        return double.TryParse(t.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v)
            ? v * scale
            : throw new UsageException($"{option.Name} {text}: give a temperature such as 20mK or 0.02K");
    }
}
