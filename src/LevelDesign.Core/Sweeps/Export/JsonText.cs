using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;

namespace LevelDesign.Core.Sweeps.Export;

/// <summary>JSON text of sweep tables, crossings and target roots; non-finite numbers are written as null.</summary>
public static class JsonText
{
    private static readonly JsonWriterOptions Options = new() { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    public static string Sweep(SweepTable table) => Write(w =>
    {
        w.WriteStartObject();
        w.WriteString("energy_unit", "GHz above the dressed ground");
        Strings(w, "axes", table.AxisPaths);
        Strings(w, "element_order", table.ElementOrder);
        Strings(w, "labels", table.Labels);
        Strings(w, "quantities", table.QuantityNames);
        w.WriteNumber("purity_threshold", table.PurityThreshold);
        w.WriteStartArray("points");
        foreach (var row in table.Rows)
        {
            w.WriteStartObject();
            w.WriteNumber("index", row.Index);
            Numbers(w, "axis_values", row.AxisValues);
            Numbers(w, "energies", row.Energies);
            Numbers(w, "purities", row.Purities);
            Numbers(w, "quantities", row.Quantities);
            Numbers(w, "quantity_purities", row.QuantityPurities);
            w.WriteBoolean("ambiguous", row.Ambiguous);
            w.WriteBoolean("low_purity", row.LowPurity);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    });

    public static string Crossings(IEnumerable<Crossing> crossings) => Write(w =>
    {
        w.WriteStartArray();
        foreach (var c in crossings)
        {
            w.WriteStartObject();
            w.WriteString("label_a", c.LabelA);
            w.WriteString("label_b", c.LabelB);
            Number(w, "bias", c.Bias);
            Number(w, "gap_ghz", c.GapGHz);
            Number(w, "purity", c.Purity);
            w.WriteBoolean("refined", c.Refined);
            if (c.DistanceToOperatingPoint is double d) Number(w, "distance_to_operating_point", d);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    });

    public static string Targets(IEnumerable<TargetRoot> roots) => Write(w =>
    {
        w.WriteStartArray();
        foreach (var r in roots)
        {
            w.WriteStartObject();
            w.WriteString("quantity", r.Quantity);
            Number(w, "target", r.Target);
            Number(w, "bias", r.Bias);
            Number(w, "value", r.Value);
            Number(w, "residual", r.Residual);
            w.WriteBoolean("refined", r.Refined);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    });

    private static string Write(Action<Utf8JsonWriter> body)
    {
        using var stream = new MemoryStream();
        using (var writer = new Utf8JsonWriter(stream, Options)) body(writer);
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void Number(Utf8JsonWriter w, string name, double x)
    {
        if (double.IsFinite(x)) w.WriteNumber(name, x); else w.WriteNull(name);
    }

    private static void Numbers(Utf8JsonWriter w, string name, IEnumerable<double> xs)
    {
        w.WriteStartArray(name);
        foreach (double x in xs) if (double.IsFinite(x)) w.WriteNumberValue(x); else w.WriteNullValue();
        w.WriteEndArray();
    }

    private static void Strings(Utf8JsonWriter w, string name, IEnumerable<string> xs)
    {
        w.WriteStartArray(name);
        foreach (string x in xs) w.WriteStringValue(x);
        w.WriteEndArray();
    }
}
