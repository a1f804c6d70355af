namespace InternalStdCal.Calibration;

/// <summary>One fitted coefficient of a regression calibration with its standard error, confidence interval and unit.</summary>
public sealed class CoefficientEstimate
{
    internal CoefficientEstimate(string symbol, string meaning, double value, double standardError, ConfidenceInterval interval, string unit)
    {
        Symbol = symbol;
        Meaning = meaning;
        Value = value;
        StandardError = standardError;
        Interval = interval;
        Unit = unit;
    }

    /// <summary>"a", "b" or "c" of y = a + b·x + c·x².</summary>
    public string Symbol { get; }

    /// <summary>"intercept", "slope" or "curvature".</summary>
    public string Meaning { get; }

    /// <summary>The estimate.</summary>
    public double Value { get; }

    /// <summary>Standard error, s·√((XᵀWX)⁻¹)ᵢᵢ.</summary>
    public double StandardError { get; }

    /// <summary>Value ± t((1 + P)/2, n − p)·SE.</summary>
    public ConfidenceInterval Interval { get; }

    /// <summary>Unit of the coefficient: "1" for the intercept (response ratio), (x unit)⁻¹ for the slope,
    /// (x unit)⁻² for the curvature; "1" throughout on the ratio axis.</summary>
    public string Unit { get; }

    /// <summary>Prints "b (slope) = 0.199708 (µg/L)⁻¹ (SE 0.0013, 95 % CI [0.1955, 0.2039])"; a dimensionless
    /// coefficient is printed without a unit.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        Symbol + " (" + Meaning + ") = " + Text.G(Value) + (Unit == "1" ? string.Empty : " " + Unit) + " (SE " + Text.G(StandardError) + ", "
        + Text.F(100 * Interval.ConfidenceLevel, 0) + " % CI [" + Text.G(Interval.Lower) + ", " + Text.G(Interval.Upper) + "])";
}
