using FluentValidation;

namespace Ledgerline.Api.Features.Alerts;

public sealed class AlertThresholdsRequestValidator : AbstractValidator<AlertThresholdsRequest>
{
    public AlertThresholdsRequestValidator()
    {
        RuleFor(r => r.PsiAmber).NotNull().InclusiveBetween(0.0, 10.0).WithMessage("give the PSI amber threshold, a number from 0 to 10 (common practice: 0.10)");
        RuleFor(r => r.PsiRed).NotNull().InclusiveBetween(0.0, 10.0).WithMessage("give the PSI red threshold, a number from 0 to 10 (common practice: 0.25)");
        RuleFor(r => r.PsiRed).GreaterThanOrEqualTo(r => r.PsiAmber).When(r => r.PsiAmber is not null && r.PsiRed is not null)
            .WithMessage("the PSI red threshold must be at least the amber one");
        RuleFor(r => r.CsiAmber).NotNull().InclusiveBetween(0.0, 10.0).WithMessage("give the CSI amber threshold, a number from 0 to 10 (common practice: 0.10)");
        RuleFor(r => r.CsiRed).NotNull().InclusiveBetween(0.0, 10.0).WithMessage("give the CSI red threshold, a number from 0 to 10 (common practice: 0.25)");
        RuleFor(r => r.CsiRed).GreaterThanOrEqualTo(r => r.CsiAmber).When(r => r.CsiAmber is not null && r.CsiRed is not null)
            .WithMessage("the CSI red threshold must be at least the amber one");
        RuleFor(r => r.AucDecline).NotNull().InclusiveBetween(0.0, 1.0).WithMessage("give how far below development the AUC may fall, from 0 to 1 (default 0.05)");
        RuleFor(r => r.HosmerLemeshowP).NotNull().ExclusiveBetween(0.0, 1.0).WithMessage("give the Hosmer-Lemeshow p-value threshold, strictly between 0 and 1 (default 0.01)");
        RuleFor(r => r.SampleRatioP).NotNull().ExclusiveBetween(0.0, 1.0).WithMessage("give the sample-ratio p-value threshold, strictly between 0 and 1 (default 0.001)");
    }
}
