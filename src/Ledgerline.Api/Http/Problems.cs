using Ledgerline.Scoring.Scorecards;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Ledgerline.Api.Http;

/// <summary>The expected failures, as RFC 9457 problem details with a message a person can act on.</summary>
public static class Problems
{
    public static ProblemHttpResult NotFound(string detail) =>
        TypedResults.Problem(detail: detail, statusCode: StatusCodes.Status404NotFound, title: "Not found");

    public static ProblemHttpResult Conflict(string detail) =>
        TypedResults.Problem(detail: detail, statusCode: StatusCodes.Status409Conflict, title: "Conflict");

    public static ValidationProblem Invalid(IDictionary<string, string[]> errors) =>
        TypedResults.ValidationProblem(errors, detail: Summarise(errors), title: "The request is not valid");

    public static ValidationProblem Invalid(IEnumerable<FieldProblem> problems) =>
        Invalid(problems.GroupBy(p => p.Path).ToDictionary(g => g.Key, g => g.Select(p => p.Message).ToArray()));

    public static ValidationProblem Invalid(string path, string message) =>
        Invalid(new Dictionary<string, string[]> { [path] = [message] });

    private static string Summarise(IDictionary<string, string[]> errors)
    {
        var first = errors.First();
        var more = errors.Sum(e => e.Value.Length) - 1;
        var text = $"{first.Key}: {first.Value[0]}";
        return more > 0 ? $"{text} (and {more} more problem{(more == 1 ? "" : "s")}, listed under 'errors')" : text;
    }
}
