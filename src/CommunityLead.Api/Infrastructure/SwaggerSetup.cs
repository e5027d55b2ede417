using Microsoft.Extensions.Options;
using Microsoft.OpenApi;

namespace CommunityLead.Api.Infrastructure;

/// <summary>Settings of the "Swagger" section.</summary>
public sealed class SwaggerOptions
{
    public const string Section = "Swagger";

    /// <summary>Serve /swagger (the API description and its UI); unset, only in the Development environment.</summary>
    public bool? Enabled { get; set; }
}

public static class SwaggerSetup
{
    /// <summary>
    /// The UI is for people trying the API on their own machine; a deployment need not advertise every route,
    /// so it is off there unless a setting turns it on.
    /// </summary>
    public static void UseCommunityLeadSwagger(this WebApplication app)
    {
        if (!(app.Services.GetRequiredService<IOptions<SwaggerOptions>>().Value.Enabled ?? app.Environment.IsDevelopment())) return;
        app.UseSwagger();
        app.UseSwaggerUI();
    }

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
