namespace LevelDesign.Core.Sweeps;

/// <summary>A sweep refused before any solve because its estimated memory is over the limit (the message says what to lower).</summary>
public sealed class SweepTooLargeException(string message) : InvalidOperationException(message);
