using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using System.Threading.Tasks;
using Microsoft.DotNet.Interactive.Documents;
using Xunit;

namespace InternalStdCal.Notebook.Tests;

public class NotebookTests
{
    [Fact]
    public async Task Dump()
    {
        string path = Environment.GetEnvironmentVariable("NB") ?? throw new InvalidOperationException();
        InteractiveDocument doc = NotebookRunner.Read(path);
        IReadOnlyList<CellRun> runs = await NotebookRunner.RunAsync(doc);
        using var w = new StreamWriter("/tmp/nb-dump.txt");
        foreach (CellRun r in runs)
        {
            w.WriteLine($"=== cell {r.Index} error={r.Error}");
            foreach (var o in r.Outputs)
            {
                switch (o)
                {
                    case DisplayElement d: foreach (var kv in d.Data) w.WriteLine($"[display {kv.Key}]\n{System.Net.WebUtility.HtmlDecode(kv.Value?.ToString())}"); break;
                    case ReturnValueElement d: foreach (var kv in d.Data) w.WriteLine($"[return {kv.Key}]\n{System.Net.WebUtility.HtmlDecode(kv.Value?.ToString())}"); break;
                    case TextElement t: w.WriteLine($"[{t.Name}]\n{t.Text}"); break;
                    case ErrorElement e: w.WriteLine($"[error] {e.ErrorValue}"); break;
                }
            }
        }
    }
}
