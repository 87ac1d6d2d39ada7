using LevelDesign.Core.Couplers;

namespace LevelDesign.Core.Kinds;

/// <summary>
/// One coupler kind outside its physics (<see cref="Coupler.Create"/> gives its operators and form): its name in
/// files, what it couples (the manual's words), the key that inserts one in the terminal UI, and whether it needs
/// operators named.
/// </summary>
public sealed record CouplerKindInfo(string Name, CouplerKind Kind, char InsertLetter, string Meaning, bool NeedsOperators = false)
{
    public static readonly IReadOnlyList<CouplerKindInfo> All =
    [
        new("capacitive", CouplerKind.Capacitive, 'c', "n ⊗ n"),
        new("inductive", CouplerKind.Inductive, 'i', "φ ⊗ φ"),
        new("exchange", CouplerKind.Exchange, 'x', "a†⊗a + a⊗a†, rotating-wave"),
        new("custom", CouplerKind.Custom, 'o', "needs `operators`", NeedsOperators: true),
    ];

    public static IReadOnlyList<string> Names => All.Select(k => k.Name).ToArray();

    public static CouplerKindInfo? Named(string name) => All.FirstOrDefault(k => k.Name == name);

    public static CouplerKindInfo Of(CouplerKind kind) => All.First(k => k.Kind == kind);

    /// <summary>The manual's text for the `kind` key of a coupler table.</summary>
    public static string ManualText => string.Join(", ", All.Select(k => $"`{k.Name}` ({k.Meaning})"));
}
