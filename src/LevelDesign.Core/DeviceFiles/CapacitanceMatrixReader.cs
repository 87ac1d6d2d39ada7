using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>
/// Reads [capacitance_matrix]: nodes = element ids, matrix = Maxwell capacitance matrix (diagonal: each node's total
/// capacitance; off-diagonal: minus the mutual capacitance). Node charging energies and n·n couplings follow from
/// its inverse (see <see cref="MaxwellCharging"/>).
/// </summary>
public static class CapacitanceMatrixReader
{
    public static readonly IReadOnlyList<string> Keys = ["nodes", "matrix"];

    public sealed record Result(IReadOnlyList<string> Nodes, MaxwellCharging Charging, IReadOnlyList<SourceValue> NodeValues);

    public static Result? Read(SourceTable? table, ErrorList errors)
    {
        if (table is null) return null;
        int before = errors.Count;
        var r = new TableReader(table, "capacitance_matrix", errors, Keys.ToHashSet());
        var nodes = r.TextArray("nodes", 0, true, "the element ids in matrix order, e.g. nodes = [\"qa\", \"qb\"]");
        var matrix = r.Matrix("matrix", UnitKind.Capacitance, true, nodes?.Count);
        if (nodes is not null && nodes.Select(n => n.Text).Distinct().Count() != nodes.Count)
            r.Error("nodes", "each node may appear only once");
        if (errors.Count > before || nodes is null || matrix is null) return null;
        try
        {
            return new Result(nodes.Select(n => n.Text).ToList(), MaxwellCharging.FromCapacitanceMatrix(matrix), nodes.Select(n => n.Value).ToList());
        }
        catch (ArgumentException e)
        {
            r.Error("matrix", e.Message.Split(" (Parameter")[0]);
            return null;
        }
    }
}
