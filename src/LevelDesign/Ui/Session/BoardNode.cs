namespace LevelDesign.Ui.Session;

/// <summary>One line of the board tree: what it is, its id, its depth and the text shown.</summary>
public sealed record BoardNode(BoardNodeKind Kind, string Id, int Depth, string Text);
