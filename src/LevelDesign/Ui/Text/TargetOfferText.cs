using System.Globalization;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Ui.Compute;

namespace LevelDesign.Ui.Text;

/// <summary>
/// The words of an F9 target search's answer: the goal, each root offered under a digit (marked when it is a jump or
/// inside a hybridized region), and — when no root is found — where the quantity came closest, so the designer knows
/// how far off the range is.
/// </summary>
public static class TargetOfferText
{
    public static string Goal(TargetRequest request) => $"{request.Quantity} = {FrequencyText.Of(request.Quantity, request.GoalGHz)}";

    /// <summary>One offer per root (at most nine, one per digit key).</summary>
    public static IReadOnlyList<string> Offers(TargetRequest request, IReadOnlyList<TargetRoot> roots, ShownUnit unit, double purityThreshold) =>
        roots.Take(9).Select((root, i) =>
        {
            string note = !root.Refined ? " (jump, not a root)"
                : root.IsHybridized(purityThreshold) ? $" ! hybridized, purity {root.Purity.ToString("0.00", CultureInfo.InvariantCulture)}" : "";
            return $"[{i + 1}] {unit.Text(root.Bias)}{note}";
        }).ToArray();

    /// <summary>The message for a search without a root, with the closest approach on the scan.</summary>
    public static string Missed(TargetRequest request, TargetSearchResult result, ShownUnit unit, double purityThreshold)
    {
        string closest = result.Closest is { } c
            ? $"; closest: {FrequencyText.Of(request.Quantity, c.Value)} ({FrequencyText.Of(request.Quantity, c.Value - request.GoalGHz)} off) at {unit.Text(c.Bias)}"
              + (c.Purity < purityThreshold ? $" ! hybridized, purity {c.Purity.ToString("0.00", CultureInfo.InvariantCulture)}" : "")
            : "";
        string jumps = result.Roots.Count > 0 ? $" ({result.Roots.Count} label jump{(result.Roots.Count == 1 ? "" : "s")}, no root)" : "";
        return $"✗ {Goal(request)} is not reached for {request.Bias} in the range{jumps}{closest}; widen the range or add 'in 81'";
    }
}
