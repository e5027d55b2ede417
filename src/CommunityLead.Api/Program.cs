using CommunityLead.Api.Commands;
using CommunityLead.Api.Features.Admin;
using CommunityLead.Api.Features.Areas;
using CommunityLead.Api.Features.Attention;
using CommunityLead.Api.Features.Calendar;
using CommunityLead.Api.Features.Health;
using CommunityLead.Api.Features.Households;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Operations;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Api.Features.Results;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Api.Infrastructure.OpenApi;
using CommunityLead.Rules.Interpretation;
using Microsoft.Extensions.Options;

// Help and mistyped commands are answered before any setting is read or any database is touched.
var commandLine = CommandLine.Parse(args);
if (!commandLine.RunsService && !commandLine.NeedsServices) return await commandLine.RunAsync(null, Console.Out, Console.Error);

// Settings files travel with the program, so it reads the same appsettings.json from whatever folder it runs in.
var builder = WebApplication.CreateBuilder(new WebApplicationOptions { Args = args, ContentRootPath = AppContext.BaseDirectory });
if (!commandLine.RunsService) CommandLine.QuietLogging(builder.Logging);
WebApplication app;
try
{
    builder.AddCommunityLead();
    app = builder.Build();
    // Every setting, then the rule profiles: a bad one stops the program here, named, before anything is served.
    SettingsChecks.Validate(app.Services);
    app.Services.GetRequiredService<ProfileCatalog>();
}
catch (Exception e) when (e is SettingsException or ProfileException)
{
    Console.Error.WriteLine(e.Message);
    return CommandLine.Failed;
}

if (!commandLine.RunsService) return await commandLine.RunAsync(app.Services, Console.Out, Console.Error);

if (app.Services.GetRequiredService<IOptions<DatabaseOptions>>().Value.MigrateOnStartup) await StorageSetup.MigrateAsync(app.Services);

app.UseForwardedHeaders();
app.UseSecurityHeaders();
app.UseCommunityLeadPages();
app.UseExceptionHandler();
app.UseStatusCodePages();
app.Use(NoNulText.InQueryAsync);
app.Use(UnconvertedQueryValues.NameThemAsync);
app.UseCommunityLeadSwagger();
app.UseAuthentication();
app.UseAuthorization();
app.UseRateLimiter();

app.MapHealth();
app.MapCalendar();
app.MapOperations();
app.MapAreas();
app.MapHouseholds();
app.MapKits();
app.MapLabResults();
app.MapInterpretation();
app.MapLetters();
app.MapAttention();
app.MapReports();
app.MapResults();
app.MapAdmin();
app.MapWording();

await app.RunAsync();
return 0;

public partial class Program;
