using System.Text;
using LevelDesign.Core.DeviceFiles;

namespace LevelDesign.Output;

/// <summary>
/// The commands' stdout and stderr with control characters escaped (<see cref="TerminalText"/>): text from a device
/// file (an id, a kind, a name, an error echoing a value) can never send escape sequences to the terminal. The
/// progress bar alone writes its carriage returns to the raw stderr. Not used by the terminal UI, which draws with
/// escape sequences of its own.
/// </summary>
public sealed class SafeConsole(TextWriter inner) : TextWriter
{
    /// <summary>stderr as it was before <see cref="Install"/>, for the progress bar's \r redraws.</summary>
    public static TextWriter RawError { get; private set; } = Console.Error;

    public static void Install()
    {
        if (Console.Out is SafeConsole) return;
        RawError = Console.Error;
        Console.SetOut(new SafeConsole(Console.Out));
        Console.SetError(new SafeConsole(Console.Error));
    }

    public override Encoding Encoding => inner.Encoding;

    public override void Write(char value)
    {
        if (TerminalText.Unsafe(value)) inner.Write(TerminalText.Clean(value.ToString()));
        else inner.Write(value);
    }

    public override void Write(string? value)
    {
        if (value is not null) inner.Write(TerminalText.Clean(value));
    }

    public override void Write(char[] buffer, int index, int count) => Write(new string(buffer, index, count));

    public override void WriteLine(string? value)
    {
        Write(value);
        inner.WriteLine();
    }

    public override void Flush() => inner.Flush();
}
