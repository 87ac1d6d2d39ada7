using System.Numerics;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Linear;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Couplers;

/// <summary>
/// Turns each coupler's strength into the coefficient c of c·op_A ⊗ op_B. A g is converted with the bare matrix
/// elements at its reference point (<see cref="GReference"/>), not at the point being solved: a coupling is
/// hardware, so c is the same at every bias.
/// </summary>
public static class CouplerResolver
{
    /// <param name="bareAt">Diagonalises element <c>i</c> as given (used for the reference point; cache it).</param>
    public static ResolvedCoupler Resolve(Coupler coupler, IReadOnlyList<Element> elements, IReadOnlyList<BareSpectrum> spectra,
        Func<int, Element, BareSpectrum> bareAt)
    {
        int a = IndexOf(elements, coupler.ElementA, coupler.Id);
        int b = IndexOf(elements, coupler.ElementB, coupler.Id);
        if (a == b) throw new ArgumentException($"coupler '{coupler.Id}' links element '{coupler.ElementA}' to itself");
        var opA = spectra[a].Operator(coupler.OperatorA);
        var opB = spectra[b].Operator(coupler.OperatorB);
        double c = coupler.Strength switch
        {
            CouplingStrength.Coefficient k => k.GHz,
            CouplingStrength.TargetG g => g.GHz / ReferenceTransitionElement(coupler, g.At, a, b, elements, spectra, bareAt),
            CouplingStrength.Capacitance cap => CapacitiveCoefficient(coupler, elements[a], elements[b], cap.Farad),
            _ => throw new InvalidOperationException("unknown coupling strength"),
        };
        return new ResolvedCoupler(coupler, a, b, opA, opB, c);
    }

    private static double ReferenceTransitionElement(Coupler coupler, GReference? at, int a, int b, IReadOnlyList<Element> elements,
        IReadOnlyList<BareSpectrum> spectra, Func<int, Element, BareSpectrum> bareAt)
    {
        BareSpectrum Side(int index, int side)
        {
            if (at is null) return spectra[index];
            var moved = at.Apply(elements[index], side);
            return moved.Equals(elements[index]) ? spectra[index] : bareAt(index, moved);
        }
        try
        {
            return LowestTransitionElement(coupler, Side(a, 0).Operator(coupler.OperatorA), Side(b, 1).Operator(coupler.OperatorB), at?.PointName);
        }
        catch (InvalidOperationException e)
        {
            throw new ArgumentException($"coupler '{coupler.Id}': g cannot be converted at the {at?.PointName ?? "given"} point: {e.Message}", e);
        }
    }

    /// <summary>|⟨0|op_A|1⟩·⟨0|op_B|1⟩|, the factor that turns c into g between the lowest transitions.</summary>
    public static double LowestTransitionElement(Coupler coupler, OperatorMatrix opA, OperatorMatrix opB, string? pointName = null)
    {
        if (opA.Size < 2 || opB.Size < 2) throw new ArgumentException($"coupler '{coupler.Id}': a g needs at least 2 levels on each side");
        double product = TransitionProduct(coupler.Form, opA, opB);
        if (product < 1e-12)
            throw new ArgumentException($"coupler '{coupler.Id}': operators '{coupler.OperatorA}'/'{coupler.OperatorB}' have no 0↔1 matrix element" +
                (pointName is null ? "" : $" at the {pointName} point") + ", so a target g cannot be converted there" +
                (pointName is null ? "" : "; give g_at = a point where both elements have a 0↔1 transition, or a coefficient"));
        return product;
    }

    /// <summary>|⟨0|op_A|1⟩·⟨0|op_B|1⟩| (for the exchange form also |⟨1|op_A|0⟩·⟨0|op_B|1⟩|); 0 with fewer than 2 levels.</summary>
    public static double TransitionProduct(CouplerForm form, OperatorMatrix opA, OperatorMatrix opB)
    {
        if (opA.Size < 2 || opB.Size < 2) return 0;
        double product = Complex.Abs(opA[0, 1]) * Complex.Abs(opB[0, 1]);
        if (form == CouplerForm.Exchange)
            product = Math.Max(product, Complex.Abs(opA[1, 0]) * Complex.Abs(opB[0, 1]));
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
