using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Areas;
using CommunityLead.Api.Features.Households;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using FluentValidation;
using FluentValidation.Results;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Demo;

public sealed record DemoLoadResult(int NewHouseholds, int NewKits, int SkippedHouseholds);

/// <summary>
/// Loads the invented demo scenario through the same validators, lifecycle and collection review as the API,
/// so the demo shows exactly what real use would. Households already present (by id) are skipped.
/// </summary>
public static class DemoLoader
{
    private static readonly Actor Loader = new("demo-loader", Roles.Coordinator);

    public static async Task<DemoLoadResult?> LoadAsync(IServiceProvider services, TextWriter error)
    {
        var file = FindScenarioFile(services.GetRequiredService<IConfiguration>());
        if (file is null)
        {
            error.WriteLine("seed-data/demo.json was not found next to the program or above the working directory.");
            return null;
        }
        var json = new JsonSerializerOptions(JsonSerializerDefaults.Web);
        JsonSetup.Configure(json);
        DemoScenario scenario;
        await using (var stream = File.OpenRead(file))
            scenario = (await JsonSerializer.DeserializeAsync<DemoScenario>(stream, json))!;

        await using var scope = services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        var validator = scope.ServiceProvider.GetRequiredService<IValidator<HouseholdRequest>>();
        var collectionValidator = scope.ServiceProvider.GetRequiredService<IValidator<CollectionRequest>>();
        var reasonValidator = scope.ServiceProvider.GetRequiredService<IValidator<ReasonRequest>>();
        var limits = scope.ServiceProvider.GetRequiredService<IOptions<SamplingLimits>>().Value;
        // Dated with the first sign-up, when the invented program began.
        var begun = scenario.Households.Select(h => h.Household.ConsentGivenAt?.UtcDateTime ?? DateTime.UnixEpoch).DefaultIfEmpty(DateTime.UnixEpoch).Min();
        if (!await AddAreasAsync(db, scope.ServiceProvider.GetRequiredService<IValidator<NewAreaRequest>>(), scenario.Areas ?? [], begun, file, error))
            return null;
        var existing = (await db.Households.Select(h => h.Id).ToListAsync()).ToHashSet();
        int newHouseholds = 0, newKits = 0;
        foreach (var entry in scenario.Households)
        {
            if (existing.Contains(entry.Id)) continue;
            var check = await validator.ValidateAsync(entry.Household);
            if (!check.IsValid)
            {
                error.WriteLine($"{file}: household {entry.Id}: {string.Join("; ", check.Errors.Select(e => $"{e.PropertyName}: {e.ErrorMessage}"))}");
                return null;
            }
            var badKit = entry.Kits.Select(k => (k.Code, Errors: Check(k, collectionValidator, reasonValidator)))
                .FirstOrDefault(k => k.Errors.Count > 0);
            if (badKit.Errors is not null)
            {
                error.WriteLine($"{file}: kit {badKit.Code}: {string.Join("; ", badKit.Errors.Select(e => $"{e.PropertyName}: {e.ErrorMessage}"))}");
                return null;
            }
            var household = HouseholdMapping.NewHousehold(entry.Household, entry.Household.ConsentGivenAt!.Value.UtcDateTime);
            household.Id = entry.Id;
            db.Households.Add(household);
            db.AuditTrail.Add(Audit.Household(Loader, household.CreatedAtUtc, household.Id, "sign-up", "demo scenario"));
            var kits = new Dictionary<string, Kit>();
            foreach (var demoKit in entry.Kits)
            {
                kits[demoKit.Code] = AddKit(db, household.Id, demoKit, kits, limits);
                newKits++;
            }
            newHouseholds++;
        }
        await db.SaveChangesAsync();
        if (!await DemoResults.LoadAsync(scope.ServiceProvider, scenario.LettersSent ?? [], error)) return null;
        return new DemoLoadResult(newHouseholds, newKits, scenario.Households.Count - newHouseholds);
    }

    /// <summary>Areas first, saved, so the household validator finds them; those already there are left as they are.</summary>
    private static async Task<bool> AddAreasAsync(CommunityLeadDb db, IValidator<NewAreaRequest> validator, IReadOnlyList<NewAreaRequest> areas,
        DateTime atUtc, string file, TextWriter error)
    {
        var known = (await db.Areas.Select(a => a.Code).ToListAsync()).ToHashSet();
        foreach (var area in areas)
        {
            var check = await validator.ValidateAsync(area);
            if (!check.IsValid)
            {
                error.WriteLine($"{file}: area {area.Code}: {string.Join("; ", check.Errors.Select(e => $"{e.PropertyName}: {e.ErrorMessage}"))}");
                return false;
            }
            var code = AreaCodes.Normal(area.Code!);
            if (!known.Add(code)) continue;
            db.Areas.Add(new Area { Code = code, Name = area.Name!.Trim() });
            db.AuditTrail.Add(Audit.Area(Loader, atUtc, code, "add", "demo scenario"));
        }
        await db.SaveChangesAsync();
        return true;
    }

    private static Kit AddKit(CommunityLeadDb db, Guid householdId, DemoKit d, Dictionary<string, Kit> earlier, SamplingLimits limits)
    {
        var issued = d.IssuedAt.UtcDateTime;
        var kit = new Kit
        {
            Code = KitCode.Parse(d.Code).Code ?? throw new InvalidDataException($"Demo kit code {d.Code} fails its check character."),
            Kind = d.Kind, State = KitState.Issued, HouseholdId = householdId,
            IssuedAtUtc = issued, UpdatedAtUtc = issued,
            ReplacesCode = d.Replaces is null ? null
                : KitCode.Parse(d.Replaces).Code ?? throw new InvalidDataException($"Demo kit {d.Code} replaces {d.Replaces}, which fails its check character."),
        };
        db.Kits.Add(kit);
        db.AuditTrail.Add(Audit.Kit(Loader, issued, kit.Code, "issue", to: KebabEnum.Name(KitState.Issued), detail: "demo scenario"));
        if (d.Replaces is not null && earlier.TryGetValue(d.Replaces, out var old))
        {
            Move(db, old, KitAction.Replace, issued, null, $"replacement {kit.Code}");
            old.ReplacedByCode = kit.Code;
        }
        if (d.Collection is { } c)
        {
            var review = CollectionRecording.Review(kit.Kind, c.Samples, c.RecordedAt, limits);
            Move(db, kit, KitAction.RecordCollection, c.RecordedAt.UtcDateTime, null, CollectionRecording.Describe(c.Samples.Count, review));
            kit.Collections.Add(CollectionRecording.NewCollection(0, c.Samples, review, c.RecordedAt.UtcDateTime, Loader.Label));
            kit.CollectedAtUtc = c.Samples.Min(s => s.CollectedAt!.Value.UtcDateTime);
        }
        if (d.ReceivedAt is { } received)
        {
            Move(db, kit, KitAction.Receive, received.UtcDateTime, null, null);
            kit.ReceivedAt = received;
        }
        if (d.Then is { } then)
        {
            var action = KebabEnum.TryParse<KitAction>(then.Action, out var a) ? a
                : then.Action == "lost" ? KitAction.MarkLost
                : throw new InvalidDataException($"Demo kit {d.Code}: unknown final move '{then.Action}'.");
            Move(db, kit, action, (d.ReceivedAt ?? d.Collection?.RecordedAt ?? d.IssuedAt).AddDays(1).UtcDateTime, then.Reason, null);
        }
        return kit;
    }

    /// <summary>The bottles and the final move's reason pass the API's own validators: the demo stores nothing the API would refuse.</summary>
    private static List<ValidationFailure> Check(DemoKit kit, IValidator<CollectionRequest> collection, IValidator<ReasonRequest> reason) =>
    [
        .. kit.Collection is { } c ? collection.Validate(new CollectionRequest(c.Samples)).Errors : [],
        .. kit.Then is { } then ? reason.Validate(new ReasonRequest(then.Reason)).Errors : [],
    ];

    private static void Move(CommunityLeadDb db, Kit kit, KitAction action, DateTime atUtc, string? reason, string? detail)
    {
        if (KitTransitions.Apply(db, kit, action, Loader, atUtc, reason, detail) is not null)
            throw new InvalidDataException($"Demo kit {kit.Code}: '{KebabEnum.Name(action)}' is not allowed from {KebabEnum.Name(kit.State)}.");
    }

    /// <summary>Demo:File if set; else seed-data/demo.json.</summary>
    private static string? FindScenarioFile(IConfiguration configuration) =>
        configuration["Demo:File"] is { Length: > 0 } configured
            ? (File.Exists(configured) ? configured : null)
            : SeedData.Find("demo.json");
}
