namespace LevelDesign.Core.Analysis;

/// <summary>
/// Noise amplitudes, loss figures and temperatures of the coherence budget. The defaults are common practice
/// (typical figures quoted for aluminium-junction devices), not measurements: replace them with your own.
/// </summary>
public sealed record CoherenceInputs
{
    /// <summary>Capacitive quality factor Q_cap = 1/tan δ (common practice: 1e6).</summary>
    public double QCapacitive { get; init; } = 1e6;

    /// <summary>Inductive quality factor of a fluxonium's superinductance (common practice: 5e8).</summary>
    public double QInductive { get; init; } = 5e8;

    /// <summary>1/f flux-noise amplitude A_Φ in Φ0 (common practice: 2e-6 Φ0, i.e. a few µΦ0).</summary>
    public double FluxNoise { get; init; } = 2e-6;

    /// <summary>1/f charge-noise amplitude A in units of e (common practice: 1e-4 e, the figure of Koch et al. 2007).</summary>
    public double ChargeNoise { get; init; } = 1e-4;

    /// <summary>Effective temperature of the qubit's loss baths in K (common practice: 20 mK).</summary>
    public double QubitTemperature { get; init; } = 0.020;

    /// <summary>Effective temperature of the readout resonators' photons in K (common practice: 50 mK).</summary>
    public double ResonatorTemperature { get; init; } = 0.050;

    /// <summary>Infrared cutoff of the 1/f noise in Hz (common practice: 1 Hz).</summary>
    public double InfraredCutoffHz { get; init; } = 1;

    /// <summary>Measurement (free-evolution) time entering the 1/f log factor, in s (common practice: 10 µs).</summary>
    public double MeasurementSeconds { get; init; } = 10e-6;

    /// <summary>Flux step for the numerical derivatives of the dressed f01, in Φ0 (checked against twice the step).</summary>
    public double FluxStep { get; init; } = 1e-3;

    /// <summary>Every input by its option name, value and meaning, for output beside the budget.</summary>
    public IReadOnlyList<(string Name, double Value, string Unit, string Meaning)> Describe() =>
    [
        ("q_cap", QCapacitive, "", "capacitive quality factor 1/tan δ (default 1e6, common practice)"),
        ("q_ind", QInductive, "", "inductive quality factor (default 5e8, common practice)"),
        ("flux_noise", FluxNoise, "Φ0", "1/f flux-noise amplitude (default 2e-6 Φ0, common practice)"),
        ("charge_noise", ChargeNoise, "e", "1/f charge-noise amplitude (default 1e-4 e, common practice)"),
        ("qubit_temperature", QubitTemperature, "K", "qubit bath temperature (default 20 mK, common practice)"),
        ("resonator_temperature", ResonatorTemperature, "K", "readout photon temperature (default 50 mK, common practice)"),
        ("infrared_cutoff", InfraredCutoffHz, "Hz", "1/f infrared cutoff (default 1 Hz, common practice)"),
        ("measurement_time", MeasurementSeconds, "s", "measurement time in the 1/f log factor (default 10 µs, common practice)"),
        ("flux_step", FluxStep, "Φ0", "step of the numerical flux derivatives (default 1e-3 Φ0)"),
    ];

    /// <summary>Problems with the values (empty when usable).</summary>
    public IReadOnlyList<string> Validate()
    {
        var problems = new List<string>();
        foreach (var (name, value, _, _) in Describe())
        {
            bool mayBeZero = name is "flux_noise" or "charge_noise" or "qubit_temperature" or "resonator_temperature";
            if (!double.IsFinite(value) || value < 0 || (!mayBeZero && value == 0))
                problems.Add($"{name} must be a finite number {(mayBeZero ? "≥ 0" : "> 0")} (got {value})");
        }
        if (InfraredCutoffHz * MeasurementSeconds * 2 * Math.PI >= 1)
            problems.Add("infrared_cutoff × measurement_time × 2π must be below 1 (the 1/f log factor)");
        return problems;
    }
}
