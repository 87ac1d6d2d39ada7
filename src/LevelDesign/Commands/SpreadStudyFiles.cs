using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Files;
using LevelDesign.Core.Spread;
using LevelDesign.Core.Spread.Export;
using LevelDesign.Plots;

namespace LevelDesign.Commands;

/// <summary>
/// The files of a spread study in its output folder — spread.json (header, summary, one sample a line),
/// samples.csv, and per rule hist-RULE.png and .svg — written the same way by `spread` and by `merge`, so a
/// merged study is byte for byte the unsharded one apart from the timing fields. A shard writes shard-I-of-N.json.
/// </summary>
public static class SpreadStudyFiles
{
    public const string StudyFile = "spread.json";
    public const string SamplesFile = "samples.csv";

    public static string ShardFile(ShardRange shard) => $"shard-{shard.Shard}-of-{shard.Count}.json";

    public static string Version() =>
        typeof(SpreadStudyFiles).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
        ?? typeof(SpreadStudyFiles).Assembly.GetName().Version?.ToString() ?? "unknown";

    public static SpreadStudyHeader Header(DeviceDocument document, SpreadDefinition definition, IReadOnlyList<double> nominal) =>
        new(Version(), document.Path, document.Device.Name, Sha256(document.Text), EigenSolvers.Describe(), definition.Seed, definition.Samples,
            definition.Rules.Select(r => (r.Name, r.Text)).ToList(), definition.Paths, nominal);

    public static string Sha256(string text) => Convert.ToHexString(SHA256.HashData(Encoding.UTF8.GetBytes(text))).ToLowerInvariant();

    /// <summary>Creates the output folder if needed; refuses a path that is a file.</summary>
    public static void Prepare(string folder)
    {
        if (File.Exists(folder)) throw new UsageException($"--out {folder}: that is a file; --out names a folder for the study's files");
        try { Directory.CreateDirectory(folder); }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException) { throw new UsageException($"--out {folder}: {e.Message}"); }
    }

    public static void WriteShard(string folder, SpreadStudyHeader header, SpreadRun run, double elapsed, DateTimeOffset started)
    {
        string path = Path.Combine(folder, ShardFile(run.Range));
        string text = SpreadResultFile.Write(header, run.Range, run.Completed, elapsed, started, run.Outcomes, null, Core.Analysis.Conventions.LimitsOfModel);
        OutputFile.Write(path, () => AtomicFile.Write(path, text));
        Console.Error.WriteLine($"wrote {run.Outcomes.Count} samples (shard {run.Range}) to {path}");
    }

    public static void WriteStudy(string folder, SpreadStudyHeader header, SpreadDefinition definition, IReadOnlyList<SampleOutcome> outcomes,
        bool completed, double elapsed, DateTimeOffset started, string deviceName)
    {
        var summary = SpreadSummary.Of(definition, outcomes);
        string json = SpreadResultFile.Write(header, null, completed, elapsed, started, outcomes, SpreadSummaryJson.Of(summary), Core.Analysis.Conventions.LimitsOfModel);
        Save(Path.Combine(folder, StudyFile), json);
        Save(Path.Combine(folder, SamplesFile), SpreadCsv.Write(header, outcomes));
        for (int r = 0; r < definition.Rules.Count; r++)
        {
            var rule = definition.Rules[r];
            var plot = SpreadHistogram.Build(rule, outcomes.Select(o => o.Figures[r]).ToArray(), header.NominalFigures[r], deviceName);
            string png = Path.Combine(folder, $"hist-{rule.Name}.png"), svg = Path.Combine(folder, $"hist-{rule.Name}.svg");
            OutputFile.Write(png, () => SpectrumPlot.SavePng(plot, png, 1000, 650));
            OutputFile.Write(svg, () => SpectrumPlot.SaveSvg(plot, svg, 1000, 650));
        }
        Console.Error.WriteLine($"wrote {outcomes.Count} samples to {Path.Combine(folder, StudyFile)}, {SamplesFile} and {definition.Rules.Count} histogram(s) (PNG and SVG)");
    }

    private static void Save(string path, string text) => OutputFile.Write(path, () => AtomicFile.Write(path, text));
}
