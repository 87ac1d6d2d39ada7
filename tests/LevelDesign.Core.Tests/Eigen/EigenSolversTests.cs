using LevelDesign.Core.Eigen;
using Xunit.Abstractions;

namespace LevelDesign.Core.Tests.Eigen;

public sealed class EigenSolversTests(ITestOutputHelper output)
{
    [Fact]
    public void ReportsTheActiveBackend()
    {
        string description = EigenSolvers.Describe();
        output.WriteLine(description);
        Assert.StartsWith("eigensolver: " + EigenSolvers.Active.Name, description);
        if (EigenSolvers.Active.IsNative)
            Assert.Null(EigenSolvers.FallbackReason);
        else
            Assert.Contains(EigenSolvers.FallbackReason!, description);
    }

    [Fact]
    public void ActiveBackendFollowsTheEnvironment()
    {
        string? requested = Environment.GetEnvironmentVariable(EigenSolvers.EnvironmentVariable);
        output.WriteLine($"{EigenSolvers.EnvironmentVariable}={requested ?? "(unset)"}; {EigenSolvers.Describe()}");
        if (string.Equals(requested?.Trim(), "managed", StringComparison.OrdinalIgnoreCase))
        {
            Assert.False(EigenSolvers.Active.IsNative);
            Assert.Contains("managed", EigenSolvers.FallbackReason);
        }
        else
        {
            // Otherwise native is used exactly when it is available (loaded and verified).
            Assert.Equal(EigenSolvers.Native is not null, EigenSolvers.Active.IsNative);
        }
    }

    [SystemLapackFact]
    public void NativeIsChosenWhenRequestedAndTheSystemLibraryExists()
    {
        var selection = EigenSolverSelection.Choose("native", EigenSolvers.Managed, EigenSolvers.ProbeNative);
        output.WriteLine(selection.Describe());
        Assert.True(selection.Active.IsNative, "native requested and liblapack.so.3 present, but: " + selection.FallbackReason);
        Assert.Null(selection.FallbackReason);
        Assert.StartsWith("eigensolver: native LAPACK (liblapack.so.3", selection.Describe());
    }

    [Fact]
    public void ManagedRequestDoesNotTouchNative()
    {
        bool probed = false;
        var selection = EigenSolverSelection.Choose(" Managed ", EigenSolvers.Managed, () => { probed = true; return (new FakeNative(), null); });
        Assert.False(probed);
        Assert.Same(EigenSolvers.Managed, selection.Active);
        Assert.Contains("native not used: LEVELDESIGN_EIGEN=managed", selection.Describe());
    }

    [Fact]
    public void FailedNativeFallsBackToManagedWithTheReason()
    {
        var selection = EigenSolverSelection.Choose("native", EigenSolvers.Managed, () => (null, "cannot load liblapack.so.3"));
        Assert.Same(EigenSolvers.Managed, selection.Active);
        Assert.Equal("cannot load liblapack.so.3", selection.FallbackReason);
        Assert.Equal(
            $"eigensolver: {EigenSolvers.Managed.Name} — native unavailable: cannot load liblapack.so.3",
            selection.Describe());
    }

    [Fact]
    public void UnsetOrUnknownRequestPrefersAWorkingNative()
    {
        var fake = new FakeNative();
        Assert.Same(fake, EigenSolverSelection.Choose(null, EigenSolvers.Managed, () => (fake, null)).Active);
        var unknown = EigenSolverSelection.Choose("fast", EigenSolvers.Managed, () => (fake, null));
        Assert.Same(fake, unknown.Active);
        Assert.Contains("'fast' ignored", unknown.Describe());
    }

    [Fact]
    public void MissingLibraryIsAReasonNotACrash()
    {
        NativeLapackSolver? solver = NativeLapackSolver.TryCreate("liblapack-absent-for-test.so.0", out string? reason);
        Assert.Null(solver);
        Assert.Equal("cannot load liblapack-absent-for-test.so.0", reason);
    }

    [Fact]
    public void VerificationAcceptsCorrectBackends()
    {
        Assert.Null(EigenSolverCheck.Verify(EigenSolvers.Managed));
        Assert.Null(EigenSolverCheck.Verify(new FakeNative()));
        if (EigenSolvers.Native is { } native) Assert.Null(EigenSolverCheck.Verify(native));
    }

    [Fact]
    public void VerificationRejectsWrongValuesWrongVectorsAndExceptions()
    {
        var shifted = new FakeNative(r => r with { Values = r.Values.Select(v => v + 1e-9).ToArray() });
        Assert.Contains("eigenvalue", EigenSolverCheck.Verify(shifted));

        var flipped = new FakeNative(r => r with { Vectors = r.Vectors.Select(v => -v).ToArray() });
        Assert.Contains("eigenvector", EigenSolverCheck.Verify(flipped));

        Assert.Contains("DllNotFoundException", EigenSolverCheck.Verify(new FakeNative(throws: true)));
    }
}
