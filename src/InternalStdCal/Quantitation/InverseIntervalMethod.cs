namespace InternalStdCal.Quantitation;

/// <summary>How the confidence interval of an inverse prediction is formed.</summary>
public enum InverseIntervalMethod
{
    /// <summary>x0 ± t·s_x0, with s_x0 from first-order propagation (ISO 8466-1/-2; field-reference §1.1). Every model.</summary>
    Symmetric = 0,

    /// <summary>Fieller's exact interval for straight lines (field-reference §1.1; not symmetric about x0; unbounded when the
    /// slope is not significant). Other models fall back to <see cref="Symmetric"/>, with a note.</summary>
    Fieller,
}
