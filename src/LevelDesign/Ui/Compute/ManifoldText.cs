namespace LevelDesign.Ui.Compute;

public static class ManifoldText
{
    public static string Describe(this Manifold manifold) => manifold switch
    {
        Manifold.SingleExcitations => "1 excitation",
        Manifold.UpToTwo => "≤2 excitations",
        _ => "all kept",
    };

    public static bool Admits(this Manifold manifold, int excitations) => manifold switch
    {
        Manifold.SingleExcitations => excitations == 1,
        Manifold.UpToTwo => excitations is 1 or 2,
        _ => excitations >= 1,
    };

    public static Manifold Next(this Manifold manifold) => (Manifold)(((int)manifold + 1) % 3);
}
