using LevelDesign.Core.Files;
using LevelDesign.Tests.Support;
using LevelDesign.Ui.Session;
using Terminal.Gui.Input;

namespace LevelDesign.Tests.Ui;

/// <summary>The UI's side of issue 11: read-only files, the autosave's mode and links, and a failing autosave shown.</summary>
public sealed class FileSafetyUiTests : IDisposable
{
    private readonly TempFolder _dir = new();

    public void Dispose() => _dir.Dispose();

    [Fact]
    public void A_read_only_file_is_said_on_open_and_ctrl_s_offers_save_as_instead_of_replacing_it()
    {
        string file = UiHarness.CopyDevice("single.toml", _dir.Path);
        string original = File.ReadAllText(file);
        if (!_dir.MakeUnwritable(file)) return;   // root without chattr: no file it may not write
        using var ui = new UiHarness(open: s => s.OpenFile(file));
        Assert.Contains("read-only", ui.Screen);
        Assert.True(ui.Session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        ui.Press(Key.S.WithCtrl);
        Assert.True(ui.Window.Prompt.IsOpen);
        Assert.Contains("read-only", ui.Window.Prompt.Question);
        ui.Press(Key.W);
        Assert.Contains("save as", ui.Window.Prompt.Question);
        Assert.Equal(original, File.ReadAllText(file));
        Assert.False(File.Exists(file + ".bak"));
        Assert.True(ui.Session.IsDirty);
    }

    [Fact]
    public void Saving_a_read_only_file_through_the_session_is_refused_with_the_reason()
    {
        string file = UiHarness.CopyDevice("single.toml", _dir.Path);
        if (!_dir.MakeUnwritable(file)) return;   // root without chattr: no file it may not write
        var session = new EditSession();
        session.OpenFile(file);
        Assert.True(session.IsReadOnly);
        session.SetValue("elements.r.frequency", "7 GHz");
        var outcome = session.Save();
        Assert.False(outcome.Accepted);
        Assert.Contains("read-only", outcome.Message);
        Assert.True(session.Save(_dir.File("copy.toml")).Accepted);
    }

    [Fact]
    public void The_autosave_takes_the_device_files_mode()
    {
        string file = UiHarness.CopyDevice("single.toml", _dir.Path);
        File.SetUnixFileMode(file, UnixFileMode.UserRead | UnixFileMode.UserWrite);
        var session = new EditSession();
        session.OpenFile(file);
        session.SetValue("elements.r.frequency", "7 GHz");
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite, File.GetUnixFileMode(file + ".autosave"));
        Assert.Empty(_dir.Temporaries());
    }

    [Fact]
    public void A_planted_link_at_the_autosave_never_receives_the_unsaved_text()
    {
        string file = UiHarness.CopyDevice("single.toml", _dir.Path), victim = _dir.File("victim.txt");
        File.WriteAllText(victim, "precious");
        File.CreateSymbolicLink(file + ".autosave", victim);
        var session = new EditSession();
        session.OpenFile(file);
        session.SetValue("elements.r.frequency", "7 GHz");
        Assert.Equal("precious", File.ReadAllText(victim));
        Assert.Equal(FileKind.Regular, PosixFile.Lstat(file + ".autosave").Kind);
        Assert.Contains("7 GHz", File.ReadAllText(file + ".autosave"));
    }

    [Fact]
    public void A_failing_autosave_is_shown_and_editing_goes_on()
    {
        string file = UiHarness.CopyDevice("single.toml", _dir.Path);
        Directory.CreateDirectory(file + ".autosave");   // stands in for a full disk: every autosave write fails
        using var ui = new UiHarness(open: s => s.OpenFile(file));
        Assert.True(ui.Session.SetValue("elements.r.frequency", "7 GHz").Accepted);
        Assert.NotNull(ui.Session.AutosaveProblem);
        Assert.Contains("autosave failed", ui.Screen);
        Assert.True(ui.Session.SetValue("elements.r.frequency", "7.1 GHz").Accepted);
    }
}
