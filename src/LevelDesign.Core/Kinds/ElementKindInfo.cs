using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// Everything the tool knows about one element kind outside its physics: the name in files, the keys with their
/// units and circuit forms, how a table is read into the element, the default values a new element gets, the letter
/// that inserts one in the terminal UI and the row of the file-format manual. The reader, the UI's form and Insert
/// menu, the fit's write-back refusals, `describe` and the manual's table all come from here, so a new kind is its
/// physics file, one of these and their tests (<see cref="ElementKindCatalog"/> finds it).
/// </summary>
public abstract class ElementKindInfo
{
    /// <summary>The kind's name in files and output ("tunable_transmon").</summary>
    public abstract string Name { get; }

    /// <summary>The physics record this kind reads into.</summary>
    public abstract Type ElementType { get; }

    /// <summary>Place in lists, menus and the manual.</summary>
    public abstract int Order { get; }

    /// <summary>The key that inserts one in the terminal UI's Insert menu.</summary>
    public abstract char InsertLetter { get; }

    /// <summary>How the Insert menu names it ("two-level defect (level list)").</summary>
    public virtual string InsertName => Name.Replace('_', ' ');

    /// <summary>The manual's Hamiltonian column (plain text with the symbols of docs/device-format.md).</summary>
    public abstract string HamiltonianText { get; }

    /// <summary>The manual's keys column.</summary>
    public abstract string KeysText { get; }

    /// <summary>The kind's own keys (kind, levels and basis_size come with every kind that has them).</summary>
    public abstract IReadOnlyList<KindKey> Keys { get; }

    /// <summary>Largest explicit basis_size; null when the kind has no natural basis to size.</summary>
    public virtual int? MaxBasisSize => null;

    /// <summary>The values a new element gets (TOML lines), marked in the file as defaults, not a design.</summary>
    public abstract string NewElementValues { get; }

    /// <summary>Reads the element; null after reporting every problem at its key.</summary>
    public abstract Element? Read(ElementInput input);

    /// <summary>Every key the kind's table may hold, in the order the manual lists them.</summary>
    public IReadOnlyList<string> FileKeys =>
        [.. (string[])["kind", "levels"], .. MaxBasisSize is null ? (string[])[] : ["basis_size"], .. Keys.Select(k => k.Name)];

    /// <summary>Keys that give <paramref name="parameter"/> in circuit form (ec → capacitance).</summary>
    public IReadOnlyList<string> CircuitFormsOf(string parameter) =>
        Keys.Where(k => k.Gives.Contains(parameter)).Select(k => k.Name).ToArray();

    /// <summary>The row of the element table in docs/device-format.md.</summary>
    public string ManualRow => $"| `{Name}` | {HamiltonianText} | {KeysText} |";
}
