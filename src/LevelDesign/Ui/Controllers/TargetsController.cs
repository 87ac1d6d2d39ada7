using LevelDesign.Core.Composite;
using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Controllers;

/// <summary>
/// F9: target searches and fits. Reads the entry through <see cref="TargetRequestParser"/> or
/// <see cref="FitRequestParser"/>, runs the work off the UI thread, and answers with an <see cref="Offer"/> whose
/// choice is one undoable edit of the document; a cancelled or superseded result is dropped. No screen types.
/// </summary>
public sealed class TargetsController
{
    /// <summary>The question of F9, one form per line so both read whole at 80 columns.</summary>
    public const string Question = "target: QUANTITY = VALUE by BIAS LOW to HIGH\nor  fit PATH [LOW..HIGH] [PATH ...] to QUANTITY = VALUE [at POINT][, ...]";

    /// <summary>Significant digits of a fit residual in the offer (the fitted values keep the digits written to the file).</summary>
    private const int ResidualDigits = 3;

    private readonly EditSession _session;
    private readonly IUiScheduler _scheduler;
    private readonly ITargetSolver _targets;
    private readonly LatestOnly _fitJobs = new(), _solveJobs = new();

    public TargetsController(EditSession session, IUiScheduler scheduler, ITargetSolver targets)
    {
        _session = session;
        _scheduler = scheduler;
        _targets = targets;
    }

    /// <summary>Work started or ended: the view redraws the status.</summary>
    public event Action? Changed;

    /// <summary>A message for the status line (text, warning).</summary>
    public event Action<string, bool>? Said;

    /// <summary>Values to offer: the view asks the question and applies the chosen edit.</summary>
    public event Action<Offer>? Offered;

    /// <summary>The last F9 entry, offered again so a search is repeated or adjusted, not retyped.</summary>
    public string? LastEntry { get; private set; }
    public bool IsFitting { get; private set; }
    public bool IsSolving { get; private set; }

    /// <summary>The latest fit's task (it ends as cancelled after Esc), for tests that check the work really stops.</summary>
    public Task? RunningFit { get; private set; }

    /// <summary>The text F9 offers: the last entry, else a target on the file's first bias.</summary>
    public string Suggestion(DeviceDocument document, IEnumerable<string>? quantities)
    {
        if (LastEntry is not null) return LastEntry;
        var bias = document.Biases.FirstOrDefault();
        string range = bias is null ? "qa.flux 0 to 0.5"
            : $"{bias.Name} {ShownUnit.Of(document, bias.Name).Text(bias.Offset)} to {ShownUnit.Of(document, bias.Name).Text(bias.Offset + bias.Period / 2)}";
        string quantity = quantities?.FirstOrDefault() ?? "qa.f01";
        return $"{quantity} = 5 GHz by {range}";
    }

    /// <summary>
    /// Starts the search or fit an F9 entry asks for; returns why it was refused, or null. The quantity names come
    /// from the computation at the file's biases (null before the first).
    /// </summary>
    public string? Submit(string text, IEnumerable<string>? quantities)
    {
        if (_session.Document is not { } document) return "no device is open";
        LastEntry = text;
        if (FitRequestParser.IsFit(text)) return StartFit(text, document, quantities);
        var request = TargetRequestParser.Parse(text, document, quantities, out string? error);
        if (request is null) return error;
        StartSolve(document, request);
        return null;
    }

    /// <summary>Esc: stops a running fit or search (its late result is dropped, the device stays); false when none runs.</summary>
    public bool Cancel()
    {
        if (!IsFitting && !IsSolving) return false;
        string what = IsFitting ? "fit" : "target search";
        if (IsFitting) _fitJobs.Cancel();
        if (IsSolving) _solveJobs.Cancel();
        IsFitting = IsSolving = false;
        Changed?.Invoke();
        Said?.Invoke($"{what} cancelled; the device is unchanged", false);
        return true;
    }

    /// <summary>The window closes: nothing more is computed or posted.</summary>
    public void Stop()
    {
        _fitJobs.Cancel();
        _solveJobs.Cancel();
    }

    private void StartSolve(DeviceDocument document, TargetRequest request)
    {
        var (generation, token) = _solveJobs.Begin();
        IsSolving = true;
        Changed?.Invoke();
        Said?.Invoke($"⟳ solving {request.Quantity} = {FrequencyText.Of(request.Quantity, request.GoalGHz)} by {request.Bias} ({request.ScanPoints}-point scan, hybridized steps sampled {TargetSolver.RefinementSamples}× finer, then Brent); Esc cancels", false);
        Task.Run(async () =>
        {
            try
            {
                var found = await _targets.FindAllAsync(document, request, token).ConfigureAwait(false);
                _scheduler.Post(() =>
                {
                    if (!_solveJobs.IsCurrent(generation)) return;
                    IsSolving = false;
                    Changed?.Invoke();
                    OfferRoots(document, request, found);
                });
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() =>
                {
                    if (!_solveJobs.IsCurrent(generation)) return;
                    IsSolving = false;
                    Changed?.Invoke();
                    Said?.Invoke("✗ target not solved: " + ProblemText.Describe(e), true);
                });
            }
        }, CancellationToken.None);
    }

    /// <summary>Lists every root; a digit applies that one to the device (an ordinary, undoable edit of the bias value).</summary>
    private void OfferRoots(DeviceDocument solvedOn, TargetRequest request, TargetSearchResult found)
    {
        var roots = found.Roots;
        var unit = ShownUnit.Of(solvedOn, request.Bias);
        if (!roots.Any(r => r.Refined))
        {
            Said?.Invoke(TargetOfferText.Missed(request, found, unit, solvedOn.PurityThreshold), true);
            if (roots.Count == 0) return;   // label jumps alone are still offered below, marked as such
        }
        else Said?.Invoke(ReferenceEquals(solvedOn, _session.Document) ? "target search done; a digit applies one of the values listed, Esc leaves the device as it is"
            : "the device changed while solving; the roots are for the device as it was", false);
        var choices = new Dictionary<char, Func<EditOutcome>>();
        for (int i = 0; i < roots.Count && i < 9; i++)
        {
            double bias = roots[i].Bias;
            choices[(char)('1' + i)] = () => ApplyRoot(request.Bias, bias);
        }
        string more = roots.Count > 9 ? $" (+{roots.Count - 9} more)" : "";
        Offered?.Invoke(new Offer($"{TargetOfferText.Goal(request)} at {request.Bias} = {string.Join(" · ", TargetOfferText.Offers(request, roots, unit, solvedOn.PurityThreshold))}{more}.\ndigit applies · Esc leave",
            choices, "target values left; the device is unchanged"));
    }

    /// <summary>Writes a found bias (or parameter) value into the file as one undoable edit.</summary>
    public EditOutcome ApplyRoot(string biasOrPath, double value)
    {
        if (_session.Document is not { } document) return EditOutcome.Refused("no device is open");
        var edit = TargetRequestParser.FieldFor(document, biasOrPath, value);
        if (edit is null) return EditOutcome.Refused($"{biasOrPath} is not a value written in the file");
        return _session.SetValue(edit.Value.Field, edit.Value.Text);
    }

    /// <summary>
    /// Runs the fit off the UI thread. Esc cancels it: the token reaches Core's fit loop and every full solve (through
    /// <see cref="CancellableEigenSolver"/>), a late result is dropped, and the device is never touched.
    /// </summary>
    private string? StartFit(string text, DeviceDocument document, IEnumerable<string>? quantities)
    {
        if (quantities is null) return "wait until the device has been computed once (the quantity names come from it)";
        var request = FitRequestParser.Parse(text, document, quantities.ToArray(), out string? error);
        if (request is null) return error;
        var (generation, token) = _fitJobs.Begin();
        IsFitting = true;
        Changed?.Invoke();
        Said?.Invoke($"⟳ fitting {string.Join(", ", request.Parameters.Select(p => p.Path))} to {request.Targets.Count} target(s) (least squares, full solves); Esc cancels", false);
        RunningFit = Task.Run(() =>
        {
            try
            {
                var solver = new DeviceSolver(new CancellableEigenSolver(EigenSolvers.Active, token));
                var result = ParameterFit.Fit(document.Device, request.Parameters, request.Targets, solver, cancellation: token);
                _scheduler.Post(() =>
                {
                    if (!_fitJobs.IsCurrent(generation)) return;
                    IsFitting = false;
                    Changed?.Invoke();
                    Offered?.Invoke(FitOffer(document, request, result));
                });
            }
            // a cancellation passes through and ends the task as cancelled: nothing is posted back
            catch (Exception e) when (e is not (OutOfMemoryException or OperationCanceledException))
            {
                _scheduler.Post(() =>
                {
                    if (!_fitJobs.IsCurrent(generation)) return;
                    IsFitting = false;
                    Changed?.Invoke();
                    Said?.Invoke("✗ fit failed: " + ProblemText.Describe(e), true);
                });
            }
        }, token);
        return null;
    }

    /// <summary>Fitted values in the file's units and each target's residual; 'a' writes all values as one undoable edit.</summary>
    private Offer FitOffer(DeviceDocument fittedOn, FitRequest request, FitResult result)
    {
        Said?.Invoke(ReferenceEquals(fittedOn, _session.Document) ? $"fit done ({result.Iterations} steps); a applies the values, Esc leaves the device as it is"
            : "the device changed while fitting; the values are for the device as it was", false);
        string values = string.Join(" · ", request.Fields.Select(f => $"{f.DevicePath} = {f.Display(result.Values[f.DevicePath])}"));
        string residuals = string.Join(" · ", result.Residuals.Select(r =>
            $"{r.Target.Quantity} off by {ParameterText.Display(r.Residual, UnitKind.Frequency, ResidualDigits)}"));
        string bounds = result.AtBounds.Count > 0 ? $" · at a bound: {string.Join(", ", result.AtBounds)}" : "";
        // how the fit ended, as the command line says it: a local minimum or an unreachable target is worth knowing
        string how = result.Converged ? $"fit ({result.Iterations} steps, {result.Message})" : $"fit NOT converged ({result.Message})";
        var edits = request.Fields.Select(f => (f.FieldPath!, f.Format(result.Values[f.DevicePath]))).ToList();
        return new Offer($"{how}: {values}; {residuals}{bounds}.\na applies · Esc leave",
            new Dictionary<char, Func<EditOutcome>> { ['a'] = () => _session.SetValues(edits, "fit applied: " + string.Join(", ", edits.Select(e => $"{e.Item1} = {e.Item2}"))) },
            "fit result left; the device is unchanged");
    }
}
