using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Composite;

/// <summary>A device at one point, assembled and ready for the eigen solve.</summary>
public sealed record CompositeProblem(
    Device Device,
    IReadOnlyList<BareSpectrum> Bare,
    IReadOnlyList<ResolvedCoupler> Couplers,
    CompositeBasis Basis,
    SparseHermitian Hamiltonian);
