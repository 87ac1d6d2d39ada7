using System.Numerics;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Linear;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Couplers;

/// <summary>Turns each coupler's strength into the coefficient c of c·op_A ⊗ op_B.</summary>
public static class CouplerResolver
{
    public static ResolvedCoupler Resolve(Coupler coupler, IReadOnlyList<Element> elements, IReadOnlyList<BareSpectrum> spectra)
    {
        int a = IndexOf(elements, coupler.ElementA, coupler.Id);
        int b = IndexOf(elements, coupler.ElementB, coupler.Id);
        if (a == b) throw new ArgumentException($"coupler '{coupler.Id}' links element '{coupler.ElementA}' to itself");
        var opA = spectra[a].Operator(coupler.OperatorA);
        var opB = spectra[b].Operator(coupler.OperatorB);
        double c = coupler.Strength switch
        {
            CouplingStrength.Coefficient k => k.GHz,
            CouplingStrength.TargetG g => g.GHz / LowestTransitionElement(coupler, opA, opB),
            CouplingStrength.Capacitance cap => CapacitiveCoefficient(coupler, elements[a], elements[b], cap.Farad),
            _ => throw new InvalidOperationException("unknown coupling strength"),
        };
        return new ResolvedCoupler(coupler, a, b, opA, opB, c);
    }

    /// <summary>|⟨0|op_A|1⟩·⟨0|op_B|1⟩|, the factor that turns c into g between the lowest transitions.</summary>
    public static double LowestTransitionElement(Coupler coupler, OperatorMatrix opA, OperatorMatrix opB)
    {
        if (opA.Size < 2 || opB.Size < 2) throw new ArgumentException($"coupler '{coupler.Id}': a g needs at least 2 levels on each side");
        double product = Complex.Abs(opA[0, 1]) * Complex.Abs(opB[0, 1]);
        if (coupler.Form == CouplerForm.Exchange)
            product = Math.Max(product, Complex.Abs(opA[1, 0]) * Complex.Abs(opB[0, 1]));
        if (product < 1e-12)
            throw new ArgumentException($"coupler '{coupler.Id}': operators '{coupler.OperatorA}'/'{coupler.OperatorB}' have no 0↔1 matrix element, so a target g cannot be converted");
        return product;
    }

    private static double CapacitiveCoefficient(Coupler coupler, Element a, Element b, double cg)
    {
        double ca = NodeCapacitance(coupler, a), cb = NodeCapacitance(coupler, b);
        return 4 * PhysicalConstants.ElementaryCharge * PhysicalConstants.ElementaryCharge * cg
               / (PhysicalConstants.Planck * ca * cb) / 1e9;
    }

    private static double NodeCapacitance(Coupler coupler, Element e)
    {
        if (!e.Parameters.TryGetValue("ec", out double ec))
            throw new ArgumentException($"coupler '{coupler.Id}': element '{e.Id}' has no charging energy ec, so a coupling capacitance cannot be converted");
        return CircuitConversions.CapacitanceFromChargingEnergy(ec);
    }

    private static int IndexOf(IReadOnlyList<Element> elements, string id, string couplerId)
    {
        for (int i = 0; i < elements.Count; i++) if (elements[i].Id == id) return i;
        throw new ArgumentException($"coupler '{couplerId}' names unknown element '{id}'");
    }
}
