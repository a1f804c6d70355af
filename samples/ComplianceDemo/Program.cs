// Compliance decisions near a limit, with a plan for more replicates.
// Scenario (invented): a water utility's laboratory checks a batch of drinking-water samples for "DBX-9", an invented
// disinfection by-product, against an invented maximum of 10 µg/L. Every name and number is invented for this demo.
// The library computes; the laboratory's validated method, its quality system, local regulations and licensed
// practice decide what is reported.
using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;

Concentration Ug(double value) => Concentration.FromMicrogramsPerLitre(value);
string Pct(double p) => (100 * p).ToString("F1", CultureInfo.InvariantCulture) + " %";

// 1. The limit and the decision rules, agreed with the customer before measuring (ISO/IEC 17025:2017 §7.1.3).
var limit = SpecificationLimit.Upper(Ug(10), "DBX-9 maximum");
DecisionRule[] rules =
{
    DecisionRule.SimpleAcceptance,
    DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.BinaryGuardedAcceptance),
    DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary),
    DecisionRule.RiskGuardBand(0.05, DecisionMode.BinaryGuardedRejection),
    DecisionRule.RiskGuardBand(0.05, DecisionMode.NonBinary),
};
Console.WriteLine("Limit: " + limit);
foreach (DecisionRule rule in rules)
{
    Console.WriteLine("  Rule: " + rule.Name + " [" + rule.Source + "]");
}

Console.WriteLine();

// 2. One reported result per tap, each with the method's standard uncertainty u = 0.45 µg/L; U = k·u with k = 2.
var taps = new Dictionary<string, double>
{
    ["TAP-NORTH"] = 7.9,
    ["TAP-MILL"] = 9.4,
    ["TAP-RIDGE"] = 10.3,
    ["TAP-EAST"] = 11.6,
};
Coverage k2 = Coverage.WithFactor(2);
foreach (KeyValuePair<string, double> tap in taps)
{
    Measured<Concentration> result = Measured.WithStandardUncertainty(Ug(tap.Value), Ug(0.45));
    Console.WriteLine($"{tap.Key}: {result.Value} (u = {result.StandardUncertainty}), P(true value > limit) = {Pct(DecisionRule.SimpleAcceptance.Assess(limit, result).ProbabilityBeyondLimit)}");
    foreach (DecisionRule rule in rules)
    {
        ComplianceDecision decision = rule.Assess(limit, result, k2);
        string zone = decision.Zone is DecisionZone z ? " / " + z : string.Empty;
        Console.WriteLine($"    {rule.Name,-70} {decision.Outcome}{zone}");
    }
}

Console.WriteLine();

// 3. TAP-RIDGE was measured in replicate; a one-sided t test of the mean at α = 0.05 (non-binary: inconclusive when
//    the mean is not significantly on either side).
DecisionRule tTest = DecisionRule.OneSidedTTest(0.05, DecisionMode.NonBinary);
Concentration[] ridge = { Ug(10.6), Ug(9.9), Ug(10.5), Ug(10.2) };
ComplianceDecision ridgeDecision = tTest.Assess(limit, ridge);
Console.WriteLine("TAP-RIDGE replicates: " + ridgeDecision);
Console.WriteLine();

// 4. The planner: assuming the mean and spread seen so far, how many replicates in total (and how many more) let the
//    t test decide with 95 % power?
ReplicatePlan plan = ReplicatesPlanner.ForReplicates(limit, ridge, 0.05, 0.95);
Console.WriteLine("Plan: " + plan);
Console.WriteLine($"Measure {plan.AdditionalReplicates} more replicate(s) of TAP-RIDGE.");

// ... and the other way round: with 8 replicates in all, how large may the method's RSD be?
double rsd = ReplicatesPlanner.MaximumRsdPercent(limit, ridgeDecision.Result, 8, 0.05, 0.95);
Console.WriteLine($"With 8 replicates the t test decides (power 95 %) if the RSD of one result is at most {rsd.ToString("F2", CultureInfo.InvariantCulture)} %.");
Console.WriteLine();

// 5. The extra replicates arrive (invented): decide again on all of them, with the rule agreed in step 3.
var all = new List<Concentration>(ridge);
double[] more = { 10.4, 10.7, 10.1, 10.5, 10.6, 10.3, 10.8, 10.2, 10.5, 10.4 };
for (int i = 0; i < plan.AdditionalReplicates && i < more.Length; i++)
{
    all.Add(Ug(more[i]));
}

Console.WriteLine("TAP-RIDGE, all replicates: " + tTest.Assess(limit, all));
Console.WriteLine("These outcomes support, never replace, the responsible analyst's decision.");
