using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>Bad input to every entry point of <c>Quantitation</c> (common practice: an unknown needs a visible
/// label, ≥ 1 injection and an IS concentration &gt; 0 of the calibration's kind; confidence levels in (0, 1)).</summary>
public class QuantitationBadInputTests
{
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);

    private static Concentration Ug(double v) => Concentration.FromMicrogramsPerLitre(v);

    private static RegressionCalibration Line(CalibrationModel model = CalibrationModel.Linear) => RegressionCalibration.Fit(
        Enumerable.Range(1, 5).Select(i => new CalibrationStandard("L" + i, Ug(i), Ug(10), new[] { new Injection((0.2 * i * i) + (0.1 * i) + (0.001 * (i % 2)), 1) })).ToArray(),
        model);

    private static UnknownSample Sample(double ratio, Concentration? isConc = null) => UnknownSample.Create("S1", isConc ?? Ug(10), new Injection(ratio, 1));

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        new("Quantitation.UnknownSample.#ctor", "blank label", () => new UnknownSample(" ", Ug(10), new[] { new Injection(1, 1) }), Arg, "label", "empty or white space"),
        new("Quantitation.UnknownSample.#ctor", "IS concentration 0", () => new UnknownSample("S1", Ug(0), new[] { new Injection(1, 1) }), Range, "internalStandardConcentration", "0 µg/L", "> 0"),
        new("Quantitation.UnknownSample.#ctor", "no injections", () => new UnknownSample("S1", Ug(10), Array.Empty<Injection>()), Arg, "injections", "empty", "at least one"),
        new("Quantitation.UnknownSample.#ctor", "null injection", () => new UnknownSample("S1", Ug(10), new Injection[] { null! }), Null, "injections", "null element at index 0"),
        new("Quantitation.UnknownSample.Create", "negative IS concentration", () => UnknownSample.Create("S1", Ug(-10), new Injection(1, 1)), Range, "internalStandardConcentration", "-10 µg/L", "> 0"),
        new("Quantitation.UnknownSample.Create", "null injections", () => UnknownSample.Create("S1", Ug(10), null!), Null, "injections", "injections"),
        new("Quantitation.SampleQuantitation.Quantify", "level 1", () => SampleQuantitation.Quantify(Line(), Sample(1), 1), Range, "confidenceLevel", "1", "(0, 1)"),
        new("Quantitation.SampleQuantitation.Quantify", "level NaN", () => SampleQuantitation.Quantify(Line(), Sample(1), double.NaN), Range, "confidenceLevel", "NaN", "(0, 1)"),
        new("Quantitation.SampleQuantitation.Quantify", "IS in µmol/L for a µg/L calibration (wrong kind)", () => SampleQuantitation.Quantify(Line(), Sample(1, Concentration.FromMicromolesPerLitre(1))), Arg, "sample", "AmountConcentration", "kinds must match"),
        new("Quantitation.SampleQuantitation.Quantify", "ratio below the parabola's vertex", () => SampleQuantitation.Quantify(Line(CalibrationModel.Quadratic), Sample(-1e6)), Arg, "sample", "cannot be read off", "never reaches it"),
        new("Quantitation.SampleQuantitation.Quantify", "undefined interval method", () => SampleQuantitation.Quantify(Line(), Sample(1), 0.95, (InverseIntervalMethod)9), Range, "intervalMethod", "9"),
        new("Quantitation.SampleQuantitation.Quantify", "null calibration", () => SampleQuantitation.Quantify(null!, Sample(1)), Null, "calibration", "calibration"),
        new("Quantitation.SampleQuantitation.QuantifyAll", "level 0", () => SampleQuantitation.QuantifyAll(Line(), new[] { Sample(1) }, 0), Range, "confidenceLevel", "0", "(0, 1)"),
        new("Quantitation.SampleQuantitation.QuantifyAll", "null samples", () => SampleQuantitation.QuantifyAll(Line(), null!), Null, "samples", "samples"),
        new("Quantitation.SampleQuantitation.QuantifyAll", "null sample", () => SampleQuantitation.QuantifyAll(Line(), new UnknownSample[] { null! }), Null, "sample", "sample"),
    });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Quantitation.SampleQuantitation.Quantify", "ratio 1e300", () => Values(SampleQuantitation.Quantify(Line(), Sample(1e300)))),
        new("Quantitation.SampleQuantitation.Quantify", "ratio 1e-300", () => Values(SampleQuantitation.Quantify(Line(), Sample(1e-300)))),
        new("Quantitation.SampleQuantitation.Quantify", "IS 1e300 µg/L", () => Values(SampleQuantitation.Quantify(Line(), Sample(1, Ug(1e300))))),
        new("Quantitation.SampleQuantitation.Quantify", "ratio 1e300, Fieller", () => Values(SampleQuantitation.Quantify(Line(), Sample(1e300), 0.95, InverseIntervalMethod.Fieller))),
        new("Quantitation.SampleQuantitation.Quantify", "ratio 1e300 on a parabola", () => Values(SampleQuantitation.Quantify(Line(CalibrationModel.Quadratic), Sample(1e300)))),
        new("Quantitation.SampleQuantitation.QuantifyAll", "level 1e-300", () => SampleQuantitation.QuantifyAll(Line(), new[] { Sample(1) }, 1e-300).SelectMany(Values)),
        new("Quantitation.SampleQuantitation.QuantifyAll", "level 1 - 1e-16", () => SampleQuantitation.QuantifyAll(Line(), new[] { Sample(1) }, 1 - 1e-16).SelectMany(Values)),
    });

    private static double[] Values(QuantitationResult r) =>
        new[] { r.Concentration.Value, r.StandardError?.Value ?? 0, r.Lower?.Value ?? 0, r.Upper?.Value ?? 0, r.MeanResponse };

    [Theory]
    [MemberData(nameof(Cases))]
    public void EntryPoint_BadInput_ThrowsDocumentedExceptionNamingParameterValueAndRange(string name, BadInputCase c)
    {
        Assert.NotNull(name);
        AssertRejected(c);
    }

    [Theory]
    [MemberData(nameof(Magnitudes))]
    public void EntryPoint_AbsurdMagnitude_FiniteOrDocumentedException(string name, MagnitudeCase c)
    {
        Assert.NotNull(name);
        AssertFiniteOrRejected(c);
    }
}
