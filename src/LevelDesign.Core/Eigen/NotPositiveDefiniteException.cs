namespace LevelDesign.Core.Eigen;

/// <summary>Raised when an overlap matrix S is not symmetric positive definite.</summary>
public sealed class NotPositiveDefiniteException(string message) : Exception(message);
