using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;
using Xunit.Abstractions;

namespace InternalStdCal.Tests.Calibration;

/// <summary>
/// Accuracy against the NIST Statistical Reference Datasets (StRD), linear least squares: certified values
/// read from the .dat files in ../shared/reference-data/nist-strd/ (public domain, NIST ITL).
/// </summary>
public class RegressionFitNistTests
{
    private const double RequiredLre = 12;
    private readonly ITestOutputHelper _output;

    public RegressionFitNistTests(ITestOutputHelper output) => _output = output;

    // Source: NIST StRD certified values (Norris: line; NoInt1/NoInt2: through origin; Pontius: quadratic).
    [SkippableTheory]
    [InlineData("Norris", CalibrationModel.Linear)]
    [InlineData("NoInt1", CalibrationModel.LinearThroughOrigin)]
    [InlineData("NoInt2", CalibrationModel.LinearThroughOrigin)]
    [InlineData("Pontius", CalibrationModel.Quadratic)]
    public void Fit_NistCertifiedDataset_ReproducesEveryCertifiedValueToTwelveDigits(string dataset, CalibrationModel model)
    {
        string folder = RepositoryPaths.NistStrdFolder;
        Skip.IfNot(Directory.Exists(folder), $"NIST StRD folder not found: {folder}");
        NistStrdDataset data = NistStrdDataset.Load(folder, dataset);

        RegressionFit fit = RegressionFit.Fit(data.X, data.Y, model);

        var lres = new List<(string Quantity, double Lre)>();
        for (int i = 0; i < data.Estimates.Length; i++)
        {
            lres.Add(($"B{(model == CalibrationModel.LinearThroughOrigin ? i + 1 : i)}", Lre.Of(fit.Coefficients[i], data.Estimates[i])));
            lres.Add(($"SD(B{(model == CalibrationModel.LinearThroughOrigin ? i + 1 : i)})", Lre.Of(fit.StandardErrors[i], data.StandardDeviations[i])));
        }

        lres.Add(("residual SD", Lre.Of(fit.ResidualStandardDeviation, data.ResidualStandardDeviation)));
        lres.Add(("R²", Lre.Of(fit.RSquared, data.RSquared)));
        foreach ((string quantity, double lre) in lres)
        {
            _output.WriteLine(string.Format(CultureInfo.InvariantCulture, "{0} {1,-12} LRE {2:F2}", dataset, quantity, lre));
        }

        Assert.Equal(data.Estimates.Length, fit.ParameterCount);
        Assert.All(lres, item => Assert.True(item.Lre >= RequiredLre, $"{dataset} {item.Quantity}: LRE {item.Lre:F2} < {RequiredLre}"));
        _output.WriteLine(string.Format(CultureInfo.InvariantCulture, "{0} minimum LRE {1:F2}", dataset, lres.Min(l => l.Lre)));
    }

    // Source: NIST StRD certified values (Norris, the straight line with intercept), through the span entry
    // point: B0, B1 and the residual SD directly; SD(B0), SD(B1) from the struct's summaries,
    // SE(b) = s/√Sxx, SE(a) = s·√(1/n + x̄²/Sxx) (Miller & Miller ch. 5).
    [SkippableFact]
    public void FitLine_Norris_ReproducesEveryCertifiedValueToTwelveDigits()
    {
        string folder = RepositoryPaths.NistStrdFolder;
        Skip.IfNot(Directory.Exists(folder), $"NIST StRD folder not found: {folder}");
        NistStrdDataset data = NistStrdDataset.Load(folder, "Norris");

        LineFit line = RegressionFit.FitLine(data.X, data.Y);
        double s = line.ResidualStandardDeviation(data.X, data.Y);
        double sxx = line.WeightedSumOfSquaresX;
        var lres = new List<(string Quantity, double Lre)>
        {
            ("B0", Lre.Of(line.Intercept, data.Estimates[0])),
            ("B1", Lre.Of(line.Slope, data.Estimates[1])),
            ("SD(B0)", Lre.Of(s * System.Math.Sqrt((1.0 / line.Count) + (line.WeightedMeanX * line.WeightedMeanX / sxx)), data.StandardDeviations[0])),
            ("SD(B1)", Lre.Of(s / System.Math.Sqrt(sxx), data.StandardDeviations[1])),
            ("residual SD", Lre.Of(s, data.ResidualStandardDeviation)),
        };
        foreach ((string quantity, double lre) in lres)
        {
            _output.WriteLine(string.Format(CultureInfo.InvariantCulture, "Norris (FitLine) {0,-12} LRE {1:F2}", quantity, lre));
        }

        Assert.True(line.IsRefined, "Norris has |b·x̄| ≈ 1500·|a|: the bound asks for the refinement pass.");
        Assert.All(lres, item => Assert.True(item.Lre >= RequiredLre, $"Norris (FitLine) {item.Quantity}: LRE {item.Lre:F2} < {RequiredLre}"));
    }
}
