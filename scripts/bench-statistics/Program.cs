using System.Diagnostics;
using Ledgerline.Scoring.Statistics;

// Targets: 10,000,000 decisions over 1,000 distinct scores, all report statistics together < 50 ms;
// paired DeLong over 1,000,000 applications < 1 s. Fixed seed so runs are comparable.
var random = new Random(20240601);

// A histogram of 10 million decisions: the bad rate falls as the score rises.
var counts = new List<ScoreCount>();
long remaining = 10_000_000;
for (var score = 300; score < 1300; score++)
{
    var total = score == 1299 ? remaining : 10_000;
    remaining -= total;
    var badRate = 1 / (1 + Math.Exp((score - 700) / 80.0));
    var bads = (long)Math.Round(total * badRate);
    counts.Add(new ScoreCount(score, total - bads, bads));
}

var reference = counts.Select(count => new ScoreFrequency(count.Score + random.Next(-3, 4), count.Total)).ToArray();

void ReportStatistics()
{
    var histogram = new ScoreHistogram(counts);
    _ = Roc.Compute(histogram);
    _ = KolmogorovSmirnov.Compute(histogram);
    _ = CaptureAndLift.Compute(histogram);
    var cuts = ScoreBinning.QuantileCutPoints(reference);
    var expected = ScoreBinning.Assign(reference, cuts, BinEdge.RightClosed);
    var actual = ScoreBinning.Assign(histogram.ToFrequencies(), cuts, BinEdge.RightClosed);
    _ = StabilityIndex.Compute(expected, actual);
    var cells = Calibration.CellsByScoreBand(histogram, cuts, BinEdge.RightClosed, score => 1 / (1 + Math.Exp((score - 700) / 80.0)));
    _ = Calibration.Assess(cells);
    _ = HosmerLemeshow.Compute(cells, cells.Count);
    _ = BrierScore.Compute(histogram.Counts.Select(count => new ProbabilityGroup(1 / (1 + Math.Exp((count.Score - 700) / 80.0)), count.Total, count.Bads)));
}

// One million applications, one cell each (the worst case: no two share a cell).
var paired = new PairedScoreCount[1_000_000];
for (var i = 0; i < paired.Length; i++)
{
    var scoreA = random.Next(300, 1300);
    var scoreB = Math.Clamp(scoreA + random.Next(-40, 41), 300, 1299);
    var bad = random.NextDouble() < 1 / (1 + Math.Exp((scoreA - 700) / 80.0));
    paired[i] = new PairedScoreCount(scoreA, scoreB, bad ? 0 : 1, bad ? 1 : 0);
}

ReportStatistics();
_ = DeLong.PairedTest(paired);

var watch = Stopwatch.StartNew();
const int Repeats = 20;
for (var i = 0; i < Repeats; i++)
{
    ReportStatistics();
}

var reportMilliseconds = watch.Elapsed.TotalMilliseconds / Repeats;
watch.Restart();
var test = DeLong.PairedTest(paired);
var pairedMilliseconds = watch.Elapsed.TotalMilliseconds;

Console.WriteLine($"Report statistics, 10,000,000 decisions over 1,000 scores: {reportMilliseconds:F2} ms (target < 50 ms)");
Console.WriteLine($"Paired DeLong, 1,000,000 applications: {pairedMilliseconds:F0} ms (target < 1000 ms), z = {test.Z:F3}");
