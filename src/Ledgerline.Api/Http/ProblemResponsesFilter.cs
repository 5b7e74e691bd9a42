using System.Reflection;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.OpenApi;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace Ledgerline.Api.Http;

/// <summary>
/// Documents the problem-details answers every route can give (401, 403, 429; 404 on routes with
/// a path parameter; 413 where a body is taken; 409 where a handler can return a problem), so
/// clients see every outcome in the document, not only the successful ones.
/// </summary>
internal sealed class ProblemResponsesFilter : IOperationFilter
{
    public void Apply(OpenApiOperation operation, OperationFilterContext context)
    {
        var method = context.ApiDescription.ActionDescriptor.EndpointMetadata.OfType<MethodInfo>().FirstOrDefault();
        Add(operation, context, "401", "No key, or an unknown, revoked or expired key.");
        Add(operation, context, "403", "The key lacks a role this route admits.");
        Add(operation, context, "429", "Too many requests for this key; retry after the Retry-After header.");
        if (context.ApiDescription.ParameterDescriptions.Any(p => p.Source.Id == "Path"))
        {
            Add(operation, context, "404", "The scorecard, version or record does not exist.");
        }

        if (context.ApiDescription.ParameterDescriptions.Any(p => p.Source.Id == "Body"))
        {
            Add(operation, context, "413", "The body is over this route's size limit.");
        }

        if (method is not null && ReturnsProblem(method.ReturnType) && context.ApiDescription.HttpMethod is "POST" or "PUT" or "DELETE")
        {
            Add(operation, context, "409", "The request conflicts with the current state; the detail says how to resolve it.");
        }
    }

    private static bool ReturnsProblem(Type type) =>
        type == typeof(ProblemHttpResult) || (type.IsGenericType && type.GetGenericArguments().Any(ReturnsProblem));

    private static void Add(OpenApiOperation operation, OperationFilterContext context, string status, string description)
    {
        operation.Responses ??= [];
        if (operation.Responses.ContainsKey(status))
        {
            return;
        }

        var schema = context.SchemaGenerator.GenerateSchema(typeof(Microsoft.AspNetCore.Mvc.ProblemDetails), context.SchemaRepository);
        operation.Responses[status] = new OpenApiResponse
        {
            Description = description,
            Content = new Dictionary<string, IOpenApiMediaType> { ["application/problem+json"] = new OpenApiMediaType { Schema = schema } },
        };
    }
}
