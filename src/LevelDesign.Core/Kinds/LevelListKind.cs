using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// An element given by its levels (and operators) directly: a stray two-level defect, or any spectrum computed
/// elsewhere. A new one is a two-level defect with a transition operator, the commonest use.
/// </summary>
public sealed class LevelListKind : ElementKindInfo
{
    public override string Name => "level_list";
    public override Type ElementType => typeof(LevelList);
    public override int Order => 60;
    public override char InsertLetter => 'd';
    public override string InsertName => "two-level defect (level list)";
    public override string HamiltonianText => "given matrix H (or diag(energies)); H c = E S c with an overlap S";
    public override string KeysText =>
        "`energies` or `hamiltonian` (frequencies); operators in `[elements.ID.operators]` or `operators = { name = matrix }` (plain numbers, real symmetric except `a`); optional `overlap` (symmetric positive definite)";
    public override IReadOnlyList<KindKey> Keys { get; } =
        [new("energies", UnitKind.Frequency), new("hamiltonian", UnitKind.Frequency), new("operators", UnitKind.Dimensionless), new("overlap", UnitKind.Dimensionless)];
    public override string NewElementValues => "energies = [\"0 GHz\", \"5.3 GHz\"]\nlevels = 2\noperators = { sx = [[0, 1], [1, 0]] }\n";

    public override Element? Read(ElementInput input) => LevelListReader.Read(input.Id, input.Reader, input.Operators, input.Levels);
}
