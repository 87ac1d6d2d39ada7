using LevelDesign.Ui.Session;

namespace LevelDesign.Ui.Controllers;

/// <summary>
/// Values offered to the designer after a search or fit: the question, one edit per key (each an ordinary, undoable
/// edit of the document), and what is said when the offer is left.
/// </summary>
public sealed record Offer(string Question, IReadOnlyDictionary<char, Func<EditOutcome>> Choices, string LeftMessage);
