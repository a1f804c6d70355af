namespace InternalStdCal.Limits;

/// <summary>Which rule of 40 CFR Part 136 Appendix B (Revision 2) gave MDL_b.</summary>
public enum MdlBlankCase
{
    /// <summary>No method blank gave a numeric result: MDL_b does not apply and MDL = MDL_S.</summary>
    NotApplicable = 0,

    /// <summary>Some but not all blanks gave numeric results (at most 100 blanks): MDL_b = the highest blank result.</summary>
    HighestResult,

    /// <summary>All blanks gave numeric results (at most 100 blanks): MDL_b = X̄_b + t(0.99, n_b − 1)·S_b, X̄_b taken as 0
    /// if negative.</summary>
    MeanPlusTTimesSd,

    /// <summary>More than 100 blanks: MDL_b = the 99th percentile of the blank results.</summary>
    Percentile99,
}
