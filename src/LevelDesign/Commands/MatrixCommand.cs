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
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(op)!, parse.GetValue(count), parse.GetValue(state), parse.GetValue(at),
            parse.GetValue(point), parse.GetValue(json), parse.GetValue(allowLarge)));
        return command;
    }

    public static int Run(string path, string op, int? count, int[]? chosen, string[]? at, string? point, bool json, bool allowLarge) => CommandGuard.Run(path, () =>
    {
        int dot = op.IndexOf('.');
        if (dot <= 0 || dot == op.Length - 1) throw new UsageException($"'{op}': write ELEMENT.OPERATOR, e.g. qa.n");
        string elementId = op[..dot], name = op[(dot + 1)..];
        if (count is < 1) throw new UsageException("--states must be at least 1");
        if (count is not null && chosen is { Length: > 0 }) throw new UsageException("give either --states or --state, not both");
        var document = CommandGuard.Load(path, allowLarge);
        var device = DeviceInput.Resolve(document, point, at, out _);
        int e = device.IndexOf(elementId);
        if (e < 0) throw new UsageException($"'{op}': no element '{elementId}' (elements: {string.Join(", ", device.Elements.Select(x => x.Id))})");
        if (!device.Elements[e].OperatorNames.Contains(name))
            throw new UsageException($"'{op}': element '{elementId}' has no operator '{name}' (it offers: {string.Join(", ", device.Elements[e].OperatorNames)})");
        int highest = chosen is { Length: > 0 } ? chosen.Max() + 1 : count ?? DefaultStates;
        var (spectrum, _) = SpectrumCommand.Compute(new DeviceSolver(), device, highest);
        var states = chosen is { Length: > 0 } ? chosen.Distinct().ToArray() : Enumerable.Range(0, Math.Min(highest, spectrum.Count)).ToArray();
        foreach (int k in states)
            if (k < 0 || k >= spectrum.Count) throw new UsageException($"--state {k}: {spectrum.Count} dressed states were computed (indices 0–{spectrum.Count - 1})");
        var m = DressedMatrixElements.Matrix(spectrum, elementId, name, states);
        Console.Write(json
            ? JsonValues.Write(MatrixElementReport.Json(spectrum, elementId, name, states, m)) + Environment.NewLine
            : MatrixElementReport.Table(spectrum, elementId, name, states, m));
        return ExitCodes.Ok;
    });
}
