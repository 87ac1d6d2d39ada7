using LevelDesign.Core.Analysis;
using LevelDesign.Core.Model;

namespace LevelDesign.Ui.Compute;

/// <summary>
/// Which truncation-convergence entries a designer acts on: f01 and anharmonicity of qubit-like elements, every
/// 2χ and every ZZ. Others (resonator f12, Lamb shifts, Purcell rates) are listed but not counted, since their
/// higher levels are kept only as a margin for the key values.
/// </summary>
public static class ConvergenceSummary
{
    public static bool IsKey(string quantity, Device device)
    {
        if (quantity.StartsWith("chi2:", StringComparison.Ordinal) || quantity.StartsWith("zz:", StringComparison.Ordinal)) return true;
        int dot = quantity.LastIndexOf('.');
        if (dot < 0) return false;
        string id = quantity[..dot], name = quantity[(dot + 1)..];
        return name is "f01" or "anharmonicity" && device.IndexOf(id) is int i and >= 0 && device.Elements[i].IsQubitLike;
    }

    public static IReadOnlyList<ConvergenceEntry> Key(IReadOnlyList<ConvergenceEntry> entries, Device device) =>
        entries.Where(e => IsKey(e.Quantity, device)).ToList();

    /// <summary>"✓ key values" or "✗ N of M key values" for the status line.</summary>
    public static string StatusText(IReadOnlyList<ConvergenceEntry>? entries, Device device)
    {
        if (entries is null) return "not checked";
        var key = Key(entries, device);
        int flagged = key.Count(e => e.Flagged);
        return flagged == 0 ? $"✓ {key.Count} key values" : $"✗ {flagged} of {key.Count} key values (F3 shifts)";
    }
}
