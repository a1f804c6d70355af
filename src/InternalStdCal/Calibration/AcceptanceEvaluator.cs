using System;
using System.Collections.Generic;
using System.Linq;

namespace InternalStdCal.Calibration;

/// <summary>Applies the criteria of an <see cref="AcceptanceRuleSet"/>; every criterion is generic over the data.</summary>
internal static class AcceptanceEvaluator
{
    internal static AcceptanceVerdict Evaluate(AcceptanceRuleSet rules, RatioCalibration calibration)
    {
        List<CalibratorPoint> points = calibration.Calibrators().ToList();
        double low = calibration.LowestX;
        double high = calibration.HighestX;
        var outcomes = new List<CalibratorOutcome>(points.Count);
        foreach (CalibratorPoint p in points)
        {
            double? limit = p.Level.X == low ? rules.MaxAbsRelativeErrorAtLowestLevelPercent ?? rules.MaxAbsRelativeErrorPercent
                : p.Level.X == high ? rules.MaxAbsRelativeErrorAtHighestLevelPercent ?? rules.MaxAbsRelativeErrorPercent
                : rules.MaxAbsRelativeErrorPercent;
            bool passed = limit is not double l || (p.RelativeErrorPercent is double re && Math.Abs(re) <= l);
            outcomes.Add(new CalibratorOutcome(p.Id, p.Level.Label, p.Level.Standard.AnalyteConcentration, p.BackCalculated, p.RelativeErrorPercent, limit, passed));
        }

        bool anyPointLimit = rules.MaxAbsRelativeErrorPercent is not null || rules.MaxAbsRelativeErrorAtLowestLevelPercent is not null
            || rules.MaxAbsRelativeErrorAtHighestLevelPercent is not null;
        var criteria = new List<CriterionOutcome>();
        int passing = outcomes.Count(o => o.Passed);
        string outside = passing == outcomes.Count ? string.Empty : "; outside: " + string.Join(", ", outcomes.Where(o => !o.Passed).Select(Describe));
        if (rules.MinFractionOfCalibratorsPassing is double minFraction)
        {
            double fraction = outcomes.Count == 0 ? 0 : (double)passing / outcomes.Count;
            criteria.Add(anyPointLimit
                ? Judge("MinFractionOfCalibratorsPassing", fraction >= minFraction, fraction, minFraction,
                    Text.I(passing) + " of " + Text.I(outcomes.Count) + " calibrators (" + Text.F(100 * fraction, 1) + " %) within " + LimitText(rules)
                    + ", required ≥ " + Text.F(100 * minFraction, 1) + " %" + outside)
                : NotApplicable("MinFractionOfCalibratorsPassing", minFraction, "fraction of passing calibrators: the rule set defines no |%RE| limit"));
        }
        else if (anyPointLimit)
        {
            criteria.Add(Judge("MaxAbsRelativeErrorPercent", passing == outcomes.Count, passing, outcomes.Count,
                Text.I(passing) + " of " + Text.I(outcomes.Count) + " calibrators within " + LimitText(rules) + ", all required" + outside));
        }

        if (rules.MinLevels is int minLevels)
        {
            int levels = calibration.LevelCount;
            criteria.Add(Judge("MinLevels", levels >= minLevels, levels, minLevels, Text.I(levels) + " non-blank levels fitted, required ≥ " + Text.I(minLevels)));
        }

        if (rules.MinPassingLevels is int minPassing)
        {
            if (anyPointLimit)
            {
                // A level is a distinct x; its calibrators may come from several standards.
                var byLevel = outcomes.Zip(points, (o, p) => (o, p.Level.X)).GroupBy(t => t.X).ToList();
                var passingLevels = byLevel.Where(g => g.Count(t => t.o.Passed) >= rules.LevelPassingFraction * g.Count()).ToList();
                var failingLevels = byLevel.Except(passingLevels).Select(g => string.Join("/", g.Select(t => t.o.Level).Distinct())).ToList();
                criteria.Add(Judge("MinPassingLevels", passingLevels.Count >= minPassing, passingLevels.Count, minPassing,
                    Text.I(passingLevels.Count) + " levels passing (≥ " + Text.F(100 * rules.LevelPassingFraction, 0) + " % of their calibrators within limits), required ≥ " + Text.I(minPassing)
                    + (failingLevels.Count == 0 ? string.Empty : "; failing levels: " + string.Join(", ", failingLevels))));
            }
            else
            {
                criteria.Add(NotApplicable("MinPassingLevels", minPassing, "passing levels: the rule set defines no |%RE| limit"));
            }
        }

        if (rules.MinCorrelationCoefficientLinear is double minR)
        {
            criteria.Add(calibration is RegressionCalibration { Model: RatioModel.Linear } line
                ? Judge("MinCorrelationCoefficientLinear", line.CorrelationCoefficient >= minR, line.CorrelationCoefficient, minR,
                    "r = " + Text.F(line.CorrelationCoefficient, 6) + ", required ≥ " + Text.G(minR))
                : NotApplicable("MinCorrelationCoefficientLinear", minR, "r ≥ " + Text.G(minR) + " applies to a straight line with intercept; model is " + calibration.Model));
        }

        if (rules.MinCoefficientOfDeterminationNonLinear is double minR2)
        {
            criteria.Add(calibration is RegressionCalibration { Model: RatioModel.Quadratic } quad
                ? Judge("MinCoefficientOfDeterminationNonLinear", quad.CoefficientOfDetermination >= minR2, quad.CoefficientOfDetermination, minR2,
                    "R² = " + Text.F(quad.CoefficientOfDetermination, 6) + ", required ≥ " + Text.G(minR2))
                : NotApplicable("MinCoefficientOfDeterminationNonLinear", minR2, "R² ≥ " + Text.G(minR2) + " applies to a quadratic; model is " + calibration.Model));
        }

        if (rules.MaxRelativeStandardErrorPercent is double maxRse)
        {
            criteria.Add(calibration.RelativeStandardErrorPercent is double rse
                ? Judge("MaxRelativeStandardErrorPercent", rse <= maxRse, rse, maxRse, "RSE = " + Text.F(rse, 3) + " %, required ≤ " + Text.G(maxRse) + " %")
                : Unevaluable("MaxRelativeStandardErrorPercent", maxRse, "RSE ≤ " + Text.G(maxRse) + " % could not be evaluated (see the calibration notes)"));
        }

        if (rules.MaxResponseFactorRsdPercent is double maxRsd)
        {
            if (calibration is ResponseFactorCalibration rf)
            {
                criteria.Add(rf.ResponseFactorRsdPercent is double rsd
                    ? Judge("MaxResponseFactorRsdPercent", rsd <= maxRsd, rsd, maxRsd, "RF %RSD = " + Text.F(rsd, 3) + " %, required ≤ " + Text.G(maxRsd) + " %")
                    : Unevaluable("MaxResponseFactorRsdPercent", maxRsd, "RF %RSD ≤ " + Text.G(maxRsd) + " % could not be evaluated: only one response factor"));
            }
            else
            {
                criteria.Add(NotApplicable("MaxResponseFactorRsdPercent", maxRsd, "RF %RSD ≤ " + Text.G(maxRsd) + " % applies to response-factor models; model is " + calibration.Model));
            }
        }

        return new AcceptanceVerdict(rules, criteria, outcomes);
    }

    private static string LimitText(AcceptanceRuleSet rules)
    {
        var parts = new List<string>();
        if (rules.MaxAbsRelativeErrorPercent is double g)
        {
            parts.Add("±" + Text.G(g) + " %");
        }

        if (rules.MaxAbsRelativeErrorAtLowestLevelPercent is double lo)
        {
            parts.Add("±" + Text.G(lo) + " % at the lowest level");
        }

        if (rules.MaxAbsRelativeErrorAtHighestLevelPercent is double hi)
        {
            parts.Add("±" + Text.G(hi) + " % at the highest level");
        }

        return string.Join(", ", parts);
    }

    private static string Describe(CalibratorOutcome o) =>
        o.Id + " (" + (o.RelativeErrorPercent is double re ? Text.Signed(re, 2) + " %" : "no back-calculated value") + ")";

    private static CriterionOutcome Judge(string name, bool ok, double observed, double limit, string text) =>
        new(name, ok ? CriterionStatus.Passed : CriterionStatus.Failed, observed, limit, text);

    private static CriterionOutcome NotApplicable(string name, double limit, string text) =>
        new(name, CriterionStatus.NotApplicable, null, limit, text);

    private static CriterionOutcome Unevaluable(string name, double limit, string text) =>
        new(name, CriterionStatus.Failed, null, limit, text);
}
