namespace LevelDesign.Core.Labels;

/// <summary>
/// The bare product state a dressed state is named after (one-to-one over the dressed states), its purity
/// (overlap squared with that bare state), its largest components, and whether the choice was ambiguous
/// (the top two overlaps within the margin, or the assignment overruling the largest overlap).
/// </summary>
public sealed record DressedLabel(int BareIndex, double Purity, bool Ambiguous, IReadOnlyList<Component> Components);
