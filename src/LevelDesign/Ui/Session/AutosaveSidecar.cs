using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;

namespace LevelDesign.Ui.Session;

/// <summary>
/// PATH.autosave holds the edited text of an unsaved session, so a killed session can be recovered on the
/// next start. Written after every edit, deleted on save and on a deliberate quit without saving.
/// </summary>
public sealed class AutosaveSidecar(string devicePath)
{
    private readonly string _devicePath = devicePath;

    public string Path { get; } = devicePath + ".autosave";

    /// <summary>
    /// Written like a save (exclusive temporary, flush, rename) so a kill never leaves half a sidecar; whatever is at
    /// PATH.autosave (a planted link, a FIFO) is replaced, never written through; it takes the device file's mode.
    /// </summary>
    public void Write(string text) => AtomicFile.Write(Path, text, AtomicWrite.Sidecar(_devicePath));

    /// <summary>The sidecar text when it exists and differs from the file on disk; null otherwise.</summary>
    public string? PendingRecovery(string? fileText)
    {
        // only a regular file of sane size is read back (a planted FIFO would block, a huge file would fill memory)
        if (PosixFile.Lstat(Path) is not { Kind: FileKind.Regular } facts || facts.Size > DeviceFileText.MaxBytes) return null;
        string text = File.ReadAllText(Path);
        return text == fileText ? null : text;
    }

    public void Delete()
    {
        if (PosixFile.Lstat(Path).Exists) File.Delete(Path);
    }
}
