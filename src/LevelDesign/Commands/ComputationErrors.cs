using LevelDesign.Core.Eigen;
using LevelDesign.Core.Model;

namespace LevelDesign.Commands;

/// <summary>Exceptions that mean "this device could not be computed" (reported, exit 3) rather than a bug.</summary>
public static class ComputationErrors
{
    public static bool IsExpected(Exception e) =>
        e is InvalidDeviceException or InvalidOperationException or ArgumentException or NotPositiveDefiniteException or KeyNotFoundException;

    public static int Report(string path, Exception e)
    {
        Console.Error.WriteLine($"{path}: computation failed: {e.Message}");
        return ExitCodes.ComputationFailed;
    }
}
