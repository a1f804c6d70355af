namespace InternalStdCal.Calibration;

/// <summary>Functional form of a calibration function y = f(x) fitted by (weighted) least squares.</summary>
/// <remarks>
/// x is the concentration (or concentration ratio analyte/internal standard) of the standards, y the
/// instrument response (or response ratio). Both are in the caller's units; the fit keeps them as given.
/// </remarks>
public enum CalibrationModel
{
    /// <summary>Straight line with intercept, y = a + b·x (ISO 8466-1). Needs at least 3 points and 2 distinct x.</summary>
    Linear = 0,

    /// <summary>Straight line through the origin, y = b·x. Needs at least 2 points and 2 distinct x.</summary>
    LinearThroughOrigin = 1,

    /// <summary>Second-order polynomial, y = a + b·x + c·x² (ISO 8466-2). Needs at least 4 points and 3 distinct x.</summary>
    Quadratic = 2,
}
