using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>Reads [truncation]: max_excitations, max_bare_energy, default_levels, allow_large.</summary>
public static class TruncationReader
{
    public static readonly IReadOnlyList<string> Keys = ["max_excitations", "max_bare_energy", "default_levels", "allow_large"];

    public sealed record Result(int? MaxExcitations, double? MaxBareEnergyGHz, int DefaultLevels, bool AllowLarge);

    public static Result Read(SourceTable? table, ErrorList errors)
    {
        if (table is null) return new Result(null, null, 4, false);
        var r = new TableReader(table, "truncation", errors, Keys.ToHashSet());
        int? maxExcitations = r.Integer("max_excitations", 1, 1000);
        double? maxEnergy = r.Checked("max_bare_energy", UnitKind.Frequency, x => x > 0 && double.IsFinite(x), "the bare-energy window must be > 0");
        int levels = r.Integer("default_levels", 2, 1000) ?? 4;
        bool allowLarge = r.Boolean("allow_large") ?? false;
        return new Result(maxExcitations, maxEnergy, levels, allowLarge);
    }
}
