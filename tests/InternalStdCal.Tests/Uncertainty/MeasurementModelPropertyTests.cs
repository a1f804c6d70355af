using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Uncertainty;

namespace InternalStdCal.Tests.Uncertainty;

// Invented inputs (property tests): a product model y = k·Π xᵢ^pᵢ with 1–6 positive inputs of mixed distributions.
public class MeasurementModelPropertyTests
{
    private static readonly double[] Powers = { 1, -1, 2, -2, 0.5, 1.5 };

    private static Gen<UncertainInput[]> Inputs =>
        from n in Gen.Choose(1, 6)
        from values in Gen.Choose(1, 10_000).ArrayOf(n)
        from uncertainties in Gen.Choose(0, 500).ArrayOf(n)
        from kinds in Gen.Choose(0, 3).ArrayOf(n)
        select Enumerable.Range(0, n).Select(i => Input("x" + i, values[i] / 100.0, values[i] / 100.0 * uncertainties[i] / 10_000.0, kinds[i])).ToArray();

    private static Gen<double[]> Exponents(int n) => Gen.Elements(Powers).ArrayOf(n);

    private static UncertainInput Input(string name, double value, double u, int kind) => kind switch
    {
        0 => UncertainInput.Normal(name, value, u),
        1 => UncertainInput.Rectangular(name, value, u * Math.Sqrt(3)),
        2 => UncertainInput.Triangular(name, value, u * Math.Sqrt(6)),
        _ => UncertainInput.StudentT(name, value, u, 3 + kind),
    };

    private static UncertainInput WithValueAndU(UncertainInput x, double value, double u) =>
        x.DegreesOfFreedom < double.PositiveInfinity ? UncertainInput.StudentT(x.Name, value, u, x.DegreesOfFreedom) : UncertainInput.Normal(x.Name, value, u);

    private static bool Close(double a, double b, double relative) => Math.Abs(a - b) <= relative * Math.Max(Math.Abs(a), Math.Abs(b)) || a == b;

    [Property(MaxTest = 200)]
    public Property EvaluateGum_ScalingOneInputsUncertainty_ScalesOnlyItsContribution() =>
        Prop.ForAll(
            (from inputs in Inputs
             from p in Exponents(inputs.Length)
             from which in Gen.Choose(0, inputs.Length - 1)
             from factor in Gen.Choose(1, 1000)
             select (inputs, p, which, factor / 100.0)).ToArbitrary(),
            c =>
            {
                (UncertainInput[] inputs, double[] p, int which, double factor) = c;
                GumEvaluation before = MeasurementModel.Product("y", null, 3, inputs, p).EvaluateGum();
                UncertainInput[] scaled = (UncertainInput[])inputs.Clone();
                scaled[which] = WithValueAndU(inputs[which], inputs[which].Value, inputs[which].StandardUncertainty * factor);
                GumEvaluation after = MeasurementModel.Product("y", null, 3, scaled, p).EvaluateGum();
                return Enumerable.Range(0, inputs.Length).All(i =>
                    Close(before.Contributions[i].Contribution * (i == which ? factor : 1), after.Contributions[i].Contribution, 1e-13));
            });

    [Property(MaxTest = 200)]
    public Property EvaluateGum_PermutingInputs_LeavesCombinedUncertaintyUnchanged() =>
        Prop.ForAll(
            (from inputs in Inputs
             from p in Exponents(inputs.Length)
             from order in Gen.Shuffle(Enumerable.Range(0, inputs.Length).ToArray())
             select (inputs, p, order)).ToArbitrary(),
            c =>
            {
                (UncertainInput[] inputs, double[] p, int[] order) = c;
                GumEvaluation a = MeasurementModel.Product("y", null, 1, inputs, p).EvaluateGum();
                GumEvaluation b = MeasurementModel.Product("y", null, 1, order.Select(i => inputs[i]).ToArray(), order.Select(i => p[i]).ToArray()).EvaluateGum();
                return Close(a.Value, b.Value, 1e-14) && Close(a.StandardUncertainty, b.StandardUncertainty, 1e-13)
                    && Close(a.EffectiveDegreesOfFreedom, b.EffectiveDegreesOfFreedom, 1e-12);
            });

    [Property(MaxTest = 200)]
    public Property EvaluateGum_ProductModelInOtherUnits_KeepsRelativeUncertainty() =>
        Prop.ForAll(
            (from inputs in Inputs
             from p in Exponents(inputs.Length)
             from decades in Gen.Choose(-6, 6).ArrayOf(inputs.Length)
             select (inputs, p, decades)).ToArbitrary(),
            c =>
            {
                (UncertainInput[] inputs, double[] p, int[] decades) = c;
                GumEvaluation a = MeasurementModel.Product("y", null, 1, inputs, p).EvaluateGum();
                UncertainInput[] rescaled = inputs.Select((x, i) => WithValueAndU(x, x.Value * Math.Pow(10, decades[i]), x.StandardUncertainty * Math.Pow(10, decades[i]))).ToArray();
                GumEvaluation b = MeasurementModel.Product("y", null, 1, rescaled, p).EvaluateGum();
                return Close(a.RelativeStandardUncertainty, b.RelativeStandardUncertainty, 1e-12);
            });
}
