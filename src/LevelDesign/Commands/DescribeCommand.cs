using LevelDesign.Core.Presentation;
using System.CommandLine;
using LevelDesign.Core.Composite;

namespace LevelDesign.Commands;

/// <summary>leveldesign describe FILE [--at ...] [--json]: the fully resolved model, as tables or as JSON.</summary>
public static class DescribeCommand
{
    public static Command Create()
    {
        var file = CommonOptions.File();
        var at = CommonOptions.At();
        var point = CommonOptions.Point();
        var json = new Option<bool>("--json") { Description = "write the model as JSON to stdout (default: readable tables)" };
        var allowLarge = CommonOptions.AllowLarge();
        var command = new Command("describe", "the fully resolved model (energies in GHz after every conversion), enough to rebuild the Hamiltonian")
            { file, at, point, json, allowLarge };
        command.SetAction(parse => Run(new DescribeArguments
        {
            Path = parse.GetValue(file)!, At = parse.GetValue(at), Point = parse.GetValue(point), Json = parse.GetValue(json),
            AllowLarge = parse.GetValue(allowLarge),
        }));
        return command;
    }

    public static int Run(DescribeArguments a) => CommandGuard.Run(a.Path, () =>
    {
        var document = DeviceInput.Load(a.Path, a.AllowLarge);
        var device = DeviceInput.Resolve(document, a.Point, a.At, out var applied);
        var problem = new DeviceSolver().Prepare(device);
        var warnings = DeviceWarnings.Print(a.Path, device);
        var model = DescribeFormatter.Describe(problem, applied);
        model["warnings"] = new System.Text.Json.Nodes.JsonArray(warnings.Select(w => (System.Text.Json.Nodes.JsonNode?)w).ToArray());
        if (a.Json) Console.WriteLine(JsonValues.Write(model));
        else Console.Write(DescribeTable.Format(model));
        return ExitCodes.Ok;
    });
}
