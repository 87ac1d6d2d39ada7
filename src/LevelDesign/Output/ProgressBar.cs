namespace LevelDesign.Output;

/// <summary>A one-line progress bar on stderr; redrawn in place on a terminal, printed every 10% otherwise.</summary>
public sealed class ProgressBar(int total, TextWriter? writer = null)
{
    private readonly TextWriter _out = writer ?? Console.Error;
    private readonly bool _interactive = !Console.IsErrorRedirected;
    private int _lastDecile = -1;

    public void Report(int done)
    {
        if (_interactive)
        {
            const int width = 30;
            int filled = total == 0 ? width : done * width / total;
            _out.Write($"\r[{new string('#', filled)}{new string('.', width - filled)}] {done}/{total}");
            if (done == total) _out.WriteLine();
            return;
        }
        int decile = total == 0 ? 10 : done * 10 / total;
        if (decile != _lastDecile)
        {
            _lastDecile = decile;
            _out.WriteLine($"progress: {done}/{total}");
        }
    }

    public void Finish()
    {
        if (_interactive) _out.WriteLine();
    }
}
