namespace LevelDesign.Core.DeviceFiles;

/// <summary>Loading choices: <see cref="AllowLarge"/> skips the memory guard (like truncation key allow_large = true).</summary>
public sealed record DeviceLoadOptions(bool AllowLarge = false, long LimitBytes = CompositeSizeEstimate.DefaultLimitBytes)
{
    public static readonly DeviceLoadOptions Default = new();
}
