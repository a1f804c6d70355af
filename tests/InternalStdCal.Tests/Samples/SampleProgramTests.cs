using System;
using System.IO;
using System.Reflection;
using Xunit;

namespace InternalStdCal.Tests.Samples;

/// <summary>Tests that redirect <see cref="Console.Out"/> run alone, never beside other tests.</summary>
[CollectionDefinition(nameof(ConsoleRedirection), DisableParallelization = true)]
public sealed class ConsoleRedirection
{
}

// Invented demo data (the console samples): the checks are that each sample runs to the end and prints its key lines.
[Collection(nameof(ConsoleRedirection))]
public class SampleProgramTests
{
    [Fact]
    public void BudgetDemo_Run_PrintsBudgetMonteCarloAndDecision()
    {
        string output = RunEntryPoint("BudgetDemo");

        Assert.Contains("Dilution chain from VR-23 stock", output, StringComparison.Ordinal);
        Assert.Contains("WS-6: ", output, StringComparison.Ordinal);
        Assert.Contains("Stage ", output, StringComparison.Ordinal);
        Assert.Contains("c = ∂f/∂x", output, StringComparison.Ordinal);
        Assert.Contains("Monte Carlo: result = ", output, StringComparison.Ordinal);
        Assert.Contains("shortest [", output, StringComparison.Ordinal);
        Assert.Contains("(JCGM 101:2008 §8)", output, StringComparison.Ordinal);
        Assert.Contains("Rule: Guard band w = U", output, StringComparison.Ordinal);
        Assert.Contains("Caution: ", output, StringComparison.Ordinal);
    }

    [Fact]
    public void SelectInternalStandardDemo_Run_RanksLabelledAnalogueFirst()
    {
        string output = RunEntryPoint("SelectInternalStandardDemo");

        Assert.Contains("Internal-standard selection for 'PX-88'", output, StringComparison.Ordinal);
        Assert.Contains("best: PX-88-13C6", output, StringComparison.Ordinal);
        Assert.Contains("worsens", output, StringComparison.Ordinal);
        Assert.Contains("warning: NB-2", output, StringComparison.Ordinal);
        Assert.Contains("times tighter", output, StringComparison.Ordinal);
        Assert.Contains("Caution: ", output, StringComparison.Ordinal);
    }

    [Fact]
    public void ComplianceDemo_Run_PrintsEveryRuleAndThePlan()
    {
        string output = RunEntryPoint("ComplianceDemo");

        Assert.Contains("Rule: Simple acceptance (w = 0)", output, StringComparison.Ordinal);
        Assert.Contains("Inconclusive / ConditionalPass", output, StringComparison.Ordinal);
        Assert.Contains("Plan: 14 replicates give power", output, StringComparison.Ordinal);
        Assert.Contains("10 more", output, StringComparison.Ordinal);
        Assert.Contains("never replace", output, StringComparison.Ordinal);
    }

    [Fact]
    public void CalibrateDemo_Run_PrintsWeightingComparisonAndCalibration()
    {
        string output = RunEntryPoint("CalibrateDemo");

        Assert.Contains("Weighting comparison", output, StringComparison.Ordinal);
        Assert.Contains("Ratio calibration: straight line", output, StringComparison.Ordinal);
        Assert.Contains("calibrated range", output, StringComparison.Ordinal);
    }

    /// <summary>Runs a referenced sample's Main in this process and returns what it wrote to the console.</summary>
    private static string RunEntryPoint(string assemblyName)
    {
        MethodInfo main = Assembly.Load(new AssemblyName(assemblyName)).EntryPoint
            ?? throw new InvalidOperationException(assemblyName + " has no entry point.");
        object?[]? arguments = main.GetParameters().Length == 0 ? null : new object?[] { Array.Empty<string>() };
        TextWriter original = Console.Out;
        using var output = new StringWriter();
        Console.SetOut(output);
        try
        {
            main.Invoke(null, arguments);
        }
        finally
        {
            Console.SetOut(original);
        }

        return output.ToString();
    }
}
