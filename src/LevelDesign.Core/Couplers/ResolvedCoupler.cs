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

    /// <summary>g between the lowest transitions at this point: |c·⟨0|op_A|1⟩·⟨0|op_B|1⟩| with this point's bare elements.</summary>
    public double GHereGHz => Math.Abs(CoefficientGHz) * CouplerResolver.TransitionProduct(Form, OperatorA, OperatorB);

    /// <summary>Where a coupler given as g was converted (null for a coefficient or a capacitance).</summary>
    public GReference? ConvertedAt => (Source.Strength as CouplingStrength.TargetG)?.At;
}
