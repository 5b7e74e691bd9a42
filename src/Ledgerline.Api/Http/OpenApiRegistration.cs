using Microsoft.OpenApi;

namespace Ledgerline.Api.Http;

/// <summary>
/// Swashbuckle: the document is always served, without a key (tests compare it with openapi/; it
/// describes the API and holds no data); the UI only in Development.
/// </summary>
public static class OpenApiRegistration
{
    public const string DocumentName = "v1";

    public static IServiceCollection AddLedgerlineOpenApi(this IServiceCollection services)
    {
        services.AddEndpointsApiExplorer();
        services.AddSwaggerGen(o =>
        {
            o.SwaggerDoc(DocumentName, new OpenApiInfo
            {
                Title = "Ledgerline",
                Version = "v1",
                Description = "Scorecard registry, champion–challenger scoring, decision log, outcomes and monitoring reports.",
            });
            o.AddSecurityDefinition("bearer", new OpenApiSecurityScheme
            {
                Type = SecuritySchemeType.Http,
                Scheme = "bearer",
                Description = "An API key from POST /access/keys, sent as 'Authorization: Bearer <key>'.",
            });
            o.AddSecurityRequirement(document => new OpenApiSecurityRequirement
            {
                [new OpenApiSecuritySchemeReference("bearer", document)] = [],
            });
            o.DocumentFilter<HealthDocumentFilter>();
            o.SupportNonNullableReferenceTypes();
            o.CustomSchemaIds(t => t.FullName!
                .Replace("Ledgerline.Api.Features.", string.Empty, StringComparison.Ordinal)
                .Replace("Ledgerline.Scoring.", string.Empty, StringComparison.Ordinal)
                .Replace('+', '.'));
            // Handler method names are the operation ids (RegisterVersion, Decide, …).
            o.CustomOperationIds(d => d.ActionDescriptor.EndpointMetadata.OfType<System.Reflection.MethodInfo>().FirstOrDefault()?.Name);
            o.OperationFilter<ProblemResponsesFilter>();
        });
        return services;
    }

    public static WebApplication UseLedgerlineOpenApi(this WebApplication app)
    {
        app.UseSwagger(o => o.RouteTemplate = "openapi/{documentName}.json");
        if (app.Environment.IsDevelopment())
        {
            app.UseSwaggerUI(o => o.SwaggerEndpoint($"/openapi/{DocumentName}.json", "Ledgerline v1"));
        }

        return app;
    }
}
