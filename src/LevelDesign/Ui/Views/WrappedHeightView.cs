using Terminal.Gui.ViewBase;

namespace LevelDesign.Ui.Views;

/// <summary>
/// A view at the bottom of the window whose height follows its text wrapped to the parent's width (the status
/// line, the question bar); the window moves what is above it when <see cref="RowsChanged"/> is raised.
/// </summary>
public abstract class WrappedHeightView : View
{
    private int _rows = -1;

    public event Action? RowsChanged;

    /// <summary>Lines the text needs at the current width.</summary>
    public abstract int Rows { get; }

    /// <summary>Sets the height to <see cref="Rows"/>, telling the window when it changed.</summary>
    public virtual void Refit()
    {
        int rows = Rows;
        if (rows == _rows) return;
        _rows = rows;
        Height = rows;
        RowsChanged?.Invoke();
    }

    /// <summary>The parent's width once laid out (the view fills it), before that the view's own.</summary>
    protected int AvailableWidth() => SuperView is { } parent && parent.Viewport.Width > 0 ? parent.Viewport.Width : Math.Max(Frame.Width, 1);
}
