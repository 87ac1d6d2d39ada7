namespace LevelDesign.Tests.Support;

/// <summary>A test that drives the real terminal UI in tmux: skipped, with the reason, where tmux is not installed.</summary>
public sealed class TmuxFactAttribute : FactAttribute
{
    public TmuxFactAttribute()
    {
        if (!TmuxSession.Available) Skip = "tmux is not installed: the real terminal UI cannot be driven";
    }
}
