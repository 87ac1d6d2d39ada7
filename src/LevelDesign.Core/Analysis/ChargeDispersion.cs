using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// Charge dispersion of a transmon level: ε_m = E_m(n_g = 1/2) − E_m(n_g = 0) of the element alone (GHz),
/// the peak-to-peak swing of level m with offset charge; and the asymptotic formula of Koch et al.,
/// Phys. Rev. A 76, 042319 (2007): ε_m ≈ (−1)^m E_C 2^{4m+5}/m! · sqrt(2/π) · (E_J/2E_C)^{m/2+3/4} · e^{−sqrt(8E_J/E_C)}.
/// </summary>
public static class ChargeDispersion
{
    public static double OfLevel(Element element, int level)
    {
        if (element is not (Transmon or TunableTransmon))
            throw new ArgumentException($"element '{element.Id}' is not a charge-basis element; charge dispersion applies to transmons");
        var at0 = element.WithParameter("ng", 0);
        var atHalf = element.WithParameter("ng", 0.5);
        return atHalf.Diagonalise(level + 1).Energies[level] - at0.Diagonalise(level + 1).Energies[level];
    }

    /// <summary>Asymptotic estimate (valid for E_J/E_C ≫ 1), GHz.</summary>
    public static double Asymptotic(double ec, double ej, int level)
    {
        double factorial = 1;
        for (int i = 2; i <= level; i++) factorial *= i;
        return (level % 2 == 0 ? 1 : -1) * ec * Math.Pow(2, 4 * level + 5) / factorial * Math.Sqrt(2 / Math.PI)
               * Math.Pow(ej / (2 * ec), level / 2.0 + 0.75) * Math.Exp(-Math.Sqrt(8 * ej / ec));
    }
}
