using LevelDesign.Ui.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>
/// A scrolling list of text lines drawn by hand. With <see cref="Selectable"/> one row is current (shown by
/// a "›" marker, not only by colour) and Enter raises <see cref="RowActivated"/>; otherwise arrows scroll.
/// Keys are commands bound with AddCommand + KeyBindings.
/// </summary>
public class RowList : View
{
    private IReadOnlyList<TextLine> _lines = [];
    private int _top;
    private int _selected;

    public RowList()
    {
        CanFocus = true;
        AddCommand(Command.Up, () => ArrowOverride?.Invoke(-1) == true ? true : Step(-1));
        AddCommand(Command.Down, () => ArrowOverride?.Invoke(1) == true ? true : Step(1));
        AddCommand(Command.PageUp, () => Step(-Math.Max(1, Viewport.Height - 1)));
        AddCommand(Command.PageDown, () => Step(Math.Max(1, Viewport.Height - 1)));
        AddCommand(Command.Start, () => Step(-_lines.Count));
        AddCommand(Command.End, () => Step(_lines.Count));
        AddCommand(Command.Accept, () =>
        {
            if (!Selectable || _lines.Count == 0) return false;
            RowActivated?.Invoke(_selected);
            return true;
        });
        KeyBindings.Add(Key.CursorUp, Command.Up);
        KeyBindings.Add(Key.CursorDown, Command.Down);
        KeyBindings.Add(Key.PageUp, Command.PageUp);
        KeyBindings.Add(Key.PageDown, Command.PageDown);
        KeyBindings.Add(Key.Home, Command.Start);
        KeyBindings.Add(Key.End, Command.End);
        KeyBindings.ReplaceCommands(Key.Enter, Command.Accept);
    }

    public bool Selectable { get; init; } = true;

    /// <summary>Takes ↑ (−1) and ↓ (+1) before they scroll when it returns true (a page that moves its own cursor).</summary>
    public Func<int, bool>? ArrowOverride { get; set; }

    /// <summary>Adds a command of this list and binds a key to it (used for context keys such as Insert on the board).</summary>
    public void Bind(Key key, Command command, Func<bool?> action)
    {
        AddCommand(command, action);
        KeyBindings.ReplaceCommands(key, command);
    }

    /// <summary>Rows that cannot be selected (headings) are skipped by the arrows.</summary>
    public Func<int, bool>? CanSelect { get; set; }

    public event Action<int>? SelectionChanged;
    public event Action<int>? RowActivated;

    public int SelectedIndex => _selected;
    public IReadOnlyList<TextLine> Lines => _lines;

    public void SetLines(IReadOnlyList<TextLine> lines, int? select = null)
    {
        _lines = lines;
        int wanted = Math.Clamp(select ?? _selected, 0, Math.Max(0, lines.Count - 1));
        _selected = NearestSelectable(wanted, 1);
        if (!Selectable) _top = Math.Clamp(_top, 0, Math.Max(0, lines.Count - 1));
        EnsureVisible();
        SetNeedsDraw();
        SelectionChanged?.Invoke(_selected);
    }

    /// <summary>Shows the first rows again (a new page of text starts at its top).</summary>
    public void ScrollToTop()
    {
        _top = 0;
        SetNeedsDraw();
    }

    public void Select(int index)
    {
        if (_lines.Count == 0) return;
        _selected = NearestSelectable(Math.Clamp(index, 0, _lines.Count - 1), 1);
        EnsureVisible();
        SetNeedsDraw();
        SelectionChanged?.Invoke(_selected);
    }

    private bool? Step(int delta)
    {
        if (_lines.Count == 0) return true;
        if (!Selectable)
        {
            _top = Math.Clamp(_top + delta, 0, Math.Max(0, _lines.Count - Viewport.Height));
            SetNeedsDraw();
            return true;
        }
        int target = Math.Clamp(_selected + delta, 0, _lines.Count - 1);
        target = NearestSelectable(target, Math.Sign(delta) == 0 ? 1 : Math.Sign(delta));
        if (target != _selected)
        {
            _selected = target;
            EnsureVisible();
            SetNeedsDraw();
            SelectionChanged?.Invoke(_selected);
        }
        return true;
    }

    private int NearestSelectable(int index, int direction)
    {
        if (CanSelect is null || _lines.Count == 0) return index;
        for (int i = index; i >= 0 && i < _lines.Count; i += direction) if (CanSelect(i)) return i;
        for (int i = index; i >= 0 && i < _lines.Count; i -= direction) if (CanSelect(i)) return i;
        return index;
    }

    private void EnsureVisible()
    {
        int height = Math.Max(1, Viewport.Height);
        if (!Selectable) return;
        if (_selected < height) _top = 0; // keep the first rows (headings) in view when they fit
        if (_selected < _top) _top = _selected;
        if (_selected >= _top + height) _top = _selected - height + 1;
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width, height = Viewport.Height;
        if (Selectable) EnsureVisible();
        var normal = GetAttributeForRole(VisualRole.Normal);
        for (int row = 0; row < height; row++)
        {
            int index = _top + row;
            var line = index < _lines.Count ? _lines[index] : null;
            bool current = Selectable && index == _selected && line is not null;
            string text = line is null ? "" : (Selectable ? (current ? "›" : " ") : "") + line.Text;
            var attribute = current
                ? GetAttributeForRole(HasFocus ? VisualRole.Focus : VisualRole.Active)
                : line is { Warning: true } ? Palette.Warning(this) : line is { Heading: true } ? GetAttributeForRole(VisualRole.HotNormal) : normal;
            SetAttribute(attribute);
            Move(0, row);
            AddStr(Pad(text, width));
        }
        SetAttribute(normal);
        return true;
    }

    /// <summary>Exactly <paramref name="width"/> columns: padded, or cut with a visible "…" so a cut never passes unseen.</summary>
    internal static string Pad(string text, int width) => TextFit.Pad(text, width);
}
