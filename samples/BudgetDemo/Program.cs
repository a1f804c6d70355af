// From a weighed reference substance to a reported result with its uncertainty budget.
// Scenario (invented): "VR-23", an invented preservative, is determined by LC-MS in "HP-3", an invented herbal
// powder, with its labelled analogue VR-23-d6 as internal standard (IS). Every name and number is invented.
// The library computes; the laboratory's validated method, its quality system, local regulations and licensed
// practice decide what is reported.
using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Calibration;
using InternalStdCal.Decisions;
using InternalStdCal.Preparation;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using InternalStdCal.Uncertainty;

Volume Ml(double value) => Volume.FromMillilitres(value);
Measured<Volume> Pipette(double ml) => VolumetricEquipment.ClassAOneMarkPipette(Ml(ml), ToleranceDistribution.Triangular);
Measured<Volume> Flask(double ml) => VolumetricEquipment.ClassAOneMarkFlask(Ml(ml), ToleranceDistribution.Triangular);
string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

// 1. The stock: 25.03 mg of VR-23 (purity 99.85 % ± 0.10 %) weighed by difference and made up to 25 mL.
//    The balance: linearity ±0.1 mg, repeatability 0.05 mg, readability 0.1 mg. The flask's u combines its class A
//    tolerance with a ±4 °C temperature effect.
var balance = new Balance(Mass.FromMilligrams(0.1), Mass.FromMilligrams(0.05), Mass.FromMilligrams(0.1));
Measured<Mass> weighed = balance.WeighByDifference(Mass.FromMilligrams(25.03));
Purity purity = Purity.FromTolerance(0.9985, 0.0010, ToleranceDistribution.Rectangular);
Measured<Volume> stockFlask = VolumetricEquipment.Combine(
    Ml(25),
    Flask(25).StandardUncertainty,
    VolumetricEquipment.TemperatureEffect(Ml(25), 4, VolumetricEquipment.WaterExpansionCoefficientPerKelvin));
PreparedSolution stock = PreparedSolution.FromWeighedSubstance("VR-23 stock", weighed, purity, stockFlask, ConcentrationUnit.MilligramPerLitre);
Console.WriteLine("Balance: one reading u = " + balance.SingleReadingStandardUncertainty.ConvertTo(MassUnit.Milligram).ToString("G3", null) + "; weighed " + weighed.ToString("G4", null));
Console.WriteLine(stock);
Console.WriteLine();

// 2. Stock → intermediate (1 mL into 100 mL) → six working standards (aliquots into 100 mL flasks).
DilutionStep toIntermediate = DilutionStep.Volumetric(Pipette(1), Flask(100));
PreparedSolution intermediate = stock.Dilute(toIntermediate, "VR-23 intermediate");
double[] aliquotsMl = { 1, 2, 5, 10, 20, 25 };
var workingStandards = new List<PreparedSolution>();
for (int i = 0; i < aliquotsMl.Length; i++)
{
    workingStandards.Add(intermediate.Dilute(DilutionStep.Volumetric(Pipette(aliquotsMl[i]), Flask(100)), "WS-" + (i + 1).ToString(CultureInfo.InvariantCulture)));
}

// The path to the top standard as a chain table, then every working standard with its u.
Console.WriteLine(DilutionChain.From(stock, toIntermediate, DilutionStep.Volumetric(Pipette(25), Flask(100))));
Console.WriteLine("Working standards:");
foreach (PreparedSolution standard in workingStandards)
{
    Console.WriteLine("  " + standard);
}

Console.WriteLine();

// Budget of the lowest standard: every weighing, volume and the purity, step by step.
Console.WriteLine("WS-1, per-step budget:");
Console.WriteLine(workingStandards[0].Budget);

// 3. The IS: a certified solution, 100.0 mg/L ± 0.6 mg/L (k = 2), diluted 1 mL into 100 mL; 100 µL of that is
//    spiked into every 10 mL measured solution (an adjustable pipette: ±0.8 µL systematic, 0.3 µL random).
PreparedSolution isCertified = PreparedSolution.FromCertificate(
    "VR-23-d6 certified",
    Measured.FromExpandedUncertainty(Concentration.FromMilligramsPerLitre(100.0), Concentration.FromMilligramsPerLitre(0.6), 2));
PreparedSolution isSpikingSolution = isCertified.Dilute(DilutionStep.Volumetric(Pipette(1), Flask(100)), "VR-23-d6 spiking solution");
Measured<Volume> spikeVolume = VolumetricEquipment.AdjustablePipette(
    Volume.FromMicrolitres(100), Volume.FromMicrolitres(0.8), Volume.FromMicrolitres(0.3), ToleranceDistribution.Rectangular);
var spike = InternalStandardSpike.Create(isSpikingSolution, DilutionStep.Volumetric(spikeVolume, Flask(10)), SpikeTiming.AfterSamplePreparation);
Console.WriteLine(spike);
Console.WriteLine();

// 4. Calibrate: each working standard (with the same IS spike) injected twice; peak areas in counts.
Concentration isInSolution = spike.Concentration.Value;
double[][] areas =
{
    new double[] { 39_795, 200_480, 40_488, 203_150 },
    new double[] { 79_549, 199_620, 78_598, 197_880 },
    new double[] { 197_378, 198_950, 202_072, 202_700 },
    new double[] { 399_660, 201_340, 394_853, 198_120 },
    new double[] { 794_848, 199_410, 801_666, 201_880 },
    new double[] { 998_064, 201_020, 989_625, 198_640 },
};
var standards = new List<CalibrationStandard>();
for (int i = 0; i < workingStandards.Count; i++)
{
    standards.Add(CalibrationStandard.Create(
        workingStandards[i].Name,
        workingStandards[i].Concentration.Value,
        isInSolution,
        new Injection(areas[i][0], areas[i][1]),
        new Injection(areas[i][2], areas[i][3])));
}

RegressionCalibration calibration = RegressionCalibration.Fit(standards, CalibrationModel.Linear, Weighting.InverseX);
Console.WriteLine(calibration.Summary());

// 5. The sample: 250.4 mg of HP-3 extracted into 50 mL; 1 mL of the extract + the IS spike made up to 10 mL and
//    injected twice.
var sample = UnknownSample.Create("HP-3 lot 17", isInSolution, new Injection(463_200, 201_600), new Injection(455_900, 198_300));
QuantitationResult quantitation = SampleQuantitation.Quantify(calibration, sample);
Console.WriteLine(quantitation);
Console.WriteLine();

// The preparation as a back-calculation template: extract volume, sample mass and the 1 → 10 mL dilution.
SampleResult preparation = SampleResult.Solid(
    quantitation.AsMeasured()!.Value,
    Flask(50),
    balance.WeighByDifference(Mass.FromMilligrams(250.4)),
    new DilutionStep[] { DilutionStep.Volumetric(Pipette(1), Flask(10)) },
    ConcentrationUnit.MilligramPerKilogram);

// Two components from the validation (invented): recovery 96 % from 10 spiked extracts (Student t, ν = 9; the result
// is corrected for it, exponent −1) and a matrix factor of 1 within ±2 % (rectangular).
// The IS is left out: the same spike goes into standards and sample, so its error cancels in the ratio.
var factors = new[]
{
    UncertainInput.StudentT("extraction recovery", 0.96, 0.012, 9),
    UncertainInput.Rectangular("matrix factor", 1, 0.02),
};
var budget = ResultUncertaintyBudget.Create(quantitation, preparation, factors: factors, factorExponents: new[] { -1.0, 1.0 });

// 6. The GUM budget: sensitivities, contributions and shares of the variance.
Console.WriteLine("Result budget (GUM):");
Console.WriteLine(budget);

// 7. Monte Carlo (JCGM 101:2008) with a fixed seed, and whether it confirms the GUM interval.
MonteCarloEvaluation monteCarlo = budget.MonteCarlo(seed: 20_261_202);
Console.WriteLine("Monte Carlo: " + monteCarlo);
Console.WriteLine("  95 % intervals in mg/kg: probabilistically symmetric " + monteCarlo.SymmetricInterval + ", shortest " + monteCarlo.ShortestInterval);
GufValidation validation = monteCarlo.ValidateGum(budget.Gum);
Console.WriteLine("  " + validation);
Console.WriteLine(validation.IsValidated
    ? "  The GUM interval is confirmed; either evaluation may be reported."
    : "  The GUM interval is not confirmed (the recovery divides the result and is a Student t input); JCGM 101:2008 §8 then uses the Monte Carlo interval.");
Console.WriteLine();

// 8. The reported result against an invented maximum of 2450 mg/kg, under two decision rules.
Measured<Concentration> reported = budget.ToMeasured();
var limit = SpecificationLimit.Upper(Concentration.FromMilligramsPerKilogram(2450), "VR-23 maximum in HP-3");
Coverage coverage = Coverage.WithFactor(budget.Gum.CoverageFactor);
Console.WriteLine("Reported: " + F(reported.Value.Value, "F0") + " mg/kg ± " + F(budget.Gum.ExpandedUncertainty, "F0")
    + " mg/kg (k = " + F(budget.Gum.CoverageFactor, "F2") + ", p = 95 %)");
foreach (DecisionRule rule in new[] { DecisionRule.SimpleAcceptance, DecisionRule.ExpandedUncertaintyGuardBand(DecisionMode.NonBinary) })
{
    Console.WriteLine("  " + rule.Assess(limit, reported, coverage));
}

Console.WriteLine("Caution: these numbers support, never replace, the responsible analyst's decision; the laboratory's"
    + " validated method, its quality system, local regulations and licensed practice decide.");
