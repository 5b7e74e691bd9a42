using System.Globalization;
using FluentValidation;

namespace Ledgerline.Api.Features.Decisions;

internal sealed class DecisionRequestValidator : AbstractValidator<DecisionRequest>
{
    public const int MaxApplicationIdLength = 100;

    public const int MaxKeyLength = 200;

    public DecisionRequestValidator(TimeProvider clock)
    {
        RuleFor(r => r.ApplicationId).NotEmpty().WithMessage("must give the application's id (1 to 100 characters)")
            .MaximumLength(MaxApplicationIdLength).WithMessage(r => $"is {r.ApplicationId!.Length} characters long; at most {MaxApplicationIdLength} are allowed");
        RuleFor(r => r.AssignmentKey).NotEmpty().WithMessage("must not be empty; leave it out to assign by application id")
            .MaximumLength(MaxKeyLength).WithMessage($"must be at most {MaxKeyLength} characters")
            .When(r => r.AssignmentKey is not null);
        RuleFor(r => r.ApplicationDate).Custom((text, context) =>
        {
            if (text is null)
            {
                return;
            }

            if (!TryParseDate(text, out var date))
            {
                context.AddFailure($"'{text}' is not a date; send yyyy-MM-dd, e.g. 2026-11-30");
            }
            else if (date > LatestToday(clock))
            {
                context.AddFailure($"{text} is in the future; send the date the application was taken (today or earlier)");
            }
        });
        RuleFor(r => r.Characteristics).NotNull().WithMessage("must give the application's characteristics as an object: name → number, text or null");
    }

    public static bool TryParseDate(string text, out DateOnly date) =>
        DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out date);

    /// <summary>
    /// Today's date in the easternmost time zone (UTC+14): an origination system anywhere may
    /// send its local today, and nothing later is accepted.
    /// </summary>
    public static DateOnly LatestToday(TimeProvider clock) => DateOnly.FromDateTime(clock.GetUtcNow().UtcDateTime.AddHours(14));
}

internal sealed class DecisionBatchRequestValidator : AbstractValidator<DecisionBatchRequest>
{
    public DecisionBatchRequestValidator() =>
        RuleFor(r => r.Applications).NotNull().WithMessage("must list the applications to decide")
            .Must(a => a!.Count is > 0 and <= DecisionsEndpoints.MaxBatchItems)
            .WithMessage(r => $"holds {r.Applications!.Count} applications; send 1 to {DecisionsEndpoints.MaxBatchItems} per batch")
            .When(r => r.Applications is not null, ApplyConditionTo.CurrentValidator);
}
