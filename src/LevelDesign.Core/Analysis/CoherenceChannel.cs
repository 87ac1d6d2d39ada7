namespace LevelDesign.Core.Analysis;

/// <summary>
/// One loss or dephasing channel of a qubit: its rate in 1/s (NaN when it could not be evaluated), the formula and
/// published source it follows, and what it was evaluated with (matrix element, slope, step check, ...).
/// </summary>
public sealed record CoherenceChannel(string Name, CoherenceChannelKind Kind, double RatePerSecond, string Formula, string Source, string Detail)
{
    /// <summary>The time this channel alone would allow (1/rate), in s.</summary>
    public double LimitSeconds => RatePerSecond > 0 ? 1 / RatePerSecond : double.PositiveInfinity;

    /// <summary>Its share of 1/T2 = 1/(2T1) + 1/T_φ, the figure by which the dominant channel is named.</summary>
    public double T2Rate => Kind == CoherenceChannelKind.Relaxation ? RatePerSecond / 2 : RatePerSecond;
}
