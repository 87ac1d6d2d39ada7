using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Session;

namespace LevelDesign.Tests.Ui;

public class EditSessionTests
{
    [Fact]
    public void Every_edit_is_undoable_and_a_new_edit_clears_redo()
    {
        var session = new EditSession(new EditLogDocumentStore());
        session.OpenDemo();
        var original = session.Document;
        Assert.True(session.SetValue("elements.qa.ec", "200 MHz").Accepted);
        Assert.True(session.SetValue("couplers.g_qa_ra.g", "95 MHz").Accepted);
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
        var session = new EditSession(new EditLogDocumentStore());
        session.OpenDemo();
        var before = session.Document;
        var outcome = session.SetValue("elements.qa.ec", "-5 GHz");
        Assert.False(outcome.Accepted);
        Assert.Contains("ec", outcome.Message);
        Assert.Same(before, session.Document);
        Assert.False(session.CanUndo);
    }

    [Fact]
    public void Changed_on_disk_is_noticed()
    {
        string folder = Directory.CreateTempSubdirectory("ld-ui-").FullName;
        string path = Path.Combine(folder, "d.log");
        File.WriteAllText(path, "# v1\n");
        var session = new EditSession(new EditLogDocumentStore());
        session.OpenFile(path);
        Assert.False(session.ChangedOnDisk);
        File.WriteAllText(path, "# v2, written by someone else\nset elements.qa.ec = 230 MHz\n");
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
