using System.Runtime.InteropServices;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// The C library's own environment, which native libraries read when they load. .NET keeps a copy of its own on Linux:
/// Environment.SetEnvironmentVariable does not reach getenv() in native code.
/// </summary>
internal static partial class NativeEnvironment
{
    [LibraryImport("libc.so.6", EntryPoint = "setenv", StringMarshalling = StringMarshalling.Utf8)]
    private static partial int SetEnv(string name, string value, int overwrite);

    /// <summary>Sets a variable for native code unless it is set already; false where the C library cannot be reached.</summary>
    public static bool SetUnlessSet(string name, string value)
    {
        if (!OperatingSystem.IsLinux() || Environment.GetEnvironmentVariable(name) is not null) return false;
        try { return SetEnv(name, value, 0) == 0; }
        catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException) { return false; }
    }
}
