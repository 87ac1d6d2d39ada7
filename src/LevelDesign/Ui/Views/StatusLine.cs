using LevelDesign.Ui.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>
/// The lines above the key bar: the facts (file, unsaved mark, eigensolver, convergence, last computation, running
/// work), keeping the most important ones when they do not all fit, then the latest message, wrapped onto up to
/// <see cref="MaxMessageLines"/> lines so no reason is cut off.
/// </summary>
public sealed class StatusLine : WrappedHeightView
{
    public const int MaxMessageLines = 3;
    private IReadOnlyList<(string Text, int Rank)> _facts = [];
    private string _message = "";

    public StatusLine()
    {
        Height = 2;
        CanFocus = false;
    }

    /// <summary>Facts in display order; a larger rank is left out first when the line is too narrow.</summary>
    public void SetFacts(IReadOnlyList<(string Text, int Rank)> facts)
    {
        _facts = facts;
        SetNeedsDraw();
    }

    public string Facts => FactsLine(int.MaxValue);
    public bool MessageIsWarning { get; set; }

    public string Message
    {
        get => _message;
        set { _message = value; Refit(); SetNeedsDraw(); }
    }

    /// <summary>Lines in use: the facts and the wrapped message.</summary>
    public override int Rows => 1 + MessageLines(AvailableWidth()).Count;

    private string FactsLine(int width) => TextFit.KeepMostImportant(_facts, width, " │ ");

    private IReadOnlyList<string> MessageLines(int width) =>
        _message.Length == 0 ? [""] : TextFit.WrapLines(_message, width, MaxMessageLines, indent: "  ");

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width;
        SetAttribute(GetAttributeForRole(VisualRole.Normal));
        Move(0, 0);
        AddStr(RowList.Pad(FactsLine(width), width));
        SetAttribute(MessageIsWarning ? Palette.Warning(this) : GetAttributeForRole(VisualRole.Normal));
        var lines = MessageLines(width);
        for (int row = 1; row < Viewport.Height; row++)
        {
            Move(0, row);
            AddStr(RowList.Pad(row - 1 < lines.Count ? lines[row - 1] : "", width));
        }
        SetAttribute(GetAttributeForRole(VisualRole.Normal));
        return true;
    }
}
