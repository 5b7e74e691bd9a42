using Microsoft.OpenApi;
using Swashbuckle.AspNetCore.SwaggerGen;

namespace Ledgerline.Api.Http;

/// <summary>
/// Health checks are not minimal-API handlers, so the API explorer does not see them; this puts
/// <c>GET /health</c> in the document so every mapped route is documented.
/// </summary>
internal sealed class HealthDocumentFilter : IDocumentFilter
{
    public void Apply(OpenApiDocument swaggerDoc, DocumentFilterContext context)
    {
        var operation = new OpenApiOperation
        {
            OperationId = "Health",
            Summary = "Answers 200 once the service can serve (database reachable, migrations applied), else 503. Needs no key.",
            Security = [],
            Responses = new OpenApiResponses
            {
                ["200"] = new OpenApiResponse { Description = "Healthy" },
                ["503"] = new OpenApiResponse { Description = "Unhealthy" },
            },
        };
        var path = new OpenApiPathItem();
        path.AddOperation(HttpMethod.Get, operation);
        swaggerDoc.Paths["/health"] = path;
    }
}
