using System.Numerics;
using System.Text;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Composite;

/// <summary>
/// Which matrix elements each coupler contributes, worked out once per basis structure and coupler shape
/// (elements linked, form, and the non-zero pattern of the operators), so a sweep point only multiplies numbers.
/// Coupler terms: full form c·X⊗Y (plus h.c. when that product is not Hermitian); exchange form c·(X⊗Y + h.c.)
/// with X = op_A†.
/// </summary>
internal sealed class AssemblyPlan
{
    private enum Mode : byte { Lower, DiagonalReal, DiagonalDoubled, Mirror }

    private sealed record Terms(int[] Slot, short[] Ia, short[] La, short[] Ib, short[] Lb, Mode[] Mode);

    private readonly Terms[] _terms;

    private AssemblyPlan(HermitianPattern pattern, Terms[] terms)
    {
        Pattern = pattern;
        _terms = terms;
    }

    public HermitianPattern Pattern { get; }

    /// <summary>The operators a coupler multiplies: X (op_A, or op_A† for exchange), Y = op_B, and whether h.c. is added.</summary>
    public static CouplerTerm[] Operators(IReadOnlyList<ResolvedCoupler> couplers) => couplers.Select(Operators).ToArray();

    private static CouplerTerm Operators(ResolvedCoupler coupler)
    {
        if (coupler.Form == CouplerForm.Exchange) return new(coupler.OperatorA.Adjoint(), coupler.OperatorB, true);
        return new(coupler.OperatorA, coupler.OperatorB, !(coupler.OperatorA.IsHermitian() && coupler.OperatorB.IsHermitian()));
    }

    /// <summary>A key that is equal exactly when two points can share a plan on the same basis structure.</summary>
    public static string ShapeKey(IReadOnlyList<ResolvedCoupler> couplers, CouplerTerm[] terms)
    {
        var key = new StringBuilder();
        for (int c = 0; c < couplers.Count; c++)
        {
            var coupler = couplers[c];
            var (x, y, conjugate) = terms[c];
            key.Append(coupler.IndexA).Append(',').Append(coupler.IndexB).Append(conjugate ? 'c' : 'h');
            AppendMask(key, x);
            AppendMask(key, y);
            key.Append(coupler.CoefficientGHz == 0 ? "z;" : ";");
        }
        return key.ToString();
    }

    /// <summary>
    /// Entries below 1e-10 of an operator's largest are left out: parity zeros come out of the element solve as
    /// rounding noise (~1e-15) that would otherwise flicker in and out of the pattern from point to point, and
    /// dropping a true entry that small moves energies by less than 1e-10·c.
    /// </summary>
    private static bool IsStructural(OperatorMatrix op, int row, int column, double scale) =>
        Complex.Abs(op[row, column]) > 1e-10 * scale;

    private static void AppendMask(StringBuilder key, OperatorMatrix op)
    {
        double scale = op.MaxAbs();
        key.Append(op.Size).Append(':');
        for (int i = 0; i < op.Size; i++)
            for (int j = 0; j < op.Size; j++)
                key.Append(IsStructural(op, i, j, scale) ? '1' : '0');
        key.Append('|');
    }

    public static AssemblyPlan Build(BasisStructure basis, IReadOnlyList<ResolvedCoupler> couplers, CouplerTerm[] terms)
    {
        int n = basis.Dimension;
        var slotOf = new Dictionary<long, int>();
        var slotRow = new List<int>();
        var slotColumn = new List<int>();
        for (int s = 0; s < n; s++) { slotOf[(long)s * n + s] = s; slotRow.Add(s); slotColumn.Add(s); }
        int SlotAt(int row, int column)
        {
            long key = (long)row * n + column;
            if (slotOf.TryGetValue(key, out int slot)) return slot;
            slot = slotRow.Count;
            slotOf[key] = slot;
            slotRow.Add(row);
            slotColumn.Add(column);
            return slot;
        }

        var allTerms = new Terms[couplers.Count];
        var target = new int[basis.ElementCount];
        for (int c = 0; c < couplers.Count; c++)
        {
            var coupler = couplers[c];
            var (x, y, addConjugate) = terms[c];
            double xScale = x.MaxAbs(), yScale = y.MaxAbs();
            var slots = new List<int>();
            var ia = new List<short>(); var la = new List<short>(); var ib = new List<short>(); var lb = new List<short>();
            var modes = new List<Mode>();
            int ea = coupler.IndexA, eb = coupler.IndexB;
            if (coupler.CoefficientGHz != 0)
                for (int s = 0; s < n; s++)
                {
                    var state = basis.States[s];
                    state.CopyTo(target, 0);
                    int sa = state[ea], sb = state[eb];
                    for (int i = 0; i < x.Size; i++)
                    {
                        if (!IsStructural(x, i, sa, xScale)) continue;
                        target[ea] = i;
                        for (int j = 0; j < y.Size; j++)
                        {
                            if (!IsStructural(y, j, sb, yScale)) continue;
                            target[eb] = j;
                            int t = basis.IndexOf(target);
                            if (t < 0) continue;
                            Mode mode;
                            int slot;
                            if (t == s) { slot = s; mode = addConjugate ? Mode.DiagonalDoubled : Mode.DiagonalReal; }
                            else if (t > s) { slot = SlotAt(t, s); mode = Mode.Lower; }
                            else if (addConjugate) { slot = SlotAt(s, t); mode = Mode.Mirror; }
                            else continue;   // a Hermitian product: the mirror entry is visited from the other side
                            slots.Add(slot); modes.Add(mode);
                            ia.Add((short)i); la.Add((short)sa); ib.Add((short)j); lb.Add((short)sb);
                        }
                        target[eb] = sb;
                    }
                }
            allTerms[c] = new Terms(slots.ToArray(), ia.ToArray(), la.ToArray(), ib.ToArray(), lb.ToArray(), modes.ToArray());
        }
        return new AssemblyPlan(new HermitianPattern(n, slotRow.ToArray(), slotColumn.ToArray()), allTerms);
    }

    /// <summary>Fills in one point's values: bare energies on the diagonal plus every coupler term.</summary>
    public SparseHermitian Evaluate(double[] bareEnergies, IReadOnlyList<ResolvedCoupler> couplers, CouplerTerm[] terms)
    {
        var values = new Complex[Pattern.SlotCount];
        for (int s = 0; s < bareEnergies.Length; s++) values[s] = bareEnergies[s];
        for (int c = 0; c < couplers.Count; c++)
        {
            var (x, y, _) = terms[c];
            double k = couplers[c].CoefficientGHz;
            var t = _terms[c];
            for (int p = 0; p < t.Slot.Length; p++)
            {
                Complex v = k * x[t.Ia[p], t.La[p]] * y[t.Ib[p], t.Lb[p]];
                switch (t.Mode[p])
                {
                    case Mode.Lower: values[t.Slot[p]] += v; break;
                    case Mode.DiagonalReal: values[t.Slot[p]] += v.Real; break;
                    case Mode.DiagonalDoubled: values[t.Slot[p]] += 2 * v.Real; break;
                    default: values[t.Slot[p]] += Complex.Conjugate(v); break;
                }
            }
        }
        return new SparseHermitian(Pattern, values);
    }
}
