namespace LevelDesign.Core.Labels;

/// <summary>One bare product state inside a dressed state and its weight |⟨bare|dressed⟩|².</summary>
public sealed record Component(int BareIndex, double Weight);
