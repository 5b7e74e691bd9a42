using FluentValidation;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>
/// Checks the shape of a points table (required fields, known words), then, when the shape is
/// sound, every rule of <see cref="ScorecardValidator"/> (bins, bands, scaling), all in one answer.
/// </summary>
internal sealed class RegisterVersionRequestValidator : AbstractValidator<RegisterVersionRequest>
{
    public RegisterVersionRequestValidator()
    {
        RuleFor(r => r.Scaling).NotNull().WithMessage("must give baseScore, baseOdds and pointsToDoubleOdds");
        RuleFor(r => r.Scaling!.BaseScore).NotNull().OverridePropertyName("scaling.baseScore").When(r => r.Scaling is not null);
        RuleFor(r => r.Scaling!.BaseOdds).NotNull().OverridePropertyName("scaling.baseOdds").When(r => r.Scaling is not null);
        RuleFor(r => r.Scaling!.PointsToDoubleOdds).NotNull().OverridePropertyName("scaling.pointsToDoubleOdds").When(r => r.Scaling is not null);
        RuleFor(r => r.Characteristics).NotEmpty().WithMessage("must list at least one characteristic");
        RuleFor(r => r.DecisionBands).NotEmpty().WithMessage("must list at least one band; the last has no minScore");
        RuleForEach(r => r.Characteristics).ChildRules(c =>
        {
            c.RuleFor(x => x.Name).NotEmpty();
            c.RuleFor(x => x.Type).Must(t => t is "numeric" or "categorical").WithMessage("must be 'numeric' or 'categorical'");
            c.RuleFor(x => x.ReasonCode).NotEmpty();
            c.RuleFor(x => x.ReasonText).NotEmpty();
            c.RuleFor(x => x.Bins).NotEmpty().WithMessage("must list at least one bin");
            // One pass over the bins rather than a child rule per bin: tables hold tens of thousands.
            c.RuleFor(x => x.Bins).Custom((bins, context) =>
            {
                for (var b = 0; bins is not null && b < bins.Count; b++)
                {
                    if (bins[b]?.Points is null)
                    {
                        context.AddFailure(new FluentValidation.Results.ValidationFailure($"{context.PropertyPath}[{b}].points", "must give the bin's points"));
                    }
                }
            });
        });
        RuleForEach(r => r.DecisionBands).ChildRules(b =>
            b.RuleFor(x => x.Decision).Must(d => BandNames.TryParse(d, out _)).WithMessage("must be 'approve', 'refer' or 'decline'"));
        RuleFor(r => r).Custom((request, context) =>
        {
            foreach (var problem in ScorecardValidator.Validate(request.ToDefinition()))
            {
                context.AddFailure(problem.Path, problem.Message);
            }
        }).When(ShapeIsSound);
    }

    private static bool ShapeIsSound(RegisterVersionRequest r) =>
        r.Scaling is { BaseScore: not null, BaseOdds: not null, PointsToDoubleOdds: not null }
        && r.Characteristics is { Count: > 0 }
        && r.DecisionBands is { Count: > 0 }
        && r.Characteristics.All(c => c is { Name.Length: > 0, Type: "numeric" or "categorical", ReasonCode.Length: > 0, ReasonText.Length: > 0, Bins.Count: > 0 }
            && c.Bins.All(b => b?.Points is not null))
        && r.DecisionBands.All(b => BandNames.TryParse(b.Decision, out _));
}

internal sealed class CreateScorecardRequestValidator : AbstractValidator<CreateScorecardRequest>
{
    public CreateScorecardRequestValidator()
    {
        RuleFor(r => r.Key).NotEmpty().MaximumLength(64)
            .Matches("^[a-z0-9]+(-[a-z0-9]+)*$")
            .WithMessage("must be a URL-safe slug: lower-case letters and digits in words joined by single hyphens, e.g. 'personal-loan-application'");
        RuleFor(r => r.Name).NotEmpty().MaximumLength(200);
        RuleFor(r => r.OutcomeDefinition).NotNull().WithMessage("must give badDaysPastDue, indeterminateDaysPastDue and performanceWindowMonths");
        RuleFor(r => r.OutcomeDefinition!.BadDaysPastDue).NotNull().InclusiveBetween(1, 3650)
            .OverridePropertyName("outcomeDefinition.badDaysPastDue").When(r => r.OutcomeDefinition is not null);
        RuleFor(r => r.OutcomeDefinition!.IndeterminateDaysPastDue).NotNull().InclusiveBetween(0, 3650)
            .OverridePropertyName("outcomeDefinition.indeterminateDaysPastDue").When(r => r.OutcomeDefinition is not null);
        RuleFor(r => r.OutcomeDefinition!.IndeterminateDaysPastDue)
            .Must((r, d) => d < r.OutcomeDefinition!.BadDaysPastDue)
            .WithMessage("must be below badDaysPastDue (indeterminate lies between the two)")
            .OverridePropertyName("outcomeDefinition.indeterminateDaysPastDue")
            .When(r => r.OutcomeDefinition is { BadDaysPastDue: not null, IndeterminateDaysPastDue: not null });
        RuleFor(r => r.OutcomeDefinition!.PerformanceWindowMonths).NotNull().InclusiveBetween(1, 120)
            .OverridePropertyName("outcomeDefinition.performanceWindowMonths").When(r => r.OutcomeDefinition is not null);
    }
}

internal sealed class ScoreRequestValidator : AbstractValidator<ScoreRequest>
{
    public ScoreRequestValidator() =>
        RuleFor(r => r.Characteristics).NotNull().WithMessage("must give the application's characteristics as an object: name → number, text or null");
}
