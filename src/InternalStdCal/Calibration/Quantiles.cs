using MathNet.Numerics;

namespace InternalStdCal.Calibration;

/// <summary>Student t and F distribution values used by the calibration diagnostics (MathNet.Numerics).</summary>
internal static class Quantiles
{
    /// <summary>t quantile with cumulative probability <paramref name="p"/> and ν degrees of freedom.</summary>
    internal static double StudentT(double p, double degreesOfFreedom) =>
        MathNet.Numerics.Distributions.StudentT.InvCDF(0, 1, degreesOfFreedom, p);

    /// <summary>F quantile F(p; ν1, ν2).</summary>
    internal static double F(double p, double numeratorDf, double denominatorDf) =>
        MathNet.Numerics.Distributions.FisherSnedecor.InvCDF(numeratorDf, denominatorDf, p);

    /// <summary>Upper-tail probability P(F ≥ f) of F(ν1, ν2) = I_{ν2/(ν2 + ν1·f)}(ν2/2, ν1/2), computed directly so
    /// small p-values keep their precision.</summary>
    internal static double FUpperTail(double f, double numeratorDf, double denominatorDf) =>
        f <= 0 ? 1 : SpecialFunctions.BetaRegularized(denominatorDf / 2, numeratorDf / 2, denominatorDf / (denominatorDf + (numeratorDf * f)));
}
