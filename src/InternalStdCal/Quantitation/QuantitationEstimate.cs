using InternalStdCal.Calibration;
using InternalStdCal.Quantities;

namespace InternalStdCal.Quantitation;

/// <summary>The numbers of a <see cref="QuantitationResult"/> (see <see cref="SampleQuantitation.Estimate"/>), in
/// the calibration's unit.</summary>
internal readonly struct QuantitationEstimate
{
    internal QuantitationEstimate(double meanResponse, Concentration concentration, Concentration? lower, Concentration? upper, ExtrapolationStatus extrapolation)
    {
        MeanResponse = meanResponse;
        Concentration = concentration;
        Lower = lower;
        Upper = upper;
        Extrapolation = extrapolation;
    }

    internal double MeanResponse { get; }

    internal Concentration Concentration { get; }

    internal Concentration? Lower { get; }

    internal Concentration? Upper { get; }

    internal ExtrapolationStatus Extrapolation { get; }

    internal bool IsExtrapolated => Extrapolation != ExtrapolationStatus.WithinRange;
}
