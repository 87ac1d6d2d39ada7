namespace LevelDesign.Ui.Text;

/// <summary>A line for a text page; Warning lines also carry a symbol in their text, colour only repeats it.</summary>
public sealed record TextLine(string Text, bool Warning = false, bool Heading = false);
