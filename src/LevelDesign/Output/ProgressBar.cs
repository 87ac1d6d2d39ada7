namespace LevelDesign.Output;

/// <summary>
/// A one-line progress bar on stderr, redrawn in place when stderr is a terminal; otherwise a line every 10%.
/// Thread-safe: sweep workers report from several threads, possibly out of order, so the largest count wins.
/// </summary>
public sealed class ProgressBar(int total, TextWriter? writer = null) : IProgress<Core.Sweeps.SweepProgress>
{
    private readonly TextWriter _out = writer ?? SafeConsole.RawError;
    private readonly bool _interactive = writer is null && !Console.IsErrorRedirected;
    private readonly object _gate = new();
    private int _lastDecile = -1;
    private int _done;
    private bool _open;

    public void Report(Core.Sweeps.SweepProgress value) => Report(value.Done);

    public void Report(int done)
    {
        lock (_gate)
        {
            if (done <= _done && _done > 0) return;
            _done = done;
            if (_interactive)
            {
                const int width = 30;
                int filled = total == 0 ? width : done * width / total;
                _out.Write($"\r[{new string('#', filled)}{new string('.', width - filled)}] {done}/{total}");
                _open = done < total;
                if (!_open) _out.WriteLine();
                return;
            }
            int decile = total == 0 ? 10 : done * 10 / total;
            if (decile != _lastDecile)
            {
                _lastDecile = decile;
                _out.WriteLine($"progress: {done}/{total}");
            }
        }
    }

    /// <summary>Ends an unfinished bar line so the next message starts on its own line.</summary>
    public void Finish()
    {
        lock (_gate)
        {
            if (_interactive && _open) _out.WriteLine();
            _open = false;
        }
    }
}
