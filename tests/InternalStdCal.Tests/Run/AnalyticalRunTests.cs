using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Consistency checks of a run at creation; each error must name the offending row (project rule).</summary>
public class AnalyticalRunTests
{
    private static readonly string[] Analytes = { "Pb", "Cd" };
    private static readonly string[] Standards = { "Bi", "In" };

    [Fact]
    public void Create_RowsInAnyOrder_SortsByInjectionOrder()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Reverse();
        AnalyticalRun run = RunScenario.Run(rows);
        Assert.Equal(Enumerable.Range(1, 17), run.Injections.Select(r => r.Order));
    }

    [Fact]
    public void Create_DuplicateInjectionOrder_ThrowsNamingBothRows()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.Sample(9, "S9", RunScenario.Signals(1, 1, 1, 1)));
        ArgumentException e = Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
        Assert.Contains("'S9'", e.Message, StringComparison.Ordinal);
        Assert.Contains("'S1'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_UndeclaredAnalyteSignal_ThrowsNamingTheRowAndSignal()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.Sample(30, "S9", RunScenario.Signals(1, 1, 1, 1).WithAnalyte("Zn", 5)));
        ArgumentException e = Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
        Assert.Contains("#30 Sample 'S9'", e.Message, StringComparison.Ordinal);
        Assert.Contains("'Zn'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_UndeclaredInternalStandard_ThrowsNamingTheRow()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.Sample(30, "S9", RunScenario.Signals(1, 1, 1, 1).WithInternalStandard("Rh", 5)));
        ArgumentException e = Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
        Assert.Contains("'Rh'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_UndeclaredNominalAnalyte_Throws()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.QualityControl(30, "QC2", new Dictionary<string, Concentration> { ["Zn"] = RunScenario.Ug(1) }, RunScenario.Signals(1, 1, 1, 1)));
        Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
    }

    [Fact]
    public void Create_IdSharedBetweenRoles_Throws()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.MethodBlank(30, "S1", RunScenario.Signals(1, 1, 1, 1)));
        ArgumentException e = Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
        Assert.Contains("another role", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_ReplicateWithOtherPreparation_Throws()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.Sample(30, "S1", RunScenario.Signals(1, 1, 1, 1)));
        Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
    }

    [Fact]
    public void Create_ReplicateStandardWithOtherNominal_Throws()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.CalibrationStandard(30, "CAL-1", RunScenario.Nominal(1.5, 0.5), RunScenario.Signals(1, 1, 1, 1)));
        Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
    }

    [Fact]
    public void Create_DuplicateWithUnknownParent_Throws()
    {
        List<RunInjection> rows = RunScenario.Rows();
        rows.Add(RunInjection.SampleDuplicate(30, "S7-D", "S7", RunScenario.Signals(1, 1, 1, 1)));
        ArgumentException e = Assert.Throws<ArgumentException>("injections", () => RunScenario.Run(rows));
        Assert.Contains("'S7'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_BadNameLists_Throw()
    {
        List<RunInjection> rows = RunScenario.Rows();
        Assert.Throws<ArgumentException>("analytes", () => AnalyticalRun.Create("r", Array.Empty<string>(), Standards, rows));
        Assert.Throws<ArgumentException>("analytes", () => AnalyticalRun.Create("r", new[] { "Pb", "Pb" }, Standards, rows));
        Assert.Throws<ArgumentException>("internalStandards", () => AnalyticalRun.Create("r", Analytes, new[] { " " }, rows));
        Assert.Throws<ArgumentException>("injections", () => AnalyticalRun.Create("r", Analytes, Standards, Array.Empty<RunInjection>()));
        Assert.Throws<ArgumentNullException>("injections", () => AnalyticalRun.Create("r", Analytes, Standards, new RunInjection[] { null! }));
        Assert.Throws<ArgumentException>("name", () => AnalyticalRun.Create(" ", Analytes, Standards, rows));
    }
}
