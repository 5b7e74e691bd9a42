using FluentValidation;

namespace Ledgerline.Api.Http;

/// <summary>
/// Runs the FluentValidation validator of a request argument and answers 400 with every
/// problem, keyed by the JSON path of the field, before the handler runs.
/// </summary>
internal sealed class ValidationFilter<T>(IValidator<T> validator) : IEndpointFilter
{
    public async ValueTask<object?> InvokeAsync(EndpointFilterInvocationContext context, EndpointFilterDelegate next)
    {
        var argument = context.Arguments.OfType<T>().FirstOrDefault();
        if (argument is null)
        {
            return TypedResults.Problem(
                title: "Missing request body",
                detail: "This request needs a JSON body.",
                statusCode: StatusCodes.Status400BadRequest);
        }

        var result = await validator.ValidateAsync(argument, context.HttpContext.RequestAborted);
        return result.IsValid ? await next(context) : Problems.Invalid(result.ToDictionary());
    }
}

public static class ValidationFilterRegistration
{
    /// <summary>Validates the <typeparamref name="T"/> argument with its registered validator.</summary>
    public static RouteHandlerBuilder WithValidation<T>(this RouteHandlerBuilder builder) =>
        builder.AddEndpointFilter<ValidationFilter<T>>().ProducesValidationProblem();
}
