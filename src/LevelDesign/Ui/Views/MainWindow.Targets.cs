using LevelDesign.Ui.Controllers;

namespace LevelDesign.Ui.Views;

/// <summary>F9: the question of the targets controller, and its offers, applied or left.</summary>
public sealed partial class MainWindow
{
    private void AskTarget()
    {
        var document = _session.Document;
        if (document is null) { Say("no device is open", warning: true); return; }
        _prompt.Ask(TargetsController.Question, _targets.Suggestion(document, _point.Snapshot?.Quantities.Named().Keys),
            text => _targets.Submit(text, _point.Snapshot?.Quantities.Named().Keys));
    }

    /// <summary>A digit or letter applies the offered values (one undoable edit); Esc leaves the device as it is.</summary>
    private void AskOffer(Offer offer) =>
        _prompt.Choose(offer.Question, offer.Choices.ToDictionary(c => c.Key, c => (Action)(() => Report(c.Value()))),
            onCancel: () => Say(offer.LeftMessage));
}
