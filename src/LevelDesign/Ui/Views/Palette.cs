using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>
/// Colours used on top of the scheme. With NO_COLOR set every colour collapses to the normal attribute;
/// meaning is always also carried by a symbol or text.
/// </summary>
public static class Palette
{
    public static bool Monochrome { get; set; } = !string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"));

    public static Terminal.Gui.Drawing.Attribute Warning(View view)
    {
        var normal = view.GetAttributeForRole(VisualRole.Normal);
        return Monochrome ? normal : new Terminal.Gui.Drawing.Attribute(new Color(ColorName16.BrightYellow), normal.Background);
    }

    public static Terminal.Gui.Drawing.Attribute Cursor(View view)
    {
        var normal = view.GetAttributeForRole(VisualRole.Normal);
        return Monochrome ? normal : new Terminal.Gui.Drawing.Attribute(new Color(ColorName16.BrightCyan), normal.Background);
    }

    /// <summary>A two-tone scheme for NO_COLOR: normal text, and reverse video for focus.</summary>
    public static Scheme MonochromeScheme()
    {
        var normal = new Terminal.Gui.Drawing.Attribute(new Color(ColorName16.White), new Color(ColorName16.Black));
        var reverse = new Terminal.Gui.Drawing.Attribute(new Color(ColorName16.Black), new Color(ColorName16.White));
        return new Scheme(normal) { Focus = reverse, HotFocus = reverse, Active = reverse, HotActive = reverse, HotNormal = normal, Highlight = reverse };
    }
}
