namespace LevelDesign.Ui.Session;

/// <summary>Result of an edit: accepted, or refused with the reason (the document is unchanged then).</summary>
public sealed record EditOutcome(bool Accepted, string Message)
{
    public static EditOutcome Ok(string message) => new(true, message);
    public static EditOutcome Refused(string reason) => new(false, reason);
}
