namespace LevelDesign.Core.Tests.Eigen;

/// <summary>A fact about the system LAPACK file; skipped on machines that do not have it installed.</summary>
public sealed class SystemLapackFactAttribute : FactAttribute
{
    public const string Path = "/usr/lib/x86_64-linux-gnu/liblapack.so.3";

    public SystemLapackFactAttribute()
    {
        if (!File.Exists(Path)) Skip = $"{Path} not present on this machine (skipped by design)";
    }
}
