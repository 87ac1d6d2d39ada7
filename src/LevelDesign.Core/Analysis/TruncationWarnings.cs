using LevelDesign.Core.Model;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// Warns when an element's kept levels end inside a degenerate or near-degenerate multiplet (e.g. the charge doublets
/// of a Cooper-pair box at E_J = 0): the cut then keeps one partner of a pair and drops the other, which breaks the
/// symmetry of the model and makes labels in that multiplet arbitrary.
/// </summary>
public static class TruncationWarnings
{
    /// <summary>Levels closer than this fraction of the mean level spacing count as one multiplet.</summary>
    public const double RelativeSplitting = 1e-6;

    public static IReadOnlyList<string> For(Device device)
    {
        var warnings = new List<string>();
        foreach (var element in device.Elements)
        {
            int kept = device.Truncation.LevelsOf(element.Id);
            int available = element.MaxLevels ?? int.MaxValue;
            if (kept < 2 || kept >= available) continue;
            int probe = Math.Min(available, kept + 4);
            double[] energies;
            try { energies = element.Diagonalise(probe, device.Truncation.BasisSizeOf(element.Id)).Energies; }
            catch (Exception e) when (e is not OutOfMemoryException) { continue; }   // a warning never stops a computation
            double spacing = (energies[kept - 1] - energies[0]) / (kept - 1);
            double tolerance = RelativeSplitting * Math.Max(spacing, 1e-12);
            int end = kept;
            while (end < energies.Length && energies[end] - energies[end - 1] <= tolerance) end++;
            if (end == kept) continue;
            int start = kept - 1;
            while (start > 0 && energies[start] - energies[start - 1] <= tolerance) start--;
            string fewer = start >= 2 ? $" (or {start})" : "";
            warnings.Add($"element '{element.Id}': its {kept} kept levels end inside a degenerate multiplet (levels {kept - 1} and " +
                $"{kept} differ by {energies[kept] - energies[kept - 1]:G3} GHz); set levels = {end}{fewer} so the multiplet stays whole");
        }
        return warnings;
    }
}
