namespace InternalStdCal.Calibration;

/// <summary>The calibration function of a <see cref="RatioCalibration"/>.</summary>
public enum RatioModel
{
    /// <summary>One standard: C_x = A_x·C_is/(A_is·RF) with the RF of that standard (SW-846 Method 8000C §11.4.3).</summary>
    SinglePointResponseFactor = 0,

    /// <summary>Mean relative response factor over the standards: C_x = A_x·C_is/(A_is·mean RF)
    /// (SW-846 Method 8000C §11.4.3). One term (p = 1).</summary>
    AverageResponseFactor,

    /// <summary>Straight line y = a + b·x (p = 2).</summary>
    Linear,

    /// <summary>Straight line through the origin y = b·x (p = 1).</summary>
    LinearThroughOrigin,

    /// <summary>Second-order polynomial y = a + b·x + c·x² (p = 3; ISO 8466-2).</summary>
    Quadratic,
}
