namespace LevelDesign.Core.Model;

/// <summary>The device failed the model's own checks; each problem says which element or coupler it concerns.</summary>
public sealed class InvalidDeviceException(IReadOnlyList<ModelProblem> problems)
    : Exception("invalid device: " + string.Join("; ", problems.Select(p => p.Message)))
{
    public IReadOnlyList<ModelProblem> Problems { get; } = problems;
}
