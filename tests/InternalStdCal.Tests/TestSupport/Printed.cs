using System;
using System.Globalization;
using Xunit;

namespace InternalStdCal.Tests.TestSupport;

/// <summary>Comparison with a value as printed in a table: equal within half a unit of its last printed digit.</summary>
internal static class Printed
{
    internal static void Equal(string printed, double actual)
    {
        double expected = double.Parse(printed, NumberStyles.Float, CultureInfo.InvariantCulture);
        int dot = printed.IndexOf('.', StringComparison.Ordinal);
        int decimals = dot < 0 ? 0 : printed.Length - dot - 1;
        double halfUnit = 0.5 * Math.Pow(10, -decimals);
        Assert.True(Math.Abs(actual - expected) <= halfUnit * 1.0001, $"expected {printed}, got {actual.ToString("R", CultureInfo.InvariantCulture)}");
    }
}
