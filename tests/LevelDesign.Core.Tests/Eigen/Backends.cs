using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>
/// Theory data naming every backend usable in this process. The native backend is listed only when it
/// loaded and passed verification; its absence is reported by <see cref="NativeFactAttribute"/> tests as skipped.
/// </summary>
public static class Backends
{
    public const string ManagedKey = "managed";
    public const string NativeKey = "native";

    public static TheoryData<string> Available
    {
        get
        {
            var data = new TheoryData<string> { ManagedKey };
            if (EigenSolvers.Native is not null) data.Add(NativeKey);
            return data;
        }
    }

    public static IEigenSolver Get(string key) => key switch
    {
        ManagedKey => EigenSolvers.Managed,
        NativeKey => EigenSolvers.Native ?? throw new InvalidOperationException(
            "native backend listed but unavailable: " + EigenSolvers.NativeUnavailableReason),
        _ => throw new ArgumentOutOfRangeException(nameof(key), key, "unknown backend key"),
    };
}
