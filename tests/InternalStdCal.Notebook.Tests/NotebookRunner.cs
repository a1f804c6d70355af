using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Net;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using System.Threading.Tasks;
using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Documents;
using Microsoft.DotNet.Interactive.Events;
using JupyterNotebook = Microsoft.DotNet.Interactive.Documents.Jupyter.Notebook;

namespace InternalStdCal.Notebook.Tests;

/// <summary>One executed code cell: its index among all cells, its outputs and its error (null when it ran).</summary>
internal sealed record CellRun(int Index, IReadOnlyList<InteractiveDocumentOutputElement> Outputs, string? Error)
{
    /// <summary>The cell's outputs as plain text (text/plain where given, else the HTML decoded without tags).</summary>
    public string Text => string.Join("\n", Outputs.Select(PlainText));

    private static string PlainText(InteractiveDocumentOutputElement output) => output switch
    {
        TextElement t => t.Text,
        DisplayElement d => FromData(d.Data),
        ReturnValueElement r => FromData(r.Data),
        ErrorElement e => e.ErrorName + ": " + e.ErrorValue,
        _ => string.Empty,
    };

    private static string FromData(IDictionary<string, object> data) =>
        data.TryGetValue("text/plain", out object? text) ? text?.ToString() ?? string.Empty
        : data.TryGetValue("text/html", out object? html) ? WebUtility.HtmlDecode(Regex.Replace(html?.ToString() ?? string.Empty, "<[^>]+>", string.Empty))
        : string.Empty;
}

/// <summary>
/// Runs the code cells of a .ipynb in order in one fresh C# kernel, the way a reader does with "Run All", and keeps
/// the kernel so that the test can read the notebook's variables afterwards.
/// </summary>
internal sealed class NotebookRunner : IDisposable
{
    private const string CSharp = "csharp";

    private static readonly Regex ReferenceLine = new(@"^(?<indent>[ \t]*)#r[ \t]+""(?<target>[^""]+)""[ \t]*$", RegexOptions.Multiline);

    // Packages whose assembly is named otherwise than the package.
    private static readonly Dictionary<string, string> AssemblyOfPackage = new(StringComparer.OrdinalIgnoreCase) { ["OxyPlot.Core"] = "OxyPlot" };

    private readonly CompositeKernel _kernel;

    private NotebookRunner(InteractiveDocument document, CompositeKernel kernel, IReadOnlyList<CellRun> cells)
    {
        Document = document;
        _kernel = kernel;
        Cells = cells;
    }

    /// <summary>The notebook as read (its cells' sources unchanged).</summary>
    public InteractiveDocument Document { get; }

    /// <summary>The code cells, in order, with their outputs.</summary>
    public IReadOnlyList<CellRun> Cells { get; }

    /// <summary>Reads a .ipynb with C# as its default kernel.</summary>
    public static InteractiveDocument Read(string path)
    {
        var kernels = new KernelInfoCollection { new Microsoft.DotNet.Interactive.Documents.KernelInfo(CSharp, "C#", new[] { "c#", "cs" }) };
        kernels.DefaultKernelName = CSharp;
        return JupyterNotebook.Parse(File.ReadAllText(path), kernels);
    }

    /// <summary>
    /// Points every <c>#r</c> of a cell at the DLLs beside this test assembly, which the build has just produced:
    /// <c>#r "nuget: Name, version"</c> becomes <c>#r "&lt;test bin&gt;/Name.dll"</c> (OxyPlot.Core: OxyPlot.dll) and <c>#r "…/X.dll"</c> becomes
    /// <c>#r "&lt;test bin&gt;/X.dll"</c>. So the test needs no package restore inside the kernel and always runs the
    /// library of the current build, whatever configuration it was built in.
    /// </summary>
    /// <exception cref="FileNotFoundException">A referenced DLL is not beside the test assembly (add a ProjectReference).</exception>
    public static string UseBuiltReferences(string code) => ReferenceLine.Replace(code, m =>
    {
        string target = m.Groups["target"].Value;
        string file = Path.GetFileName(target);
        if (target.StartsWith("nuget:", StringComparison.Ordinal))
        {
            string package = target.Substring("nuget:".Length).Split(',')[0].Trim();
            file = (AssemblyOfPackage.TryGetValue(package, out string? assembly) ? assembly : package) + ".dll";
        }

        string local = Path.Combine(AppContext.BaseDirectory, file);
        if (!File.Exists(local))
        {
            throw new FileNotFoundException($"The notebook references {target}; expected {local} beside the test assembly.", local);
        }

        return $"{m.Groups["indent"].Value}#r \"{local}\"";
    });

    /// <summary>The targets of the notebook's <c>#r</c> lines, as written in the notebook.</summary>
    public static IReadOnlyList<string> References(InteractiveDocument document) => document.Elements
        .Where(e => e.KernelName == CSharp)
        .SelectMany(e => ReferenceLine.Matches(e.Contents).Select(m => m.Groups["target"].Value))
        .ToList();

    /// <summary>Runs every code cell in order, going on after a failing cell so that all errors are seen.</summary>
    public static async Task<NotebookRunner> RunAsync(InteractiveDocument document)
    {
        var kernel = new CompositeKernel { new CSharpKernel().UseKernelHelpers().UseValueSharing() };
        kernel.DefaultKernelName = CSharp;
        var cells = new List<CellRun>();
        for (int i = 0; i < document.Elements.Count; i++)
        {
            InteractiveDocumentElement cell = document.Elements[i];
            if (cell.KernelName == CSharp)
            {
                KernelCommandResult result = await kernel.SendAsync(new SubmitCode(UseBuiltReferences(cell.Contents), CSharp));
                cells.Add(ToCellRun(i, result.Events));
            }
        }

        return new NotebookRunner(document, kernel, cells);
    }

    /// <summary>The value of a variable the notebook defined.</summary>
    public T Value<T>(string name)
    {
        var csharp = (CSharpKernel)_kernel.FindKernelByName(CSharp);
        return csharp.TryGetValue(name, out T value) ? value : throw new InvalidOperationException($"The notebook defines no variable '{name}' of type {typeof(T).Name}.");
    }

    /// <summary>
    /// The notebook with every code cell's outputs and execution count replaced by this run's, written by the
    /// Documents API; the notebook-level metadata is kept from <paramref name="originalJson"/>.
    /// </summary>
    public string ToJupyterJson(string originalJson)
    {
        int executionCount = 0;
        foreach (CellRun run in Cells)
        {
            InteractiveDocumentElement cell = Document.Elements[run.Index];
            cell.Outputs.Clear();
            cell.Outputs.AddRange(run.Outputs);
            cell.ExecutionOrder = ++executionCount;
        }

        // A fresh document: the parsed one keeps its metadata as plain dictionaries, which the writer cannot extend.
        JsonNode written = JsonNode.Parse(JupyterNotebook.ToJupyterJson(new InteractiveDocument(Document.Elements), CSharp))!;
        written["metadata"] = JsonNode.Parse(originalJson)!["metadata"]!.DeepClone();
        return written.ToJsonString(new JsonSerializerOptions { WriteIndented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }) + "\n";
    }

    public void Dispose() => _kernel.Dispose();

    private static CellRun ToCellRun(int index, IReadOnlyList<KernelEvent> events)
    {
        var outputs = new List<InteractiveDocumentOutputElement>();
        string? error = null;
        foreach (KernelEvent e in events)
        {
            switch (e)
            {
                case StandardOutputValueProduced o:
                    outputs.Add(new TextElement(o.FormattedValues.First().Value, "stdout"));
                    break;
                case StandardErrorValueProduced o:
                    outputs.Add(new TextElement(o.FormattedValues.First().Value, "stderr"));
                    break;
                case ReturnValueProduced r:
                    var value = new ReturnValueElement();
                    foreach (var formatted in r.FormattedValues)
                    {
                        value.Data[formatted.MimeType] = formatted.Value;
                    }

                    outputs.Add(value);
                    break;
                case DisplayEvent d:
                    outputs.Add(new DisplayElement(d.FormattedValues.ToDictionary(v => v.MimeType, v => (object)v.Value)));
                    break;
                case CommandFailed f:
                    error = f.Message;
                    outputs.Add(new ErrorElement(f.Message, "Error", Array.Empty<string>()));
                    break;
            }
        }

        return new CellRun(index, outputs, error);
    }
}
