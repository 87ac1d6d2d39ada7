using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Model;

namespace LevelDesign.Commands;

/// <summary>
/// What every sweeping command needs: the loaded file, the starting settings (--point, --at), the axes (--vary
/// or --sweep, with --link), and the map from axis values to the device at that point.
/// </summary>
public sealed record SweepSetup(DeviceDocument Document, IReadOnlyDictionary<string, double> Start, IReadOnlyList<SweepAxis> Axes)
{
    public Device Resolve(IReadOnlyList<double> values) => Document.Resolve(Axes, values, Start);

    /// <summary>Builds the setup from a command's options or throws <see cref="UsageException"/>; <paramref name="maxAxes"/> is 1 for 1-D commands.</summary>
    public static SweepSetup Create(DeviceDocument document, SweepAxesArguments options, int maxAxes, int? defaultCount = null)
    {
        var (vary, links, sweepName) = (options.Vary, options.Links, options.SweepName);
        DeviceInput.Resolve(document, options.Point, options.At, out var applied);   // checks the point and --at settings
        var start = applied.ToDictionary(kv => kv.Key, kv => kv.Value!.GetValue<double>());
        IReadOnlyList<SweepAxis> axes;
        if (vary is { Length: > 0 })
        {
            if (sweepName is not null) throw new UsageException("give either --vary or --sweep, not both");
            if (vary.Length > maxAxes)
                throw new UsageException(maxAxes == 1 ? "this command sweeps one axis: give one --vary" : "at most two --vary axes (a grid)");
            axes = vary.Select(v => AxisArguments.Axis(document, v, defaultCount)).ToArray();
            if (axes.Count == 2 && axes[0].Path == axes[1].Path) throw new UsageException($"--vary names '{axes[0].Path}' twice");
        }
        else
        {
            var chosen = sweepName is null ? document.Sweeps.FirstOrDefault() : document.Sweeps.FirstOrDefault(s => s.Name == sweepName);
            if (chosen is null)
                throw new UsageException(sweepName is null
                    ? "give --vary BIAS=START:STOP:COUNT (this file defines no sweep)"
                    : $"no sweep '{sweepName}'{EditDistance.Suggestion(sweepName, document.Sweeps.Select(s => s.Name))} (sweeps in {document.Path}: {string.Join(", ", document.Sweeps.Select(s => s.Name))})");
            if (chosen.Axes.Count > maxAxes) throw new UsageException($"sweep '{chosen.Name}' has {chosen.Axes.Count} axes; this command sweeps one");
            axes = chosen.Axes;
        }
        axes = AxisArguments.WithLinks(document, axes, links);
        // sizes and ends are refused here, before the first point is computed
        if (Core.Sweeps.SweepGrid.AxisProblems(axes) is { Count: > 0 } problems) throw new UsageException(string.Join("; ", problems));
        var setup = new SweepSetup(document, start, axes);
        setup.CheckEnds();
        return setup;
    }

    /// <summary>The device must be valid at both ends of every axis (e.g. no negative frequency), so a sweep fails before it starts.</summary>
    private void CheckEnds()
    {
        var corners = Axes.Count == 1
            ? new[] { new[] { Axes[0].Start }, new[] { Axes[0].Stop } }
            : new[] { new[] { Axes[0].Start, Axes[1].Start }, new[] { Axes[0].Stop, Axes[1].Stop } };
        foreach (var c in corners)
        {
            Device device;
            try { device = Resolve(c); }
            catch (ArgumentException e) { throw new UsageException($"{Document.Path}: {e.Message}"); }
            var problems = device.Validate();
            if (problems.Count > 0) throw new UsageException($"{Document.Path}: at the end of the sweep ({string.Join(", ", c)}): {string.Join("; ", problems)}");
        }
    }
}
