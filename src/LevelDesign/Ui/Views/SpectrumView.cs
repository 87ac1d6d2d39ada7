using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Drawing;
using LevelDesign.Ui.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>
/// Dressed transition frequencies against the swept bias, drawn with braille dots. Each branch is named at
/// its right end; crossings are marked "×"; the bias cursor is a dotted column with its value in the header.
/// ←/→ move the cursor; +/− zoom the frequency axis about the level at the cursor nearest the middle, PgUp/PgDn pan
/// it; &gt;/&lt; zoom the bias axis about the cursor (the window follows the cursor); Home fits both again.
/// </summary>
public sealed class SpectrumView : View
{
    private const int AxisWidth = 8;
    /// <summary>Only the narrowest crossings are marked, so the marks stay readable; all are listed on the crossings page.</summary>
    public const int MarkedCrossings = 8;
    private SpectrumSeries? _series;
    private IReadOnlyList<CrossingMark> _crossings = [];
    private double? _low, _high;
    /// <summary>The bias window when the bias axis is zoomed (null: the whole sweep).</summary>
    private double? _xLow, _xHigh;

    public SpectrumView()
    {
        CanFocus = true;
        AddCommand(Command.Left, () => MoveCursor(-1));
        AddCommand(Command.Right, () => MoveCursor(1));
        AddCommand(Command.LeftStart, () => MoveCursor(-10));
        AddCommand(Command.RightEnd, () => MoveCursor(10));
        AddCommand(Command.ZoomIn, () => Zoom(0.5));
        AddCommand(Command.ZoomOut, () => Zoom(2));
        AddCommand(Command.PageUp, () => Pan(0.5));
        AddCommand(Command.PageDown, () => Pan(-0.5));
        AddCommand(Command.Up, () => Pan(0.1));
        AddCommand(Command.Down, () => Pan(-0.1));
        AddCommand(Command.Expand, () => ZoomBias(0.5));
        AddCommand(Command.Collapse, () => ZoomBias(2));
        AddCommand(Command.Start, () => { _low = _high = _xLow = _xHigh = null; SetNeedsDraw(); return true; });
        KeyBindings.Add(Key.CursorLeft, Command.Left);
        KeyBindings.Add(Key.CursorRight, Command.Right);
        KeyBindings.Add(Key.CursorLeft.WithShift, Command.LeftStart);
        KeyBindings.Add(Key.CursorRight.WithShift, Command.RightEnd);
        KeyBindings.Add(new Key('+'), Command.ZoomIn);
        KeyBindings.Add(new Key('='), Command.ZoomIn);
        KeyBindings.Add(new Key('-'), Command.ZoomOut);
        KeyBindings.Add(Key.PageUp, Command.PageUp);
        KeyBindings.Add(Key.PageDown, Command.PageDown);
        KeyBindings.Add(Key.CursorUp, Command.Up);
        KeyBindings.Add(Key.CursorDown, Command.Down);
        KeyBindings.Add(Key.Home, Command.Start);
        KeyBindings.Add(new Key('>'), Command.Expand);
        KeyBindings.Add(new Key('.'), Command.Expand);
        KeyBindings.Add(new Key('<'), Command.Collapse);
        KeyBindings.Add(new Key(','), Command.Collapse);
    }

    public int CursorIndex { get; private set; }
    public string ManifoldText { get; set; } = "";

    /// <summary>Writes a bias value for the header and axis ends (e.g. "0.75 mA" for a coil current); plain numbers by default.</summary>
    public Func<double, string> FormatBias { get; set; } = v => Numbers.Plain(v);
    public string Status { get; set; } = "no sweep yet: F5 starts one";
    public SpectrumSeries? Series => _series;

    public event Action<int>? CursorMoved;

    public void Show(SpectrumSeries? series, IReadOnlyList<CrossingMark> crossings)
    {
        // a sweep over another range starts with the whole bias axis
        if (series is null || _series is null || series.Axis.Length == 0 || _series.Axis.Length == 0
            || series.Axis[0] != _series.Axis[0] || series.Axis[^1] != _series.Axis[^1])
            _xLow = _xHigh = null;
        _series = series;
        _crossings = crossings;
        if (series is not null) CursorIndex = Math.Clamp(CursorIndex, 0, Math.Max(0, series.Axis.Length - 1));
        SetNeedsDraw();
    }

    public void SetCursor(int index)
    {
        if (_series is null || _series.Axis.Length == 0) return;
        CursorIndex = Math.Clamp(index, 0, _series.Axis.Length - 1);
        FollowCursor();
        SetNeedsDraw();
        CursorMoved?.Invoke(CursorIndex);
    }

    private bool? MoveCursor(int delta)
    {
        SetCursor(CursorIndex + delta);
        return true;
    }

    /// <summary>Zooms the frequency axis about the level at the cursor nearest the window's middle (the middle without a sweep).</summary>
    private bool? Zoom(double factor)
    {
        var (low, high) = Range();
        double middle = (low + high) / 2, half = (high - low) / 2 * factor;
        double centre = _series is { Axis.Length: > 0 } series
            ? series.Branches.Select(b => b.Frequencies[CursorIndex]).Where(f => double.IsFinite(f) && f >= low && f <= high)
                .DefaultIfEmpty(middle).MinBy(f => Math.Abs(f - middle))
            : middle;
        (_low, _high) = (centre - half, centre + half);
        SetNeedsDraw();
        return true;
    }

    /// <summary>The bias window shown: the zoomed one, or the whole sweep.</summary>
    public (double Low, double High) BiasRange()
    {
        if (_xLow is double l && _xHigh is double h) return (l, h);
        if (_series is not { Axis.Length: > 0 } series) return (0, 1);
        return (series.Axis[0], series.Axis[^1]);
    }

    /// <summary>Zooms the bias axis about the cursor, inside the sweep's range; zooming out to the whole sweep ends it.</summary>
    private bool? ZoomBias(double factor)
    {
        if (_series is not { Axis.Length: > 1 } series) return true;
        double first = Math.Min(series.Axis[0], series.Axis[^1]), last = Math.Max(series.Axis[0], series.Axis[^1]);
        var (low, high) = BiasRange();
        double half = Math.Abs(high - low) / 2 * factor;
        // no narrower than four sweep steps, so a zoomed window still shows lines
        half = Math.Max(half, 2 * (last - first) / (series.Axis.Length - 1));
        if (2 * half >= last - first) { _xLow = _xHigh = null; SetNeedsDraw(); return true; }
        double centre = Math.Clamp(series.Axis[CursorIndex], first + half, last - half);
        (_xLow, _xHigh) = (centre - half, centre + half);
        SetNeedsDraw();
        return true;
    }

    /// <summary>Shifts a zoomed bias window so the cursor stays inside it.</summary>
    private void FollowCursor()
    {
        if (_xLow is not double low || _xHigh is not double high || _series is null) return;
        double x = _series.Axis[CursorIndex], width = high - low;
        if (x < low) (_xLow, _xHigh) = (x, x + width);
        else if (x > high) (_xLow, _xHigh) = (x - width, x);
    }

    private bool? Pan(double fraction)
    {
        var (low, high) = Range();
        double shift = (high - low) * fraction;
        (_low, _high) = (low + shift, high + shift);
        SetNeedsDraw();
        return true;
    }

    /// <summary>The frequency window shown: the zoomed one, or all branches with a small margin.</summary>
    public (double Low, double High) Range()
    {
        if (_low is double l && _high is double h) return (l, h);
        var values = _series?.Branches.SelectMany(b => b.Frequencies).Where(double.IsFinite).ToList() ?? [];
        if (values.Count == 0) return (0, 10);
        double min = values.Min(), max = values.Max(), pad = Math.Max(0.02, (max - min) * 0.05);
        return (min - pad, max + pad);
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width, height = Viewport.Height;
        var normal = GetAttributeForRole(VisualRole.Normal);
        SetAttribute(normal);
        for (int r = 0; r < height; r++) { Move(0, r); AddStr(new string(' ', Math.Max(0, width))); }
        if (width < AxisWidth + 10 || height < 5) { Move(0, 0); AddStr(RowList.Pad("enlarge to see the spectrum", width)); return true; }

        var series = _series;
        // On a narrow plot the manifold goes first, then the status; the cursor's bias always stays.
        string header = series is null || series.Axis.Length == 0
            ? $"Spectrum — {Status}"
            : TextFit.KeepMostImportant([($"cursor {series.AxisName} = {FormatBias(series.Axis[CursorIndex])}", 0), (ManifoldText, 2), (Status, 1)], width, " │ ");
        Move(0, 0);
        AddStr(RowList.Pad(header, width));
        int labelWidth = width >= 60 ? 12 : width >= 45 ? 8 : 0;
        int plotColumns = width - AxisWidth - labelWidth, plotRows = height - 3;
        if (series is null || series.Axis.Length == 0 || plotColumns < 4 || plotRows < 2)
        {
            var keys = TextFit.WrapLines("←/→ cursor · +/− zoom f · >/< zoom bias · PgUp/PgDn pan · Home fit · F7 manifold", width, Math.Max(1, height - 2));
            for (int i = 0; i < keys.Count; i++) { Move(0, 2 + i); AddStr(RowList.Pad(keys[i], width)); }
            return true;
        }

        var (low, high) = Range();
        var (xMin, xMax) = BiasRange();
        if (xMax == xMin) xMax = xMin + 1;
        var canvas = new BrailleCanvas(plotColumns, plotRows);
        int DotX(double x) => (int)Math.Round((x - xMin) / (xMax - xMin) * (canvas.DotWidth - 1));
        int DotY(double f) => (int)Math.Round((high - f) / (high - low) * (canvas.DotHeight - 1));
        var ends = new List<(int Row, string Label)>();
        foreach (var branch in series.Branches)
        {
            int? lastX = null, lastY = null, endY = null;
            for (int i = 0; i < series.Axis.Length; i++)
            {
                double f = branch.Frequencies[i];
                if (!double.IsFinite(f)) { lastX = lastY = null; continue; }
                int x = DotX(series.Axis[i]), y = DotY(f);
                if (lastX is int px && lastY is int py) canvas.Line(px, py, x, y); else canvas.Set(x, y);
                (lastX, lastY) = (x, y);
                if (x >= 0 && x < canvas.DotWidth) endY = y;   // the name goes where the branch leaves a zoomed window
            }
            if (endY is int end && end >= 0 && end < canvas.DotHeight) ends.Add((end / 4, branch.Label));
        }

        int cursorColumn = Math.Clamp(DotX(series.Axis[CursorIndex]) / 2, 0, plotColumns - 1);
        var marks = new HashSet<(int, int)>();
        foreach (var c in _crossings.OrderBy(c => c.Crossing.GapGHz).Take(MarkedCrossings))
        {
            int cx = DotX(c.Crossing.Bias) / 2, cy = DotY(c.FrequencyGHz) / 4;
            if (cx >= 0 && cx < plotColumns && cy >= 0 && cy < plotRows) marks.Add((cx, cy));
        }

        for (int row = 0; row < plotRows; row++)
        {
            Move(0, row + 1);
            SetAttribute(normal);
            bool tick = row == 0 || row == plotRows - 1 || row == plotRows / 2;
            double f = high - (high - low) * (row * 4 + 1.5) / (canvas.DotHeight - 1);
            AddStr(tick ? $"{Numbers.Plain(f, 3),7}┤" : "       │");
            for (int column = 0; column < plotColumns; column++)
            {
                if (marks.Contains((column, row))) { SetAttribute(Palette.Warning(this)); AddRune('×'); SetAttribute(normal); continue; }
                if (column == cursorColumn)
                {
                    SetAttribute(Palette.Cursor(this));
                    AddRune(canvas.IsEmpty(column, row) ? '┊' : canvas.CharAt(column, row));
                    SetAttribute(normal);
                    continue;
                }
                AddRune(canvas.IsEmpty(column, row) ? ' ' : canvas.CharAt(column, row));
            }
        }

        // Branch names at the right end, on their own branch's row or one row off; a name with no free row that
        // close is left out rather than put beside another branch.
        var used = new HashSet<int>();
        foreach (var (row, label) in ends.OrderBy(e => e.Row))
        {
            if (labelWidth == 0) break;
            int r = new[] { row, row + 1, row - 1 }.FirstOrDefault(x => x >= 0 && x < plotRows && !used.Contains(x), -1);
            if (r < 0) continue;
            used.Add(r);
            Move(AxisWidth + plotColumns, r + 1);
            AddStr(RowList.Pad(" " + label, labelWidth));
        }

        Move(0, height - 2);
        AddStr(new string(' ', AxisWidth - 1) + "└" + new string('─', plotColumns));
        Move(0, height - 1);
        AddStr(RowList.Pad(AxisLine(FormatBias(xMin), FormatBias(xMax), series.AxisName, plotColumns, width), width));
        return true;
    }

    /// <summary>
    /// The line under the plot: the bias at both ends, the axis name centred between them (or after them when the
    /// plot is too narrow), then as much of "f in GHz · × crossing" as fits.
    /// </summary>
    public static string AxisLine(string left, string right, string axisName, int plotColumns, int width)
    {
        string line = new string(' ', AxisWidth) + left;
        int rightAt = Math.Max(line.Length + 1, AxisWidth + plotColumns - right.Length);
        string name = $"{axisName} →";
        int gap = rightAt - line.Length;
        bool nameBetween = name.Length + 4 <= gap;
        if (nameBetween) line += new string(' ', (gap - name.Length) / 2) + name;
        line = line.PadRight(rightAt) + right;
        var notes = new List<(string, int)> { ("f in GHz", 1), ("× crossing", 2) };
        if (!nameBetween) notes.Insert(0, (name, 0));
        string tail = TextFit.KeepMostImportant(notes, Math.Max(0, width - line.Length - 2), " · ", cutLast: nameBetween is false);
        return tail.Length > 0 ? line + "  " + tail : line;
    }
}
