using System.Text.Json.Nodes;
using LevelDesign.Core.Analysis;

namespace LevelDesign.Core.Presentation;

/// <summary>The conventions every result is computed with, as one JSON object (spectrum, sweeps, exports alike).</summary>
public static class ConventionsText
{
    public static JsonObject Json() => new()
    {
        ["energies"] = Conventions.Energies,
        ["transitions"] = Conventions.Transitions,
        ["lamb_shift"] = Conventions.LambShift,
        ["dispersive_shift"] = Conventions.DispersiveShift,
        ["zz"] = Conventions.ZZ,
        ["purity"] = Conventions.Purity,
        ["purcell"] = Conventions.Purcell,
        ["quantity_purity"] = Conventions.QuantityPurity,
        ["couplings"] = Conventions.Coupling,
    };
}
