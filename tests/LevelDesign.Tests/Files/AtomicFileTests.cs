using LevelDesign.Core.Files;
using LevelDesign.Tests.Support;

namespace LevelDesign.Tests.Files;

/// <summary>
/// The one writer of output files (issue 11): what it replaces, what it writes into, what it never follows, and the
/// mode, owner and backup it keeps. Every file, FIFO and link is made in a temporary folder.
/// </summary>
public sealed class AtomicFileTests : IDisposable
{
    private readonly TempFolder _dir = new();

    public void Dispose() => _dir.Dispose();

    [Fact]
    public void A_regular_file_is_replaced_and_its_previous_text_kept_as_bak_with_no_temporaries_left()
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        AtomicFile.Write(file, "new");
        Assert.Equal("new", File.ReadAllText(file));
        Assert.Equal("old", File.ReadAllText(file + ".bak"));
        Assert.Empty(_dir.Temporaries());
        AtomicFile.Write(file, "newer");
        Assert.Equal("new", File.ReadAllText(file + ".bak"));
    }

    [Theory]
    [InlineData(UnixFileMode.UserRead | UnixFileMode.UserWrite)]                                                  // 0600
    [InlineData(UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead)]                         // 0640
    [InlineData(UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute | UnixFileMode.GroupRead
                | UnixFileMode.GroupExecute | UnixFileMode.OtherRead | UnixFileMode.OtherExecute)]               // 0755
    [InlineData(UnixFileMode.SetUser | UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute
                | UnixFileMode.GroupRead | UnixFileMode.GroupExecute | UnixFileMode.OtherRead | UnixFileMode.OtherExecute)] // 4755
    public void The_mode_survives_a_save_on_the_file_and_its_backup(UnixFileMode mode)
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        File.SetUnixFileMode(file, mode);
        AtomicFile.Write(file, "new");
        Assert.Equal(mode, File.GetUnixFileMode(file));
        Assert.Equal(mode, File.GetUnixFileMode(file + ".bak"));
    }

    [Fact]
    public void The_owner_survives_a_save_where_the_saving_user_may_set_it()
    {
        if (!TempFolder.IsRoot) return;   // only root may give a file to another user; a plain user keeps ownership by rename rules
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        TempFolder.Run("chown", "4321:4322", file);
        AtomicFile.Write(file, "new");
        var facts = PosixFile.Lstat(file);
        Assert.Equal((4321u, 4322u), (facts.Uid, facts.Gid));
    }

    [Fact]
    public void A_fifo_is_written_into_like_stdout_never_replaced_or_backed_up()
    {
        string fifo = _dir.Fifo("out.csv");
        var reader = Task.Run(() => File.ReadAllText(fifo));
        AtomicFile.Write(fifo, "a,b\n1,2\n");
        Assert.True(reader.Wait(TimeSpan.FromSeconds(30)));
        Assert.Equal("a,b\n1,2\n", reader.Result);
        Assert.Equal(FileKind.Fifo, PosixFile.Lstat(fifo).Kind);
        Assert.False(File.Exists(fifo + ".bak"));
        Assert.Null(AtomicFile.Problem(fifo));
    }

    [Fact]
    public void A_planted_link_at_the_backup_is_replaced_not_written_through()
    {
        string file = _dir.File("device.toml"), victim = _dir.File("victim.txt");
        File.WriteAllText(file, "old");
        File.WriteAllText(victim, "precious");
        File.CreateSymbolicLink(file + ".bak", victim);
        AtomicFile.Write(file, "new");
        Assert.Equal("precious", File.ReadAllText(victim));
        Assert.Equal(FileKind.Regular, PosixFile.Lstat(file + ".bak").Kind);
        Assert.Equal("old", File.ReadAllText(file + ".bak"));
    }

    [Fact]
    public void A_device_file_that_is_a_link_is_saved_through_to_its_target_and_stays_a_link()
    {
        Directory.CreateDirectory(_dir.File("real"));
        string target = _dir.File("real/device.toml"), link = _dir.File("device.toml");
        File.WriteAllText(target, "old");
        File.CreateSymbolicLink(link, target);
        AtomicFile.Write(link, "new");
        Assert.Equal(FileKind.SymbolicLink, PosixFile.Lstat(link).Kind);
        Assert.Equal("new", File.ReadAllText(target));
        Assert.Equal("old", File.ReadAllText(link + ".bak"));
        Assert.Empty(Directory.GetFiles(_dir.File("real"), "*.ldtmp"));
    }

    [Fact]
    public void A_sidecar_replaces_a_planted_link_and_takes_the_original_files_mode()
    {
        string file = _dir.File("device.toml"), victim = _dir.File("victim.txt"), sidecar = file + ".autosave";
        File.WriteAllText(file, "device");
        File.SetUnixFileMode(file, UnixFileMode.UserRead | UnixFileMode.UserWrite);
        File.WriteAllText(victim, "precious");
        File.CreateSymbolicLink(sidecar, victim);
        AtomicFile.Write(sidecar, "unsaved edits", AtomicWrite.Sidecar(file));
        Assert.Equal("precious", File.ReadAllText(victim));
        Assert.Equal(FileKind.Regular, PosixFile.Lstat(sidecar).Kind);
        Assert.Equal("unsaved edits", File.ReadAllText(sidecar));
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite, File.GetUnixFileMode(sidecar));
        Assert.False(File.Exists(sidecar + ".bak"));
    }

    [Fact]
    public void A_sidecar_replaces_a_planted_fifo_instead_of_blocking_on_it()
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "device");
        string sidecar = _dir.Fifo("device.toml.autosave");
        var write = Task.Run(() => AtomicFile.Write(sidecar, "unsaved", AtomicWrite.Sidecar(file)));
        Assert.True(write.Wait(TimeSpan.FromSeconds(30)), "the sidecar write blocked on a FIFO");
        Assert.Equal(FileKind.Regular, PosixFile.Lstat(sidecar).Kind);
    }

    [Fact]
    public void A_file_this_process_may_not_write_is_refused_and_left_as_it_was()
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        if (!_dir.MakeUnwritable(file)) return;   // root without chattr: no file it may not write
        var e = Assert.Throws<FileWriteException>(() => AtomicFile.Write(file, "new"));
        Assert.Contains("read-only", e.Message);
        Assert.Equal("old", File.ReadAllText(file));
        Assert.True(AtomicFile.IsReadOnly(file));
        Assert.Empty(_dir.Temporaries());
    }

    [Fact]
    public void A_0444_file_is_judged_by_the_kernel_read_only_for_a_user_writable_for_root()
    {
        const UnixFileMode readOnly = UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead;
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        File.SetUnixFileMode(file, readOnly);
        if (TempFolder.IsRoot)
        {
            // root may write any mode (access W_OK says so); the save goes through and keeps the mode
            Assert.False(AtomicFile.IsReadOnly(file));
            Assert.Null(AtomicFile.Problem(file));
            AtomicFile.Write(file, "new");
            Assert.Equal("new", File.ReadAllText(file));
            Assert.Equal("old", File.ReadAllText(file + ".bak"));
            Assert.Equal(readOnly, File.GetUnixFileMode(file));
        }
        else
        {
            Assert.True(AtomicFile.IsReadOnly(file));
            Assert.Contains("read-only", AtomicFile.Problem(file));
            Assert.Throws<FileWriteException>(() => AtomicFile.Write(file, "new"));
            Assert.Equal("old", File.ReadAllText(file));
        }
    }

    [Fact]
    public void A_hard_linked_file_is_written_in_place_after_a_complete_backup_so_its_other_names_see_the_new_text()
    {
        Directory.CreateDirectory(_dir.File("elsewhere"));
        string file = _dir.File("device.toml"), other = _dir.File("elsewhere/shared.toml");
        File.WriteAllText(file, "old text, longer than the new one");
        File.SetUnixFileMode(file, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead);
        TempFolder.Run("ln", file, other);   // a second hard link, made with ln(1)
        var before = PosixFile.Lstat(file);
        Assert.Equal(2, before.Links);

        AtomicFile.Write(file, "new");

        Assert.Equal("new", File.ReadAllText(other));
        Assert.Equal("new", File.ReadAllText(file));
        var after = PosixFile.Lstat(file);
        Assert.True(after.SameFileAs(PosixFile.Lstat(other)), "the save detached the file from its other link");
        Assert.Equal((before.Inode, 2L), (after.Inode, after.Links));
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead, File.GetUnixFileMode(file));
        // the backup is a separate, complete file (not a third name of the same inode)
        Assert.Equal("old text, longer than the new one", File.ReadAllText(file + ".bak"));
        Assert.Equal(1, PosixFile.Lstat(file + ".bak").Links);
        Assert.Empty(_dir.Temporaries());
    }

    [Fact]
    public void A_single_name_file_is_still_replaced_by_rename()
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        ulong inode = PosixFile.Lstat(file).Inode;
        AtomicFile.Write(file, "new");
        Assert.NotEqual(inode, PosixFile.Lstat(file).Inode);   // a new inode: the atomic path, not the in-place one
    }

    [Fact]
    public void Old_format_temporaries_are_removed_once_a_minute_old_and_fresh_ones_kept()
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        string minuteOld = _dir.File($".device.toml.{Guid.NewGuid():N}.tmp");
        string fresh = _dir.File($".device.toml.{Guid.NewGuid():N}.tmp");
        File.WriteAllText(minuteOld, "x");
        File.WriteAllText(fresh, "x");
        File.SetLastWriteTimeUtc(minuteOld, DateTime.UtcNow - AtomicFile.OldTemporaryAge - TimeSpan.FromSeconds(5));
        File.SetLastWriteTimeUtc(fresh, DateTime.UtcNow - TimeSpan.FromSeconds(20));   // may belong to a save still running
        Assert.Equal(TimeSpan.FromMinutes(1), AtomicFile.OldTemporaryAge);
        AtomicFile.Write(file, "new");
        Assert.False(File.Exists(minuteOld));
        Assert.True(File.Exists(fresh));
    }

    [Fact]
    public void Problems_name_the_path_given_and_never_a_temporary()
    {
        Directory.CreateDirectory(_dir.File("sub"));
        File.WriteAllText(_dir.File("plain"), "x");
        string missing = _dir.File("no/such/out.csv");
        Assert.Contains("no such directory " + _dir.File("no/such"), AtomicFile.Problem(missing));
        Assert.Contains("is a directory", AtomicFile.Problem(_dir.File("sub")));
        Assert.Contains("is not a directory", AtomicFile.Problem(_dir.File("plain/out.csv")));
        File.CreateSymbolicLink(_dir.File("dangling"), _dir.File("gone"));
        Assert.Contains("does not exist", AtomicFile.Problem(_dir.File("dangling")));
        Assert.Null(AtomicFile.Problem(_dir.File("fresh.csv")));
        foreach (string p in new[] { missing, _dir.File("sub") })
            Assert.DoesNotContain(AtomicFile.TemporarySuffix, Assert.Throws<FileWriteException>(() => AtomicFile.Write(p, "x")).Message);
        Assert.Empty(_dir.Temporaries());
    }

    [Fact]
    public void Stale_temporaries_of_a_dead_process_are_removed_on_the_next_save_and_others_left_alone()
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "old");
        int dead = DeadProcessId();
        string stale = _dir.File($".device.toml.{dead}.{Guid.NewGuid():N}.ldtmp");
        string staleBackup = _dir.File($".device.toml.bak.{dead}.{Guid.NewGuid():N}.ldtmp");
        string live = _dir.File($".device.toml.{Environment.ProcessId}.{Guid.NewGuid():N}.ldtmp");
        string unrelated = _dir.File(".device.toml.notes");
        foreach (var f in new[] { stale, staleBackup, live, unrelated }) File.WriteAllText(f, "x");
        AtomicFile.Write(file, "new");
        Assert.False(File.Exists(stale));
        Assert.False(File.Exists(staleBackup));
        Assert.True(File.Exists(live));      // a save still running in a live process is not disturbed
        Assert.True(File.Exists(unrelated));
    }

    [Fact]
    public void Same_file_is_told_through_links_and_relative_names()
    {
        string file = _dir.File("device.toml");
        File.WriteAllText(file, "x");
        File.CreateSymbolicLink(_dir.File("alias.toml"), file);
        Assert.True(AtomicFile.SameFile(_dir.File("alias.toml"), file));
        Assert.True(AtomicFile.SameFile(_dir.File("sub/../device.toml").Replace("sub/..", "."), file));
        Assert.False(AtomicFile.SameFile(_dir.File("other.csv"), file));
    }

    private static int DeadProcessId()
    {
        for (int pid = 4_000_000; pid > 1000; pid -= 7919)
            if (!PosixFile.ProcessAlive(pid)) return pid;
        throw new InvalidOperationException("no unused process id found");
    }
}
