using System;
using System.Text;

namespace InternalStdCal.Calibration;

/// <summary>Regression calibration (placeholder until the regression core is merged).</summary>
public sealed class RegressionCalibration : RatioCalibration
{
    private RegressionCalibration()
        : base(null!, RatioModel.Linear, 2, Array.Empty<StandardResult>(), new())
    {
    }

    /// <summary>Fit.</summary>
    /// <returns>Nothing yet.</returns>
    public static RegressionCalibration Fit() => throw new NotSupportedException();

    /// <summary>r.</summary>
    public double CorrelationCoefficient { get; }

    /// <summary>R².</summary>
    public double CoefficientOfDetermination { get; }

    internal override AxisPrediction PredictAxis(double meanRatio, int replicates, double confidenceLevel) => throw new NotSupportedException();

    internal override double? InverseAxis(double response) => throw new NotSupportedException();

    internal override string ModelText() => throw new NotSupportedException();

    private protected override void AppendModel(StringBuilder sb) => throw new NotSupportedException();
}
