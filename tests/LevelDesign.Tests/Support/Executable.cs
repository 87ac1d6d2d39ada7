using System.Diagnostics;

namespace LevelDesign.Tests.Support;

/// <summary>
/// Runs the built leveldesign executable as a separate process (dotnet leveldesign.dll ...), as a user would.
/// The test project references the executable's project, so leveldesign.dll is built and copied beside the tests.
/// </summary>
public static class Executable
{
    public static string DllPath
    {
        get
        {
            string beside = Path.Combine(AppContext.BaseDirectory, "leveldesign.dll");
            if (File.Exists(beside)) return beside;
            throw new FileNotFoundException("leveldesign.dll is not beside the test assembly; build the solution first", beside);
        }
    }

    public static CommandResult Run(params string[] args) => Run(args, TimeSpan.FromMinutes(2));

    /// <summary>`dotnet leveldesign.dll ARGS` from the repository root, with all three standard streams redirected.</summary>
    public static ProcessStartInfo StartInfo(IEnumerable<string> args)
    {
        var start = new ProcessStartInfo("dotnet")
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
            WorkingDirectory = RepositoryPaths.Root,
        };
        start.ArgumentList.Add(DllPath);
        foreach (var a in args) start.ArgumentList.Add(a);
        return start;
    }

    public static CommandResult Run(string[] args, TimeSpan timeout)
    {
        using var process = Process.Start(StartInfo(args))!;
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"leveldesign {string.Join(' ', args)} did not finish within {timeout}");
        }
        return new CommandResult(process.ExitCode, stdout.Result, stderr.Result);
    }
}
