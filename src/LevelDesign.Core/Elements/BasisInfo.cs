namespace LevelDesign.Core.Elements;

/// <summary>The natural basis an element was diagonalised in: e.g. ("charge", 41) or ("oscillator", 80).</summary>
public sealed record BasisInfo(string Kind, int Size);
