using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;
using System.Threading.Tasks;
using Microsoft.DotNet.Interactive;
using Microsoft.DotNet.Interactive.Commands;
using Microsoft.DotNet.Interactive.CSharp;
using Microsoft.DotNet.Interactive.Documents;
using Microsoft.DotNet.Interactive.Documents.Jupyter;
using Microsoft.DotNet.Interactive.Events;

namespace InternalStdCal.Notebook.Tests;

/// <summary>One executed code cell: its index among all cells, outputs and error (if any).</summary>
internal sealed record CellRun(int Index, string Code, IReadOnlyList<InteractiveDocumentOutputElement> Outputs, string? Error)
{
    /// <summary>All text/plain and text/html values and stdout of the cell, joined.</summary>
    public string Text => string.Join("\n", Outputs.Select(OutputText));

    private static string OutputText(InteractiveDocumentOutputElement output) => output switch
    {
        TextElement t => t.Text,
        DisplayElement d => string.Join("\n", d.Data.Values.Select(v => v?.ToString())),
        ReturnValueElement r => string.Join("\n", r.Data.Values.Select(v => v?.ToString())),
        ErrorElement e => e.ErrorName + ": " + e.ErrorValue,
        _ => string.Empty,
    };
}

/// <summary>Runs the code cells of a .ipynb in order in a fresh C# kernel and collects their outputs.</summary>
internal static class NotebookRunner
{
    private static readonly Regex ReferenceLine = new(@"^\s*#r\s+""(?<target>[^""]+)""\s*$", RegexOptions.Multiline);

    public static InteractiveDocument Read(string path)
    {
        var kernels = new KernelInfoCollection { new Microsoft.DotNet.Interactive.Documents.KernelInfo("csharp", "C#", new[] { "c#", "cs" }) };
        kernels.DefaultKernelName = "csharp";
        return Microsoft.DotNet.Interactive.Documents.Jupyter.Notebook.Parse(File.ReadAllText(path), kernels);
    }

    /// <summary>
    /// Points every <c>#r</c> of the notebook at the DLLs beside this test assembly (built with it):
    /// <c>#r "nuget: Name, version"</c> becomes <c>#r "&lt;bin&gt;/Name.dll"</c>, <c>#r "…/X.dll"</c> becomes <c>#r "&lt;bin&gt;/X.dll"</c>.
    /// </summary>
    public static string UseBuiltReferences(string code) => ReferenceLine.Replace(code, m =>
    {
        string target = m.Groups["target"].Value;
        string file = target.StartsWith("nuget:", StringComparison.Ordinal)
            ? target.Substring(6).Split(',')[0].Trim() + ".dll"
            : Path.GetFileName(target);
        string local = Path.Combine(AppContext.BaseDirectory, file);
        if (!File.Exists(local))
        {
            throw new FileNotFoundException($"The notebook references {target}; expected {local} beside the test assembly.", local);
        }

        return $"#r \"{local}\"";
    });

    public static async Task<IReadOnlyList<CellRun>> RunAsync(InteractiveDocument document)
    {
        using var kernel = new CompositeKernel { new CSharpKernel().UseKernelHelpers().UseValueSharing() };
        kernel.DefaultKernelName = "csharp";
        var runs = new List<CellRun>();
        for (int i = 0; i < document.Elements.Count; i++)
        {
            InteractiveDocumentElement cell = document.Elements[i];
            if (cell.KernelName != "csharp")
            {
                continue;
            }

            KernelCommandResult result = await kernel.SendAsync(new SubmitCode(UseBuiltReferences(cell.Contents), "csharp"));
            var outputs = new List<InteractiveDocumentOutputElement>();
            string? error = null;
            foreach (KernelEvent e in result.Events)
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
                        foreach (var v in r.FormattedValues)
                        {
                            value.Data[v.MimeType] = v.Value;
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

            runs.Add(new CellRun(i, cell.Contents, outputs, error));
        }

        return runs;
    }
}
