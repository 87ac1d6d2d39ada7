using System.Text;
using MathNet.Numerics.Distributions;

namespace LevelDesign.Core.Spread;

/// <summary>
/// Standard normal numbers that depend only on (seed, sample index, name): a counter-based generator (the
/// SplitMix64 finaliser applied to a hash of the three) gives a uniform number, turned into a normal one by the
/// inverse normal CDF. So a sample is the same however the samples are split between processes or threads, and
/// adding a spread group leaves the numbers of the others unchanged (each draws under its own name).
/// </summary>
public static class SampleNoise
{
    public static double Normal(ulong seed, long sample, string name)
    {
        ulong h = Mix(seed ^ 0x9E3779B97F4A7C15UL);
        h = Mix(h ^ (ulong)sample);
        foreach (byte b in Encoding.UTF8.GetBytes(name)) h = Mix(h ^ b);
        // 53 random bits, centred in their cell so the uniform number is never exactly 0 or 1
        double u = ((h >> 11) + 0.5) / (1UL << 53);
        return MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, u);
    }

    /// <summary>The SplitMix64 output function (Steele, Lea and Flood, OOPSLA 2014): a bijective 64-bit mixer.</summary>
    private static ulong Mix(ulong z)
    {
        z += 0x9E3779B97F4A7C15UL;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }
}
