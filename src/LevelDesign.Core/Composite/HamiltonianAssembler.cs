using LevelDesign.Core.Couplers;

namespace LevelDesign.Core.Composite;

/// <summary>
/// H = Σ_i E_i(l_i) (bare energies above each element's ground) + Σ_couplers c·(coupling term), restricted to
/// the pruned product basis. Coupler terms: full form c·op_A⊗op_B (plus h.c. when that product is not Hermitian);
/// exchange form c·(op_A†⊗op_B + op_A⊗op_B†). The sparsity pattern is planned once per basis structure and
/// coupler shape and reused (<see cref="AssemblyPlan"/>).
/// </summary>
public static class HamiltonianAssembler
{
    public static SparseHermitian Assemble(CompositeBasis basis, IReadOnlyList<ResolvedCoupler> couplers)
    {
        var terms = AssemblyPlan.Operators(couplers);
        return AssemblyPlan.Build(basis.Structure, couplers, terms).Evaluate(basis.BareEnergies, couplers, terms);
    }

    internal static SparseHermitian Assemble(CompositeBasis basis, IReadOnlyList<ResolvedCoupler> couplers, AssemblyPlanCache cache)
    {
        var terms = AssemblyPlan.Operators(couplers);   // once per point: the plan key and the values both use them
        return cache.Get(basis.Structure, couplers, terms).Evaluate(basis.BareEnergies, couplers, terms);
    }
}
