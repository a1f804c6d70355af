using System;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>One input of a product/quotient model y = k·Π xᵢ^sᵢ, before its contribution to a result is known.</summary>
internal readonly struct BudgetTerm
{
    private BudgetTerm(string stage, string component, double value, double standardUncertainty, string unit, UncertaintyEvaluation evaluation, double? degreesOfFreedom, double sensitivity)
    {
        Stage = stage;
        Component = component;
        Value = value;
        StandardUncertainty = standardUncertainty;
        Unit = unit;
        Evaluation = evaluation;
        DegreesOfFreedom = degreesOfFreedom;
        Sensitivity = sensitivity;
    }

    internal string Stage { get; }

    internal string Component { get; }

    internal double Value { get; }

    internal double StandardUncertainty { get; }

    internal string Unit { get; }

    internal UncertaintyEvaluation Evaluation { get; }

    internal double? DegreesOfFreedom { get; }

    /// <summary>Relative sensitivity coefficient ∂ln y/∂ln x: the exponent sᵢ.</summary>
    internal double Sensitivity { get; }

    /// <summary>|sᵢ|·u(xᵢ)/|xᵢ|: this input's share of u(y)/|y| (JCGM 100:2008 §5.1.6). Requires xᵢ ≠ 0.</summary>
    internal double RelativeContribution => Math.Abs(Sensitivity) * StandardUncertainty / Math.Abs(Value);

    internal static BudgetTerm Of(string stage, string component, Measured<Volume> input, double sensitivity) =>
        new(stage, component, input.Value.Value, input.StandardUncertainty.Value, UnitTable.Symbol(input.Value.Unit), input.Evaluation, input.DegreesOfFreedom, sensitivity);

    internal static BudgetTerm Of(string stage, string component, Measured<Mass> input, double sensitivity) =>
        new(stage, component, input.Value.Value, input.StandardUncertainty.Value, UnitTable.Symbol(input.Value.Unit), input.Evaluation, input.DegreesOfFreedom, sensitivity);

    internal static BudgetTerm Of(string stage, string component, Measured<Concentration> input, double sensitivity) =>
        new(stage, component, input.Value.Value, input.StandardUncertainty.Value, Concentration.SymbolOf(input.Value.Unit), input.Evaluation, input.DegreesOfFreedom, sensitivity);

    internal static BudgetTerm Of(string stage, string component, Purity purity, double sensitivity) =>
        new(stage, component, purity.MassFraction, purity.StandardUncertainty, "g/g", purity.Evaluation, null, sensitivity);

    internal static BudgetTerm OfDensity(string stage, string component, Density density, double standardUncertainty, double sensitivity) =>
        new(stage, component, density.GramsPerMillilitre, standardUncertainty, "g/mL", standardUncertainty == 0 ? UncertaintyEvaluation.Exact : UncertaintyEvaluation.TypeBStandard, null, sensitivity);

    internal BudgetTerm WithStage(string stage, double sensitivity) =>
        new(stage, Component, Value, StandardUncertainty, Unit, Evaluation, DegreesOfFreedom, sensitivity);
}
