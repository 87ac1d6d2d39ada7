using System.Collections.Concurrent;
using System.Runtime.CompilerServices;
using LevelDesign.Core.Couplers;

namespace LevelDesign.Core.Composite;

/// <summary>Assembly plans by basis structure and coupler shape; thread-safe, bounded per structure.</summary>
internal sealed class AssemblyPlanCache
{
    private readonly ConditionalWeakTable<BasisStructure, ConcurrentDictionary<string, AssemblyPlan>> _plans = new();

    public AssemblyPlan Get(BasisStructure structure, IReadOnlyList<ResolvedCoupler> couplers, CouplerTerm[] terms)
    {
        var perStructure = _plans.GetOrCreateValue(structure);
        string key = AssemblyPlan.ShapeKey(couplers, terms);
        if (perStructure.TryGetValue(key, out var plan)) return plan;
        plan = AssemblyPlan.Build(structure, couplers, terms);
        if (perStructure.Count >= 64) perStructure.Clear();
        perStructure[key] = plan;
        return plan;
    }
}
