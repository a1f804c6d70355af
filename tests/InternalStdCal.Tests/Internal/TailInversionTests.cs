using System;
using InternalStdCal.Internal;
using Xunit;

namespace InternalStdCal.Tests.Internal;

public class TailInversionTests
{
    [Fact]
    public void Solve_ExponentialTail_IsMinusLogOfTarget()
    {
        // Computed: P(X > v) = e^(−v) for the unit exponential, so the upper-tail quantile of 0.05 is −ln 0.05.
        Assert.Equal(-Math.Log(0.05), TailInversion.Solve(default(Exponential), 0.05, 1), 14);
        Assert.Equal(-Math.Log(1e-10), TailInversion.Solve(default(Exponential), 1e-10, double.PositiveInfinity), 13);
    }

    [Fact]
    public void Solve_TailThatNeverFallsToTheTarget_ThrowsInsteadOfLooping()
    {
        var e = Assert.Throws<InvalidOperationException>(() => TailInversion.Solve(default(Flat), 0.5, 1));
        Assert.Equal("Quantile search did not converge (upper bound overflow).", e.Message);
    }

    private readonly struct Exponential : ITailDistribution
    {
        public double UpperTail(double v) => Math.Exp(-v);

        public double Density(double v) => Math.Exp(-v);
    }

    // Not a valid tail (never decreases): the bracket search must stop at overflow.
    private readonly struct Flat : ITailDistribution
    {
        public double UpperTail(double v) => 1;

        public double Density(double v) => 0;
    }
}
