using CommunityLead.Api.Infrastructure;
using CommunityLead.Tests.Deploy;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>Every settings section is checked at start: a bad value stops the program, naming the setting.</summary>
public class SettingsTests
{
    [Theory]
    [InlineData("Sampling:MinimumStanding", "abc")]
    [InlineData("Sampling:MinimumStanding", "00:00:00")]
    [InlineData("Sampling:MaximumStanding", "04:00:00")]
    [InlineData("Sampling:ClockTolerance", "-00:05:00")]
    [InlineData("LabIntake:MaxBatchBytes", "0")]
    [InlineData("LabIntake:Qc:CalibrationCheckHighPercent", "80")]
    [InlineData("LabIntake:Qc:SamplesPerCalibrationCheck", "0")]
    [InlineData("LabIntake:Holding:AnalysisWithinMonths", "six")]
    [InlineData("Interpretation:UrgentLeadUgL", "NaN")]
    [InlineData("Interpretation:PipeInnerDiameterMm", "-19")]
    [InlineData("Reports:SuppressionThreshold", "-1")]
    [InlineData("Reports:NinetiethRounding", "7")]
    [InlineData("RateLimits:LabBatchesPerKey", "0")]
    [InlineData("RateLimits:FailedSignInWindow", "soon")]
    [InlineData("ForwardedHeaders:KnownProxies:0", "10.0.0.300")]
    [InlineData("ForwardedHeaders:KnownNetworks:0", "10.0.0.0/33")]
    [InlineData("Swagger:Enabled", "yes please")]
    [InlineData("Database:MigrateOnStartup", "maybe")]
    [InlineData("Program:TimeZone", "Mars/Olympus_Mons")]
    [InlineData("Letters:Paper", "B5")]
    [InlineData("Letters:ProgramPhone", "")]
    public void Settings_BadValue_RefusedNamingTheSetting(string name, string value)
    {
        var error = Assert.Throws<SettingsException>(() => Check((name, value)));
        Assert.Contains(name, error.Message);
    }

    [Fact]
    public void Settings_MisspeltName_RefusedNamingIt()
    {
        var error = Assert.Throws<SettingsException>(() => Check(("Sampling:MinimumStandng", "06:00:00")));
        Assert.Contains("Sampling has no setting MinimumStandng", error.Message);
    }

    [Fact]
    public void Settings_ShippedFileAndDefaults_Pass() => Check();

    [Fact]
    public async Task Service_BadSetting_RefusesToStartNamingItOnStandardError()
    {
        // Before, this value let the service start and /health answer 200 while every collection answered 500.
        var folder = Directory.CreateTempSubdirectory("cl-settings").FullName;
        try
        {
            var database = Path.Combine(folder, "x.db");
            var start = new System.Diagnostics.ProcessStartInfo("dotnet", [typeof(Program).Assembly.Location, "--urls", "http://127.0.0.1:0"])
            {
                WorkingDirectory = ImageRun.ProgramFolder,
                Environment =
                {
                    ["Sampling__MinimumStanding"] = "abc",
                    ["ConnectionStrings__CommunityLead"] = $"Data Source={database}",
                },
            };
            using var service = new StartedProgram(start);

            Assert.Equal(1, await service.ExitCodeAsync(ImageRun.Patience));
            Assert.Contains("Sampling:MinimumStanding", service.Error);
            Assert.DoesNotContain("Now listening", service.Output);
            Assert.False(File.Exists(database), "a refused start must not create or migrate the database");
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    /// <summary>The program's own appsettings.json with some settings over it, bound and checked as at start.</summary>
    private static void Check(params (string Name, string Value)[] settings)
    {
        var configuration = new ConfigurationBuilder()
            .AddJsonFile(Path.Combine(ImageRun.ProgramFolder, "appsettings.json"))
            .AddInMemoryCollection(settings.Select(s => KeyValuePair.Create(s.Name, (string?)s.Value)))
            .Build();
        var services = new ServiceCollection();
        services.AddCommunityLeadSettings(configuration);
        using var provider = services.BuildServiceProvider();
        SettingsChecks.Validate(provider);
    }
}
