using System;
using Xunit;

namespace InternalStdCal.Tests.TestSupport;

/// <summary>Tolerances derived from how many roundings a computation makes.</summary>
internal static class Numeric
{
    /// <summary>Unit roundoff of binary64: one correctly rounded operation has relative error ≤ 2^-53.</summary>
    internal const double UnitRoundoff = 1.1102230246251565e-16;

    /// <summary>Asserts |actual − expected| ≤ k·u·|expected| (k roundings, each ≤ u relative; (1+u)^k − 1 &lt; 1.01·k·u).</summary>
    internal static void AssertWithinRoundings(double expected, double actual, int roundings)
    {
        double tolerance = 1.01 * roundings * UnitRoundoff * Math.Abs(expected);
        Assert.True(
            Math.Abs(actual - expected) <= tolerance,
            FormattableString.Invariant($"expected {expected:R}, actual {actual:R}: difference {Math.Abs(actual - expected):R} exceeds {roundings} roundings ({tolerance:R})"));
    }

    /// <summary>Asserts |actual − expected| ≤ relative·|expected|.</summary>
    internal static void AssertRelative(double expected, double actual, double relative)
    {
        Assert.True(
            Math.Abs(actual - expected) <= relative * Math.Abs(expected),
            FormattableString.Invariant($"expected {expected:R}, actual {actual:R}: relative difference {Math.Abs(actual - expected) / Math.Abs(expected):R} exceeds {relative:R}"));
    }

    /// <summary>Bitwise equality, so that −0 and +0 are told apart.</summary>
    internal static void AssertIdentical(double expected, double actual) =>
        Assert.True(
            BitConverter.DoubleToInt64Bits(expected) == BitConverter.DoubleToInt64Bits(actual),
            FormattableString.Invariant($"expected {expected:R}, actual {actual:R} (bitwise)"));
}
