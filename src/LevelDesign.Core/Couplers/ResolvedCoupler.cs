using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Couplers;

/// <summary>A coupler with its strength converted to a plain coefficient and its operators taken from the bare spectra.</summary>
public sealed record ResolvedCoupler(
    Coupler Source,
    int IndexA,
    int IndexB,
    OperatorMatrix OperatorA,
    OperatorMatrix OperatorB,
    double CoefficientGHz)
{
    public string Id => Source.Id;
    public CouplerForm Form => Source.Form;
}
