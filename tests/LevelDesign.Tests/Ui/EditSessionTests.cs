using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Session;

namespace LevelDesign.Tests.Ui;

public sealed class EditSessionTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("ld-session-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public void Every_edit_is_undoable_and_a_new_edit_clears_redo()
    {
        var session = new EditSession();
        session.OpenFile(UiHarness.CopyDevice("pair.toml", _folder));
        var original = session.Document;
        Assert.True(session.SetValue("elements.qa.ec", "200 MHz").Accepted);
        Assert.True(session.SetValue("couplers.qa_ra.g", "95 MHz").Accepted);
        Assert.Equal(2, session.UndoDepth);
        session.Undo();
        Assert.True(session.CanRedo);
        Assert.True(session.SetValue("elements.qb.ec", "190 MHz").Accepted);
        Assert.False(session.CanRedo);
        session.Undo();
        session.Undo();
        Assert.Same(original, session.Document);
        Assert.False(session.IsDirty);
    }

    [Fact]
    public void A_refused_edit_leaves_the_document_and_history_alone()
    {
        var session = new EditSession();
        session.OpenFile(UiHarness.CopyDevice("pair.toml", _folder));
        var before = session.Document;
        var outcome = session.SetValue("elements.qa.ec", "-5 GHz");
        Assert.False(outcome.Accepted);
        Assert.Contains("ec", outcome.Message);
        Assert.Same(before, session.Document);
        Assert.False(session.CanUndo);
    }

    [Fact]
    public void Structural_edits_are_undoable_like_values()
    {
        var session = new EditSession();
        session.OpenFile(UiHarness.CopyDevice("pair.toml", _folder));
        string text = session.Document!.ToText();
        var removed = session.Remove("qa");
        Assert.True(removed.Accepted);
        Assert.Contains("coupler qa_ra", removed.Message);
        Assert.True(session.Rename("qb", "q2").Accepted);
        session.Undo();
        session.Undo();
        Assert.Equal(text, session.Document!.ToText());
        Assert.Equal(0, session.UndoDepth);
        Assert.True(session.CanRedo);
        Assert.False(session.Rename("qz", "q3").Accepted);   // refused: history untouched
        Assert.True(session.CanRedo);
    }

    [Fact]
    public void The_device_form_edits_truncation_and_the_purity_threshold()
    {
        var session = new EditSession();
        session.OpenFile(UiHarness.CopyDevice("pair.toml", _folder));
        var rows = BoardOutline.Fields(session.Document!, BoardOutline.Nodes(session.Document!)[0]);
        string PathOf(string name) => rows.Single(r => r.Name == name).FieldPath!;
        Assert.True(session.SetValue(PathOf("max excitations"), "3").Accepted);
        Assert.Equal(3, session.Document!.Device.Truncation.MaxExcitations);
        Assert.True(session.SetValue(PathOf("levels each"), "5").Accepted);
        Assert.Equal(5, session.Document!.Device.Truncation.DefaultLevels);
        Assert.True(session.SetValue(PathOf("purity threshold"), "0.95").Accepted);
        Assert.Equal(0.95, session.Document!.PurityThreshold);
        var refused = session.SetValue(PathOf("purity threshold"), "1.5");
        Assert.False(refused.Accepted);
        Assert.Equal(0.95, session.Document!.PurityThreshold);
    }

    [Fact]
    public void The_demo_has_no_file_so_save_asks_for_one()
    {
        var session = new EditSession();
        session.OpenDemo();
        Assert.Null(session.Path);
        Assert.True(session.SetValue("elements.qa.ec", "200 MHz").Accepted);
        var outcome = session.Save();
        Assert.False(outcome.Accepted);
        Assert.Contains("save as", outcome.Message);
    }

    [Fact]
    public void Changed_on_disk_is_noticed()
    {
        string path = UiHarness.CopyDevice("single.toml", _folder);
        var session = new EditSession();
        session.OpenFile(path);
        Assert.False(session.ChangedOnDisk);
        File.AppendAllText(path, "# written by someone else\n");
        File.SetLastWriteTimeUtc(path, DateTime.UtcNow.AddMinutes(1));
        Assert.True(session.ChangedOnDisk);
    }

    [Fact]
    public void Latest_only_discards_an_older_generation()
    {
        var jobs = new LatestOnly();
        var (first, firstToken) = jobs.Begin();
        var (second, _) = jobs.Begin();
        Assert.True(firstToken.IsCancellationRequested);
        Assert.False(jobs.IsCurrent(first));
        Assert.True(jobs.IsCurrent(second));
        jobs.Cancel();
        Assert.False(jobs.IsCurrent(second));
    }
}
