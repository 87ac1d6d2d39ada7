namespace LevelDesign.Core.Analysis;

/// <summary>
/// The coherence budget of one qubit at one point: every channel, T1 = 1/ΣΓ1, T_φ = 1/ΣΓ_φ,
/// T2 = 1/(1/(2T1) + 1/T_φ), and the channels that limit T1 and T2 most. Model estimates, to confirm by measurement.
/// </summary>
public sealed record CoherenceBudget(string Qubit, double DressedF01, double Purity, IReadOnlyList<CoherenceChannel> Channels)
{
    private IEnumerable<CoherenceChannel> Counted(CoherenceChannelKind kind) =>
        Channels.Where(c => c.Kind == kind && double.IsFinite(c.RatePerSecond));

    public double T1Seconds => Inverse(Counted(CoherenceChannelKind.Relaxation).Sum(c => c.RatePerSecond));

    public double TPhiSeconds => Inverse(Counted(CoherenceChannelKind.Dephasing).Sum(c => c.RatePerSecond));

    public double T2Seconds => Inverse(1 / (2 * T1Seconds) + 1 / TPhiSeconds);

    /// <summary>The relaxation channel with the largest rate (null when none has a rate).</summary>
    public CoherenceChannel? DominantT1 => Counted(CoherenceChannelKind.Relaxation).Where(c => c.RatePerSecond > 0).MaxBy(c => c.RatePerSecond);

    /// <summary>The channel with the largest share of 1/T2.</summary>
    public CoherenceChannel? DominantT2 => Channels.Where(c => double.IsFinite(c.RatePerSecond) && c.RatePerSecond > 0).MaxBy(c => c.T2Rate);

    private static double Inverse(double rate) => rate > 0 ? 1 / rate : double.PositiveInfinity;
}
