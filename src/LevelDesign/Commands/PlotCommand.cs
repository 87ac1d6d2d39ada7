using LevelDesign.Core.Presentation;
using System.CommandLine;
using LevelDesign.Core.Sweeps;
using LevelDesign.Plots;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign plot FILE --vary BIAS=START:STOP:COUNT --out PATH.svg|PATH.png [--manifold 1|2|all] [--width W]
/// [--height H]: the labelled spectrum along a 1-D sweep with the crossings marked.
/// </summary>
public static class PlotCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var vary = SweepCommand.Vary("the axis BIAS=START:STOP:COUNT (one axis)");
        var link = SweepCommand.Link();
        var sweep = SweepCommand.SweepName();
        var output = new Option<string?>("--out") { Description = "the picture to write: PATH.svg or PATH.png" };
        var manifold = new Option<string?>("--manifold") { Description = "which branches to draw: 1 (single excitations), 2 (two excitations) or all (default)" };
        var width = new Option<int?>("--width") { Description = "picture width in pixels (default 1200)" };
        var height = new Option<int?>("--height") { Description = "picture height in pixels (default 800)" };
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var levels = CommonOptions.Levels(
            "number of lowest labelled states drawn and searched for crossings (default: the lowest 12, or every labelled state with --manifold)");
        var labels = SweepCommand.Labels();
        var quantity = new Option<string[]?>("--quantity")
        {
            Description = "draw these quantities against the bias instead of the spectrum: zz:qa:qb, jeff:qa:qb, qa.f01, chi2:qa:ra, purity:qa1 …; repeatable or comma-separated",
        };
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("plot", "picture (SVG or PNG) of the labelled spectrum along a sweep, crossings marked with their gaps")
            { file, vary, link, sweep, output, manifold, width, height, at, point, levels, labels, quantity, allowLarge };
        command.SetAction(parse => Run(new PlotArguments
        {
            Path = parse.GetValue(file)!, Vary = parse.GetValue(vary), Links = parse.GetValue(link), SweepName = parse.GetValue(sweep),
            Output = parse.GetValue(output), Manifold = parse.GetValue(manifold), Width = parse.GetValue(width), Height = parse.GetValue(height),
            At = parse.GetValue(at), Point = parse.GetValue(point), Levels = parse.GetValue(levels), Labels = parse.GetValue(labels),
            AllowLarge = parse.GetValue(allowLarge), Quantities = parse.GetValue(quantity),
        }));
        return command;
    }

    public static int Run(PlotArguments a) => CommandGuard.Run(a.Path, () =>
    {
        string output = a.Output ?? throw new UsageException("give --out PATH.svg or --out PATH.png");
        string extension = Path.GetExtension(output).ToLowerInvariant();
        if (extension is not (".svg" or ".png")) throw new UsageException($"--out {output}: the name must end in .svg or .png");
        int w = a.Width ?? 1200, h = a.Height ?? 800;
        if (w is < 200 or > 10000 || h is < 150 or > 10000) throw new UsageException("--width must be 200–10000 and --height 150–10000 pixels");
        int? manifold = a.Manifold switch
        {
            null or "all" => null,
            "1" => 1,
            "2" => 2,
            _ => throw new UsageException($"--manifold {a.Manifold}: choose 1, 2 or all"),
        };
        var mode = CommandGuard.LabelMode(a.Labels);
        OutputFile.Check(output, a.Path);
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        var setup = SweepSetup.Create(document, a, maxAxes: 1);
        if (setup.Axes[0].Count < 3) throw new UsageException($"--vary: a plot needs at least 3 points (got {setup.Axes[0].Count})");
        if (a.Quantities is { Length: > 0 } quantities)
            return DrawQuantities(document, setup, mode, a.Levels, quantities, output, extension, w, h);
        var (result, crossings, judged) = CrossingsCommand.Find(setup, mode, a.Levels, 0, 0.5, []);
        if (result is null) return ExitCodes.Cancelled;
        // (the title's second line keeps it inside a 1200-pixel canvas)
        // all judged labels when one manifold is picked (its branches may lie above the lowest 12), else the lowest 12
        int shown = a.Levels ?? (manifold is null ? Math.Min(judged, 12) : judged);
        var plot = SpectrumPlot.Build(result, crossings, shown, document: document, manifold: manifold is int wanted ? e => e == wanted : null,
            title: $"{document.Device.Name}: spectrum along {setup.Axes[0].Path}\nlabels by {(mode == LabelMode.ByCharacter ? "character" : "order")}"
                   + (manifold is int m ? $", {m}-excitation manifold" : "") + "; lines coloured by character, blended where states mix");
        // the caption from the axis name alone cannot know a bias's control unit; say it, and what the bias moves
        OutputFile.Write(output, () =>
        {
            if (extension == ".svg") SpectrumPlot.SaveSvg(plot, output, w, h);
            else SpectrumPlot.SavePng(plot, output, w, h);
        });
        Console.Error.WriteLine($"wrote {output} ({result.Points.Count} points, {crossings.Count} crossing(s))");
        return ExitCodes.Ok;
    });

    /// <summary>Quantities along the sweep (no crossing search): one picture, purities apart from frequencies.</summary>
    private static int DrawQuantities(Core.DeviceFiles.DeviceDocument document, SweepSetup setup, LabelMode mode, int? levels, string[] quantities,
        string output, string extension, int w, int h)
    {
        var names = quantities.SelectMany(q => q.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)).Distinct().ToArray();
        var solver = new Core.Composite.DeviceSolver();
        var (planLevels, _) = SweepExecution.Levels(setup, levels, solver);
        var result = SweepExecution.Run(setup, mode, planLevels, solver);
        if (result.Points.Count == 0) return ExitCodes.Cancelled;
        var available = QuantitySeries.Available(result);
        if (names.FirstOrDefault(n => !available.Contains(n)) is string unknown)
            throw new UsageException($"--quantity {unknown}: not computed along this sweep{Core.DeviceFiles.EditDistance.Suggestion(unknown, available)} (available: {string.Join(", ", available)})");
        ScottPlot.Plot plot;
        try { plot = QuantityPlot.Build(result, names, document, document.PurityThreshold); }
        catch (ArgumentException e) { throw new UsageException($"--quantity: {e.Message}"); }
        OutputFile.Write(output, () =>
        {
            if (extension == ".svg") SpectrumPlot.SaveSvg(plot, output, w, h);
            else SpectrumPlot.SavePng(plot, output, w, h);
        });
        Console.Error.WriteLine($"wrote {output} ({result.Points.Count} points{(result.Completed ? "" : ", cancelled: only the points computed")})");
        return result.Completed ? ExitCodes.Ok : ExitCodes.Cancelled;
    }
}
