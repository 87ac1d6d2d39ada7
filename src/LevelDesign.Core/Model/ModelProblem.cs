namespace LevelDesign.Core.Model;

/// <summary>
/// One problem the model's own checks found, with the part of the device it concerns (so a reader can put it at the
/// right table of the file without parsing the text): <see cref="Section"/> "elements" or "couplers" and the id, or
/// empty for the device as a whole.
/// </summary>
public sealed record ModelProblem(string Section, string Id, string Message)
{
    public static ModelProblem OfElement(string id, string message) => new("elements", id, message);

    public static ModelProblem OfCoupler(string id, string message) => new("couplers", id, message);

    /// <summary>The table of the file the problem belongs to ("elements.qa"), or empty.</summary>
    public string Table => Section.Length == 0 ? "" : $"{Section}.{Id}";

    public override string ToString() => Message;
}
