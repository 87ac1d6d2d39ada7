using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>One line above the key bar: file, unsaved mark, eigensolver path, convergence, last computation, and the latest message.</summary>
public sealed class StatusLine : View
{
    public string Facts { get; set; } = "";
    public string Message { get; set; } = "";
    public bool MessageIsWarning { get; set; }

    public StatusLine()
    {
        Height = 2;
        CanFocus = false;
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width;
        SetAttribute(GetAttributeForRole(VisualRole.Normal));
        Move(0, 0);
        AddStr(RowList.Pad(Facts, width));
        Move(0, 1);
        SetAttribute(MessageIsWarning ? Palette.Warning(this) : GetAttributeForRole(VisualRole.Normal));
        AddStr(RowList.Pad(Message, width));
        SetAttribute(GetAttributeForRole(VisualRole.Normal));
        return true;
    }
}
