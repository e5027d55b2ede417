using CommunityLead.Api.Commands;
using CommunityLead.Api.Features.Admin;
using CommunityLead.Api.Features.Attention;
using CommunityLead.Api.Features.Health;
using CommunityLead.Api.Features.Households;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;

// Settings files travel with the program, so it reads the same appsettings.json from whatever folder it runs in.
var builder = WebApplication.CreateBuilder(new WebApplicationOptions { Args = args, ContentRootPath = AppContext.BaseDirectory });
var command = CommandLine.Find(args);
if (command is not null) CommandLine.QuietLogging(builder.Logging);
builder.AddCommunityLead();
var app = builder.Build();

// Rule profiles are validated before anything else: a broken one stops the service, naming file and field.
try
{
    app.Services.GetRequiredService<ProfileCatalog>();
}
catch (ProfileException e)
{
    Console.Error.WriteLine(e.Message);
    return 1;
}

if (command is not null) return await command.RunAsync(app.Services, Console.Out, Console.Error);

if (app.Configuration.GetValue("Database:MigrateOnStartup", true)) await StorageSetup.MigrateAsync(app.Services);

app.UseExceptionHandler();
app.UseStatusCodePages();
app.Use(NoNulText.InQueryAsync);
app.UseSwagger();
app.UseSwaggerUI();
app.UseAuthentication();
app.UseAuthorization();

app.MapHealth();
app.MapHouseholds();
app.MapKits();
app.MapLabResults();
app.MapInterpretation();
app.MapLetters();
app.MapAttention();
app.MapReports();
app.MapAdmin();
app.MapWording();

await app.RunAsync();
return 0;

public partial class Program;
