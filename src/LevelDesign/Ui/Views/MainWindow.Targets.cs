using LevelDesign.Core.DeviceFiles;
using LevelDesign.Core.Files;
using LevelDesign.Core.Presentation;
using LevelDesign.Core.Composite;
using LevelDesign.Core.Eigen;
using LevelDesign.Core.Sweeps;
using LevelDesign.Core.Units;
using LevelDesign.Ui.Compute;
using LevelDesign.Ui.Export;
using LevelDesign.Ui.Session;
using LevelDesign.Ui.Text;

namespace LevelDesign.Ui.Views;

/// <summary>F9: target searches and fits, run off the UI thread, answered by offers the designer applies or leaves.</summary>
public sealed partial class MainWindow
{
    /// <summary>The question of F9, one form per line so both read whole at 80 columns.</summary>
    public const string TargetQuestion = "target: QUANTITY = VALUE by BIAS LOW to HIGH\nor  fit PATH [LOW..HIGH] [PATH ...] to QUANTITY = VALUE [at POINT][, ...]";

    private void AskTarget()
    {
        var document = _session.Document;
        if (document is null) { Say("no device is open", warning: true); return; }
        var bias = document.Biases.FirstOrDefault();
        string range = bias is null ? "qa.flux 0 to 0.5"
            : $"{bias.Name} {ShownUnit.Of(document, bias.Name).Text(bias.Offset)} to {ShownUnit.Of(document, bias.Name).Text(bias.Offset + bias.Period / 2)}";
        string quantity = _snapshot?.Quantities.Named().Keys.FirstOrDefault() ?? "qa.f01";
        _prompt.Ask(TargetQuestion, _lastTarget ?? $"{quantity} = 5 GHz by {range}", text =>
        {
            _lastTarget = text;   // offered again next time, so a search is repeated or adjusted, not retyped
            if (FitRequestParser.IsFit(text)) return StartFit(text, document);
            var request = TargetRequestParser.Parse(text, document, _snapshot?.Quantities.Named().Keys, out string? error);
            if (request is null) return error;
            StartSolve(document, request);
            return null;
        });
    }

    /// <summary>The last F9 entry, offered again.</summary>
    private string? _lastTarget;

    private void StartSolve(Core.DeviceFiles.DeviceDocument document, TargetRequest request)
    {
        var (generation, token) = _solveJobs.Begin();
        _solving = true;
        UpdateStatus();
        Say($"⟳ solving {request.Quantity} = {FrequencyText.Of(request.Quantity, request.GoalGHz)} by {request.Bias} ({request.ScanPoints}-point scan, hybridized steps sampled {TargetSolver.RefinementSamples}× finer, then Brent); Esc cancels");
        Task.Run(async () =>
        {
            try
            {
                var found = await _targets.FindAllAsync(document, request, token).ConfigureAwait(false);
                _scheduler.Post(() =>
                {
                    if (!_solveJobs.IsCurrent(generation)) return;
                    _solving = false;
                    UpdateStatus();
                    OfferRoots(document, request, found);
                });
            }
            catch (OperationCanceledException) { }
            catch (Exception e) when (e is not OutOfMemoryException)
            {
                _scheduler.Post(() =>
                {
                    if (!_solveJobs.IsCurrent(generation)) return;
                    _solving = false;
                    UpdateStatus();
                    Say("✗ target not solved: " + DescribeProblem(e), warning: true);
                });
            }
        }, CancellationToken.None);
    }

    /// <summary>Lists every root; a digit applies that one to the device (an ordinary, undoable edit of the bias value).</summary>
    private void OfferRoots(Core.DeviceFiles.DeviceDocument solvedOn, TargetRequest request, TargetSearchResult found)
    {
        var roots = found.Roots;
        var unit = ShownUnit.Of(solvedOn, request.Bias);
        if (!roots.Any(r => r.Refined))
        {
            Say(TargetOfferText.Missed(request, found, unit, solvedOn.PurityThreshold), warning: true);
            if (roots.Count == 0) return;   // label jumps alone are still offered below, marked as such
        }
        else Say(ReferenceEquals(solvedOn, _session.Document) ? "target search done; a digit applies one of the values listed, Esc leaves the device as it is"
            : "the device changed while solving; the roots are for the device as it was");
        var offers = new Dictionary<char, Action>();
        for (int i = 0; i < roots.Count && i < 9; i++)
        {
            double bias = roots[i].Bias;
            offers[(char)('1' + i)] = () => ApplyRoot(request.Bias, bias);
        }
        string more = roots.Count > 9 ? $" (+{roots.Count - 9} more)" : "";
        _prompt.Choose($"{TargetOfferText.Goal(request)} at {request.Bias} = {string.Join(" · ", TargetOfferText.Offers(request, roots, unit, solvedOn.PurityThreshold))}{more}.\ndigit applies · Esc leave", offers,
            onCancel: () => Say("target values left; the device is unchanged"));
    }

    /// <summary>The latest fit's task (it ends as cancelled after Esc), for tests that check the work really stops.</summary>
    public Task? RunningFit { get; private set; }

    /// <summary>
    /// Runs the fit off the UI thread. Esc cancels it: the token reaches Core's fit loop and every full solve (through
    /// <see cref="CancellableEigenSolver"/>), a late result is dropped, and the device is never touched.
    /// </summary>
    private string? StartFit(string text, Core.DeviceFiles.DeviceDocument document)
    {
        if (_snapshot is null) return "wait until the device has been computed once (the quantity names come from it)";
        var request = FitRequestParser.Parse(text, document, _snapshot.Quantities.Named().Keys.ToArray(), out string? error);
        if (request is null) return error;
        var (generation, token) = _fitJobs.Begin();
        _fitting = true;
        UpdateStatus();
        Say($"⟳ fitting {string.Join(", ", request.Parameters.Select(p => p.Path))} to {request.Targets.Count} target(s) (least squares, full solves); Esc cancels");
        RunningFit = Task.Run(() =>
        {
            try
            {
                var solver = new DeviceSolver(new CancellableEigenSolver(EigenSolvers.Active, token));
                var result = ParameterFit.Fit(document.Device, request.Parameters, request.Targets, solver, cancellation: token);
                _scheduler.Post(() =>
                {
                    if (!_fitJobs.IsCurrent(generation)) return;
                    _fitting = false;
                    UpdateStatus();
                    OfferFit(document, request, result);
                });
            }
            // a cancellation passes through and ends the task as cancelled: nothing is posted back
            catch (Exception e) when (e is not (OutOfMemoryException or OperationCanceledException))
            {
                _scheduler.Post(() =>
                {
                    if (!_fitJobs.IsCurrent(generation)) return;
                    _fitting = false;
                    UpdateStatus();
                    Say("✗ fit failed: " + DescribeProblem(e), warning: true);
                });
            }
        }, token);
        return null;
    }

    /// <summary>Significant digits of a fit residual in the offer (the fitted values keep the digits written to the file).</summary>
    private const int ResidualDigits = 3;

    /// <summary>Fitted values in the file's units and each target's residual; 'a' writes all values as one undoable edit.</summary>
    private void OfferFit(Core.DeviceFiles.DeviceDocument fittedOn, FitRequest request, FitResult result)
    {
        Say(ReferenceEquals(fittedOn, _session.Document) ? $"fit done ({result.Iterations} steps); a applies the values, Esc leaves the device as it is"
            : "the device changed while fitting; the values are for the device as it was");
        string values = string.Join(" · ", request.Fields.Select(f => $"{f.DevicePath} = {f.Display(result.Values[f.DevicePath])}"));
        string residuals = string.Join(" · ", result.Residuals.Select(r =>
            $"{r.Target.Quantity} off by {ParameterText.Display(r.Residual, UnitKind.Frequency, ResidualDigits)}"));
        string bounds = result.AtBounds.Count > 0 ? $" · at a bound: {string.Join(", ", result.AtBounds)}" : "";
        // how the fit ended, as the command line says it: a local minimum or an unreachable target is worth knowing
        string how = result.Converged ? $"fit ({result.Iterations} steps, {result.Message})" : $"fit NOT converged ({result.Message})";
        var edits = request.Fields.Select(f => (f.FieldPath!, f.Format(result.Values[f.DevicePath]))).ToList();
        _prompt.Choose($"{how}: {values}; {residuals}{bounds}.\na applies · Esc leave",
            new Dictionary<char, Action> { ['a'] = () => Report(_session.SetValues(edits, "fit applied: " + string.Join(", ", edits.Select(e => $"{e.Item1} = {e.Item2}")))) },
            onCancel: () => Say("fit result left; the device is unchanged"));
    }

    private void ApplyRoot(string biasOrPath, double value)
    {
        var document = _session.Document;
        if (document is null) return;
        var edit = TargetRequestParser.FieldFor(document, biasOrPath, value);
        if (edit is null) { Say($"✗ {biasOrPath} is not a value written in the file", warning: true); return; }
        Report(_session.SetValue(edit.Value.Field, edit.Value.Text));
    }
}
