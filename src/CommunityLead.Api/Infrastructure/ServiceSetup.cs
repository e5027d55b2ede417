using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Households;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Layout;
using CommunityLead.Api.Features.Operations;
using CommunityLead.Api.Infrastructure.OpenApi;
using FluentValidation;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Http.Json;

namespace CommunityLead.Api.Infrastructure;

public static class ServiceSetup
{
    public static void AddCommunityLead(this WebApplicationBuilder builder)
    {
        var services = builder.Services;
        services.AddCommunityLeadStorage(builder.Configuration);
        services.AddSingleton(TimeProvider.System);
        services.AddCommunityLeadSettings(builder.Configuration);
        services.AddSingleton<ProfileCatalog>();
        services.AddScoped<InterpretWithResults>();
        services.AddScoped<InterpretationRepair>();
        // One instance, so tests (and nothing else) can also run a sweep by hand.
        services.AddSingleton<InterpretationSweep>();
        services.AddHostedService(sp => sp.GetRequiredService<InterpretationSweep>());
        services.AddSingleton<ILetterLayout, PdfLetterLayout>();
        services.AddScoped<LetterIssuing>();
        services.AddSingleton<Features.Results.ResultSecrets>();
        services.AddSingleton<Features.Results.ResultThrottle>();
        services.AddSingleton<Features.Reports.ReportRelease>();
        services.AddHostedService<Features.Reports.ReportReleaseInBackground>();
        services.Configure<JsonOptions>(o => JsonSetup.Configure(o.SerializerOptions));
        // Binding failures (bad JSON, wrong content type) are thrown so the handler below can name the field.
        services.Configure<RouteHandlerOptions>(o => o.ThrowOnBadRequest = true);
        // Ours first: the framework's writer leaves a client that accepts */* (curl) with a bare status.
        services.AddSingleton<IProblemDetailsWriter, AnyClientProblemWriter>();
        services.AddProblemDetails();
        services.AddExceptionHandler<BadRequestExceptionHandler>();
        // The household validator reads the area list, so it lives per request with the DbContext.
        services.AddValidatorsFromAssemblyContaining<Program>(ServiceLifetime.Singleton, r => r.ValidatorType != typeof(HouseholdValidator));
        services.AddScoped<IValidator<HouseholdRequest>, HouseholdValidator>();
        services.AddHttpContextAccessor();

        services.AddScoped<ApiKeyService>();
        services.AddSingleton<VerifiedKeys>();
        services.AddSingleton<SignInThrottle>();
        services.AddCommunityLeadRateLimits();
        services.AddCommunityLeadForwarding();
        services.AddCommunityLeadHealthChecks();
        services.AddCommunityLeadTelemetry(builder.Configuration);
        services.AddAuthentication(ApiKeyAuthenticationHandler.SchemeName)
            .AddScheme<AuthenticationSchemeOptions, ApiKeyAuthenticationHandler>(ApiKeyAuthenticationHandler.SchemeName, null);
        services.AddAuthorization(Policies.Add);

        services.AddEndpointsApiExplorer();
        services.AddCommunityLeadSwagger();
    }
}
