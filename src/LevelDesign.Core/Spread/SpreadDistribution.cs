namespace LevelDesign.Core.Spread;

/// <summary>How a spread parameter is drawn around its nominal value.</summary>
public enum SpreadDistribution
{
    /// <summary>value = nominal·(1 + σ·z) for a relative σ, nominal + σ·z for an absolute one.</summary>
    Normal,

    /// <summary>value = nominal·exp(σ·z): always of the nominal's sign; σ is the spread of the logarithm (relative only).</summary>
    LogNormal,
}
