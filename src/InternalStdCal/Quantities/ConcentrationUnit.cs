namespace InternalStdCal.Quantities;

/// <summary>The kind of a concentration: what is divided by what.</summary>
public enum ConcentrationKind
{
    /// <summary>Mass of analyte per volume of solution (ISO 80000-9 mass concentration, γ or ρ).</summary>
    MassConcentration = 0,

    /// <summary>Amount of substance per volume of solution (ISO 80000-9 amount-of-substance concentration, c).</summary>
    AmountConcentration = 1,

    /// <summary>Mass of analyte per mass of sample or solution (ISO 80000-9 mass fraction, w).</summary>
    MassFraction = 2,
}

/// <summary>Units of <see cref="Concentration"/>. Each unit belongs to exactly one <see cref="ConcentrationKind"/>.</summary>
/// <remarks>
/// "ppm" and "ppb" are deliberately not units here: they mean mg/L or mg/kg (µg/L or µg/kg) depending on the
/// matrix, so the caller must say which kind is meant (see <see cref="Concentration.FromPartsPerMillion"/>).
/// </remarks>
public enum ConcentrationUnit
{
    /// <summary>g/L (mass concentration).</summary>
    GramPerLitre = 0,

    /// <summary>mg/L (mass concentration).</summary>
    MilligramPerLitre,

    /// <summary>µg/L (mass concentration).</summary>
    MicrogramPerLitre,

    /// <summary>ng/L (mass concentration).</summary>
    NanogramPerLitre,

    /// <summary>mol/L (amount concentration).</summary>
    MolePerLitre,

    /// <summary>mmol/L (amount concentration).</summary>
    MillimolePerLitre,

    /// <summary>µmol/L (amount concentration).</summary>
    MicromolePerLitre,

    /// <summary>nmol/L (amount concentration).</summary>
    NanomolePerLitre,

    /// <summary>g/kg (mass fraction).</summary>
    GramPerKilogram,

    /// <summary>mg/kg (mass fraction).</summary>
    MilligramPerKilogram,

    /// <summary>µg/kg (mass fraction).</summary>
    MicrogramPerKilogram,

    /// <summary>ng/kg (mass fraction).</summary>
    NanogramPerKilogram,

    /// <summary>% (mass fraction, g/100 g).</summary>
    Percent,
}
