namespace LevelDesign.Core.Elements;

/// <summary>An element cannot be computed because of one parameter's value; <see cref="Parameter"/> names it, so a reader can point at its key.</summary>
public sealed class ElementLimitException(string parameter, string message) : InvalidOperationException(message)
{
    public string Parameter { get; } = parameter;
}
