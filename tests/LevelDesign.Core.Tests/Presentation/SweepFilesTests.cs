using System.Globalization;
using System.Text.Json;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;

namespace LevelDesign.Core.Tests.Presentation;

public class SweepFilesTests
{
    /// <summary>The demo's coupler sweep along its coil current, written "0.15 mA" in the file.</summary>
    private static async Task<(DeviceDocument Document, SweepResult Sweep, SweepTable Table)> CoilSweep()
    {
        var document = DeviceDocument.Demo();
        var axis = new SweepAxis("qc_flux", 0.15e-3, 1.05e-3, 5, []);
        var sweep = await SweepRunner.RunAsync(values => document.Resolve([axis], values), new SweepPlan([axis]));
        return (document, sweep, SweepTable.From(sweep, SweepTable.ReportedCount(sweep), document.PurityThreshold));
    }

    [Fact]
    public async Task Csv_has_a_header_with_units_names_and_every_column_on_every_row()
    {
        var (document, sweep, table) = await CoilSweep();
        var lines = SweepFiles.Csv(document, sweep, table).Split('\n', StringSplitOptions.RemoveEmptyEntries);
        var comments = lines.TakeWhile(l => l.StartsWith('#')).ToArray();
        Assert.Contains(comments, l => l.Contains("axis qc_flux in mA"));
        Assert.Contains(comments, l => l.Contains("eigensolver"));
        Assert.Contains(comments, l => l.Contains("limits of the model", StringComparison.OrdinalIgnoreCase));
        string header = lines[comments.Length];
        Assert.StartsWith("point,qc_flux (mA),E ground (GHz),E q", header);
        Assert.Contains(",E qa1 (GHz),", header);
        Assert.Contains("purity qa1", header);
        Assert.Contains("zz:qa:qb (GHz)", header);
        var rows = lines.Skip(comments.Length + 1).ToArray();
        Assert.Equal(5, rows.Length);
        Assert.All(rows, r => Assert.Equal(CsvFields(header), CsvFields(r)));
        // axis values in the file's unit: 0.15 mA … 1.05 mA, written exactly
        Assert.Equal("0.15", rows[0].Split(',')[1]);
        Assert.Equal("1.05", rows[^1].Split(',')[1]);
    }

    [Fact]
    public async Task A_sweep_stopped_by_a_failing_point_says_where_and_why_in_both_files()
    {
        var document = DeviceDocument.Demo();
        var axis = new SweepAxis("qc_flux", 0.15e-3, 1.05e-3, 5, []);
        var sweep = await SweepRunner.RunAsync(
            values => values[0] > 0.8e-3 ? throw new InvalidOperationException("no device here") : document.Resolve([axis], values),
            new SweepPlan([axis]), new SweepOptions { Parallelism = 1, KeepPointsOnFailure = true });
        var table = SweepTable.From(sweep, SweepTable.ReportedCount(sweep), document.PurityThreshold);
        string csv = SweepFiles.Csv(document, sweep, table);
        Assert.Contains("stopped: the point at qc_flux = 0.825 mA failed (no device here); only the points computed before it", csv.Split('\n')[0]);
        var json = JsonDocument.Parse(SweepFiles.Json(document, sweep, table)).RootElement;
        Assert.False(json.GetProperty("completed").GetBoolean());
        Assert.Equal("qc_flux = 0.825 mA", json.GetProperty("failed_at").GetString());
        Assert.Equal(3, json.GetProperty("points").GetArrayLength());
    }

    [Fact]
    public async Task Json_names_states_both_ways_and_gives_axis_values_in_the_unit_it_states()
    {
        var (document, sweep, table) = await CoilSweep();
        using var json = JsonDocument.Parse(SweepFiles.Json(document, sweep, table));
        var root = json.RootElement;
        Assert.Equal("mA", root.GetProperty("axis_details")[0].GetProperty("unit").GetString());
        Assert.Equal(0.15, root.GetProperty("points")[0].GetProperty("axis_values")[0].GetDouble(), 12);
        var names = root.GetProperty("names").EnumerateArray().Select(e => e.GetString()).ToList();
        var labels = root.GetProperty("labels").EnumerateArray().Select(e => e.GetString()).ToList();
        Assert.Equal(labels.Count, names.Count);
        Assert.Equal("qa1", names[labels.IndexOf("|1,0,0,0,0⟩")]);
        // the parameter the bias moves, in Φ0, from the file's mapping
        var bias = document.Bias("qc_flux")!;
        double flux = root.GetProperty("points")[0].GetProperty("parameters").GetProperty(bias.Target).GetDouble();
        Assert.Equal(bias.ToParameter(0.15e-3), flux, 12);
        Assert.Equal(sweep.Points.Count, root.GetProperty("points").GetArrayLength());
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
