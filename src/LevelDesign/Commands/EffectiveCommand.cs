using LevelDesign.Core.Presentation;
using System.CommandLine;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign effective FILE [--pair QA:QB ...] [--purity P] [--at ...] [--json]: the effective Hamiltonian of qubit
/// pairs on their computational states (J_eff, ZZ, Z terms, residual), by least-action block diagonalisation.
/// </summary>
public static class EffectiveCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var pair = new Option<string[]>("--pair") { Description = "a qubit pair QA:QB; repeatable (default: every qubit pair joined by a coupler directly or through one element)", AllowMultipleArgumentsPerToken = false };
        var purity = new Option<double?>("--purity") { Description = $"call the result ill-conditioned when a computational state keeps less than this weight on the computational states (default {BlockDiagonalisation.DefaultThreshold})" };
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var json = CommonOptions.Json();
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("effective", "the effective two-qubit Hamiltonian (J_eff, ZZ, Z terms) of coupled qubit pairs at one bias point")
            { file, pair, purity, at, point, json, allowLarge };
        command.SetAction(parse => Run(new EffectiveArguments
        {
            Path = parse.GetValue(file)!, Pairs = parse.GetValue(pair), Purity = parse.GetValue(purity), At = parse.GetValue(at),
            Point = parse.GetValue(point), Json = parse.GetValue(json), AllowLarge = parse.GetValue(allowLarge),
        }));
        return command;
    }

    public static int Run(EffectiveArguments a) => CommandGuard.Run(a.Path, () =>
    {
        double threshold = a.Purity ?? BlockDiagonalisation.DefaultThreshold;
        if (!(threshold > 0 && threshold <= 1)) throw new UsageException($"--purity {threshold}: give a weight in (0, 1], e.g. 0.9");
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        var device = DeviceInput.Resolve(document, a.Point, a.At, out var applied);
        var chosen = a.Pairs is { Length: > 0 } pairs ? pairs.Select(p => Pair(device, p)).ToArray() : BlockDiagonalisation.CoupledPairs(device);
        if (chosen.Count == 0) throw new UsageException($"{a.Path}: no two qubit-like elements are coupled; name a pair with --pair QA:QB");
        var spectrum = new DeviceSolver().Solve(device);
        var results = chosen.Select(p => BlockDiagonalisation.Of(spectrum, p.A, p.B, threshold)).ToArray();
        Console.Write(a.Json
            ? JsonValues.Write(EffectiveHamiltonianReport.Json(device.Name, applied, results)) + Environment.NewLine
            : EffectiveHamiltonianReport.Table(device.Name, results));
        if (results.Any(r => r.IllConditioned))
            Console.Error.WriteLine($"{results.Count(r => r.IllConditioned)} pair(s) ill-conditioned (computational states hybridized below {threshold})");
        return ExitCodes.Ok;
    });

    /// <summary>For a jeff:QA:QB quantity, warns on stderr when the pair's block diagonalisation at this point is ill-conditioned.</summary>
    public static void WarnIfIllConditioned(DressedSpectrum spectrum, string quantity, string where)
    {
        var parts = quantity.Split(':');
        if (parts.Length != 3 || parts[0] != "jeff") return;
        var h = BlockDiagonalisation.Of(spectrum, parts[1], parts[2]);
        if (h.IllConditioned)
            Console.Error.WriteLine($"warning: at {where} {quantity} is ill-conditioned: a computational state keeps only {h.MinComputationalWeight:F3} of its weight on the computational states (threshold {h.Threshold}); J_eff there is not reliable");
    }

    private static (string A, string B) Pair(Core.Model.Device device, string text)
    {
        var parts = text.Split(':');
        if (parts.Length != 2 || parts.Any(string.IsNullOrWhiteSpace)) throw new UsageException($"--pair {text}: write QA:QB, e.g. qa:qb");
        foreach (var id in parts)
            if (device.IndexOf(id.Trim()) < 0)
                throw new UsageException($"--pair {text}: no element '{id.Trim()}' (elements: {string.Join(", ", device.Elements.Select(e => e.Id))})");
        if (parts[0].Trim() == parts[1].Trim()) throw new UsageException($"--pair {text}: name two different elements");
        return (parts[0].Trim(), parts[1].Trim());
    }
}
