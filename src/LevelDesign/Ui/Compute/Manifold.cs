namespace LevelDesign.Ui.Compute;

/// <summary>Which dressed levels the spectrum shows, by the excitation count of their bare label.</summary>
public enum Manifold
{
    SingleExcitations,
    UpToTwo,
    AllKept,
}
