using CommunityLead.Api.Commands;
using CommunityLead.Api.Features.Admin;
using CommunityLead.Api.Features.Attention;
using CommunityLead.Api.Features.Households;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Infrastructure;

var builder = WebApplication.CreateBuilder(args);
var command = CommandLine.Find(args);
if (command is not null) CommandLine.QuietLogging(builder.Logging);
builder.AddCommunityLead();
var app = builder.Build();

if (command is not null) return await command.RunAsync(app.Services, Console.Out, Console.Error);

if (app.Configuration.GetValue("Database:MigrateOnStartup", true)) await StorageSetup.MigrateAsync(app.Services);

app.UseExceptionHandler();
app.UseStatusCodePages();
app.UseSwagger();
app.UseSwaggerUI();
app.UseAuthentication();
app.UseAuthorization();

app.MapGet("/health", () => TypedResults.Ok(new HealthStatus("ok"))).AllowAnonymous().WithTags("Health");
app.MapHouseholds();
app.MapKits();
app.MapLabResults();
app.MapAttention();
app.MapAdmin();

await app.RunAsync();
return 0;

public partial class Program;

public sealed record HealthStatus(string Status);
