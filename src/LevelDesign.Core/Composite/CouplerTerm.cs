using LevelDesign.Core.Linear;

namespace LevelDesign.Core.Composite;

/// <summary>What one coupler multiplies at a point: X (op_A, or op_A† for exchange), Y = op_B, and whether h.c. is added.</summary>
internal readonly record struct CouplerTerm(OperatorMatrix X, OperatorMatrix Y, bool AddConjugate);
