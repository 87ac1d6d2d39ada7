using LevelDesign.Ui.Text;
using Terminal.Gui.Drawing;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace LevelDesign.Ui.Views;

/// <summary>
/// The question area at the bottom of the board, as many lines as the question needs at the current width
/// (wrapped, never cut silently): either a typed answer (Enter accepts, Esc
/// cancels; a refused answer keeps the prompt open and shows the reason) or a one-key choice such as
/// "s save and quit · d discard · Esc stay". Used instead of modal dialogs so nothing ever blocks.
/// </summary>
public sealed class PromptBar : WrappedHeightView
{
    private readonly TextField _input;
    private Func<string, string?>? _onAnswer;
    private IReadOnlyDictionary<char, Action>? _choices;
    private Action? _onCancel;
    private View? _returnFocus;
    private string _question = "";
    private string _message = "";

    public PromptBar()
    {
        CanFocus = true;
        Visible = false;
        Height = 3;
        _input = new TextField { X = 2, Y = 1, Width = Dim.Fill(1) };
        _input.Accepting += (_, e) =>
        {
            e.Handled = true;
            Answer();
        };
        Add(_input);
        AddCommand(Command.Cancel, Cancel);
        AddCommand(Command.Toggle, context =>
        {
            if (_choices is null || context?.Binding is not KeyBinding { Key: { } key }) return false;
            char c = char.ToLowerInvariant((char)key.AsRune.Value);
            if (!_choices.TryGetValue(c, out var action)) return false;
            Close();
            action();
            return true;
        });
        KeyBindings.Add(Key.Esc, Command.Cancel);
    }

    public bool IsOpen => Visible;
    public string Question => _question;
    public string Message => _message;
    /// <summary>The text in the input line (what Enter would answer).</summary>
    public string InputText => _input.Text;

    /// <summary>Asks for text. <paramref name="onAnswer"/> returns null to close, or a reason to keep asking.</summary>
    public void Ask(string question, string initial, Func<string, string?> onAnswer, Action? onCancel = null)
    {
        Open(question, onCancel);
        _onAnswer = onAnswer;
        _choices = null;
        _input.Visible = true;
        _input.Text = initial;
        _input.InsertionPoint = initial.Length;
        Refit();
        _input.SetFocus();
    }

    /// <summary>Asks for one key; each key in <paramref name="choices"/> runs its action. Esc runs <paramref name="onCancel"/>.</summary>
    public void Choose(string question, IReadOnlyDictionary<char, Action> choices, Action? onCancel = null)
    {
        Open(question, onCancel);
        _onAnswer = null;
        _choices = choices;
        _input.Visible = false;
        foreach (char c in choices.Keys) KeyBindings.ReplaceCommands(new Key(c), Command.Toggle);
        Refit();
        SetFocus();
    }

    private void Open(string question, Action? onCancel)
    {
        if (!Visible) _returnFocus = App?.Navigation?.GetFocused();
        _question = question;
        _message = "";
        _onCancel = onCancel;
        Visible = true;
        SetNeedsDraw();
    }

    /// <summary>At most this many lines of question, and of message below the answer.</summary>
    public const int MaxQuestionLines = 8, MaxMessageLines = 3;

    /// <summary>Lines in use at the current width: the wrapped question, the answer (when typed), the message.</summary>
    public override int Rows => QuestionLines(AvailableWidth()).Count + (_choices is null ? 1 : 0) + FooterLines(AvailableWidth()).Count;

    /// <summary>Also puts the answer on the line under the question.</summary>
    public override void Refit()
    {
        _input.Y = QuestionLines(AvailableWidth()).Count;
        base.Refit();
    }

    /// <summary>
    /// The question wrapped; when it needs more than <see cref="MaxQuestionLines"/>, its first part is shortened
    /// (ending in "…") and its last line of keys ("a applies · Esc leave", after the last '\n') is kept whole.
    /// </summary>
    private IReadOnlyList<string> QuestionLines(int width)
    {
        var all = TextFit.WrapLines("» " + _question, width, indent: "  ");
        if (all.Count <= MaxQuestionLines) return all;
        int split = _question.LastIndexOf('\n');
        if (split < 0) return TextFit.WrapLines("» " + _question, width, MaxQuestionLines, indent: "  ");
        var keys = TextFit.WrapLines("  " + _question[(split + 1)..], width, indent: "  ");
        var body = TextFit.WrapLines("» " + _question[..split], width, Math.Max(1, MaxQuestionLines - keys.Count), indent: "  ");
        return [.. body, .. keys];
    }

    /// <summary>The refusal message, or the keys to answer (left out for a choice whose question already names Esc).</summary>
    private IReadOnlyList<string> FooterLines(int width) =>
        _message.Length > 0 ? TextFit.WrapLines("  " + _message, width, MaxMessageLines, indent: "    ")
        : _choices is null ? ["  Enter accept · Esc cancel"]
        : _question.Contains("Esc", StringComparison.Ordinal) ? [] : ["  Esc cancel"];

    private void Answer()
    {
        if (_onAnswer is null) return;
        string text = _input.Text ?? "";
        var handler = _onAnswer;
        string? refusal = handler(text);
        if (refusal is null)
        {
            if (ReferenceEquals(handler, _onAnswer)) Close();
            return;
        }
        _message = "✗ " + refusal;
        Refit();
        SetNeedsDraw();
    }

    private bool? Cancel()
    {
        if (!Visible) return false;
        var cancel = _onCancel;
        Close();
        cancel?.Invoke();
        return true;
    }

    public void Close()
    {
        if (_choices is not null)
            foreach (char c in _choices.Keys) KeyBindings.Remove(new Key(c));
        _choices = null;
        _onAnswer = null;
        bool hadFocus = HasFocus;   // an answer may already have moved focus on purpose (e.g. to the spectrum)
        Visible = false;
        var back = _returnFocus;
        _returnFocus = null;
        if (hadFocus && back is { Visible: true }) back.SetFocus();
        SuperView?.SetNeedsDraw();
    }

    protected override bool OnDrawingContent(DrawContext? context)
    {
        int width = Viewport.Width;
        var question = QuestionLines(width);
        var footer = FooterLines(width);
        SetAttribute(GetAttributeForRole(VisualRole.Normal));
        int row = 0;
        foreach (var line in question) { Move(0, row++); AddStr(RowList.Pad(line, width)); }
        if (_choices is null) { Move(0, row++); AddStr("  "); }
        SetAttribute(_message.Length > 0 ? Palette.Warning(this) : GetAttributeForRole(VisualRole.Normal));
        foreach (var line in footer)
        {
            if (row >= Viewport.Height) break;
            Move(0, row++);
            AddStr(RowList.Pad(line, width));
        }
        SetAttribute(GetAttributeForRole(VisualRole.Normal));
        return true;
    }
}
