using LevelDesign.Core.Model;

namespace LevelDesign.Core.Spread;

/// <summary>Draws sample number i of a study from (seed, i) alone (see <see cref="SampleNoise"/>).</summary>
public sealed class SpreadSampler(Device nominal, SpreadDefinition definition)
{
    public SpreadSample Draw(long index)
    {
        var device = nominal;
        var values = new List<double>();
        var deviations = new List<double>();
        foreach (var g in definition.Groups)
        {
            double common = g.Shared > 0 ? SampleNoise.Normal(definition.Seed, index, g.Name + "#shared") : 0;
            foreach (string path in g.Paths)
            {
                double own = SampleNoise.Normal(definition.Seed, index, g.Name + "/" + path);
                double step = g.Shared * common + g.Sigma * own;   // deviation of the value (absolute) or of its logarithm / fraction (relative)
                double x0 = nominal.GetParameter(path);
                double x = !g.Relative ? x0 + step
                    : g.Distribution == SpreadDistribution.LogNormal ? x0 * Math.Exp(step)
                    : x0 * (1 + step);
                device = device.WithParameter(path, x);
                values.Add(x);
                deviations.Add(g.TotalSigma > 0 ? step / g.TotalSigma : 0);
            }
        }
        return new SpreadSample(index, device, values, deviations);
    }
}
