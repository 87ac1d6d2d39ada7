namespace LevelDesign.Tests.Support;

/// <summary>What a run of the leveldesign executable produced.</summary>
public sealed record CommandResult(int ExitCode, string Stdout, string Stderr)
{
    public override string ToString() => $"exit {ExitCode}\n--- stdout ---\n{Stdout}\n--- stderr ---\n{Stderr}";
}
