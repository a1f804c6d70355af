using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Quantities;

namespace InternalStdCal.Tests.Hardening.Properties;

// Concentrations carried through random chains of units of all three kinds (mass/volume, amount/volume, mass
// fraction), crossing kinds with a molar mass (γ = c·M) or a density (γ = w·ρ), ISO 80000-9. Invented values.
// Tolerance: each conversion is a few floating-point operations, so after k conversions the relative error is
// bounded by about k·4ε (ε = 2^-52, first-order rounding analysis); the checks allow k·8ε.
public class UnitChainPropertyTests
{
    private const double Epsilon = 2.220446049250313e-16;

    private static readonly ConcentrationUnit[] Units = Enum.GetValues<ConcentrationUnit>();

    private static Arbitrary<Chain> Chains =>
        (from value in Gen.Choose(1, 1_000_000)
         from exponent in Gen.Choose(-6, 3)
         from start in Gen.Choose(0, Units.Length - 1)
         from path in Gen.ArrayOf(Gen.Choose(0, Units.Length - 1), 12)
         from length in Gen.Choose(1, 12)
         from molar in Gen.Choose(1_000, 1_000_000)
         from density in Gen.Choose(500, 3_000)
         select new Chain(
             Concentration.From(value * Math.Pow(10, exponent), Units[start]),
             path.Take(length).Select(i => Units[i]).ToArray(),
             MolarMass.FromGramsPerMole(molar / 1000.0),
             Density.FromGramsPerMillilitre(density / 1000.0)))
        .ToArbitrary();

    [Property(MaxTest = 300)]
    public Property ConvertTo_AnyChainOfUnitsAndBack_ReturnsTheStartWithinTheChainsRounding() =>
        Prop.ForAll(Chains, c =>
        {
            Concentration x = c.Start;
            int steps = 0;
            foreach (ConcentrationUnit u in c.Path.Append(c.Start.Unit))
            {
                x = Convert(x, u, c.MolarMass, c.Density, ref steps);
            }

            return (x.Unit == c.Start.Unit && Math.Abs(x.Value - c.Start.Value) <= steps * 8 * Epsilon * c.Start.Value)
                .Label(c + " → " + x.Value.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + " after " + steps + " conversions");
        });

    [Property(MaxTest = 300)]
    public Property ConvertTo_TwoStepsEqualOneStep_Composes() =>
        Prop.ForAll(Chains, c =>
        {
            ConcentrationUnit b = c.Path[0];
            ConcentrationUnit target = c.Path[c.Path.Length - 1];
            int viaSteps = 0, directSteps = 0;
            Concentration via = Convert(Convert(c.Start, b, c.MolarMass, c.Density, ref viaSteps), target, c.MolarMass, c.Density, ref viaSteps);
            Concentration direct = Convert(c.Start, target, c.MolarMass, c.Density, ref directSteps);
            double tolerance = (viaSteps + directSteps) * 8 * Epsilon * Math.Abs(direct.Value);
            return (via.Unit == direct.Unit && Math.Abs(via.Value - direct.Value) <= tolerance)
                .Label(c + ": via " + b + " " + via.Value.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + ", direct " + direct.Value.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
        });

    /// <summary>One conversion with the parameter the pair of kinds needs; amount ↔ fraction goes through mass
    /// concentration (two conversions).</summary>
    private static Concentration Convert(Concentration x, ConcentrationUnit to, MolarMass m, Density rho, ref int steps)
    {
        ConcentrationKind from = x.Kind, kind = Concentration.From(1, to).Kind;
        steps++;
        if (from == kind)
        {
            return x.ConvertTo(to);
        }

        if (from != ConcentrationKind.MassFraction && kind != ConcentrationKind.MassFraction)
        {
            return x.ConvertTo(to, m);
        }

        if (from != ConcentrationKind.AmountConcentration && kind != ConcentrationKind.AmountConcentration)
        {
            return x.ConvertTo(to, rho);
        }

        steps++;
        return from == ConcentrationKind.AmountConcentration
            ? x.ConvertTo(ConcentrationUnit.MilligramPerLitre, m).ConvertTo(to, rho)
            : x.ConvertTo(ConcentrationUnit.MilligramPerLitre, rho).ConvertTo(to, m);
    }

    internal sealed record Chain(Concentration Start, ConcentrationUnit[] Path, MolarMass MolarMass, Density Density)
    {
        public override string ToString() => Start + " via " + string.Join(" → ", Path) + " (M " + MolarMass + ", ρ " + Density + ")";
    }
}
