using FluentValidation;

namespace Ledgerline.Api.Features.Access;

internal sealed class CreateKeyRequestValidator : AbstractValidator<CreateKeyRequest>
{
    public const int MaxScorecards = 100;

    public CreateKeyRequestValidator(TimeProvider clock)
    {
        RuleFor(r => r.Name).NotEmpty().MaximumLength(200);
        RuleFor(r => r.Roles).NotEmpty().WithMessage("must list at least one role: " + string.Join(", ", Access.Roles.All));
        RuleForEach(r => r.Roles).Must(r => Access.Roles.All.Contains(r))
            .WithMessage((_, role) => $"'{role}' is not a role; expected one of: {string.Join(", ", Access.Roles.All)}");
        RuleFor(r => r.Scorecards).Must(s => s is null || s.Count <= MaxScorecards)
            .WithMessage($"may list at most {MaxScorecards} scorecards; leave it out for a key that may use all");
        RuleForEach(r => r.Scorecards).NotEmpty().MaximumLength(64);
        RuleFor(r => r.ExpiresAt).Must(e => e is null || e > clock.GetUtcNow()).WithMessage("must lie in the future");
    }
}
