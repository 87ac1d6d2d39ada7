namespace LevelDesign.Core.DeviceFiles.Source;

/// <summary>
/// A TOML table ([elements.qa] or an inline { ... }) with its entries in file order. <see cref="InsertOffset"/>
/// is where a new key = value line can be inserted (just after the table's last entry line).
/// </summary>
public sealed class SourceTable
{
    public required string Name { get; init; }
    public required int Line { get; init; }
    public required int Column { get; init; }
    public List<SourceEntry> Entries { get; } = [];
    public int InsertOffset { get; set; }

    public SourceEntry? Find(string key) => Entries.FirstOrDefault(e => e.Key == key);
}
