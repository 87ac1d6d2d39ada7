namespace LevelDesign.Core.Elements;

/// <summary>
/// Effective Josephson energy of a two-junction SQUID (Koch et al., Phys. Rev. A 76, 042319 (2007), asymmetric SQUID):
/// E_J(Φ) = E_JΣ·sqrt(cos²(πΦ/Φ0) + d²·sin²(πΦ/Φ0)), d = (E_J2 − E_J1)/(E_J1 + E_J2).
/// </summary>
public static class SquidJosephsonEnergy
{
    public static double At(double ejSum, double asymmetry, double flux)
    {
        double c = Math.Cos(Math.PI * flux), s = Math.Sin(Math.PI * flux);
        return ejSum * Math.Sqrt(c * c + asymmetry * asymmetry * s * s);
    }

    public static (double EjSum, double Asymmetry) FromJunctions(double ej1, double ej2) =>
        (ej1 + ej2, (ej2 - ej1) / (ej1 + ej2));

    /// <summary>dE_J/dΦ (per Φ0), for sensitivity estimates.</summary>
    public static double Derivative(double ejSum, double asymmetry, double flux)
    {
        double ej = At(ejSum, asymmetry, flux);
        if (ej == 0) return 0;
        double c = Math.Cos(Math.PI * flux), s = Math.Sin(Math.PI * flux);
        return ejSum * ejSum * (asymmetry * asymmetry - 1) * Math.PI * s * c / ej;
    }
}
