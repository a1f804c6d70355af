using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class RegressionCalibrationTests
{
    [Fact]
    public void Fit_ConstructedDataSetOls_MatchesFieldReference()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear);

        // OLS on y = A_x/A_is vs C_x: computed (field-reference §0).
        Assert.Equal(RatioModel.Linear, cal.Model);
        Assert.Equal(0.19970776, cal.Coefficients[1].Value, 8);
        Assert.Equal(0.013962987, cal.Coefficients[0].Value, 9);
        Assert.Equal(0.99995093, cal.CorrelationCoefficient, 8);
        Assert.Equal(0.99990185, cal.CoefficientOfDetermination, 8);
        Assert.Equal(0.0177412, cal.ResidualStandardDeviation, 7);
        Assert.Equal("(µg/L)⁻¹", cal.Coefficients[1].Unit);
        Assert.Equal("1", cal.Coefficients[0].Unit);
    }

    [Fact]
    public void Fit_ConstructedDataSetOls_BackCalculatedErrorsAndRseMatchFieldReference()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear);

        // Back-calc % error and RSE (p = 2, US EPA 8000D formula): computed (field-reference §0/§4.1).
        double[] re = { -4.342, -1.296, -0.0381, 1.320, -0.304 };
        for (int i = 0; i < re.Length; i++)
        {
            Assert.Equal(re[i], cal.Standards[i].RelativeErrorPercent!.Value, i == 2 ? 4 : 3);
            Assert.Equal(cal.Standards[i].RelativeErrorPercent!.Value, cal.Standards[i].Injections[0].RelativeErrorPercent!.Value, 12);
        }

        Assert.Equal(2, cal.ParameterCount);
        Assert.Equal(2.7304, cal.RelativeStandardErrorPercent!.Value, 4);
    }

    [Fact]
    public void Fit_ConstructedDataSetInverseXSquared_MatchesFieldReference()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear, Weighting.InverseXSquared);

        // 1/x² weighted ratio fit: computed (field-reference §0).
        Assert.Equal(0.20162074, cal.Coefficients[1].Value, 8);
        Assert.Equal(0.0037629392, cal.Coefficients[0].Value, 10);
        double[] re = { -0.190, 0.297, 0.025, 0.865, -0.997 };
        for (int i = 0; i < re.Length; i++)
        {
            Assert.Equal(re[i], cal.Standards[i].RelativeErrorPercent!.Value, 3);
        }
    }

    [Fact]
    public void Fit_Fluorescence_MandelMatchesFieldReference()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);

        // ISO 8466-1 Mandel test on the fluorescence data: computed (field-reference §1.3); formula FROM MEMORY.
        MandelTest mandel = cal.Mandel!;
        Assert.Equal(0.4328477132, mandel.ResidualStandardDeviationLinear, 9);
        Assert.Equal(0.41042951, mandel.ResidualStandardDeviationQuadratic, 8);
        Assert.Equal(0.26297619, mandel.DifferenceOfVariances, 8);
        Assert.Equal(1.56113, mandel.Test.Statistic, 5);
        Assert.Equal(21.1977, mandel.Test.CriticalValue, 4);
        Assert.Equal(1, mandel.Test.NumeratorDegreesOfFreedom);
        Assert.Equal(4, mandel.Test.DenominatorDegreesOfFreedom);
        Assert.False(mandel.Test.IsSignificant);
        Assert.Contains("the straight line is adequate", mandel.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_FluorescenceQuadratic_MandelIsTheSameFromEitherModel()
    {
        RegressionCalibration quad = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Quadratic);

        // Quadratic y = 1.797619048 + 1.7625·x + 0.01398809524·x², PG = 1.56113: computed (field-reference §1.3).
        Assert.Equal(1.797619048, quad.Coefficients[0].Value, 8);
        Assert.Equal(1.7625, quad.Coefficients[1].Value, 8);
        Assert.Equal(0.01398809524, quad.Coefficients[2].Value, 10);
        Assert.Equal(1.56113, quad.Mandel!.Test.Statistic, 5);
        Assert.Equal("(ng/L)⁻²", quad.Coefficients[2].Unit);
        Assert.Equal(3, quad.ParameterCount);
    }

    [Fact]
    public void Fit_Fluorescence_CoefficientIntervalsMatchFieldReference()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);

        // b ± 0.105137, a ± 0.758157 (t(0.975, 5)), s_b, s_a, cov(a, b): computed (field-reference §1.2).
        Assert.Equal(0.04090026446, cal.Coefficients[1].StandardError, 10);
        Assert.Equal(0.2949360014, cal.Coefficients[0].StandardError, 9);
        Assert.Equal(0.105137, cal.Coefficients[1].Interval.HalfWidth, 6);
        Assert.Equal(0.758157, cal.Coefficients[0].Interval.HalfWidth, 6);
        Assert.Equal(-0.01003699, cal.Covariance(0, 1), 8);
    }

    [Fact]
    public void Fit_NoReplicates_LackOfFitAndHomogeneityAreNotComputedAndSayWhy()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);

        Assert.Null(cal.LackOfFit);
        Assert.Null(cal.VarianceHomogeneity);
        Assert.Contains(cal.Notes, n => n.StartsWith("Lack-of-fit test not computed: no replicate injections", StringComparison.Ordinal));
        Assert.Contains(cal.Notes, n => n.StartsWith("Variance-homogeneity check not computed", StringComparison.Ordinal));
    }

    [Fact]
    public void Fit_ReplicatedStandards_LackOfFitMatchesAnIndependentComputation()
    {
        List<CalibrationStandard> standards = Replicated();

        RegressionCalibration cal = RegressionCalibration.Fit(standards, CalibrationModel.Linear);

        // Independent check with MathNet.Numerics: OLS line through all injections, then the textbook split
        // SSE = SS_pe + SS_lof (pure error about level means; lack of fit of the means), F = MS_lof/MS_pe.
        double[] x = standards.SelectMany(s => s.Injections.Select(_ => s.AnalyteConcentration.Value)).ToArray();
        double[] y = standards.SelectMany(s => s.Injections.Select(i => i.Ratio)).ToArray();
        (double a, double b) = MathNet.Numerics.Fit.Line(x, y);
        double sse = x.Select((xi, k) => Math.Pow(y[k] - a - (b * xi), 2)).Sum();
        double pe = standards.Sum(s =>
        {
            double m = s.Injections.Average(i => i.Ratio);
            return s.Injections.Sum(i => Math.Pow(i.Ratio - m, 2));
        });
        double f = (sse - pe) / (5 - 2) / (pe / (15 - 5));
        double p = 1 - MathNet.Numerics.Distributions.FisherSnedecor.CDF(3, 10, f);
        LackOfFitTest lof = cal.LackOfFit!;
        Assert.Equal(pe, lof.PureErrorSumOfSquares, 12);
        Assert.Equal(sse - pe, lof.LackOfFitSumOfSquares, 12);
        Assert.Equal(10, lof.PureErrorDegreesOfFreedom);
        Assert.Equal(3, lof.LackOfFitDegreesOfFreedom);
        Assert.Equal(f, lof.Test.Statistic, 8);
        Assert.Equal(p, lof.Test.PValue, 8);
        Assert.Equal(MathNet.Numerics.Distributions.FisherSnedecor.InvCDF(3, 10, 0.99), lof.Test.CriticalValue, 6);
    }

    [Fact]
    public void Fit_CurvedReplicatedStandards_LackOfFitIsSignificant()
    {
        // y = 0.1·x + 0.004·x² with ±0.2 % scatter: a straight line cannot follow the level means.
        List<CalibrationStandard> standards = Replicated(curvature: 0.004);

        RegressionCalibration line = RegressionCalibration.Fit(standards, CalibrationModel.Linear);
        RegressionCalibration quad = RegressionCalibration.Fit(standards, CalibrationModel.Quadratic);

        Assert.True(line.LackOfFit!.Test.IsSignificant);
        Assert.True(line.Mandel!.Test.IsSignificant);
        Assert.False(quad.LackOfFit!.Test.IsSignificant);
        Assert.Contains("significant lack of fit", line.Summary(), StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_TenReplicatesAtEachEnd_VarianceHomogeneityUsesIso8466Quantile()
    {
        // 10 replicates at the lowest and highest standard: critical value F(0.99; 9, 9) = 5.35113 (computed,
        // field-reference §1.3); PG = larger/smaller variance (ISO 8466-1, FROM MEMORY).
        double[] lowNoise = { -2, -1, 0, 1, 2, -2, -1, 0, 1, 2 };
        double[] highNoise = lowNoise.Select(d => 4 * d).ToArray();
        var standards = new List<CalibrationStandard>
        {
            CalibrationStandard.Create("LOW", FieldReferenceStandards.Ug(1), FieldReferenceStandards.Ug(10), lowNoise.Select(d => new Injection(1000 + d, 10000)).ToArray()),
            CalibrationStandard.Create("MID", FieldReferenceStandards.Ug(5), FieldReferenceStandards.Ug(10), new Injection(5000, 10000)),
            CalibrationStandard.Create("HIGH", FieldReferenceStandards.Ug(10), FieldReferenceStandards.Ug(10), highNoise.Select(d => new Injection(10000 + d, 10000)).ToArray()),
        };

        RegressionCalibration cal = RegressionCalibration.Fit(standards, CalibrationModel.Linear);

        VarianceHomogeneityTest vh = cal.VarianceHomogeneity!;
        Assert.Equal(5.35113, vh.Test.CriticalValue, 5);
        Assert.Equal(16, vh.Test.Statistic, 8);
        Assert.Equal(9, vh.Test.NumeratorDegreesOfFreedom);
        Assert.True(vh.IsHeteroscedastic);
        Assert.Equal("LOW", vh.LowestLevel);
        Assert.Equal("HIGH", vh.HighestLevel);
        Assert.Contains("consider a weighted fit", vh.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_InverseXWithBlank_IsRefusedWithTheWeightingsReasonAndTheStandard()
    {
        var ex = Assert.Throws<ArgumentException>(() => RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear, Weighting.InverseX));

        Assert.Equal("standards", ex.ParamName);
        Assert.Contains("1/x needs x > 0", ex.Message, StringComparison.Ordinal);
        Assert.Contains("0 = 'F0'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_InverseXWithBlankExcluded_FitsAndRecordsTheExclusion()
    {
        var options = new CalibrationOptions { Blanks = BlankHandling.Exclude };

        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Absorbance(), CalibrationModel.Linear, Weighting.InverseX, options);

        // 1/x weighting without the x = 0 point: b = 0.01449981982, a = 0.01440540541 (computed, field-reference §2.2).
        Assert.Equal(0.01449981982, cal.Coefficients[1].Value, 11);
        Assert.Equal(0.01440540541, cal.Coefficients[0].Value, 11);
        Assert.False(cal.Standards[0].Included);
        Assert.NotNull(cal.Standards[0].BackCalculated);
        Assert.Null(cal.Standards[0].RelativeErrorPercent);
        Assert.Equal(5, cal.PointCount);
        Assert.Contains(cal.Notes, n => n.Contains("Blank 'A0' excluded", StringComparison.Ordinal));
        Assert.Contains("(excluded from fit)", cal.Summary(), StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_InverseVarianceWeights_MatchFieldReference()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(
            FieldReferenceStandards.Absorbance(), CalibrationModel.Linear, Weighting.InverseVariance(FieldReferenceStandards.AbsorbanceSds));

        // Weighted (1/s², normalised) line: b = 0.014751993, a = 0.0090839078, s_w = 0.0024954812 (computed, §2.2).
        Assert.Equal(0.014751993, cal.Coefficients[1].Value, 9);
        Assert.Equal(0.0090839078, cal.Coefficients[0].Value, 10);
        Assert.Equal(0.0024954812, cal.ResidualStandardDeviation, 10);
    }

    [Fact]
    public void ReplicateVarianceWeighting_GivesEachPointItsStandardsSd()
    {
        List<CalibrationStandard> standards = Replicated();

        Weighting every = RegressionCalibration.ReplicateVarianceWeighting(standards);
        Weighting means = RegressionCalibration.ReplicateVarianceWeighting(standards, new CalibrationOptions { Replicates = ReplicateHandling.LevelMeans });

        // SD of each standard's ratios (n − 1), and s/√n for level means: definition of 1/s² weighting (field-reference §2.1).
        double[] r = standards[0].Injections.Select(i => i.Ratio).ToArray();
        double sd = MathNet.Numerics.Statistics.Statistics.StandardDeviation(r);
        Assert.Equal(15, every.PointValues.Count);
        Assert.Equal(sd, every.PointValues[0], 14);
        Assert.Equal(5, means.PointValues.Count);
        Assert.Equal(sd / Math.Sqrt(3), means.PointValues[0], 14);
        var ex = Assert.Throws<ArgumentException>(() => RegressionCalibration.ReplicateVarianceWeighting(FieldReferenceStandards.ConstructedRf()));
        Assert.Contains("'CAL-1' has 1 injection(s)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_LevelMeans_FitsOnePointPerStandard()
    {
        List<CalibrationStandard> standards = Replicated();

        RegressionCalibration cal = RegressionCalibration.Fit(standards, CalibrationModel.Linear, null, new CalibrationOptions { Replicates = ReplicateHandling.LevelMeans });

        // Equal replicate counts: the line through the level means equals the line through all injections (OLS algebra).
        RegressionCalibration every = RegressionCalibration.Fit(standards, CalibrationModel.Linear);
        Assert.Equal(5, cal.PointCount);
        Assert.Equal(every.Coefficients[1].Value, cal.Coefficients[1].Value, 12);
        Assert.NotNull(cal.Standards[0].StandardizedResidual);
        Assert.Null(cal.Standards[0].Injections[0].StandardizedResidual);
        Assert.Equal(ReplicateHandling.LevelMeans, cal.Replicates);
        Assert.Contains("level means", cal.Summary(), StringComparison.Ordinal);
    }

    [Fact]
    public void Summary_PrintsCoefficientsDiagnosticsAndUnits()
    {
        string text = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear).Summary();

        Assert.Contains("straight line y = a + b·x, unweighted", text, StringComparison.Ordinal);
        Assert.Contains("b (slope) = 1.93036 (ng/L)⁻¹", text, StringComparison.Ordinal);
        Assert.Contains("s_y/x = 0.432848 (response ratio)", text, StringComparison.Ordinal);
        Assert.Contains("Mandel (ISO 8466-1)", text, StringComparison.Ordinal);
        Assert.Contains("RSE (US EPA 8000D, p = 2)", text, StringComparison.Ordinal);
        Assert.Contains("Standards (concentrations in ng/L)", text, StringComparison.Ordinal);
        Assert.Equal(text, RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear).ToString());
    }

    [Fact]
    public void Fit_TooFewPointsForQuadratic_IsRefused()
    {
        var ex = Assert.Throws<ArgumentException>(() => RegressionCalibration.Fit(FieldReferenceStandards.ConstructedRf().Take(3).ToList(), CalibrationModel.Quadratic));

        Assert.Equal("standards", ex.ParamName);
        Assert.Contains("needs at least 4", ex.Message, StringComparison.Ordinal);
    }

    // Five levels (1, 2, 4, 8, 16 µg/L), three injections each, ratio = 0.1·x + curvature·x² with ±0.2 % scatter.
    internal static List<CalibrationStandard> Replicated(double curvature = 0)
    {
        double[] x = { 1, 2, 4, 8, 16 };
        double[] scatter = { -0.002, 0.0005, 0.0015 };
        return x.Select((c, i) => CalibrationStandard.Create(
            "L" + (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture),
            FieldReferenceStandards.Ug(c),
            FieldReferenceStandards.Ug(10),
            scatter.Select((e, j) => new Injection(((0.1 * c) + (curvature * c * c)) * (1 + e * (1 + (0.3 * ((i + j) % 3)))) * 10000, 10000)).ToArray())).ToList();
    }
}
