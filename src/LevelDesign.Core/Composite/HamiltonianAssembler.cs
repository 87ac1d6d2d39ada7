using System.Numerics;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Composite;

/// <summary>
/// H = Σ_i E_i(l_i) (bare energies above each element's ground) + Σ_couplers c·(coupling term), restricted to
/// the pruned product basis. Coupler terms: full form c·op_A⊗op_B (plus h.c. when that product is not Hermitian);
/// exchange form c·(op_A†⊗op_B + op_A⊗op_B†).
/// </summary>
public static class HamiltonianAssembler
{
    public static SparseHermitian Assemble(CompositeBasis basis, IReadOnlyList<BareSpectrum> spectra, IReadOnlyList<ResolvedCoupler> couplers)
    {
        var h = new SparseHermitian(basis.Dimension);
        for (int s = 0; s < basis.Dimension; s++) h.AddDiagonal(s, basis.BareEnergies[s]);
        foreach (var coupler in couplers) AddCoupler(h, basis, coupler);
        return h;
    }

    private static void AddCoupler(SparseHermitian h, CompositeBasis basis, ResolvedCoupler coupler)
    {
        if (coupler.CoefficientGHz == 0) return;
        OperatorMatrix x = coupler.OperatorA, y = coupler.OperatorB;
        bool addConjugate;
        if (coupler.Form == CouplerForm.Exchange)
        {
            x = x.Adjoint();
            addConjugate = true;
        }
        else addConjugate = !(x.IsHermitian() && y.IsHermitian());
        int ea = coupler.IndexA, eb = coupler.IndexB;
        var target = new int[basis.ElementCount];
        for (int s = 0; s < basis.Dimension; s++)
        {
            var state = basis.States[s];
            int la = state[ea], lb = state[eb];
            state.CopyTo(target, 0);
            for (int ia = 0; ia < x.Size; ia++)
            {
                Complex xa = x[ia, la];
                if (xa == Complex.Zero) continue;
                target[ea] = ia;
                for (int ib = 0; ib < y.Size; ib++)
                {
                    Complex yb = y[ib, lb];
                    if (yb == Complex.Zero) continue;
                    target[eb] = ib;
                    int t = basis.IndexOf(target);
                    if (t < 0) continue;
                    Complex value = coupler.CoefficientGHz * xa * yb;
                    if (addConjugate)
                    {
                        // each stored pair carries X_ts and its mirror (X†)_st, so X + X† is covered by visiting every entry once
                        if (t == s) h.AddDiagonal(s, 2 * value.Real);
                        else h.AddHermitianPair(t, s, value);
                    }
                    else if (t > s) h.AddHermitianPair(t, s, value);
                    else if (t == s) h.AddDiagonal(s, value.Real);
                }
                target[eb] = lb;
            }
        }
    }
}
