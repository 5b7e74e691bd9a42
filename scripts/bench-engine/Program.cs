using System.Diagnostics;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;

// Target: a 20-characteristic scorecard scores already-parsed input at >= 1,000,000 scores per
// second on one core, allocating nothing per score beyond its result. The baseline, measured in
// the same run, is the least work a score needs: adding 20 decimal points looked up by index.
const int Inputs = 10_000;
const int Rounds = 3;
const int ScoresPerRound = 3_000_000;
var random = new Random(7);
var characteristics = new List<CharacteristicDefinition>();
for (var c = 0; c < 10; c++)
{
    var bins = new List<BinDefinition> { new(null, 10m, null, random.Next(0, 60)) };
    for (var b = 1; b < 9; b++)
    {
        bins.Add(new BinDefinition(b * 10m, (b + 1) * 10m, null, random.Next(0, 60)));
    }

    bins.Add(new BinDefinition(90m, null, null, random.Next(0, 60)));
    characteristics.Add(new CharacteristicDefinition($"numeric{c}", CharacteristicType.Numeric, $"N{c:00}", $"Numeric reason {c}", bins, 20m, null));
}

for (var c = 0; c < 10; c++)
{
    var bins = Enumerable.Range(0, 6).Select(b => new BinDefinition(null, null, [$"category-{c}-{b}"], random.Next(0, 60))).ToList();
    characteristics.Add(new CharacteristicDefinition($"categorical{c}", CharacteristicType.Categorical, $"C{c:00}", $"Categorical reason {c}", bins, null, 10m));
}

var scorecard = CompiledScorecard.Compile(new ScorecardDefinition("benchmark", 100m, new Scaling(600m, 50m, 20m), 4, characteristics,
    [new DecisionBand(700m, Decision.Approve), new DecisionBand(600m, Decision.Refer), new DecisionBand(null, Decision.Decline)]));

var inputs = new ScoringValue[Inputs][];
var points = new decimal[Inputs][];
for (var i = 0; i < Inputs; i++)
{
    inputs[i] = new ScoringValue[20];
    points[i] = new decimal[20];
    for (var c = 0; c < 10; c++)
    {
        inputs[i][c] = random.Next(20) == 0 ? ScoringValue.Missing : ScoringValue.Of(random.Next(0, 120));
        inputs[i][10 + c] = ScoringValue.Of($"category-{c}-{random.Next(0, 7)}");
    }

    points[i] = scorecard.Score(inputs[i], out _)!.Points;
}

decimal sink = 0;
double Engine()
{
    var started = Stopwatch.GetTimestamp();
    for (var n = 0; n < ScoresPerRound; n++)
    {
        sink += scorecard.Score(inputs[n % Inputs], out _)!.Score;
    }

    return Stopwatch.GetElapsedTime(started).TotalSeconds;
}

double Baseline()
{
    var started = Stopwatch.GetTimestamp();
    for (var n = 0; n < ScoresPerRound; n++)
    {
        var row = points[n % Inputs];
        decimal total = 100m;
        for (var c = 0; c < row.Length; c++)
        {
            total += row[c];
        }

        sink += total;
    }

    return Stopwatch.GetElapsedTime(started).TotalSeconds;
}

Engine();
Baseline();
var engineSeconds = Enumerable.Range(0, Rounds).Select(_ => Engine()).Min();
var baselineSeconds = Enumerable.Range(0, Rounds).Select(_ => Baseline()).Min();

// Allocation per score, against what the result itself takes (the same objects made directly).
var before = GC.GetAllocatedBytesForCurrentThread();
var sample = scorecard.Score(inputs[0], out _)!;
for (var n = 1; n < 100_000; n++)
{
    sample = scorecard.Score(inputs[n % Inputs], out _)!;
}

var perScore = (GC.GetAllocatedBytesForCurrentThread() - before) / 100_000.0;
before = GC.GetAllocatedBytesForCurrentThread();
for (var n = 0; n < 100_000; n++)
{
    var r = scorecard.Score(inputs[n % Inputs], out _)!;
    sample = new ScoreResult(r.Score, r.ProbabilityOfBad, r.Decision, new int[20], new decimal[20],
        r.ReasonCodes.Select(c => c with { }).ToArray());
}

var resultOnly = (GC.GetAllocatedBytesForCurrentThread() - before) / 100_000.0 - perScore;

Console.WriteLine($"scorecard: 20 characteristics (10 numeric x 10 bins, 10 categorical x 6 categories), 4 reason codes, one thread");
Console.WriteLine($"engine:   {ScoresPerRound / engineSeconds,12:N0} scores/s  ({engineSeconds * 1e9 / ScoresPerRound:N0} ns/score, best of {Rounds})");
Console.WriteLine($"baseline: {ScoresPerRound / baselineSeconds,12:N0} sums/s    (20 decimal additions per row)");
Console.WriteLine($"ratio engine/baseline throughput: {baselineSeconds / engineSeconds:P1}");
Console.WriteLine($"allocated per score: {perScore:N0} bytes; a result of the same shape built directly: {resultOnly:N0} bytes");
Console.WriteLine($"target >= 1,000,000 scores/s: {(ScoresPerRound / engineSeconds >= 1_000_000 ? "met" : "NOT met")}");
GC.KeepAlive(sink);
GC.KeepAlive(sample);
