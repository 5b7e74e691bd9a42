namespace Ledgerline.Scoring.Scorecards;

/// <summary>One reason a points table or a scoring input is not acceptable.</summary>
/// <param name="Path">Where the problem is, as a JSON path into the request (e.g. <c>characteristics[1].bins[2].from</c>).</param>
/// <param name="Message">What is wrong and what was expected, in words a person can act on.</param>
public sealed record FieldProblem(string Path, string Message);
