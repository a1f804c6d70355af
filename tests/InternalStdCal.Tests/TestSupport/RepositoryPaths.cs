using System;
using System.IO;

namespace InternalStdCal.Tests.TestSupport;

/// <summary>Locations of the repository and of the shared reference data beside it.</summary>
internal static class RepositoryPaths
{
    /// <summary>Folder holding InternalStdCal.sln, found by walking up from the test binaries.</summary>
    internal static string Root
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "InternalStdCal.sln")))
            {
                dir = dir.Parent;
            }

            return dir?.FullName ?? throw new InvalidOperationException("InternalStdCal.sln not found above " + AppContext.BaseDirectory);
        }
    }

    /// <summary>../shared/reference-data/nist-strd/ relative to the repository root (may not exist).</summary>
    internal static string NistStrdFolder =>
        Path.GetFullPath(Path.Combine(Root, "..", "shared", "reference-data", "nist-strd"));
}
