namespace LevelDesign.Core.DeviceFiles.Source;

/// <summary>The TOML value types a device file can hold.</summary>
public enum SourceValueKind
{
    String,
    Integer,
    Float,
    Boolean,
    Array,
    Table,
    Other,
}
