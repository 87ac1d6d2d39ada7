namespace LevelDesign.Commands;

/// <summary>
/// Runs a command body and turns the expected failures into exit codes with one clear message each:
/// bad arguments (and a sweep too large for memory) 2, a device that cannot be computed 3, Ctrl-C 130. Anything else is a bug and is left to surface.
/// </summary>
public static class CommandGuard
{
    public static int Run(string path, Func<int> body)
    {
        try
        {
            return body();
        }
        catch (UsageException e)
        {
            foreach (string line in e.Lines) Console.Error.WriteLine(line);
            return ExitCodes.InvalidInput;
        }
        catch (Core.Sweeps.SweepTooLargeException e)
        {
            // refused before computing, like any argument asking for too much
            Console.Error.WriteLine($"{path}: {e.Message}");
            return ExitCodes.InvalidInput;
        }
        catch (OperationCanceledException)
        {
            Console.Error.WriteLine("cancelled");
            return ExitCodes.Cancelled;
        }
        catch (AggregateException e) when (e.InnerExceptions.All(ComputationErrors.IsExpected))
        {
            return ComputationErrors.Report(path, e.InnerExceptions[0]);
        }
        catch (Exception e) when (ComputationErrors.IsExpected(e))
        {
            return ComputationErrors.Report(path, e);
        }
    }

    /// <summary>Loads the file or throws a usage error carrying every problem with file, line and field.</summary>
    public static Core.DeviceFiles.DeviceDocument Load(string path, bool allowLarge) => DeviceInput.Load(path, allowLarge);

    public static void OneFormat(bool json, bool csv)
    {
        if (json && csv) throw new UsageException("choose one of --json and --csv");
    }

    public static Core.Sweeps.LabelMode LabelMode(string? text) => text switch
    {
        null or "character" => Core.Sweeps.LabelMode.ByCharacter,
        "order" => Core.Sweeps.LabelMode.ByOrder,
        _ => throw new UsageException($"--labels {text}: choose 'character' (a label follows the bare character through crossings) or 'order' (the k-th level stays the k-th)"),
    };
}
