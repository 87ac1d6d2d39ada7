using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>
/// Colours used on top of the scheme. With NO_COLOR set no colour is sent at all: the terminal's own foreground and
/// background stay, and emphasis is carried by text attributes (bold, reverse) and by symbols and text.
/// </summary>
public static class Palette
{
    public static bool Monochrome { get; set; } = !string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"));

    public static Terminal.Gui.Drawing.Attribute Warning(View view)
    {
        var normal = view.GetAttributeForRole(VisualRole.Normal);
        return Monochrome ? normal with { Style = TextStyle.Bold } : new Terminal.Gui.Drawing.Attribute(new Color(ColorName16.BrightYellow), normal.Background);
    }

    public static Terminal.Gui.Drawing.Attribute Cursor(View view)
    {
        var normal = view.GetAttributeForRole(VisualRole.Normal);
        return Monochrome ? normal with { Style = TextStyle.Bold } : new Terminal.Gui.Drawing.Attribute(new Color(ColorName16.BrightCyan), normal.Background);
    }

    /// <summary>The NO_COLOR scheme: the terminal's default colours (Color.None), bold headings, reverse video for focus.</summary>
    public static Scheme MonochromeScheme()
    {
        Terminal.Gui.Drawing.Attribute Plain(TextStyle style) => new(Color.None, Color.None, style);
        var normal = Plain(TextStyle.None);
        var reverse = Plain(TextStyle.Reverse);
        return new Scheme(normal)
        {
            Focus = reverse, HotFocus = Plain(TextStyle.Reverse | TextStyle.Bold), Active = reverse, HotActive = reverse,
            HotNormal = Plain(TextStyle.Bold), Highlight = reverse, Editable = normal, ReadOnly = normal, Disabled = Plain(TextStyle.Faint),
        };
    }
}
