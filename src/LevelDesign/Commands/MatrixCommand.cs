using LevelDesign.Core.Presentation;
using System.CommandLine;
using LevelDesign.Core.Analysis;
using LevelDesign.Core.Composite;

namespace LevelDesign.Commands;

/// <summary>
/// leveldesign matrix FILE ELEMENT.OPERATOR [--states K | --state I ...] [--at ...] [--json]: ⟨i|op|j⟩ of one element
/// operator between dressed states, which set drive strengths and losses.
/// </summary>
public static class MatrixCommand
{
    public const int DefaultStates = 6;

    public static Command Create()
    {
        var file = CommonOptions.File();
        var op = new Argument<string>("OPERATOR") { Description = "an element operator as ELEMENT.OPERATOR, e.g. qa.n, qa.a, fx.phi, qa.cos_phi" };
        var count = new Option<int?>("--states") { Description = $"the lowest K dressed states (default {DefaultStates})" };
        var state = new Option<int[]>("--state") { Description = "a dressed state by index (see spectrum); repeatable, instead of --states", AllowMultipleArgumentsPerToken = false };
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var json = CommonOptions.Json();
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("matrix", "matrix elements ⟨i|op|j⟩ of an element operator between dressed states")
            { file, op, count, state, at, point, json, allowLarge };
        command.SetAction(parse => Run(new MatrixArguments
        {
            Path = parse.GetValue(file)!, Operator = parse.GetValue(op)!, Count = parse.GetValue(count), Chosen = parse.GetValue(state),
            At = parse.GetValue(at), Point = parse.GetValue(point), Json = parse.GetValue(json), AllowLarge = parse.GetValue(allowLarge),
        }));
        return command;
    }

    public static int Run(MatrixArguments a) => CommandGuard.Run(a.Path, () =>
    {
        int dot = a.Operator.IndexOf('.');
        if (dot <= 0 || dot == a.Operator.Length - 1) throw new UsageException($"'{a.Operator}': write ELEMENT.OPERATOR, e.g. qa.n");
        string elementId = a.Operator[..dot], name = a.Operator[(dot + 1)..];
        if (a.Count is < 1) throw new UsageException("--states must be at least 1");
        if (a.Count is not null && a.Chosen is { Length: > 0 }) throw new UsageException("give either --states or --state, not both");
        var document = CommandGuard.Load(a.Path, a.AllowLarge);
        var device = DeviceInput.Resolve(document, a.Point, a.At, out _);
        int e = device.IndexOf(elementId);
        if (e < 0) throw new UsageException($"'{a.Operator}': no element '{elementId}' (elements: {string.Join(", ", device.Elements.Select(x => x.Id))})");
        if (!device.Elements[e].OperatorNames.Contains(name))
            throw new UsageException($"'{a.Operator}': element '{elementId}' has no operator '{name}' (it offers: {string.Join(", ", device.Elements[e].OperatorNames)})");
        int highest = a.Chosen is { Length: > 0 } ? a.Chosen.Max() + 1 : a.Count ?? DefaultStates;
        var (spectrum, _) = SpectrumCommand.Compute(new DeviceSolver(), device, highest);
        var states = a.Chosen is { Length: > 0 } ? a.Chosen.Distinct().ToArray() : Enumerable.Range(0, Math.Min(highest, spectrum.Count)).ToArray();
        foreach (int k in states)
            if (k < 0 || k >= spectrum.Count) throw new UsageException($"--state {k}: {spectrum.Count} dressed states were computed (indices 0–{spectrum.Count - 1})");
        var m = DressedMatrixElements.Matrix(spectrum, elementId, name, states);
        Console.Write(a.Json
            ? JsonValues.Write(MatrixElementReport.Json(spectrum, elementId, name, states, m)) + Environment.NewLine
            : MatrixElementReport.Table(spectrum, elementId, name, states, m));
        return ExitCodes.Ok;
    });
}
