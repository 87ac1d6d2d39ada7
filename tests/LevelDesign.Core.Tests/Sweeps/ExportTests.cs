using System.Text.Json;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Sweeps.Export;

namespace LevelDesign.Core.Tests.Sweeps;

public class ExportTests
{
    private static async Task<SweepResult> KerrSweep()
    {
        var axis = new SweepAxis("b.frequency", 4.8, 5.2, 21, []);
        return await SweepRunner.RunAsync(ParameterResolver.ForPaths(SweepDevices.KerrPair(5.0, 4.8, 0.005), [axis]),
            new SweepPlan([axis], Levels: 3));
    }

    /// <summary>
    /// Purity of |1,0⟩ in a two-level mixing problem is cos²θ with tan 2θ = 2J/Δ (textbook 2×2 rotation): below 99%
    /// computed here from that closed form, so the flags must match it point by point.
    /// </summary>
    [Fact]
    public async Task Hybridization_flags_follow_the_two_level_mixing_angle()
    {
        var sweep = await KerrSweep();
        var map = HybridizationMap.From(sweep, [[1, 0]], threshold: 0.99);
        foreach (var point in sweep.Points)
        {
            double delta = 5.0 - point.AxisValues[0], j = 0.005;
            double purity = 0.5 * (1 + Math.Abs(delta) / Math.Sqrt(delta * delta + 4 * j * j));   // cos²θ, larger of the two
            Assert.Equal(purity < 0.99, map.FlaggedPoints.Contains(point.Index));
            Assert.Equal(purity, map.Purity[point.Index][0], 1e-6);
        }
    }

    [Fact]
    public async Task Csv_and_json_carry_every_point_and_column()
    {
        var sweep = await KerrSweep();
        var table = SweepTable.From(sweep);
        Assert.Equal(3, table.Labels.Count);
        var csv = CsvText.Sweep(table).Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(1 + 1 + 21, csv.Length);   // comment, header, rows
        int columns = CsvFields(csv[1]);
        Assert.All(csv.Skip(2), line => Assert.Equal(columns, CsvFields(line)));
        Assert.Equal(1 + 1 + 3 + 3 + 2 * table.QuantityNames.Count + 2, columns);   // each quantity and its purity
        using var json = JsonDocument.Parse(JsonText.Sweep(table));
        Assert.Equal(21, json.RootElement.GetProperty("points").GetArrayLength());
        Assert.Contains("zz:a:b", json.RootElement.GetProperty("quantities").EnumerateArray().Select(e => e.GetString()));
    }

    /// <summary>Number of fields in a CSV line, honouring double quotes (RFC 4180).</summary>
    private static int CsvFields(string line)
    {
        int fields = 1;
        bool quoted = false;
        foreach (char ch in line)
        {
            if (ch == '"') quoted = !quoted;
            else if (ch == ',' && !quoted) fields++;
        }
        return fields;
    }
}
