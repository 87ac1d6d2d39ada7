using System.CommandLine;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Presentation;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign solve FILE --vary BIAS=START:STOP[:SCAN] --target QUANTITY=VALUE [--json]: every bias in the range
/// where the quantity equals the target (scan for sign changes, then Brent refinement).
/// </summary>
public static class SolveCommand
{
    public const int DefaultScan = 41;

    public static Command Create()
    {
        var file = CommonOptions.File();
        var vary = SweepCommand.Vary($"the range BIAS=START:STOP[:SCAN] to search (SCAN scan points, default {DefaultScan})");
        var target = new Option<string?>("--target") { Description = "QUANTITY=VALUE, e.g. qa.f01=5.2GHz or zz:qa:qb=0; VALUE is a frequency with its unit, e.g. 5.2GHz; a bare number is GHz" };
        var link = SweepCommand.Link();
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var levels = CommonOptions.Levels(
            "number of dressed states solved at each scan point (default: enough for every derived quantity; raise it when the target's states lie higher)");
        var json = CommonOptions.Json();
        var allowLarge = CommonOptions.AllowLarge();
        var purity = CommonOptions.Purity("list roots whose states are less pure than this apart, as inside a hybridized region");
        var command = new Command("solve", "every bias in a range where a quantity meets a target (e.g. the coupler flux of zero ZZ)")
            { file, vary, target, link, at, point, levels, json, allowLarge, purity };
        command.SetAction(parse => Run(new SolveArguments
        {
            Path = parse.GetValue(file)!, Vary = parse.GetValue(vary), Target = parse.GetValue(target), Links = parse.GetValue(link),
            At = parse.GetValue(at), Point = parse.GetValue(point), Levels = parse.GetValue(levels), Json = parse.GetValue(json),
            AllowLarge = parse.GetValue(allowLarge), Purity = parse.GetValue(purity),
        }));
        return command;
    }

    public static int Run(SolveArguments a) => CommandGuard.Run(a.Path, () =>
    {
        if (a.Vary is not { Length: > 0 }) throw new UsageException("give the range: --vary BIAS=START:STOP[:SCAN]");
        string target = a.Target ?? throw new UsageException("give --target QUANTITY=VALUE, e.g. zz:qa:qb=0");
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        double threshold = CommonOptions.PurityThreshold(a.Purity, document);
        var setup = SweepSetup.Create(document, a, maxAxes: 1, defaultCount: DefaultScan);
        var axis = setup.Axes[0];
        if (axis.Count < 2) throw new UsageException($"--vary: a root search needs at least 2 scan points (got {axis.Count})");
        var solver = new DeviceSolver();
        var (planLevels, _) = SweepExecution.Levels(setup, a.Levels, solver);
        var available = DerivedQuantities.From(solver.Solve(setup.Resolve([axis.Start]), planLevels)).Named().Keys.ToArray();
        var (quantity, value) = FitCommand.Term("--target", () => TargetTerm.Parse(target, available));
        var options = new SweepOptions { Solver = solver };
        var found = SweepExecution.WithCancel(token =>
            TargetSolver.SearchAsync(setup.Resolve, axis, quantity, value, options, planLevels, ToleranceFor(axis), token, refineBelowPurity: threshold));
        var roots = found.Roots;
        Console.Write(a.Json ? TargetReport.Json(document, axis, quantity, value, roots, threshold) : TargetReport.Table(document, axis, quantity, value, roots, threshold));
        if (roots.Any(r => r.Refined && r.IsHybridized(threshold)))
            Console.Error.WriteLine(string.Create(System.Globalization.CultureInfo.InvariantCulture, $"warning: {roots.Count(r => r.Refined && r.IsHybridized(threshold))} root(s) lie inside a hybridized region (purity below {threshold:G3})"));
        foreach (var r in roots.Where(r => r.Refined))
            EffectiveCommand.WarnIfIllConditioned(solver.Solve(setup.Resolve([r.Bias]), planLevels), quantity, $"{axis.Path} = {r.Bias:G10}");
        if (!roots.Any(r => r.Refined))
        {
            var unit = ShownUnit.Of(document, axis.Path);
            string closest = found.Closest is { } c
                ? $"; closest: {FrequencyText.Of(quantity, c.Value)} ({FrequencyText.Of(quantity, c.Value - value)} off) at {unit.Text(c.Bias)}" : "";
            Console.Error.WriteLine($"no root of {quantity} = {FrequencyText.Of(quantity, value)} between {unit.Text(axis.Start)} and {unit.Text(axis.Stop)}{closest}");
        }
        return ExitCodes.Ok;
    });

    /// <summary>Brent's bias tolerance: 1e-12 of the range, so control units of any size (A, Φ0, GHz) get the same relative precision.</summary>
    public static double ToleranceFor(Core.DeviceFiles.SweepAxis axis) => Math.Max(1e-12 * Math.Abs(axis.Stop - axis.Start), 1e-300);
}
