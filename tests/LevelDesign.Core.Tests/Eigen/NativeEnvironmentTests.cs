using System.Runtime.InteropServices;
using LevelDesign.Core.Eigen;

namespace LevelDesign.Core.Tests.Eigen;

/// <summary>
/// A native library reads its settings with the C library's getenv when it loads (OpenBLAS its thread count), so the
/// value must be in that environment, which .NET's own Environment.SetEnvironmentVariable does not write on Linux.
/// </summary>
public partial class NativeEnvironmentTests
{
    [LibraryImport("libc.so.6", EntryPoint = "getenv", StringMarshalling = StringMarshalling.Utf8)]
    private static partial nint GetEnv(string name);

    private static string? NativeValue(string name) => Marshal.PtrToStringUTF8(GetEnv(name));

    [Fact]
    public void A_variable_set_for_native_code_is_seen_by_getenv_and_a_value_already_set_is_kept()
    {
        if (!OperatingSystem.IsLinux()) return;
        string name = "LEVELDESIGN_TEST_" + Guid.NewGuid().ToString("N");
        Assert.Null(NativeValue(name));
        Assert.True(NativeEnvironment.SetUnlessSet(name, "1"));
        Assert.Equal("1", NativeValue(name));

        // set by the user (seen by .NET): left alone
        string user = "LEVELDESIGN_TEST_" + Guid.NewGuid().ToString("N");
        Environment.SetEnvironmentVariable(user, "4");
        Assert.False(NativeEnvironment.SetUnlessSet(user, "1"));
        Assert.Null(NativeValue(user));   // .NET's copy only: the proof that setenv itself is needed
        Environment.SetEnvironmentVariable(user, null);
    }
}
