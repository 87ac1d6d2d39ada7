using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>A theory that needs the native backend; reported as skipped, with the reason, when it is unavailable.</summary>
public sealed class NativeTheoryAttribute : TheoryAttribute
{
    public NativeTheoryAttribute()
    {
        if (EigenSolvers.Native is null)
            Skip = "native LAPACK backend unavailable (skipped by design): " + EigenSolvers.NativeUnavailableReason;
    }
}
