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
        command.SetAction(parse => Run(parse.GetValue(file)!, parse.GetValue(at), parse.GetValue(point), parse.GetValue(json), parse.GetValue(allowLarge)));
        return command;
    }

    public static int Run(string path, string[]? at, string? point, bool json, bool allowLarge) => CommandGuard.Run(path, () =>
    {
        var document = DeviceInput.Load(path, allowLarge);
        var device = DeviceInput.Resolve(document, point, at, out var applied);
        var problem = new DeviceSolver().Prepare(device);
        var warnings = DeviceWarnings.Print(path, device);
        var model = DescribeFormatter.Describe(problem, applied);
        model["warnings"] = new System.Text.Json.Nodes.JsonArray(warnings.Select(w => (System.Text.Json.Nodes.JsonNode?)w).ToArray());
        if (json) Console.WriteLine(JsonValues.Write(model));
        else Console.Write(DescribeTable.Format(model));
        return ExitCodes.Ok;
    });
}
