using System.Collections.Generic;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>The allocation-free inverse prediction and the fast straight-line path agree with the general ones.</summary>
public partial class RegressionFitTests
{
    [Theory]
    [InlineData(2.9, "0.7160037", "0.26457", "0.680098")]
    [InlineData(13.5, "6.2072155", "0.239754", "0.616308")]
    public void EstimateInverse_FluorescenceExample_MatchesTextbook(double y0, string x0, string se, string halfWidth)
    {
        // Same worked example and computed values as InversePredict_FluorescenceExample_MatchesTextbook
        // (Miller & Miller ch. 5, data from memory; numbers computed, field-reference §1.2).
        InverseEstimate e = Fluorescence().EstimateInverse(y0);

        Printed.Equal(x0, e.Value);
        Printed.Equal(se, e.StandardError);
        Printed.Equal(halfWidth, e.Interval.HalfWidth);
        Assert.Equal(5, e.DegreesOfFreedom);
        Assert.False(e.IsExtrapolated);
    }

    // Property (any data): the struct path is the class path without the text — equal bit for bit, for every
    // model, weighting and confidence level (0.95 uses the fit's cached t; the others compute it per call).
    [Property(MaxTest = 200)]
    public Property EstimateInverse_AnyFit_EqualsInversePredictBitForBit() =>
        Prop.ForAll(
            Models.SelectMany(m => Cases(m, noisy: true))
                .SelectMany(c => Gen.ArrayOf(Gen.Choose(1, 1000), c.X.Length)
                    .SelectMany(w => Gen.Elements(0.9, 0.95, 0.99)
                        .SelectMany(level => Gen.Choose(1, 4).Select(m => (Case: c, Weights: w.Select(v => (double)v).ToArray(), Level: level, Replicates: m)))))
                .ToArbitrary(),
            t =>
            {
                RegressionFit plain = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model);
                RegressionFit weighted = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model, Weighting.Custom(t.Weights));
                double y0 = plain.Predict(t.Case.X.Average());
                return Same(plain.EstimateInverse(y0, t.Replicates, t.Level), plain.InversePredict(y0, t.Replicates, t.Level))
                    && Same(plain.EstimateInverse(y0, t.Replicates, t.Level), plain.EstimateInverse(y0, t.Replicates, t.Level))
                    && Same(weighted.EstimateInverse(y0, t.Replicates, t.Level, 2.5), weighted.InversePredict(y0, t.Replicates, t.Level, 2.5));
            });

    // Property (any data): array input takes the one-pass path, other lists the checked path with weights scaled by
    // a power of 2; power-of-2 scaling is exact, so both give the same fit bit for bit, even for weights far from 1.
    [Property(MaxTest = 200)]
    public Property Fit_ArrayOrListInput_GivesIdenticalLineFit() =>
        Prop.ForAll(
            Gen.Elements(CalibrationModel.Linear, CalibrationModel.LinearThroughOrigin).SelectMany(m => Cases(m, noisy: true))
                .SelectMany(c => Gen.ArrayOf(Gen.Choose(1, 1000), c.X.Length)
                    .SelectMany(w => Gen.Choose(-60, 60).Select(k => (Case: c, Weights: w.Select(v => v * System.Math.Pow(10, k)).ToArray()))))
                .ToArbitrary(),
            t =>
            {
                RegressionFit fromArrays = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model, Weighting.Custom(t.Weights));
                RegressionFit fromLists = RegressionFit.Fit(new List<double>(t.Case.X), new List<double>(t.Case.Y), t.Case.Model, Weighting.Custom(t.Weights));
                return fromArrays.Coefficients.SequenceEqual(fromLists.Coefficients)
                    && fromArrays.StandardErrors.SequenceEqual(fromLists.StandardErrors)
                    && fromArrays.Weights.SequenceEqual(fromLists.Weights)
                    && fromArrays.ResidualStandardDeviation.Equals(fromLists.ResidualStandardDeviation)
                    && fromArrays.RSquared.Equals(fromLists.RSquared);
            });

    [Fact]
    public void EstimateInverse_BadArguments_ThrowLikeInversePredict()
    {
        RegressionFit fit = Fluorescence();

        Assert.Equal("response", Assert.Throws<System.ArgumentOutOfRangeException>(() => fit.EstimateInverse(double.NaN)).ParamName);
        Assert.Equal("replicates", Assert.Throws<System.ArgumentOutOfRangeException>(() => fit.EstimateInverse(10, 0)).ParamName);
        Assert.Contains("(0, 1)", Assert.Throws<System.ArgumentOutOfRangeException>(() => fit.EstimateInverse(10, 1, 1.0)).Message, System.StringComparison.Ordinal);
        Assert.Equal("unknownWeight", Assert.Throws<System.ArgumentOutOfRangeException>(() => fit.EstimateInverse(10, 1, 0.95, -1)).ParamName);
    }

    private static bool Same(InverseEstimate e, InversePrediction p) =>
        e.Value.Equals(p.Value) && e.StandardError.Equals(p.StandardError) && e.Interval == p.Interval
        && e.DegreesOfFreedom == p.DegreesOfFreedom && e.Replicates == p.Replicates && e.MeanResponse.Equals(p.MeanResponse)
        && e.UnknownWeight.Equals(p.UnknownWeight) && e.Extrapolation == p.Extrapolation;

    private static bool Same(InverseEstimate e, InverseEstimate f) => e == f && e.Equals((object)f) && e.GetHashCode() == f.GetHashCode();
}
