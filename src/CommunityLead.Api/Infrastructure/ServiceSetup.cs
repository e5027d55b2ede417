using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Api.Features.Letters.Layout;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Rules.Sampling;
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
        services.Configure<SamplingLimits>(builder.Configuration.GetSection("Sampling"));
        services.Configure<LabIntakeOptions>(builder.Configuration.GetSection("LabIntake"));
        services.Configure<InterpretationOptions>(builder.Configuration.GetSection("Interpretation"));
        services.Configure<ReportOptions>(builder.Configuration.GetSection("Reports"));
        services.AddSingleton<ProfileCatalog>();
        services.AddScoped<InterpretWithResults>();
        services.AddScoped<InterpretationRepair>();
        // One instance, so tests (and nothing else) can also run a sweep by hand.
        services.AddSingleton<InterpretationSweep>();
        services.AddHostedService(sp => sp.GetRequiredService<InterpretationSweep>());
        services.AddSingleton(builder.Configuration.GetSection("Letters").Get<LetterSettings>()
            ?? throw new InvalidOperationException("The Letters settings (program name, contacts) are missing."));
        services.AddSingleton<ILetterLayout, PdfLetterLayout>();
        services.AddScoped<LetterIssuing>();
        services.Configure<JsonOptions>(o => JsonSetup.Configure(o.SerializerOptions));
        // Binding failures (bad JSON, wrong content type) are thrown so the handler below can name the field.
        services.Configure<RouteHandlerOptions>(o => o.ThrowOnBadRequest = true);
        services.AddProblemDetails();
        services.AddExceptionHandler<BadRequestExceptionHandler>();
        services.AddValidatorsFromAssemblyContaining<Program>(ServiceLifetime.Singleton);

        services.AddScoped<ApiKeyService>();
        services.AddAuthentication(ApiKeyAuthenticationHandler.SchemeName)
            .AddScheme<AuthenticationSchemeOptions, ApiKeyAuthenticationHandler>(ApiKeyAuthenticationHandler.SchemeName, null);
        services.AddAuthorization(Policies.Add);

        services.AddEndpointsApiExplorer();
        services.AddCommunityLeadSwagger();
    }
}
