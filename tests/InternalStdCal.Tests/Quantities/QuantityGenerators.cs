using System;
using System.Globalization;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using InternalStdCal.Quantities;

namespace InternalStdCal.Tests.Quantities;

/// <summary>Generators of valid quantities (finite values away from overflow and subnormal range).</summary>
internal static class QuantityGenerators
{
    /// <summary>Decimal-looking numbers m·10^e, as typed in a laboratory, rounded to the nearest double.</summary>
    internal static readonly Gen<double> DecimalLike =
        from m in Gen.Choose(-999_999, 999_999)
        from e in Gen.Choose(-15, 15)
        select double.Parse(FormattableString.Invariant($"{m}e{e}"), CultureInfo.InvariantCulture);

    /// <summary>Any finite double whose magnitude is 0 or within [1e-280, 1e280], so unit scaling stays normal.</summary>
    internal static readonly Gen<double> WideFinite =
        ArbMap.Default.GeneratorFor<double>()
            .Where(d => !double.IsNaN(d) && !double.IsInfinity(d) && (d == 0 || (Math.Abs(d) >= 1e-280 && Math.Abs(d) <= 1e280)));

    internal static readonly Gen<double> Finite = Gen.OneOf(DecimalLike, WideFinite);

    internal static readonly Gen<double> NonNegative = Finite.Select(Math.Abs);

    internal static readonly Gen<double> Positive = NonNegative.Where(d => d > 0);

    internal static readonly Gen<ConcentrationUnit> ConcentrationUnits =
        Gen.Elements(Enum.GetValues<ConcentrationUnit>());

    internal static readonly Gen<Concentration> Concentrations =
        from unit in ConcentrationUnits
        from value in Finite
        select Concentration.From(value, unit);

    internal static readonly Gen<VolumeUnit> VolumeUnits =
        Gen.Elements(Enum.GetValues<VolumeUnit>());

    internal static readonly Gen<MassUnit> MassUnits =
        Gen.Elements(Enum.GetValues<MassUnit>());

    internal static readonly Gen<Volume> Volumes =
        from unit in VolumeUnits
        from value in NonNegative
        select Volume.From(value, unit);

    internal static readonly Gen<Mass> Masses =
        from unit in MassUnits
        from value in NonNegative
        select Mass.From(value, unit);

    /// <summary>Two units of the same concentration kind.</summary>
    internal static readonly Gen<(ConcentrationUnit From, ConcentrationUnit To)> SameKindUnitPairs =
        from a in ConcentrationUnits
        from b in ConcentrationUnits.Where(b => Concentration.KindOf(b) == Concentration.KindOf(a))
        select (a, b);
}
