namespace LevelDesign.Core.Analysis;

/// <summary>
/// Purcell estimate γ = κ × (weight of the resonator-excited product states in the dressed qubit 1 state);
/// in the dispersive limit this is κ(g/Δ)² (Houck et al., PRL 101, 080502 (2008)). Rates in GHz (i.e. rate/2π).
/// </summary>
/// <param name="Purity">Purity of the labelled qubit-1 state the weight is read from.</param>
public sealed record PurcellEstimate(string Qubit, string Resonator, double KappaGHz, double ResonatorWeight, double Purity = double.NaN)
{
    public double RateGHz => KappaGHz * ResonatorWeight;

    /// <summary>T1 limit in seconds: 1/(2π·γ).</summary>
    public double T1LimitSeconds => RateGHz > 0 ? 1 / (2 * Math.PI * RateGHz * 1e9) : double.PositiveInfinity;
}
