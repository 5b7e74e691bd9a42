using FluentValidation;

namespace Ledgerline.Api.Features.Traffic;

internal sealed class TrafficPlanRequestValidator : AbstractValidator<TrafficPlanRequest>
{
    public TrafficPlanRequestValidator()
    {
        RuleFor(r => r.Champion).NotNull().WithMessage("must name the champion version, e.g. \"champion\": 1")
            .GreaterThan(0).WithMessage("must be a version number (1 or more)");
        RuleFor(r => r.Reason).NotEmpty().WithMessage("must say why the plan changes (kept with the revision)")
            .MaximumLength(1000).WithMessage("must be at most 1000 characters");
        RuleForEach(r => r.Challengers).ChildRules(c =>
        {
            c.RuleFor(x => x.Version).NotNull().WithMessage("must name a version")
                .GreaterThan(0).WithMessage("must be a version number (1 or more)");
            c.RuleFor(x => x.Share).NotNull().WithMessage("must give the share of applications this challenger decides, e.g. 0.1")
                .ExclusiveBetween(0m, 1m).WithMessage("must lie strictly between 0 and 1");
        });
        RuleForEach(r => r.Shadows).GreaterThan(0).WithMessage("must be a version number (1 or more)");
        RuleFor(r => r.Challengers)
            .Must(c => c!.Sum(x => x.Share ?? 0) < 1m)
            .When(r => r.Challengers is { Count: > 0 } && r.Challengers.All(c => c.Share is > 0 and < 1))
            .WithMessage(r => $"shares sum to {r.Challengers!.Sum(x => x.Share ?? 0)}; they must sum below 1, since the champion takes the rest");
        RuleFor(r => r)
            .Must(r => RepeatedVersion(r) is null)
            .When(r => r.Champion is not null)
            .OverridePropertyName("challengers")
            .WithMessage(r => $"version {RepeatedVersion(r)} appears more than once; a version plays one role only (champion, challenger or shadow)");
    }

    public static int? RepeatedVersion(TrafficPlanRequest r)
    {
        var seen = new HashSet<int>();
        foreach (var version in Versions(r))
        {
            if (!seen.Add(version))
            {
                return version;
            }
        }

        return null;
    }

    public static IEnumerable<int> Versions(TrafficPlanRequest r)
    {
        if (r.Champion is { } champion)
        {
            yield return champion;
        }

        foreach (var c in r.Challengers ?? [])
        {
            if (c.Version is { } v)
            {
                yield return v;
            }
        }

        foreach (var s in r.Shadows ?? [])
        {
            yield return s;
        }
    }
}
