namespace LevelDesign.Ui.Session;

/// <summary>
/// PATH.autosave holds the edited text of an unsaved session, so a killed session can be recovered on the
/// next start. Written after every edit, deleted on save and on a deliberate quit without saving.
/// </summary>
public sealed class AutosaveSidecar(string devicePath)
{
    public string Path { get; } = devicePath + ".autosave";

    public void Write(string text)
    {
        // Write-then-rename so a kill during the write never leaves a half sidecar.
        string temporary = Path + ".tmp";
        File.WriteAllText(temporary, text);
        File.Move(temporary, Path, overwrite: true);
    }

    /// <summary>The sidecar text when it exists and differs from the file on disk; null otherwise.</summary>
    public string? PendingRecovery(string? fileText)
    {
        if (!File.Exists(Path)) return null;
        string text = File.ReadAllText(Path);
        return text == fileText ? null : text;
    }

    public void Delete()
    {
        if (File.Exists(Path)) File.Delete(Path);
    }
}
