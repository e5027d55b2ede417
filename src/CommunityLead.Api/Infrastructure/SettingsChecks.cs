using System.Net;
using System.Text.RegularExpressions;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Api.Infrastructure.OpenApi;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Rules.Sampling;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Every settings section, bound and checked when the program starts (the service and every command): a value
/// that does not convert (Sampling:MinimumStanding=abc), is out of range, or is a misspelt setting name stops the
/// program with a message naming it. Before, such a value surfaced only as a 500 on every request that read it.
/// </summary>
public static class SettingsChecks
{
    public static void AddCommunityLeadSettings(this IServiceCollection services, IConfiguration configuration)
    {
        Add<SamplingLimits>(services, configuration, "Sampling", (s, p) =>
        {
            p.Positive(s.MinimumStanding, nameof(s.MinimumStanding));
            p.Check(s.MaximumStanding > s.MinimumStanding, nameof(s.MaximumStanding), "must be longer than Sampling:MinimumStanding", s.MaximumStanding);
            p.Check(s.ClockTolerance >= TimeSpan.Zero, nameof(s.ClockTolerance), "cannot be negative", s.ClockTolerance);
        });
        Add<LabIntakeOptions>(services, configuration, "LabIntake", (s, p) =>
        {
            p.AtLeast(s.MaxBatchBytes, 1, nameof(s.MaxBatchBytes));
            p.AtLeast(s.MaxProblemsListed, 1, nameof(s.MaxProblemsListed));
            p.Window(s.Qc.CalibrationCheckLowPercent, s.Qc.CalibrationCheckHighPercent, "Qc:CalibrationCheckLowPercent", "Qc:CalibrationCheckHighPercent");
            p.Window(s.Qc.FortifiedBlankLowPercent, s.Qc.FortifiedBlankHighPercent, "Qc:FortifiedBlankLowPercent", "Qc:FortifiedBlankHighPercent");
            p.Window(s.Qc.MatrixSpikeLowPercent, s.Qc.MatrixSpikeHighPercent, "Qc:MatrixSpikeLowPercent", "Qc:MatrixSpikeHighPercent");
            p.Positive(s.Qc.DuplicateMaxRpdPercent, "Qc:DuplicateMaxRpdPercent");
            p.AtLeast(s.Qc.SamplesPerCalibrationCheck, 1, "Qc:SamplesPerCalibrationCheck");
            // The lab's own run (Rules/LabResults/QcWindows.Run.cs).
            p.Check(s.Qc.MinCorrelation is > 0 and <= 1, "Qc:MinCorrelation", "must be above 0 and at most 1", s.Qc.MinCorrelation);
            p.Positive(s.Qc.BackCalculatedPercent, "Qc:BackCalculatedPercent");
            p.Check(s.Qc.BackCalculatedLowestPercent >= s.Qc.BackCalculatedPercent, "Qc:BackCalculatedLowestPercent",
                "must be at least Qc:BackCalculatedPercent", s.Qc.BackCalculatedLowestPercent);
            p.Positive(s.Qc.MaxReplicateRsdPercent, "Qc:MaxReplicateRsdPercent");
            p.Positive(s.Qc.MaxComputedDifferencePercent, "Qc:MaxComputedDifferencePercent");
            p.Positive(s.Qc.MaxDetectionLimitOverMdl, "Qc:MaxDetectionLimitOverMdl");
            p.Positive(s.Qc.MaxBlankDriftOfReportingLimit, "Qc:MaxBlankDriftOfReportingLimit");
            p.Window(s.Qc.ReferenceSoilLowPercent, s.Qc.ReferenceSoilHighPercent, "Qc:ReferenceSoilLowPercent", "Qc:ReferenceSoilHighPercent");
            p.Positive(s.Qc.RepeatAgreementSigmas, "Qc:RepeatAgreementSigmas");
            p.AtLeast(s.Holding.AnalysisWithinMonths, 1, "Holding:AnalysisWithinMonths");
            p.Positive(s.Holding.AcidificationWithin, "Holding:AcidificationWithin");
            p.Check(s.Holding.WaitAfterAcidification >= TimeSpan.Zero, "Holding:WaitAfterAcidification", "cannot be negative", s.Holding.WaitAfterAcidification);
        });
        Add<InterpretationOptions>(services, configuration, "Interpretation", (s, p) =>
        {
            p.Check(!string.IsNullOrWhiteSpace(s.WaterProfile), nameof(s.WaterProfile), "must name a rule profile", s.WaterProfile);
            p.Check(!string.IsNullOrWhiteSpace(s.SoilProfile), nameof(s.SoilProfile), "must name a rule profile", s.SoilProfile);
            if (s.AdvisoryLeadUgL is { } advisory) p.Positive(advisory, nameof(s.AdvisoryLeadUgL));
            p.Positive(s.UrgentLeadUgL, nameof(s.UrgentLeadUgL));
            p.Positive(s.PipeInnerDiameterMm, nameof(s.PipeInnerDiameterMm));
        });
        Add<ReportOptions>(services, configuration, "Reports", (s, p) =>
        {
            p.AtLeast(s.SuppressionThreshold, 0, nameof(s.SuppressionThreshold));
            p.AtLeast(s.MinimumHiddenRange, 1, nameof(s.MinimumHiddenRange));
            p.Check(s.DecideInBackgroundEvery >= TimeSpan.Zero, nameof(s.DecideInBackgroundEvery), "cannot be negative (0 turns it off)", s.DecideInBackgroundEvery);
            p.Check(Enum.IsDefined(s.NinetiethRounding), nameof(s.NinetiethRounding),
                $"must be one of {string.Join(", ", Enum.GetNames<Rules.Reports.NinetiethRounding>())}", s.NinetiethRounding);
        });
        Add<RateLimitOptions>(services, configuration, RateLimitOptions.Section, (s, p) =>
        {
            p.AtLeast(s.FailedSignInsPerAddress, 1, nameof(s.FailedSignInsPerAddress));
            p.AtLeast(s.FailedSignInsPerKeyId, 1, nameof(s.FailedSignInsPerKeyId));
            p.Positive(s.FailedSignInWindow, nameof(s.FailedSignInWindow));
            p.AtLeast(s.LabBatchesPerKey, 1, nameof(s.LabBatchesPerKey));
            p.AtLeast(s.LetterBatchesPerKey, 1, nameof(s.LetterBatchesPerKey));
            p.Positive(s.Window, nameof(s.Window));
        });
        Add<ForwardingOptions>(services, configuration, ForwardingOptions.Section, (s, p) =>
        {
            foreach (var (proxy, i) in s.KnownProxies.Select((x, i) => (x, i)))
                p.Check(IPAddress.TryParse(proxy, out _), $"KnownProxies:{i}", "must be an IP address (like 10.0.0.5)", proxy);
            foreach (var (network, i) in s.KnownNetworks.Select((x, i) => (x, i)))
                p.Check(IPNetwork.TryParse(network, out _), $"KnownNetworks:{i}", "must be a network in CIDR form (like 10.0.0.0/24)", network);
        });
        Add<ProgramOptions>(services, configuration, "Program", (s, p) =>
            p.Check(TimeZoneInfo.TryFindSystemTimeZoneById(s.TimeZone ?? "", out _), nameof(s.TimeZone),
                "must be an IANA time zone id (like America/Chicago)", s.TimeZone));
        services.AddSingleton<ProgramCalendar>();
        Add<Features.Results.ResultAccessOptions>(services, configuration, Features.Results.ResultAccessOptions.Section, (s, p) =>
        {
            p.Check(s.SecretKey is null || s.SecretKey.Length >= 32, nameof(s.SecretKey), "must be at least 32 characters (a random string)", "(not shown)");
            p.Check(s.PageAddress is null || Uri.TryCreate(s.PageAddress, UriKind.Absolute, out _), nameof(s.PageAddress),
                "must be an absolute address (like https://tapcheck.example.org/ui/result/)", s.PageAddress);
            p.AtLeast(s.LookupsPerAddress, 1, nameof(s.LookupsPerAddress));
            p.Positive(s.Window, nameof(s.Window));
        });
        Add<SwaggerOptions>(services, configuration, SwaggerOptions.Section, (_, _) => { });
        Add<DatabaseOptions>(services, configuration, "Database", (_, _) => { });
        services.AddSingleton(_ => ReadLetters(configuration));
    }

    /// <summary>Binds and checks every section now, turning what the binder or a check throws into one message.</summary>
    public static void Validate(IServiceProvider services)
    {
        try
        {
            services.GetRequiredService<IStartupValidator>().Validate();
            services.GetRequiredService<LetterSettings>();
        }
        catch (OptionsValidationException e)
        {
            throw new SettingsException(e.Failures);
        }
        catch (AggregateException e) when (e.InnerExceptions.All(i => i is OptionsValidationException))
        {
            throw new SettingsException(e.InnerExceptions.SelectMany(i => ((OptionsValidationException)i).Failures));
        }
        catch (InvalidOperationException e) when (e is not SettingsException)
        {
            // The binder's own words name the setting and the type it wanted ("... at 'Sampling:MinimumStanding' to type 'System.TimeSpan'").
            throw new SettingsException(e.InnerException is null ? e.Message : $"{e.Message} {e.InnerException.Message}");
        }
    }

    private static void Add<T>(IServiceCollection services, IConfiguration configuration, string section, Action<T, SettingProblems> rules)
        where T : class
    {
        services.AddOptions<T>().Configure(options => Bind(configuration.GetSection(section), options)).ValidateOnStart();
        services.AddSingleton<IValidateOptions<T>>(new SettingsCheck<T>(section, rules));
    }

    /// <summary>A misspelt name in a known section ("Sampling:MinimumStandng") is refused rather than silently ignored.</summary>
    private static void Bind<T>(IConfigurationSection section, T options) where T : class
    {
        try
        {
            section.Bind(options, o => o.ErrorOnUnknownConfiguration = true);
        }
        catch (InvalidOperationException e) when (e.Message.Contains(nameof(BinderOptions.ErrorOnUnknownConfiguration), StringComparison.Ordinal))
        {
            // The binder names the class and the unknown properties ("...SamplingLimits: 'MinimumStandng'"); people know the section.
            var names = Regex.Matches(e.Message[e.Message.LastIndexOf(':')..], "'([^']+)'").Select(m => m.Groups[1].Value);
            throw new SettingsException(names.Select(n =>
                $"{section.Path} has no setting {n} (check its spelling against the settings table in README.md)."));
        }
    }

    private static LetterSettings ReadLetters(IConfiguration configuration)
    {
        var letters = configuration.GetSection("Letters").Get<LetterSettings>()
            ?? throw new SettingsException("The Letters settings (program name, contacts) are missing.");
        var p = new SettingProblems("Letters");
        foreach (var (value, key) in new[] { (letters.ProgramName, "ProgramName"), (letters.ProgramPhone, "ProgramPhone"),
                     (letters.HealthDepartmentName, "HealthDepartmentName"), (letters.HealthDepartmentPhone, "HealthDepartmentPhone") })
            p.Check(!string.IsNullOrWhiteSpace(value), key, "is printed on every letter and cannot be empty", value);
        p.Check(letters.ProgramAddress.Any(line => !string.IsNullOrWhiteSpace(line)), "ProgramAddress", "needs at least one line", "empty");
        p.Check(Enum.IsDefined(letters.Paper), "Paper", "must be Letter or A4", letters.Paper);
        return p.Result.Failed ? throw new SettingsException(p.Result.Failures!) : letters;
    }
}

/// <summary>Settings of the "Database" section read through options, so a value that is not true or false is named at start.</summary>
public sealed class DatabaseOptions
{
    /// <summary>Read by <see cref="StorageSetup.Provider"/> before the services exist; here so the name is a known one.</summary>
    public string? Provider { get; set; }
    public bool MigrateOnStartup { get; set; } = true;
}
