using LevelDesign.Core.Units;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// One key an element kind accepts in its file table: its unit kind and, for a key that gives a model parameter in
/// circuit form (capacitance → ec, ic or rn → ej, ej1/ej2 → ej_sum and asymmetry), the parameters it gives.
/// </summary>
public sealed record KindKey(string Name, UnitKind Unit, params string[] Gives)
{
    public bool IsCircuitForm => Gives.Length > 0;
}
