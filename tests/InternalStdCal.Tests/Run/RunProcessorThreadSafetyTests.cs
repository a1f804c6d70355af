using System.Collections.Generic;
using System.Linq;
using System.Threading.Tasks;
using InternalStdCal.Calibration;
using InternalStdCal.IO;
using InternalStdCal.Limits;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Tests.Calibration;
using InternalStdCal.Tests.IO;
using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Run;

// Thread safety (common practice for shared immutable results): processing the same run on many threads gives
// bit-identical results to the serial run, first use of a fit's lazily computed statistics or of a result's
// deferred quantitation, back-calculation and notes from many threads gives the serial values. Invented demo run;
// the check is equality with the serial result.
public class RunProcessorThreadSafetyTests
{
    [Fact]
    public void Process_ParallelRuns_BitIdenticalToSerial()
    {
        RunReport serial = RunResultsJsonTests.ProcessDemo(DriftRule.Magnitude(10));
        RunResults expected = RunResults.From(serial);
        string expectedText = serial.ToString();

        var results = new RunResults[16];
        var texts = new string[16];
        Parallel.For(0, results.Length, new ParallelOptions { MaxDegreeOfParallelism = 8 }, i =>
        {
            RunReport report = RunResultsJsonTests.ProcessDemo(DriftRule.Magnitude(10));
            results[i] = RunResults.From(report);
            texts[i] = report.ToString();
        });

        Assert.All(results, r => Assert.Equal(expected, r));
        Assert.All(texts, t => Assert.Equal(expectedText, t));
    }

    [Fact]
    public void Process_DeferredPartsFirstReadFromManyThreads_SameInstancesAndEqualToSerialValues()
    {
        // Quantitation, sample calculation and notes of a result are built on first read; many threads reading them
        // first must all get one instance, equal to what a report read on one thread gives.
        RunReport serial = RunResultsJsonTests.ProcessDemo(DriftRule.Magnitude(10));
        RunResults expected = RunResults.From(serial);
        for (int attempt = 0; attempt < 10; attempt++)
        {
            RunReport shared = RunResultsJsonTests.ProcessDemo(DriftRule.Magnitude(10));
            var seen = new (object? Q, object? S, object N)[8][];
            Parallel.For(0, seen.Length, i => seen[i] = shared.Results.Select(r => ((object?)r.Quantitation, (object?)r.SampleCalculation, (object)r.Notes.ToList())).ToArray());
            for (int k = 0; k < shared.Results.Count; k++)
            {
                Assert.All(seen, s => Assert.Same(seen[0][k].Q, s[k].Q));
                Assert.All(seen, s => Assert.Same(seen[0][k].S, s[k].S));
                Assert.All(seen, s => Assert.Equal((List<string>)seen[0][k].N, (List<string>)s[k].N));
            }

            Assert.Equal(expected, RunResults.From(shared));
        }
    }

    [Fact]
    public void Process_ReportedValuesAndNotesFirstReadFromManyThreads_SameInstancesAndEqualToSerialValues()
    {
        // Reported values, result notes, QC notes and calibration notes (with the diagnostics they report on) are
        // made on first read: many threads reading them first must all get one instance, equal to a serial read.
        RunReport serial = RunResultsJsonTests.ProcessDemo(DriftRule.Magnitude(10));
        for (int attempt = 0; attempt < 10; attempt++)
        {
            RunReport shared = RunResultsJsonTests.ProcessDemo(DriftRule.Magnitude(10));
            var seen = new (object? Reported, object Notes)[8][];
            var qcNotes = new object[8][];
            var calibrationNotes = new object?[8][];
            Parallel.For(0, seen.Length, i =>
            {
                seen[i] = shared.Results.Select(r => ((object?)r.Reported, (object)r.Notes)).ToArray();
                qcNotes[i] = shared.QualityControl.Select(c => (object)c.Notes).ToArray();
                calibrationNotes[i] = shared.Calibrations.Select(c => (object?)c.Calibration?.Notes).ToArray();
            });
            for (int k = 0; k < shared.Results.Count; k++)
            {
                Assert.All(seen, s => Assert.Same(seen[0][k].Reported, s[k].Reported));
                Assert.All(seen, s => Assert.Same(seen[0][k].Notes, s[k].Notes));
                Assert.Equal(serial.Results[k].Reported, shared.Results[k].Reported);
                Assert.Equal(serial.Results[k].Notes, shared.Results[k].Notes);
            }

            for (int k = 0; k < shared.QualityControl.Count; k++)
            {
                Assert.All(qcNotes, s => Assert.Same(qcNotes[0][k], s[k]));
                Assert.Equal(serial.QualityControl[k].Notes, shared.QualityControl[k].Notes);
            }

            for (int k = 0; k < shared.Calibrations.Count; k++)
            {
                Assert.All(calibrationNotes, s => Assert.Same(calibrationNotes[0][k], s[k]));
                Assert.Equal(serial.Calibrations[k].Calibration?.Notes, shared.Calibrations[k].Calibration?.Notes);
            }
        }
    }

    [Theory]
    [InlineData(CalibrationModel.Linear, 0.0)]
    [InlineData(CalibrationModel.Linear, 0.004)]
    [InlineData(CalibrationModel.LinearThroughOrigin, 0.0)]
    [InlineData(CalibrationModel.Quadratic, 0.004)]
    public void RegressionCalibration_DiagnosticsFirstUsedFromManyThreads_SameInstancesEqualToSerialValues(CalibrationModel model, double curvature)
    {
        // Lack of fit, Mandel's test, variance homogeneity and the standards' standardised residuals (read from the
        // fit's lazily made residual views) are computed on first use. Invented replicated standards
        // (3 injections at 5 levels, so all three tests are computed); the check is equality with a serial first use,
        // whichever of the tests or the notes a thread reads first.
        List<CalibrationStandard> standards = RegressionCalibrationTests.Replicated(curvature);
        RegressionCalibration reference = RegressionCalibration.Fit(standards, model, Weighting.InverseX);
        string expected = Describe(reference.LackOfFit, reference.Mandel, reference.VarianceHomogeneity, reference.Notes);
        double?[] expectedResiduals = StandardizedResiduals(reference);
        Assert.Contains(expectedResiduals, z => z is not null);
        Assert.NotNull(reference.LackOfFit);
        Assert.NotNull(reference.Mandel);
        Assert.NotNull(reference.VarianceHomogeneity);

        for (int attempt = 0; attempt < 20; attempt++)
        {
            RegressionCalibration shared = RegressionCalibration.Fit(standards, model, Weighting.InverseX);
            var seen = new (object? Lof, object? Mandel, object? Homogeneity, object Notes)[10];
            var residuals = new double?[10][];
            Parallel.For(0, seen.Length, i =>
            {
                // Each thread starts with a different member, so any of them may trigger the computation.
                object first = (i % 5) switch
                {
                    0 => (object?)shared.LackOfFit ?? string.Empty,
                    1 => (object?)shared.Mandel ?? string.Empty,
                    2 => (object?)shared.VarianceHomogeneity ?? string.Empty,
                    3 => StandardizedResiduals(shared),
                    _ => shared.Notes,
                };
                residuals[i] = StandardizedResiduals(shared);
                seen[i] = (shared.LackOfFit, shared.Mandel, shared.VarianceHomogeneity, shared.Notes);
                Assert.NotNull(first);
            });
            Assert.All(seen, x => Assert.Same(seen[0].Lof, x.Lof));
            Assert.All(seen, x => Assert.Same(seen[0].Mandel, x.Mandel));
            Assert.All(seen, x => Assert.Same(seen[0].Homogeneity, x.Homogeneity));
            Assert.All(seen, x => Assert.Same(seen[0].Notes, x.Notes));
            Assert.Equal(expected, Describe(shared.LackOfFit, shared.Mandel, shared.VarianceHomogeneity, shared.Notes));
            Assert.All(residuals, r => Assert.Equal(expectedResiduals, r));
            Assert.Equal(reference.Summary(), shared.Summary());
        }
    }

    [Fact]
    public void Process_ValuesKeptOnTheResult_EqualTheDeferredQuantitationAndBackCalculation()
    {
        // The measured value, interval and original-sample values stored on a result are the ones the full
        // quantitation and the budgeted back-calculation (built on first read) give, bit for bit.
        RunReport report = RunResultsJsonTests.ProcessDemo();
        Assert.Contains(report.Results, r => r.Quantitation is not null && r.SampleLower is not null);
        foreach (AnalyteResult r in report.Results)
        {
            Assert.Equal(r.Quantitation?.Concentration, r.InMeasuredSolution);
            Assert.Equal(r.Quantitation?.Lower, r.MeasuredLower);
            Assert.Equal(r.Quantitation?.Upper, r.MeasuredUpper);
            if (r.Reported is ReportedValue reported)
            {
                Assert.Equal(r.SampleCalculation!.Result.Value, reported.Estimate);
            }

            if (r.SampleCalculation is SampleResult s && r.Quantitation is { Lower: Concentration lo, Upper: Concentration hi })
            {
                SamplePreparation prep = report.Run.Injections.First(i => i.Order == r.InjectionOrders[0]).Preparation;
                Assert.Equal(prep.ToSample(Measured.Exact(lo)).Result.Value, r.SampleLower);
                Assert.Equal(prep.ToSample(Measured.Exact(hi)).Result.Value, r.SampleUpper);
                Assert.Equal(prep.ToSample(r.Quantitation.AsMeasured()!.Value).Result, s.Result);
            }
        }
    }

    [Fact]
    public void RegressionFit_LazyStatisticsFirstUsedFromManyThreads_EqualSerialValues()
    {
        // Miller & Miller fluorescence standards (field-reference §1.2; data from memory), used here only as data.
        CalibrationStandard[] standards = FieldReferenceStandards.Fluorescence().ToArray();
        RegressionFit reference = RegressionCalibration.Fit(standards, CalibrationModel.Linear).Regression;
        double s = reference.ResidualStandardDeviation, r = reference.CorrelationCoefficient, v = reference.Covariance(1, 1);

        for (int attempt = 0; attempt < 20; attempt++)
        {
            RegressionFit shared = RegressionCalibration.Fit(standards, CalibrationModel.Linear).Regression;
            var seen = new (double S, double R, double V, int Residuals)[8];
            Parallel.For(0, seen.Length, i => seen[i] = (shared.ResidualStandardDeviation, shared.CorrelationCoefficient, shared.Covariance(1, 1), shared.Residuals.Count));
            Assert.All(seen, x => Assert.Equal((s, r, v, standards.Length), x));
        }
    }

    [Fact]
    public void EvaluateMonteCarlo_SameSeedOnManyThreads_BitIdentical()
    {
        MeasurementModel model = MeasurementModel.Product(
            "y", "mg/L", 1, new[] { UncertainInput.Rectangular("a", 1, 0.1), UncertainInput.Normal("b", 2, 0.05) }, new[] { 1.0, -1.0 });
        MonteCarloEvaluation serial = model.EvaluateMonteCarlo(100_000, 7);
        var parallel = new MonteCarloEvaluation[6];
        Parallel.For(0, parallel.Length, i => parallel[i] = model.EvaluateMonteCarlo(100_000, 7));
        Assert.All(parallel, p =>
        {
            Assert.Equal(serial.Value, p.Value);
            Assert.Equal(serial.StandardUncertainty, p.StandardUncertainty);
            Assert.Equal(serial.ShortestInterval.Lower, p.ShortestInterval.Lower);
            Assert.Equal(serial.SymmetricInterval.Upper, p.SymmetricInterval.Upper);
        });
    }

    // Standardised residuals of every level and injection, in order.
    private static double?[] StandardizedResiduals(RegressionCalibration calibration) =>
        calibration.Standards.SelectMany(s => s.Injections.Select(i => i.StandardizedResidual).Prepend(s.StandardizedResidual)).ToArray();

    // Every number of the three tests in round-trip form, and the notes: equal text means bit-identical values.
    private static string Describe(LackOfFitTest? lof, MandelTest? mandel, VarianceHomogeneityTest? homogeneity, IReadOnlyList<string> notes)
    {
        static string R(double v) => v.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        static string F(FTestResult t) => R(t.Statistic) + " " + R(t.CriticalValue) + " " + R(t.PValue) + " " + t.NumeratorDegreesOfFreedom + " " + t.DenominatorDegreesOfFreedom;
        return (lof is null ? "-" : R(lof.PureErrorSumOfSquares) + " " + R(lof.LackOfFitSumOfSquares) + " " + F(lof.Test)) + "|"
            + (mandel is null ? "-" : R(mandel.ResidualStandardDeviationLinear) + " " + R(mandel.ResidualStandardDeviationQuadratic) + " " + R(mandel.DifferenceOfVariances) + " " + F(mandel.Test)) + "|"
            + (homogeneity is null ? "-" : R(homogeneity.VarianceLowest) + " " + R(homogeneity.VarianceHighest) + " " + F(homogeneity.Test)) + "|"
            + string.Join("\n", notes);
    }
}
