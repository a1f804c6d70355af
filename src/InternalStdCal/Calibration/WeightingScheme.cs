namespace InternalStdCal.Calibration;

/// <summary>Kind of weights used in a weighted least-squares calibration fit (see <see cref="Weighting"/>).</summary>
public enum WeightingScheme
{
    /// <summary>All weights 1 (ordinary least squares).</summary>
    None = 0,

    /// <summary>w = 1/x; needs x &gt; 0.</summary>
    InverseX = 1,

    /// <summary>w = 1/x²; needs x ≠ 0.</summary>
    InverseXSquared = 2,

    /// <summary>w = 1/y; needs y &gt; 0.</summary>
    InverseY = 3,

    /// <summary>w = 1/y²; needs y &gt; 0.</summary>
    InverseYSquared = 4,

    /// <summary>w = 1/s², s = standard deviation of the response at each standard (e.g. from replicates).</summary>
    InverseVariance = 5,

    /// <summary>Weights supplied by the caller, one per standard.</summary>
    Custom = 6,
}
