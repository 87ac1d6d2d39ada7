namespace LevelDesign.Ui.Text;

/// <summary>
/// One entry of the key bar: the key as written in full ("Ctrl+S") and short ("^S"), what it does, and its rank
/// (0 = always shown; larger ranks are left out first when the bar is too narrow). <paramref name="LabelWhenCut"/>
/// replaces the label once anything was left out (F1 then says it lists all keys).
/// </summary>
public sealed record KeyHint(string Key, string ShortKey, string Label, int Rank, string? LabelWhenCut = null);
