using LevelDesign.Ui.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>
/// The bottom line: the main keys, as many as fit the width (see <see cref="KeyBarText"/>); when some are left
/// out it ends with "F1 all keys". Display only: the keys themselves are bound on the main window.
/// </summary>
public sealed class KeyBar : View
{
    private IReadOnlyList<KeyHint> _hints = [];

    public KeyBar()
    {
        Height = 1;
        CanFocus = false;
    }

    public IReadOnlyList<KeyHint> Hints
    {
        get => _hints;
        set { _hints = value; SetNeedsDraw(); }
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width;
        var normal = GetAttributeForRole(VisualRole.Normal);
        var key = GetAttributeForRole(VisualRole.HotNormal);
        SetAttribute(normal);
        Move(0, 0);
        AddStr(new string(' ', Math.Max(0, width)));
        var (items, indent) = KeyBarText.Layout(_hints, width);
        Move(indent, 0);
        int room = width - indent, used = 0;
        for (int i = 0; i < items.Count && used < room; i++)
        {
            string separator = i == 0 ? "" : KeyBarText.Separator;
            string keyText = TextFit.Cut(separator + items[i].Key, room - used);
            SetAttribute(normal);
            AddStr(keyText[..Math.Min(separator.Length, keyText.Length)]);
            SetAttribute(key);
            AddStr(keyText[Math.Min(separator.Length, keyText.Length)..]);
            used += keyText.Length;
            string label = TextFit.Cut(" " + items[i].Label, room - used);
            SetAttribute(normal);
            AddStr(label);
            used += label.Length;
        }
        return true;
    }
}
