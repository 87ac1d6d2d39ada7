using System.Globalization;
using System.Runtime.InteropServices;

namespace LevelDesign.Core.Eigen;

/// <summary>
/// Entry points of a Fortran-ABI LAPACK (LP64: 32-bit integers, everything by pointer, column-major).
/// Each character argument is followed at the end by its hidden length, as gfortran passes it.
/// Resolved through <see cref="NativeLibrary"/> so that a missing library or symbol is a reported
/// reason rather than a crash at the first call.
/// </summary>
internal sealed unsafe class LapackExports
{
    public const string DefaultLibraryName = "liblapack.so.3";

    // jobz, range, uplo, n, a, lda, vl, vu, il, iu, abstol, m, w, z, ldz, isuppz, work, lwork, iwork, liwork, info
    public readonly delegate* unmanaged<byte*, byte*, byte*, int*, double*, int*, double*, double*, int*, int*,
        double*, int*, double*, double*, int*, int*, double*, int*, int*, int*, int*, nuint, nuint, nuint, void> Dsyevr;

    // jobz, range, uplo, n, a, lda, vl, vu, il, iu, abstol, m, w, z, ldz, isuppz, work, lwork, rwork, lrwork, iwork, liwork, info
    public readonly delegate* unmanaged<byte*, byte*, byte*, int*, void*, int*, double*, double*, int*, int*,
        double*, int*, double*, void*, int*, int*, void*, int*, double*, int*, int*, int*, int*, nuint, nuint, nuint, void> Zheevr;

    // uplo, n, a, lda, info
    public readonly delegate* unmanaged<byte*, int*, double*, int*, int*, nuint, void> Dpotrf;

    // itype, uplo, n, a, lda, b, ldb, info
    public readonly delegate* unmanaged<int*, byte*, int*, double*, int*, double*, int*, int*, nuint, void> Dsygst;

    // side, uplo, transa, diag, m, n, alpha, a, lda, b, ldb
    public readonly delegate* unmanaged<byte*, byte*, byte*, byte*, int*, int*, double*, double*, int*, double*, int*,
        nuint, nuint, nuint, nuint, void> Dtrsm;

    private LapackExports(string requestedName, string? resolvedPath, nint dsyevr, nint zheevr, nint dpotrf, nint dsygst, nint dtrsm)
    {
        RequestedName = requestedName;
        ResolvedPath = resolvedPath;
        Dsyevr = (delegate* unmanaged<byte*, byte*, byte*, int*, double*, int*, double*, double*, int*, int*,
            double*, int*, double*, double*, int*, int*, double*, int*, int*, int*, int*, nuint, nuint, nuint, void>)dsyevr;
        Zheevr = (delegate* unmanaged<byte*, byte*, byte*, int*, void*, int*, double*, double*, int*, int*,
            double*, int*, double*, void*, int*, int*, void*, int*, double*, int*, int*, int*, int*, nuint, nuint, nuint, void>)zheevr;
        Dpotrf = (delegate* unmanaged<byte*, int*, double*, int*, int*, nuint, void>)dpotrf;
        Dsygst = (delegate* unmanaged<int*, byte*, int*, double*, int*, double*, int*, int*, nuint, void>)dsygst;
        Dtrsm = (delegate* unmanaged<byte*, byte*, byte*, byte*, int*, int*, double*, double*, int*, double*, int*,
            nuint, nuint, nuint, nuint, void>)dtrsm;
    }

    /// <summary>Name the library was asked for, e.g. "liblapack.so.3".</summary>
    public string RequestedName { get; }

    /// <summary>File actually mapped for it (after symlinks and alternatives), when it could be found.</summary>
    public string? ResolvedPath { get; }

    public static LapackExports? TryLoad(string libraryName, out string? failureReason)
    {
        // The handle is never freed: function pointers into it live as long as the process.
        bool oneThreadFromStart = OneBlasThreadUnlessAsked();
        if (!NativeLibrary.TryLoad(libraryName, out nint handle))
        {
            failureReason = $"cannot load {libraryName}";
            return null;
        }

        var missing = new List<string>();
        nint Export(string symbol)
        {
            // dtrsm_ is BLAS: found through the library's own dependencies when LAPACK does not define it.
            if (NativeLibrary.TryGetExport(handle, symbol, out nint address)) return address;
            missing.Add(symbol);
            return 0;
        }

        nint dsyevr = Export("dsyevr_"), zheevr = Export("zheevr_"), dpotrf = Export("dpotrf_"),
            dsygst = Export("dsygst_"), dtrsm = Export("dtrsm_");
        if (missing.Count > 0)
        {
            failureReason = $"{libraryName} lacks {string.Join(", ", missing)}";
            return null;
        }

        failureReason = null;
        if (!oneThreadFromStart) UseOneThreadUnlessAsked(handle);
        return new LapackExports(libraryName, MappedFileContaining(dsyevr), dsyevr, zheevr, dpotrf, dsygst, dtrsm);
    }

    /// <summary>
    /// Threaded OpenBLAS starts its worker threads when it is loaded, and they spin (sched_yield) for about a tenth of
    /// a second before they sleep: measured on a whole 201-point sweep, one of the two cores was taken by them for the
    /// first 130 ms. Setting OPENBLAS_NUM_THREADS=1 in the process's own environment before the load (only when the
    /// user has not set it) means no such threads are started. .NET's Environment.SetEnvironmentVariable does not reach
    /// the C library's environment on Linux (see NativeEnvironment).
    /// </summary>
    private static bool OneBlasThreadUnlessAsked() => NativeEnvironment.SetUnlessSet("OPENBLAS_NUM_THREADS", "1");

    /// <summary>
    /// Sweeps run points in parallel and the iterative solver's projected problems are small (tens of states);
    /// threaded OpenBLAS only adds contention there, so it runs one thread unless OPENBLAS_NUM_THREADS says otherwise.
    /// This is the fallback when the environment could not be set before the load (see OneBlasThreadUnlessAsked).
    /// </summary>
    private static void UseOneThreadUnlessAsked(nint handle)
    {
        if (Environment.GetEnvironmentVariable("OPENBLAS_NUM_THREADS") is not null) return;
        if (NativeLibrary.TryGetExport(handle, "openblas_set_num_threads", out nint setThreads))
            ((delegate* unmanaged<int, void>)setThreads)(1);
    }

    /// <summary>
    /// The kernel's map of this process names the real file behind an address, which is the only
    /// reliable way to tell which LAPACK the dynamic loader picked (alternatives, LD_LIBRARY_PATH, ...).
    /// </summary>
    private static string? MappedFileContaining(nint address)
    {
        const string maps = "/proc/self/maps";
        try
        {
            if (!File.Exists(maps)) return null;
            ulong a = (ulong)address;
            foreach (string line in File.ReadLines(maps))
            {
                // start-end perms offset dev inode path
                string[] parts = line.Split(' ', 6, StringSplitOptions.RemoveEmptyEntries);
                if (parts.Length < 6) continue;
                int dash = parts[0].IndexOf('-');
                if (dash < 0) continue;
                if (!ulong.TryParse(parts[0].AsSpan(0, dash), NumberStyles.HexNumber, CultureInfo.InvariantCulture, out ulong start)
                    || !ulong.TryParse(parts[0].AsSpan(dash + 1), NumberStyles.HexNumber, CultureInfo.InvariantCulture, out ulong end))
                    continue;
                if (a >= start && a < end)
                {
                    string path = parts[5].Trim();
                    return path.StartsWith('/') ? path : null;
                }
            }
        }
        catch (IOException)
        {
        }
        catch (UnauthorizedAccessException)
        {
        }
        return null;
    }
}
