using LevelDesign.Core.Kinds;
using System.Text.Json.Nodes;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Couplers;
using LevelDesign.Core.Elements;
using LevelDesign.Core.Model;

namespace LevelDesign.Core.Presentation;

/// <summary>
/// The fully resolved model as JSON: every parameter after unit and circuit conversions and bias mapping
/// (GHz, Φ0 for flux, 2e for offset charge), bases, kept levels, couplers as coefficient × op_a ⊗ op_b, and
/// the truncation. Operator definitions are in docs/device-format.md ("Operators").
/// </summary>
public static class DescribeFormatter
{
    public static JsonObject Describe(CompositeProblem problem, JsonObject? at = null)
    {
        var device = problem.Device;
        var o = new JsonObject { ["device"] = device.Name };
        if (at is not null) o["at"] = at;
        o["units"] = new JsonObject { ["energy"] = "GHz (E/h)", ["flux"] = "Φ0", ["ng"] = "2e" };
        var elements = new JsonArray();
        for (int i = 0; i < device.Elements.Count; i++)
        {
            var e = device.Elements[i];
            var bare = problem.Bare[i];
            elements.AddNode(new JsonObject
            {
                ["id"] = e.Id,
                ["kind"] = ElementKindCatalog.Of(e).Name,
                ["parameters"] = Parameters(e),
                ["basis"] = new JsonObject { ["kind"] = bare.Basis.Kind, ["size"] = bare.Basis.Size },
                ["levels_kept"] = bare.Levels,
                ["bare_energies_ghz"] = new JsonArray(bare.Energies.Select(x => JsonValues.Number(x - bare.Energies[0])).ToArray()),
                ["operators"] = new JsonArray(e.OperatorNames.Select(n => (JsonNode)n).ToArray()),
            });
        }
        o["elements"] = elements;
        var couplers = new JsonArray();
        foreach (var c in problem.Couplers)
        {
            couplers.AddNode(new JsonObject
            {
                ["id"] = c.Id,
                ["kind"] = CouplerKindInfo.Of(c.Source.Kind).Name,
                ["elements"] = new JsonArray(c.Source.ElementA, c.Source.ElementB),
                ["operators"] = new JsonArray(c.Source.OperatorA, c.Source.OperatorB),
                ["form"] = c.Form == CouplerForm.Exchange ? "exchange" : "full",
                ["coefficient_ghz"] = JsonValues.Number(c.CoefficientGHz),
                ["given_as"] = Given(c.Source.Strength),
                ["converted_at"] = c.ConvertedAt?.PointName,
                ["g_here_ghz"] = JsonValues.Number(c.GHereGHz),
                ["adds_conjugate"] = c.Form == CouplerForm.Exchange || !(c.OperatorA.IsHermitian() && c.OperatorB.IsHermitian()),
            });
        }
        o["couplers"] = couplers;
        o["truncation"] = Truncation(device, problem.Basis);
        o["hamiltonian"] = "H = Σ_i E_i(l_i) + Σ_c coefficient_c·op_a⊗op_b (+ h.c. when adds_conjugate; exchange form: coefficient·(op_a†⊗op_b + op_a⊗op_b†)); operators as defined in docs/device-format.md";
        return o;
    }

    private static JsonObject Given(CouplingStrength s) => s switch
    {
        CouplingStrength.TargetG g => new JsonObject { ["g_ghz"] = JsonValues.Number(g.GHz) },
        CouplingStrength.Capacitance c => new JsonObject { ["capacitance_f"] = JsonValues.Number(c.Farad) },
        CouplingStrength.Coefficient k => new JsonObject { ["coefficient_ghz"] = JsonValues.Number(k.GHz) },
        _ => new JsonObject(),
    };

    private static JsonObject Parameters(Element e)
    {
        var p = new JsonObject();
        switch (e)
        {
            case LevelList list:
                // the level energies are the eigenvalues of the given hamiltonian (with its overlap, if any), not its diagonal
                var energies = new JsonArray();
                foreach (double energy in list.Diagonalise(list.BasisSize).Energies) energies.Add(JsonValues.Number(energy));
                p["energies"] = energies;
                p["hamiltonian"] = JsonValues.Matrix(list.Hamiltonian);
                var ops = new JsonObject();
                foreach (var (name, m) in list.OperatorMatrices) ops[name] = JsonValues.Matrix(m);
                p["operator_matrices"] = ops;
                if (list.Overlap is not null) p["overlap"] = JsonValues.Matrix(list.Overlap);
                return p;
            default:
                foreach (var (name, value) in e.Parameters) p[name] = JsonValues.Number(value);
                if (e is TunableTransmon t) p["ej"] = JsonValues.Number(t.EffectiveEj);
                return p;
        }
    }

    private static JsonObject Truncation(Device device, CompositeBasis basis)
    {
        var t = device.Truncation;
        var levels = new JsonObject();
        foreach (var e in device.Elements) levels[e.Id] = t.LevelsOf(e.Id);
        return new JsonObject
        {
            ["levels"] = levels,
            ["max_excitations"] = t.MaxExcitations,
            ["max_bare_energy_ghz"] = t.MaxBareEnergyGHz is double x ? JsonValues.Number(x) : null,
            ["composite_dimension"] = basis.Dimension,
        };
    }
}
