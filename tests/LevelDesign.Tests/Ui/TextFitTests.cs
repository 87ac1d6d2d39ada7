using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;

namespace LevelDesign.Tests.Ui;

/// <summary>
/// The text-fitting rules the screens use at 80 columns: wrapping keeps every word and never exceeds the width,
/// a cut is always marked "…", the key bar keeps its most important keys and ends with the F1 hint.
/// Expected strings are written out by hand from the rule each test names.
/// </summary>
public class TextFitTests
{
    private const string Sentence = "2χ = ω_r(qubit in 1) − ω_r(qubit in 0) = [E(1q,1r) − E(1q,0r)] − [E(0q,1r) − E(0q,0r)]";

    [Theory]
    [InlineData(10)]
    [InlineData(23)]
    [InlineData(46)]
    [InlineData(76)]
    public void Wrapping_keeps_every_word_in_order_and_no_line_is_wider_than_asked(int width)
    {
        var lines = TextFit.Wrap(Sentence, width).ToList();
        Assert.All(lines, l => Assert.True(l.Length <= width, $"'{l}' is wider than {width}"));
        Assert.Equal(Sentence.Split(' '), string.Join(' ', lines).Split(' '));
    }

    [Fact]
    public void A_word_longer_than_the_line_is_split_not_lost()
    {
        var lines = TextFit.Wrap("ab cdefghijkl m", 4).ToList();
        Assert.Equal(["ab", "cdef", "ghij", "kl m"], lines);
    }

    [Fact]
    public void A_leading_indent_stays_on_the_first_line()
    {
        Assert.Equal(["  ab cd", "ef"], TextFit.Wrap("  ab cd ef", 7).ToList());
    }

    [Fact]
    public void Wrapped_paragraphs_indent_every_line_after_the_first_and_too_many_lines_end_in_an_ellipsis()
    {
        var lines = TextFit.WrapLines("one two three\nfour five", 9, indent: "  ");
        Assert.Equal(["one two", "  three", "  four", "  five"], lines);
        var capped = TextFit.WrapLines("one two three\nfour five", 9, maxLines: 2, indent: "  ");
        Assert.Equal(["one two", "  three …"], capped);
    }

    [Theory]
    [InlineData("abcdef", 6, "abcdef")]
    [InlineData("abcdef", 4, "abc…")]
    [InlineData("ab cdef", 4, "ab…")]    // a space before the mark is dropped
    [InlineData("abcdef", 1, "…")]
    public void A_cut_is_marked(string text, int width, string expected) => Assert.Equal(expected, TextFit.Cut(text, width));

    [Fact]
    public void The_least_important_parts_are_left_out_first_and_the_order_is_kept()
    {
        (string, int)[] parts = [("file", 0), ("eigen native", 4), ("trunc ✓", 2), ("at 12:00", 3)];
        Assert.Equal("file │ eigen native │ trunc ✓ │ at 12:00", TextFit.KeepMostImportant(parts, 100, " │ "));
        Assert.Equal("file │ trunc ✓ │ at 12:00", TextFit.KeepMostImportant(parts, 30, " │ "));
        Assert.Equal("file │ trunc ✓", TextFit.KeepMostImportant(parts, 16, " │ "));
        Assert.Equal("", TextFit.KeepMostImportant([("f in GHz", 1)], 5, " · ", cutLast: false));
    }

    private static readonly KeyHint[] Hints =
    [
        new("F2", "F2", "Edit", 2), new("F5", "F5", "Sweep", 3), new("Ctrl+S", "^S", "Save", 5),
        new("F7", "F7", "Manifold", 11), new("F1", "F1", "Help", 0, LabelWhenCut: "all keys"),
    ];

    [Fact]
    public void The_key_bar_writes_keys_in_full_when_all_fit()
    {
        Assert.Equal("F2 Edit  F5 Sweep  Ctrl+S Save  F7 Manifold  F1 Help", KeyBarText.Line(Hints, 80));
    }

    [Fact]
    public void A_narrow_key_bar_shortens_keys_then_drops_the_lowest_ranked_and_ends_with_the_F1_hint()
    {
        Assert.Equal("F2 Edit  F5 Sweep  ^S Save  F7 Manifold  F1 Help", KeyBarText.Line(Hints, 48));
        Assert.Equal("F2 Edit  F5 Sweep  ^S Save  F1 all keys", KeyBarText.Line(Hints, 40));
        Assert.Equal("F2 Edit  F1 all keys", KeyBarText.Line(Hints, 22));
    }

    [Fact]
    public void A_form_row_shortens_the_bias_note_before_anything_is_cut()
    {
        var bias = new FieldRow("flux", "0 Φ0", "biases.qa_flux.value", "", "0", Note: "← bias qa_flux", ShortNote: "← qa_flux");
        Assert.Equal("flux        0 Φ0 ← bias qa_flux", FormRowText.Row(bias, 11, 31));
        Assert.Equal("flux        0 Φ0 ← qa_flux", FormRowText.Row(bias, 11, 27));
        Assert.Equal("flux 0 Φ0 ← qa_flux", FormRowText.Row(bias, 11, 20));
        var readOnly = new FieldRow("operators", "n cos_phi sin_phi a adag", null, "");
        string cut = FormRowText.Row(readOnly, 11, 27);
        Assert.Equal(27, cut.Length);
        Assert.EndsWith("…", cut);
        Assert.StartsWith("operators   ·n cos_phi", cut);
    }

    [Theory]
    [InlineData(5)]
    [InlineData(60)]
    [InlineData(119)]
    public void A_long_source_line_on_the_errors_page_keeps_the_caret_under_the_error(int column)
    {
        string source = string.Concat(Enumerable.Range(0, 12).Select(i => $"key{i} = \"{i}\" ")) + "# a comment that runs on";
        var (shown, caret) = LoadErrorText.Around(source, column, 60);
        Assert.True(shown.Length <= 60, shown);
        Assert.Equal(source[column - 1], shown[caret - 1]);
    }
}
