using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;

namespace LevelDesign.Core.Presentation;

/// <summary>Every bias where a quantity meets its target, with the sign changes that are jumps rather than roots marked.</summary>
public static class TargetReport
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public const string JumpNote = "the quantity changes sign here by a jump (e.g. a label moving to another state), not through a root";

    public const string HybridizedNote = "inside a hybridized region: a state this quantity is read from has purity below the threshold, so its label (and the value) cannot be trusted";

    public static string Table(DeviceDocument document, SweepAxis axis, string quantity, double target, IReadOnlyList<TargetRoot> roots, double purityThreshold)
    {
        var unit = ShownUnit.Of(document, axis.Path);
        var (path, _) = SweepFiles.ParameterOf(document, axis.Path, 0);
        var parameterUnit = ShownUnit.Of(document, path);
        var b = new StringBuilder();
        b.AppendLine($"device {document.Device.Name}: {quantity} = {FrequencyText.Of(quantity, target)} along {axis.Path} from {unit.Text(axis.Start)} to {unit.Text(axis.Stop)} ({axis.Count} scan points)");
        var clean = roots.Where(r => r.Refined && !r.IsHybridized(purityThreshold)).ToList();
        var hybridized = roots.Where(r => r.Refined && r.IsHybridized(purityThreshold)).ToList();
        b.AppendLine(clean.Count == 0 ? "no clean root in this range" : $"{clean.Count} root(s)");
        string Root(TargetRoot r)
        {
            var (_, parameter) = SweepFiles.ParameterOf(document, axis.Path, r.Bias);
            return string.Create(Inv, $"  {axis.Path} = {unit.Text(r.Bias, 10)}   ({path} = {parameterUnit.Text(parameter, 10)})   {quantity} = {FrequencyText.Of(quantity, r.Value)}, residual {FrequencyText.Format(r.Residual, FrequencyText.ShiftResolutionGHz)}, purity {r.Purity:F4}");
        }
        foreach (var r in clean) b.AppendLine(Root(r));
        if (hybridized.Count > 0)
        {
            b.AppendLine(string.Create(Inv, $"{hybridized.Count} root(s) {HybridizedNote} ({purityThreshold:G3}):"));
            foreach (var r in hybridized) b.AppendLine(Root(r) + " !");
        }
        foreach (var r in roots.Where(r => !r.Refined))
        {
            var (_, parameter) = SweepFiles.ParameterOf(document, axis.Path, r.Bias);
            b.AppendLine(string.Create(Inv, $"  {axis.Path} ≈ {unit.Text(r.Bias, 10)}   ({path} = {parameterUnit.Text(parameter, 10)})   not a root: {JumpNote}"));
        }
        b.AppendLine(Core.Analysis.Conventions.QuantityPurity);
        return b.ToString();
    }

    public static string Json(DeviceDocument document, SweepAxis axis, string quantity, double target, IReadOnlyList<TargetRoot> roots, double purityThreshold)
    {
        var list = new JsonArray();
        var unit = ShownUnit.Of(document, axis.Path);
        foreach (var r in roots)
        {
            var (path, parameter) = SweepFiles.ParameterOf(document, axis.Path, r.Bias);
            var o = new JsonObject
            {
                ["bias"] = JsonValues.Number(unit.ToShown(r.Bias)),
                ["bias_unit"] = unit.Symbol,
                ["parameter"] = new JsonObject { [path] = JsonValues.Number(parameter) },
                ["value_ghz"] = JsonValues.Number(r.Value),
                ["residual_ghz"] = JsonValues.Number(r.Residual),
                ["root"] = r.Refined,
                ["purity"] = JsonValues.Number(r.Purity),
                ["hybridized"] = r.Refined && r.IsHybridized(purityThreshold),
            };
            if (!r.Refined) o["note"] = JumpNote;
            else if (r.IsHybridized(purityThreshold)) o["note"] = HybridizedNote;
            list.AddNode(o);
        }
        return JsonValues.Write(new JsonObject
        {
            ["device"] = document.Device.Name,
            ["quantity"] = quantity,
            ["target_ghz"] = JsonValues.Number(target),
            ["axis"] = SweepFiles.Axis(document, axis),
            ["purity_threshold"] = JsonValues.Number(purityThreshold),
            ["roots"] = list,
            ["conventions"] = ConventionsText.Json(),
        }) + Environment.NewLine;
    }
}
