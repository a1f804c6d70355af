using System;
using System.IO;
using System.Linq;
using System.Xml.Linq;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;
using InternalStdCal.Reporting;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Reporting;

// The HTML report of the invented demo run: structure (doctype + well-formed XHTML, self-contained), completeness
// (every injection id and analyte), determinism, options and argument checks.
public class RunHtmlReportTests
{
    private const string Doctype = "<!DOCTYPE html>\n";
    private static readonly XNamespace Html = "http://www.w3.org/1999/xhtml";
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static readonly RunHtmlReportOptions WithDecisions = new()
    {
        Title = "River-water survey <demo> & checks",
        Laboratory = "Invented water laboratory",
        UncertaintyBudgetSamples = new[] { "RW-02" },
        Decisions = new[]
        {
            new AnalyteSpecification("Pb-208", SpecificationLimit.Upper(Concentration.FromMicrogramsPerLitre(10), "demo limit"), DecisionRule.SimpleAcceptance),
            new AnalyteSpecification("Cd-111", SpecificationLimit.Upper(Concentration.FromMicrogramsPerLitre(6.2)), DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary)),
        },
    };

    private static XDocument Parse(string html)
    {
        Assert.StartsWith(Doctype, html, StringComparison.Ordinal);
        return XDocument.Parse(html.Substring(Doctype.Length));
    }

    private static string Text(XDocument doc) => string.Concat(doc.Descendants().Where(e => e.Name.Namespace == Html).SelectMany(e => e.Nodes().OfType<XText>()).Select(t => t.Value + " "));

    [Fact]
    public void Render_DemoRun_WellFormedAndSelfContained()
    {
        string html = RunHtmlReport.Render(DemoRun.Report);

        XDocument doc = Parse(html);
        Assert.Equal(Html + "html", doc.Root!.Name);
        Assert.Empty(doc.Descendants(Html + "script"));
        Assert.Empty(doc.Descendants(Html + "link"));
        Assert.Empty(doc.Descendants(Html + "img"));
        Assert.DoesNotContain("http://", html.Replace("http://www.w3.org/", string.Empty, StringComparison.Ordinal), StringComparison.Ordinal);
        Assert.DoesNotContain("https://", html, StringComparison.Ordinal);
        Assert.All(doc.Descendants().Attributes("href"), a => Assert.StartsWith("#", a.Value, StringComparison.Ordinal));

        // No empty non-void HTML element is written self-closed (<td/> opens a cell in an HTML parser).
        string[] voids = { "meta", "br", "hr", "img", "col" };
        Assert.DoesNotContain(
            doc.Descendants().Where(e => e.Name.Namespace == Html && e.IsEmpty),
            e => !voids.Contains(e.Name.LocalName));
    }

    [Fact]
    public void Render_DemoRun_ContainsEveryInjectionIdAndAnalyte()
    {
        string text = Text(Parse(RunHtmlReport.Render(DemoRun.Report)));

        Assert.All(DemoRun.Report.Run.Injections, i => Assert.Contains(i.Id, text, StringComparison.Ordinal));
        Assert.All(DemoRun.Report.Method.Analytes, a => Assert.Contains(a.Analyte, text, StringComparison.Ordinal));
        Assert.All(DemoRun.Report.Results, r => Assert.Contains(RunReport.QualifierText(r.Qualifiers), text, StringComparison.Ordinal));
        Assert.Contains("The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_DemoRun_ResultsTableHasARowPerSampleAndAnalyte()
    {
        XDocument doc = Parse(RunHtmlReport.Render(DemoRun.Report));

        XElement table = doc.Descendants(Html + "table").Single(t => (string?)t.Attribute("class") == "results");
        Assert.Equal(DemoRun.Report.Results.Count, table.Element(Html + "tbody")!.Elements(Html + "tr").Count());
    }

    [Fact]
    public void Render_DemoRun_PlotsAreInlineSvgWithAxisTitlesAndUniqueIds()
    {
        XDocument doc = Parse(RunHtmlReport.Render(DemoRun.Report));

        var svgs = doc.Descendants(Svg + "svg").ToList();
        int analytes = DemoRun.Report.Method.Analytes.Count;
        Assert.Equal((3 * analytes) + 2 + analytes, svgs.Count); // 3 calibration plots per analyte, 2 IS, 1 QC drift per analyte
        string[] texts = doc.Descendants(Svg + "text").Select(t => t.Value).ToArray();
        Assert.Contains("analyte concentration (µg/L)", texts);
        Assert.Contains("IS recovery (%)", texts);
        Assert.Contains("QC recovery (%)", texts);
        string[] ids = doc.Descendants().Attributes("id").Select(a => a.Value).ToArray();
        Assert.Equal(ids.Length, ids.Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void Render_SameInputTwice_Identical()
    {
        Assert.Equal(RunHtmlReport.Render(DemoRun.Report, WithDecisions), RunHtmlReport.Render(DemoRun.Report, WithDecisions));
    }

    [Fact]
    public void Write_SameTextAsRender()
    {
        var writer = new StringWriter();

        RunHtmlReport.Write(DemoRun.Report, writer, WithDecisions);

        Assert.Equal(RunHtmlReport.Render(DemoRun.Report, WithDecisions), writer.ToString());
    }

    [Fact]
    public void Render_Options_TitleEscapedLabAndDecisionsShown()
    {
        XDocument doc = Parse(RunHtmlReport.Render(DemoRun.Report, WithDecisions));
        string text = Text(doc);

        Assert.Equal("River-water survey <demo> & checks", doc.Descendants(Html + "h1").Single().Value);
        Assert.Contains("Invented water laboratory", text, StringComparison.Ordinal);
        Assert.Contains("Pb-208: upper limit 10 µg/L (demo limit)", text, StringComparison.Ordinal);
        Assert.Contains(DecisionRule.SimpleAcceptance.Description, text, StringComparison.Ordinal);
        Assert.Contains("compliant", text, StringComparison.Ordinal);
        Assert.Contains("RW-02 · Pb-208", text, StringComparison.Ordinal); // the budget asked for
        Assert.DoesNotContain("RW-01 · Cd-111", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_DefaultOptions_OneBudgetPerAnalyteAtMost()
    {
        XDocument doc = Parse(RunHtmlReport.Render(DemoRun.Report));

        XElement section = doc.Descendants(Html + "section").Single(s => (string?)s.Attribute("id") == "uncertainty");
        var headings = section.Elements(Html + "h3").Select(h => h.Value).ToList();
        Assert.InRange(headings.Count, 1, DemoRun.Report.Method.Analytes.Count);
        Assert.Equal(headings.Count, headings.Select(h => h.Split('·')[1].Trim()).Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void Render_NullArguments_ArgumentNullException()
    {
        Assert.Equal("report", Assert.Throws<ArgumentNullException>(() => RunHtmlReport.Render(null!)).ParamName);
        Assert.Equal("writer", Assert.Throws<ArgumentNullException>(() => RunHtmlReport.Write(DemoRun.Report, null!)).ParamName);
    }

    [Fact]
    public void Render_UnknownBudgetSample_MessageListsIds()
    {
        var options = new RunHtmlReportOptions { UncertaintyBudgetSamples = new[] { "RW-99" } };

        var e = Assert.Throws<ArgumentException>(() => RunHtmlReport.Render(DemoRun.Report, options));

        Assert.Equal("options", e.ParamName);
        Assert.Contains("'RW-99'", e.Message, StringComparison.Ordinal);
        Assert.Contains("'RW-01'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_DecisionForUnknownAnalyte_MessageListsAnalytes()
    {
        var options = new RunHtmlReportOptions
        {
            Decisions = new[] { new AnalyteSpecification("Zn-66", SpecificationLimit.Upper(Concentration.FromMicrogramsPerLitre(1)), DecisionRule.SimpleAcceptance) },
        };

        var e = Assert.Throws<ArgumentException>(() => RunHtmlReport.Render(DemoRun.Report, options));

        Assert.Equal("options", e.ParamName);
        Assert.Contains("'Zn-66'", e.Message, StringComparison.Ordinal);
        Assert.Contains("'Cd-111', 'Cu-63', 'Pb-208'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Options_BadValues_Throw()
    {
        Assert.Equal("Title", Assert.Throws<ArgumentException>(() => new RunHtmlReportOptions { Title = " " }).ParamName);
        Assert.Equal("UncertaintyBudgetSamples", Assert.Throws<ArgumentException>(() => new RunHtmlReportOptions { UncertaintyBudgetSamples = new[] { "RW-01", "RW-01" } }).ParamName);
        Assert.Equal("Decisions", Assert.Throws<ArgumentNullException>(() => new RunHtmlReportOptions { Decisions = null! }).ParamName);
        Assert.Equal("rule", Assert.Throws<ArgumentNullException>(() => new AnalyteSpecification("Pb-208", SpecificationLimit.Upper(Concentration.FromMicrogramsPerLitre(1)), null!)).ParamName);
    }
}
