// Choosing an internal standard (IS) from replicate injections.
// Scenario (invented): one berry extract spiked with "PX-88", an invented pesticide residue, is injected 12 times by
// LC-MS. Four candidate IS were added to the same extract; which one makes the PX-88 results tightest?
// Every name and number is invented; the signals come from the small generator below, so the output never changes.
// The library computes; the laboratory's validated method, its quality system, local regulations and licensed
// practice decide which IS the method uses (chemical suitability is not assessed here).
using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Run;

const int Injections = 12;
string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);

// A tiny documented generator: a 32-bit linear congruential generator (multiplier 1664525, increment 1013904223,
// modulus 2³²) gives uniform numbers in [0, 1); the sum of 12 of them minus 6 is close to a standard normal
// deviate (Irwin–Hall). Integer arithmetic only, so every platform prints the same numbers.
uint state = 20_261_202;
double Uniform()
{
    state = unchecked((state * 1_664_525u) + 1_013_904_223u);
    return state / 4_294_967_296.0;
}

double Normal()
{
    double sum = 0;
    for (int k = 0; k < 12; k++)
    {
        sum += Uniform();
    }

    return sum - 6;
}

// Every injection shares a sensitivity factor: a slow downward drift and 4 % (1 s) injection-to-injection scatter.
// Each signal adds its own measurement scatter (peak areas in counts).
var analyte = new double[Injections];
var labelled = new double[Injections];   // isotope-labelled PX-88: follows the analyte closely (good)
var analogue = new double[Injections];   // structural analogue at another retention time: follows it in part (mediocre)
var lateEluter = new double[Injections]; // elutes far away: does not follow it at all (worsens)
var coExtract = new double[Injections];  // follows well, but also occurs in the berries themselves (blank signal)
for (int i = 0; i < Injections; i++)
{
    double sensitivity = (1 - (0.006 * i)) * (1 + (0.04 * Normal()));
    analyte[i] = Math.Round(52_000 * sensitivity * (1 + (0.008 * Normal())));
    labelled[i] = Math.Round(84_000 * sensitivity * (1 + (0.008 * Normal())));
    analogue[i] = Math.Round(61_000 * Math.Pow(sensitivity, 0.6) * (1 + (0.028 * Normal())));
    lateEluter[i] = Math.Round(47_000 * (1 + (0.07 * Normal())));
    coExtract[i] = Math.Round(23_000 * sensitivity * (1 + (0.012 * Normal())));
}

Console.WriteLine("Peak areas (counts) of 12 injections of one extract:");
Console.WriteLine("  inj    PX-88  PX-88-13C6  KM-31  TD-5   NB-2");
for (int i = 0; i < Injections; i++)
{
    Console.WriteLine("  " + F(i + 1, "0").PadLeft(3) + F(analyte[i], "0").PadLeft(9) + F(labelled[i], "0").PadLeft(12)
        + F(analogue[i], "0").PadLeft(7) + F(lateEluter[i], "0").PadLeft(6) + F(coExtract[i], "0").PadLeft(7));
}

Console.WriteLine();

// NB-2 was also measured in three method blanks prepared without any IS: it is there anyway.
var candidates = new List<InternalStandardSelectionCandidate>
{
    new("PX-88-13C6", labelled, new double[] { 0, 0, 0 }),
    new("KM-31", analogue),
    new("TD-5", lateEluter),
    new("NB-2", coExtract, new double[] { 690, 720, 655 }),
};

// Rank the candidates: RSD of the ratio, correlation of the log signals, and a paired test of the variances.
InternalStandardSelection selection = InternalStandardSelection.Evaluate("PX-88", analyte, candidates);
Console.WriteLine(selection);
Console.WriteLine();

// What the best candidate buys: the RSD of one result, raw signal against ratio.
if (selection.Best is { Statistics: InternalStandardSelectionStatistics best } winner)
{
    double raw = selection.AnalyteRsdPercent;
    double ratio = best.RatioRsdPercent;
    Console.WriteLine($"Dividing by {winner.Name} takes the RSD of one PX-88 injection from {F(raw, "F2")} % (raw peak area) to {F(ratio, "F2")} % (area ratio), {F(raw / ratio, "F1")} times tighter.");
    Console.WriteLine($"Averaging alone would need about {F(Math.Ceiling((raw / ratio) * (raw / ratio)), "F0")} injections per result to tighten the raw signal as much.");
}
else
{
    Console.WriteLine("No candidate reduces the scatter significantly; look for a better-matched internal standard.");
}

Console.WriteLine("Caution: the ranking supports, never replaces, the method developer's choice; the laboratory's validated"
    + " method, its quality system, local regulations and licensed practice decide.");
