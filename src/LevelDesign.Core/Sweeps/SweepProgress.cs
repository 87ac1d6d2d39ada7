namespace LevelDesign.Core.Sweeps;

/// <summary>Progress of a running sweep, reported to both the command line and the terminal UI.</summary>
public readonly record struct SweepProgress(int Done, int Total);
