namespace LevelDesign.Core.Model;

/// <summary>A device that cannot be computed, with every problem found.</summary>
public sealed class InvalidDeviceException(IReadOnlyList<string> problems)
    : Exception("invalid device: " + string.Join("; ", problems))
{
    public IReadOnlyList<string> Problems { get; } = problems;
}
