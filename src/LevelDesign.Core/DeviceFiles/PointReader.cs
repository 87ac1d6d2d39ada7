using LevelDesign.Core.DeviceFiles.Source;

namespace LevelDesign.Core.DeviceFiles;

/// <summary>Reads [points.NAME]: bias name = control value lines.</summary>
public static class PointReader
{
    public static OperatingPoint? Read(string name, SourceTable table, ErrorList errors, IReadOnlyDictionary<string, BiasDefinition> biases)
    {
        string path = "points." + name;
        int before = errors.Count;
        var r = new TableReader(table, path, errors, biases.Keys.ToHashSet());
        var values = new Dictionary<string, double>();
        foreach (var entry in table.Entries)
        {
            if (!biases.TryGetValue(entry.Key, out var bias)) continue; // reported as an unknown key
            string? text = AnyQuantity.TextOf(entry.Value);
            if (text is null)
                errors.At(entry.Value, r.Field(entry.Key), $"expected a control value for bias '{entry.Key}', found {entry.Value.Describe()}");
            else if (!bias.TryParseControl(text, out double v, out string error))
                errors.At(entry.Value, r.Field(entry.Key), error);
            else values[entry.Key] = v;
        }
        if (table.Entries.Count == 0) errors.At(table, path, "an operating point sets at least one bias, e.g. qa_flux = 0.1");
        return errors.Count > before ? null : new OperatingPoint(name, values);
    }
}
