using System.Globalization;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.DeviceFiles.Source;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Spread;

/// <summary>
/// Reads a device file's [spread], [spread.NAME] and [rules] tables (docs/device-format.md, "Fabrication spread")
/// against the loaded document, reporting every problem at its line and field. Null when the file has none of them.
/// </summary>
public static class SpreadReader
{
    private static readonly string[] StudyKeys = ["samples", "seed"];
    private static readonly string[] GroupKeys = ["parameters", "parameter", "sigma", "shared", "distribution"];
    private static readonly string[] Distributions = ["normal", "lognormal"];

    public static SpreadDefinition? Read(DeviceDocument document, IReadOnlyList<SourceTable> tables, ErrorList errors)
    {
        var study = tables.FirstOrDefault(t => t.Name == "spread");
        var groupTables = tables.Where(t => t.Name.StartsWith("spread.", StringComparison.Ordinal)).ToList();
        var rulesTable = tables.FirstOrDefault(t => t.Name == "rules");
        foreach (var t in tables.Where(t => t.Name.StartsWith("rules.", StringComparison.Ordinal)))
            errors.At(t, t.Name, "write every rule as a line of the one [rules] table, e.g. detuned = \"qa.f01 - qb.f01 > 300 MHz at idle\"");
        if (study is null && groupTables.Count == 0 && rulesTable is null) return null;

        int samples = SpreadDefinition.DefaultSamples;
        ulong seed = SpreadDefinition.DefaultSeed;
        if (study is not null)
        {
            var r = new TableReader(study, "spread", errors, StudyKeys);
            samples = r.Integer("samples", 1, 10_000_000) ?? samples;
            seed = (ulong)(r.Integer("seed", 0, int.MaxValue) ?? (int)seed);
        }

        var groups = new List<SpreadGroup>();
        var owner = new Dictionary<string, string>();
        foreach (var table in groupTables)
        {
            string name = table.Name["spread.".Length..];
            if (name.Contains('.') || name.Length == 0) { errors.At(table, table.Name, $"[{table.Name}]: a spread group is [spread.NAME] with a plain name"); continue; }
            if (ReadGroup(document, table, name, errors, owner) is SpreadGroup g) groups.Add(g);
        }

        var rules = new List<SpreadRule>();
        if (rulesTable is not null)
        {
            foreach (var entry in rulesTable.Entries)
            {
                string field = "rules." + entry.Key;
                if (entry.Value.Kind != SourceValueKind.String) { errors.At(entry.Value, field, $"a rule is a text in quotes, {SpreadRuleParser.Syntax}"); continue; }
                if (rules.Any(x => x.Name == entry.Key)) { errors.At(entry, field, $"rule '{entry.Key}' is given twice"); continue; }
                // a rule's name names its histogram file, so it is a plain word (no path, no quotes)
                if (!IsPlainName(entry.Key)) { errors.At(entry, field, $"'{TerminalText.Clean(entry.Key)}': a rule's name is letters, digits, '_' or '-', e.g. detuned_ab"); continue; }
                var rule = SpreadRuleParser.Parse(entry.Key, entry.Value.Text!, document, out string? problem);
                if (rule is null) errors.At(entry.Value, field, problem!);
                else rules.Add(rule with { Line = entry.Value.Line, Column = entry.Value.Column });
            }
        }
        if (groups.Count == 0 && (study ?? rulesTable) is SourceTable anchor && groupTables.Count == 0)
            errors.At(anchor, "spread", "a spread study needs at least one [spread.NAME] table, e.g. [spread.junctions] with parameters = [\"qa.ej_sum\"] and sigma = \"3%\"");
        return new SpreadDefinition(samples, seed, groups, rules);
    }

    public static bool IsPlainName(string name) =>
        name.Length is > 0 and <= 64 && name.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-');

    private static SpreadGroup? ReadGroup(DeviceDocument document, SourceTable table, string name, ErrorList errors, Dictionary<string, string> owner)
    {
        var r = new TableReader(table, table.Name, errors, GroupKeys);
        var paths = new List<(string Path, SourceValue Value)>();
        if (r.Has("parameters") && r.Has("parameter")) r.Error("parameter", "give either 'parameter' or 'parameters', not both");
        else if (r.Has("parameter")) { if (r.Text("parameter") is string p) paths.Add((p, r.Entry("parameter")!.Value)); }
        else if (r.TextArray("parameters", 0, required: true, what: "the parameter paths drawn with this spread, e.g. [\"qa.ej_sum\", \"qb.ej_sum\"]") is { } list) paths.AddRange(list);
        bool ok = paths.Count > 0;
        var zeros = new List<(string Path, SourceValue Value, string Field)>();
        foreach (var (path, value) in paths)
        {
            string field = r.Field(r.Has("parameter") ? "parameter" : "parameters");
            double nominal;
            try { nominal = document.Device.GetParameter(path); }
            catch (ArgumentException e) { errors.At(value, field, $"'{path}': {e.Message}"); ok = false; continue; }
            if (document.Biases.FirstOrDefault(b => b.Target == path) is BiasDefinition bias)
            { errors.At(value, field, $"'{path}' is set by bias '{bias.Name}' at every point, so a spread on it would be overwritten"); ok = false; continue; }
            if (owner.TryGetValue(path, out string? other)) { errors.At(value, field, $"'{path}' is already spread by [spread.{other}]"); ok = false; continue; }
            owner[path] = name;
            if (nominal == 0) zeros.Add((path, value, field));
        }
        string distributionText = r.Choice("distribution", Distributions) ?? "normal";
        var distribution = distributionText == "lognormal" ? SpreadDistribution.LogNormal : SpreadDistribution.Normal;
        var kinds = paths.Select(p => ParameterKinds.Of(p.Path.Split('.').Last())).Distinct().ToList();
        var sigma = Sigma(r, "sigma", kinds, required: true);
        var shared = Sigma(r, "shared", kinds, required: false);
        if (sigma is null || !ok) return null;
        bool relative = sigma.Value.Relative;
        if (relative && zeros.Count > 0)
        {
            foreach (var (path, value, field) in zeros) r.Errors.At(value, field, $"'{path}' is 0, so a relative spread leaves it at 0; give an absolute sigma with a unit");
            return null;
        }
        if (shared is { } s && s.Relative != relative) { r.Error("shared", "'shared' and 'sigma' must both be relative (%) or both absolute"); return null; }
        if (!relative && distribution == SpreadDistribution.LogNormal) { r.Error("distribution", "a log-normal spread is relative: give sigma in %, e.g. \"3%\""); return null; }
        if (distribution == SpreadDistribution.Normal && relative && sigma.Value.Value + (shared?.Value ?? 0) > 0.25)
        { r.Error("sigma", "a normal spread above 25% would draw negative values too often; use distribution = \"lognormal\""); return null; }
        return new SpreadGroup(name, paths.Select(p => p.Path).ToArray(), sigma.Value.Value, shared?.Value ?? 0, relative, distribution);
    }

    /// <summary>"3%" (relative, 0.03) or a quantity with its unit (absolute, base unit); a bare number is refused as ambiguous.</summary>
    private static (double Value, bool Relative)? Sigma(TableReader r, string key, IReadOnlyList<UnitKind> kinds, bool required)
    {
        if (!r.Has(key))
        {
            if (required) r.Missing(key, "the standard deviation: relative as \"3%\" or absolute with a unit, e.g. \"50 MHz\"");
            return null;
        }
        var value = r.Entry(key)!.Value;
        if (value.Kind != SourceValueKind.String) { r.Error(key, $"write {key} in quotes: relative as \"3%\" or absolute with a unit, e.g. \"50 MHz\""); return null; }
        string text = value.Text!.Trim();
        if (text.EndsWith('%'))
        {
            if (double.TryParse(text[..^1].Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double percent) && percent >= 0 && percent < 100)
                return (percent / 100, true);
            r.Error(key, $"'{text}': a relative spread is a percentage from 0 to 100, e.g. \"3%\"");
            return null;
        }
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out _))
        { r.Error(key, $"'{text}': say what the number is: \"{text}%\" for a relative spread, or a value with its unit"); return null; }
        if (kinds.Count != 1) { r.Error(key, "an absolute spread needs parameters of one kind (all frequencies, say); use a relative spread (\"3%\") or split the group"); return null; }
        if (!QuantityParser.TryParse(text, kinds[0], out double absolute, out string error)) { r.Error(key, error); return null; }
        if (!(absolute >= 0)) { r.Error(key, "a spread is not negative"); return null; }
        return (absolute, false);
    }
}
