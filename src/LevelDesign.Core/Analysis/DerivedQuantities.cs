using LevelDesign.Core.Composite;
using LevelDesign.Core.Elements;

namespace LevelDesign.Core.Analysis;

/// <summary>
/// Everything a designer reads off one dressed spectrum. Conventions are in <see cref="Conventions"/>.
/// </summary>
public sealed class DerivedQuantities
{
    private DerivedQuantities(IReadOnlyList<ElementTransitions> transitions, IReadOnlyList<PairValue> dispersiveShifts,
        IReadOnlyList<PairValue> zz, IReadOnlyList<PurcellEstimate> purcell)
    {
        Transitions = transitions;
        DispersiveShifts = dispersiveShifts;
        ZZ = zz;
        Purcell = purcell;
    }

    public IReadOnlyList<ElementTransitions> Transitions { get; }

    /// <summary>2χ for every qubit-like element × resonator pair (First = qubit, Second = resonator).</summary>
    public IReadOnlyList<PairValue> DispersiveShifts { get; }

    /// <summary>ζ for every unordered pair of qubit-like elements.</summary>
    public IReadOnlyList<PairValue> ZZ { get; }

    public IReadOnlyList<PurcellEstimate> Purcell { get; }

    /// <summary>The effective Hamiltonian of every coupled qubit pair (<see cref="BlockDiagonalisation"/>).</summary>
    public IReadOnlyList<QubitPairHamiltonian> EffectiveHamiltonians { get; private init; } = [];

    public static DerivedQuantities From(DressedSpectrum s)
    {
        var elements = s.Device.Elements;
        var transitions = new List<ElementTransitions>();
        for (int i = 0; i < elements.Count; i++)
        {
            var bare = s.Bare[i];
            double bare01 = bare.Levels > 1 ? bare.Excitation(1) : double.NaN;
            double bare12 = bare.Levels > 2 ? bare.Energies[2] - bare.Energies[1] : double.NaN;
            double e0 = s.EnergyOfExcitation();
            double e1 = s.EnergyOfExcitation((i, 1));
            double e2 = bare.Levels > 2 ? s.EnergyOfExcitation((i, 2)) : double.NaN;
            double f01 = e1 - e0, f12 = e2 - e1;
            double p01 = Lowest(s.PurityOfExcitation(), s.PurityOfExcitation((i, 1)));
            double p12 = bare.Levels > 2 ? Lowest(p01, s.PurityOfExcitation((i, 2))) : double.NaN;
            transitions.Add(new ElementTransitions(elements[i].Id, bare01, f01, bare12, f12, f12 - f01, f01 - bare01, p01, p12));
        }

        var chi = new List<PairValue>();
        var purcell = new List<PurcellEstimate>();
        var zz = new List<PairValue>();
        for (int q = 0; q < elements.Count; q++)
        {
            if (!elements[q].IsQubitLike) continue;
            for (int r = 0; r < elements.Count; r++)
            {
                if (elements[r] is not Resonator resonator) continue;
                if (!s.ReportsPair(q, r)) continue;   // a selection that names pairs computed only their states
                chi.Add(new PairValue(elements[q].Id, elements[r].Id, ExchangeShift(s, q, r), ExchangePurity(s, q, r)));
                if (resonator.Kappa is double kappa)
                    purcell.Add(new PurcellEstimate(elements[q].Id, elements[r].Id, kappa, ExcitedWeight(s, q, r), s.PurityOfExcitation((q, 1))));
            }
            for (int p = q + 1; p < elements.Count; p++)
                if (elements[p].IsQubitLike && s.ReportsPair(q, p)) zz.Add(new PairValue(elements[q].Id, elements[p].Id, ExchangeShift(s, q, p), ExchangePurity(s, q, p)));
        }
        return new DerivedQuantities(transitions, chi, zz, purcell) { EffectiveHamiltonians = BlockDiagonalisation.ForCoupledPairs(s) };
    }

    /// <summary>E11 − E10 − E01 + E00: this is both ZZ (two qubits) and 2χ (qubit, resonator).</summary>
    private static double ExchangeShift(DressedSpectrum s, int a, int b) =>
        s.EnergyOfExcitation((a, 1), (b, 1)) - s.EnergyOfExcitation((a, 1)) - s.EnergyOfExcitation((b, 1)) + s.EnergyOfExcitation();

    private static double ExchangePurity(DressedSpectrum s, int a, int b) =>
        Lowest(s.PurityOfExcitation((a, 1), (b, 1)), s.PurityOfExcitation((a, 1)), s.PurityOfExcitation((b, 1)), s.PurityOfExcitation());

    /// <summary>The smallest of the purities; NaN when any is missing (a state not computed).</summary>
    private static double Lowest(params double[] purities) => purities.Any(double.IsNaN) ? double.NaN : purities.Min();

    private static double ExcitedWeight(DressedSpectrum s, int qubit, int resonator)
    {
        int k = s.DressedIndexOf(StateWith(s, qubit, 1));
        if (k < 0) return double.NaN;
        double weight = 0;
        var weights = s.RequireWeights();
        for (int j = 0; j < s.Dimension; j++)
            if (s.Basis.States[j][resonator] > 0) weight += weights[k * s.Dimension + j];
        return weight;
    }

    private static int[] StateWith(DressedSpectrum s, int element, int level)
    {
        var state = new int[s.Basis.ElementCount];
        state[element] = level;
        return state;
    }

    /// <summary>Flat named values ("qa.f01", "qa.anharmonicity", "chi2:qa:ra", "zz:qa:qb", "jeff:qa:qb", ...) for tables, sweeps and targets.</summary>
    public IReadOnlyDictionary<string, double> Named() => Entries().ToDictionary(e => e.Name, e => e.Value);

    /// <summary>For each name of <see cref="Named"/>, the lowest purity of the labelled states its value is read from.</summary>
    public IReadOnlyDictionary<string, double> NamedPurities() => Entries().ToDictionary(e => e.Name, e => e.Purity);

    private IEnumerable<(string Name, double Value, double Purity)> Entries()
    {
        foreach (var t in Transitions)
        {
            yield return ($"{t.ElementId}.f01", t.DressedF01, t.F01Purity);
            yield return ($"{t.ElementId}.f12", t.DressedF12, t.F12Purity);
            yield return ($"{t.ElementId}.anharmonicity", t.Anharmonicity, t.F12Purity);
            yield return ($"{t.ElementId}.lamb_shift", t.LambShift, t.F01Purity);
        }
        foreach (var c in DispersiveShifts) yield return ($"chi2:{c.First}:{c.Second}", c.Value, c.Purity);
        foreach (var z in ZZ) yield return ($"zz:{z.First}:{z.Second}", z.Value, z.Purity);
        foreach (var p in Purcell) yield return ($"purcell:{p.Qubit}:{p.Resonator}", p.RateGHz, p.Purity);
        // J_eff is read from the four labelled computational states
        foreach (var h in EffectiveHamiltonians)
            yield return ($"jeff:{h.QubitA}:{h.QubitB}", h.JEff, h.Purities.Count == 4 ? h.Purities.Min() : double.NaN);
    }
}
