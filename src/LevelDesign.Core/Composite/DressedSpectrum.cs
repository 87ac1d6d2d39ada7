using System.Numerics;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Labels;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Composite;

/// <summary>
/// The lowest dressed states of a device: energies (GHz, relative to the dressed ground), eigenvectors in the
/// product basis, and bare labels. Energies of labelled states are read with <see cref="EnergyOf"/>.
/// </summary>
public sealed class DressedSpectrum
{
    private readonly int[] _dressedOfBare;

    internal DressedSpectrum(Device device, IReadOnlyList<BareSpectrum> bare, IReadOnlyList<ResolvedCoupler> couplers,
        CompositeBasis basis, double[] eigenvalues, double[] weights, Complex[]? complexVectors, double[]? realVectors,
        DressedLabel[] labels, string solverName, bool isComplex)
    {
        Device = device;
        Bare = bare;
        Couplers = couplers;
        Basis = basis;
        GroundEnergy = eigenvalues[0];
        Energies = eigenvalues.Select(e => e - GroundEnergy).ToArray();
        Weights = weights;
        ComplexVectors = complexVectors;
        RealVectors = realVectors;
        Labels = MarkDegenerate(labels, eigenvalues);
        SolverName = solverName;
        IsComplex = isComplex;
        _dressedOfBare = Enumerable.Repeat(-1, basis.Dimension).ToArray();
        for (int k = 0; k < labels.Length; k++) _dressedOfBare[labels[k].BareIndex] = k;
    }

    /// <summary>The same spectrum without its eigenvectors and bare weights (see <see cref="WithoutVectors"/>).</summary>
    private DressedSpectrum(DressedSpectrum full)
    {
        Device = full.Device;
        Bare = full.Bare;
        Couplers = full.Couplers;
        Basis = full.Basis;
        GroundEnergy = full.GroundEnergy;
        Energies = full.Energies;
        Labels = full.Labels;
        SolverName = full.SolverName;
        IsComplex = full.IsComplex;
        MaxResidual = full.MaxResidual;
        Selection = full.Selection;
        _dressedOfBare = full._dressedOfBare;
    }

    /// <summary>
    /// A copy that keeps energies, labels (with each state's largest components) and everything else except the
    /// D-long eigenvectors and weights: what a large sweep keeps of each point once its labels and derived quantities
    /// are computed (46k states × 72 computed: 53 MB a point with them, about 0.2 MB without).
    /// </summary>
    public DressedSpectrum WithoutVectors() => Weights is null ? this : new DressedSpectrum(this);

    /// <summary>Whether the eigenvectors and weights are kept (false for the points of a large sweep).</summary>
    public bool HasVectors => Weights is not null;

    /// <summary>The weights, or a clear refusal for a point whose vectors a sweep did not keep.</summary>
    internal double[] RequireWeights() => Weights ?? throw VectorsNotKept();

    internal static InvalidOperationException VectorsNotKept() =>
        new("the eigenvectors of this sweep point were not kept (a large sweep keeps only energies, labels and derived " +
            "quantities); compute the point alone, or sweep with the vectors kept (fewer points or states)");

    /// <summary>Dressed states closer than this (GHz, 1 Hz) count as exactly degenerate.</summary>
    public const double DegenerateGHz = 1e-9;

    /// <summary>
    /// Exactly degenerate dressed states have no preferred basis inside their multiplet, so the label each one carries is
    /// arbitrary: they are marked ambiguous.
    /// </summary>
    private static DressedLabel[] MarkDegenerate(DressedLabel[] labels, double[] eigenvalues)
    {
        DressedLabel[]? marked = null;
        for (int k = 0; k < labels.Length; k++)
        {
            bool degenerate = (k > 0 && eigenvalues[k] - eigenvalues[k - 1] < DegenerateGHz)
                              || (k + 1 < eigenvalues.Length && eigenvalues[k + 1] - eigenvalues[k] < DegenerateGHz);
            if (!degenerate || labels[k].Ambiguous) continue;
            marked ??= (DressedLabel[])labels.Clone();
            marked[k] = labels[k] with { Ambiguous = true };
        }
        return marked ?? labels;
    }

    public Device Device { get; }
    public IReadOnlyList<BareSpectrum> Bare { get; }
    public IReadOnlyList<ResolvedCoupler> Couplers { get; }
    public CompositeBasis Basis { get; }

    /// <summary>Lowest eigenvalue in the frame where the bare ground is 0 (GHz).</summary>
    public double GroundEnergy { get; }

    /// <summary>Dressed energies above the dressed ground, ascending (GHz).</summary>
    public double[] Energies { get; }

    /// <summary>|⟨bare j|dressed k⟩|², column-major: Weights[k*Dimension + j]; null when not kept (<see cref="HasVectors"/>).</summary>
    public double[]? Weights { get; }

    public double[]? RealVectors { get; }
    public Complex[]? ComplexVectors { get; }
    public DressedLabel[] Labels { get; }

    /// <summary>Name of the eigensolver that produced this spectrum.</summary>
    public string SolverName { get; }

    /// <summary>True when the Hamiltonian was complex Hermitian (solved with the complex path).</summary>
    public bool IsComplex { get; }

    /// <summary>Largest residual ‖Hx − Ex‖ (GHz) of the computed states on the sparse matrix; NaN when not measured.</summary>
    public double MaxResidual { get; init; } = double.NaN;

    /// <summary>What was asked for (e.g. "every state up to 2 excitations"); null when a sweep or caller chose a count.</summary>
    public SelectedStates? Selection { get; init; }

    /// <summary>Whether ZZ / 2χ of this element pair is reported: every pair unless the selection named pairs.</summary>
    public bool ReportsPair(int a, int b) => Selection?.Pairs is not { } pairs || pairs.Contains((Math.Min(a, b), Math.Max(a, b)));

    public int Count => Energies.Length;
    public int Dimension => Basis.Dimension;

    /// <summary>Dressed index carrying the label of this product state, or −1 if it is not among the computed states.</summary>
    public int DressedIndexOf(ReadOnlySpan<int> bareState)
    {
        int bare = Basis.IndexOf(bareState);
        return bare < 0 ? -1 : _dressedOfBare[bare];
    }

    public int DressedIndexOfBare(int bareIndex) => bareIndex < 0 ? -1 : _dressedOfBare[bareIndex];

    /// <summary>Energy (GHz above the dressed ground) of the dressed state labelled with this product state; NaN if absent.</summary>
    public double EnergyOf(ReadOnlySpan<int> bareState)
    {
        int k = DressedIndexOf(bareState);
        return k < 0 ? double.NaN : Energies[k];
    }

    /// <summary>Energy of the state with the given element levels and every other element in 0.</summary>
    public double EnergyOfExcitation(params (int Element, int Level)[] levels)
    {
        var state = new int[Basis.ElementCount];
        foreach (var (e, l) in levels) state[e] = l;
        return EnergyOf(state);
    }

    /// <summary>
    /// Purity of the dressed state labelled with the given element levels (every other element in 0); NaN if absent.
    /// A derived quantity is only as trustworthy as the least pure state it is read from.
    /// </summary>
    public double PurityOfExcitation(params (int Element, int Level)[] levels)
    {
        var state = new int[Basis.ElementCount];
        foreach (var (e, l) in levels) state[e] = l;
        int k = DressedIndexOf(state);
        return k < 0 ? double.NaN : Labels[k].Purity;
    }

    /// <summary>Human label such as "qa1 ra0" → written as |qa:1, ra:0⟩ by formatters; here the raw levels.</summary>
    public int[] LabelLevels(int dressedIndex) => Basis.States[Labels[dressedIndex].BareIndex];

    /// <summary>Compact label "1,0,2" ordered like the device's elements.</summary>
    public string LabelText(int dressedIndex) => string.Join(",", LabelLevels(dressedIndex));
}
