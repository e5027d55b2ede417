using Microsoft.OpenApi;

namespace CommunityLead.Api.Infrastructure;

public static class SwaggerSetup
{
    public static void AddCommunityLeadSwagger(this IServiceCollection services) =>
        services.AddSwaggerGen(o =>
        {
            o.SwaggerDoc("v1", new OpenApiInfo
            {
                Title = "CommunityLead API",
                Version = "v1",
                Description = "Households, kits, samples and results of a community lead-testing program. " +
                              "Send 'Authorization: Bearer <key>'; keys come from the service's 'keys create' command.",
            });
            o.AddSecurityDefinition("bearer", new OpenApiSecurityScheme
            {
                Type = SecuritySchemeType.Http,
                Scheme = "bearer",
                Description = "An API key made with 'keys create --role <role> --label <label>'.",
            });
            o.AddSecurityRequirement(document => new OpenApiSecurityRequirement
            {
                [new OpenApiSecuritySchemeReference("bearer", document)] = [],
            });
            // Feature records share short names (e.g. two "Request" records would clash); full names keep them apart.
            o.CustomSchemaIds(t => t.FullName!.Replace("CommunityLead.Api.Features.", "").Replace("CommunityLead.Rules.", "").Replace('+', '.'));
        });
}
