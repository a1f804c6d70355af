using System;
using System.IO;
using System.Threading.Tasks;
using Xunit;

namespace InternalStdCal.Notebook.Tests;

/// <summary>Runs the validation walk-through once for all tests of <see cref="ValidationNotebookTests"/>.</summary>
public sealed class NotebookFixture : IAsyncLifetime, IDisposable
{
    private NotebookRunner? _run;

    /// <summary>The repository root (the folder holding InternalStdCal.sln), found above the test assembly.</summary>
    public static string RepositoryRoot { get; } = FindRepositoryRoot();

    /// <summary>The notebook under test.</summary>
    public static string NotebookPath { get; } = Path.Combine(RepositoryRoot, "samples", "ValidationNotebook", "validation-walkthrough.ipynb");

    internal NotebookRunner Run => _run ?? throw new InvalidOperationException("The notebook has not run.");

    public async Task InitializeAsync() => _run = await NotebookRunner.RunAsync(NotebookRunner.Read(NotebookPath));

    public Task DisposeAsync() => Task.CompletedTask;

    public void Dispose() => _run?.Dispose();

    private static string FindRepositoryRoot()
    {
        for (DirectoryInfo? dir = new(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "InternalStdCal.sln")))
            {
                return dir.FullName;
            }
        }

        throw new DirectoryNotFoundException($"No InternalStdCal.sln above {AppContext.BaseDirectory}.");
    }
}
