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
}
