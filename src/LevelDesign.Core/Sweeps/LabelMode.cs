namespace LevelDesign.Core.Sweeps;

/// <summary>
/// ByCharacter: a label follows the bare character of a state through crossings (diabatic).
/// ByOrder: the k-th dressed level stays the k-th (adiabatic).
/// </summary>
public enum LabelMode
{
    ByCharacter,
    ByOrder,
}
