using System.Numerics;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// Builds the coherence budget of every qubit-like element at one point from its dressed spectrum. Matrix elements
/// are those of the dressed states; flux slopes and curvatures and charge dispersions are taken numerically from the
/// composite model (extra solves at shifted flux and offset charge). Rates of separate channels are added, which for
/// the Gaussian 1/f decays is a conservative combination.
/// </summary>
public static class CoherenceEstimator
{
    private const string Nguyen = "Nguyen et al., PRX 9, 041041 (2019)";
    private const string Ithier = "Ithier et al., PRB 72, 134519 (2005)";

    public static IReadOnlyList<CoherenceBudget> Estimate(DeviceSolver solver, DressedSpectrum s, CoherenceInputs inputs,
        CancellationToken cancellation = default)
    {
        var problems = inputs.Validate();
        if (problems.Count > 0) throw new ArgumentException("coherence inputs: " + string.Join("; ", problems));
        var device = s.Device;
        var derived = DerivedQuantities.From(s);
        var qubits = Enumerable.Range(0, device.Elements.Count).Where(i => device.Elements[i].IsQubitLike).ToArray();
        var qubitIds = qubits.Select(i => device.Elements[i].Id).ToArray();
        var fluxSources = device.Elements.Where(e => e.Parameters.ContainsKey("flux")).Select(e => e.Id + ".flux").ToArray();
        var slopes = fluxSources.Select(p => FluxSensitivity.Derivatives(solver, device, p, qubitIds, inputs.FluxStep, cancellation)).ToArray();

        var budgets = new List<CoherenceBudget>();
        for (int qi = 0; qi < qubits.Length; qi++)
        {
            int q = qubits[qi];
            var element = device.Elements[q];
            double f01 = derived.Transitions[q].DressedF01;
            int ground = s.DressedIndexOf(new int[device.Elements.Count]);
            var excited = new int[device.Elements.Count];
            excited[q] = 1;
            int one = s.DressedIndexOf(excited);
            double purity = one >= 0 ? s.Labels[one].Purity : double.NaN;
            var channels = new List<CoherenceChannel>();

            foreach (var p in derived.Purcell.Where(p => p.Qubit == element.Id))
                channels.Add(new CoherenceChannel($"Purcell ({p.Resonator})", CoherenceChannelKind.Relaxation,
                    2 * Math.PI * p.RateGHz * 1e9, "Γ = 2π·κ·(resonator-excited weight of the dressed |1⟩)",
                    "Houck et al., PRL 101, 080502 (2008)", $"κ/2π = {p.KappaGHz * 1e3:G4} MHz, weight {p.ResonatorWeight:E3}"));

            if (ground >= 0 && one >= 0)
            {
                channels.Add(Dielectric(s, element, ground, one, f01, inputs));
                if (element.Parameters.TryGetValue("el", out double el))
                {
                    double phi2 = Math.Pow(Complex.Abs(DressedMatrixElements.Between(s, element.Id, "phi", ground, one)), 2);
                    channels.Add(new CoherenceChannel("inductive loss", CoherenceChannelKind.Relaxation,
                        CoherenceFormulas.InductiveRate(f01, el, inputs.QInductive, phi2, inputs.QubitTemperature),
                        "Γ = (2E_L/ħQ_ind)·|⟨0|φ|1⟩|²·(1 + coth(hf01/2k_BT))", Nguyen,
                        $"|⟨0|φ|1⟩|² = {phi2:G4} (dressed), Q_ind = {inputs.QInductive:G3}, T = {inputs.QubitTemperature * 1e3:G3} mK"));
                }
            }

            for (int src = 0; src < fluxSources.Length; src++)
            {
                var d = slopes[src][qi];
                string check = $"step {d.Step:G3} Φ0 vs {2 * d.Step:G3} Φ0";
                channels.Add(new CoherenceChannel($"flux noise, 1st order ({d.Parameter})", CoherenceChannelKind.Dephasing,
                    CoherenceFormulas.FluxFirstOrderRate(d.First, inputs.FluxNoise, inputs.InfraredCutoffHz, inputs.MeasurementSeconds),
                    "Γ_φ = √(2|ln ω_ir t|)·A_Φ·|∂ω01/∂Φ|", Ithier,
                    $"∂f01/∂Φ = {d.First:G4} GHz/Φ0 ({check}: {d.FirstWithDoubleStep:G4}{(d.FirstStepAgrees ? ", agree" : ", DISAGREE: derivative not trusted")})"));
                channels.Add(new CoherenceChannel($"flux noise, 2nd order ({d.Parameter})", CoherenceChannelKind.Dephasing,
                    CoherenceFormulas.FluxSecondOrderRate(d.Second, inputs.FluxNoise, inputs.InfraredCutoffHz, inputs.MeasurementSeconds),
                    "Γ_φ = 2A_Φ²|ln ω_ir t|·|∂²ω01/∂Φ²|/√(e⁴−1) (quasi-static, 1/e time)", Ithier + ", quasi-static limit derived here",
                    $"∂²f01/∂Φ² = {d.Second:G4} GHz/Φ0² ({check}: {d.SecondWithDoubleStep:G4}{(d.SecondStepAgrees ? ", agree" : ", DISAGREE: derivative not trusted")})"));
            }

            if (element is Transmon or TunableTransmon)
                channels.Add(Charge(solver, s, q, inputs, cancellation));

            foreach (var c in derived.DispersiveShifts.Where(c => c.First == element.Id))
            {
                int r = device.IndexOf(c.Second);
                if (device.Elements[r] is not Resonator { Kappa: double kappa }) continue;
                double fr = derived.Transitions[r].DressedF01;
                double nth = CoherenceFormulas.ThermalOccupation(fr, inputs.ResonatorTemperature);
                channels.Add(new CoherenceChannel($"thermal photons ({c.Second})", CoherenceChannelKind.Dephasing,
                    CoherenceFormulas.ThermalPhotonRate(kappa, c.Value / 2, nth),
                    "Γ_φ = (κ/2)·Re[√((1 + 2iχ/κ)² + 8iχn_th/κ) − 1], χ = 2χ/2", "Clerk & Utami, PRA 75, 042302 (2007)",
                    $"χ/2π = {c.Value / 2 * 1e3:G4} MHz, κ/2π = {kappa * 1e3:G4} MHz, n_th = {nth:E3} at {inputs.ResonatorTemperature * 1e3:G3} mK"));
            }
            budgets.Add(new CoherenceBudget(element.Id, f01, purity, channels));
        }
        return budgets;
    }

    private static CoherenceChannel Dielectric(DressedSpectrum s, Element element, int ground, int one, double f01, CoherenceInputs inputs)
    {
        const string formula = "Γ = (ħω01²/(4E_C·Q_cap))·|⟨0|φ|1⟩|²·(1 + coth(hf01/2k_BT))";
        if (!element.Parameters.TryGetValue("ec", out double ec))
            return new CoherenceChannel("dielectric loss", CoherenceChannelKind.Relaxation, double.NaN, formula, Nguyen,
                "not evaluated: the element has no charging energy ec");
        bool hasPhi = element.OperatorNames.Contains("phi");
        double m = Complex.Abs(DressedMatrixElements.Between(s, element.Id, hasPhi ? "phi" : "n", ground, one));
        double phi2 = hasPhi ? m * m : CoherenceFormulas.PhiSquaredFromCharge(m * m, ec, f01);
        string source = hasPhi ? "dressed ⟨0|φ|1⟩" : $"from dressed |⟨0|n|1⟩|² = {m * m:G4} as (8E_C/f01)²|n01|²";
        return new CoherenceChannel("dielectric loss", CoherenceChannelKind.Relaxation,
            CoherenceFormulas.DielectricRate(f01, ec, inputs.QCapacitive, phi2, inputs.QubitTemperature), formula, Nguyen,
            $"|⟨0|φ|1⟩|² = {phi2:G4} ({source}), Q_cap = {inputs.QCapacitive:G3}, T = {inputs.QubitTemperature * 1e3:G3} mK");
    }

    /// <summary>Charge dispersion of the dressed f01: the composite model solved at this element's n_g = 0 and 1/2.</summary>
    private static CoherenceChannel Charge(DeviceSolver solver, DressedSpectrum s, int q, CoherenceInputs inputs, CancellationToken cancellation)
    {
        string id = s.Device.Elements[q].Id;
        double F01(double ng)
        {
            cancellation.ThrowIfCancellationRequested();
            var spectrum = FluxSensitivity.SolveLowest(solver, s.Device.WithParameter(id + ".ng", ng));
            return spectrum.EnergyOfExcitation((q, 1)) - spectrum.EnergyOfExcitation();
        }
        double dispersion = F01(0.5) - F01(0);
        return new CoherenceChannel("charge noise", CoherenceChannelKind.Dephasing,
            CoherenceFormulas.ChargeRate(dispersion, inputs.ChargeNoise),
            "Γ_φ = π²·A·|ε01| (worst offset charge; T2 = 2ħ/(Aπ|ε01|))", "Koch et al., PRA 76, 042319 (2007), Sec. V",
            $"ε01 = f01(n_g=½) − f01(n_g=0) = {dispersion * 1e6:G4} kHz (dressed), A = {inputs.ChargeNoise:G3} e");
    }
}
