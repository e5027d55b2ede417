using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Operations;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Api.Features.Interpretation;

public static class InterpretationEndpoints
{
    // GET  /api/kits/{code}/interpretation   what the results mean (stored, or provisional)   coordinator
    // POST /api/kits/{code}/interpretation   interpret again now (e.g. after a profile change) coordinator
    public static void MapInterpretation(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/kits/{code}/interpretation").WithTags("Interpretation")
            .RequireAuthorization(Policies.Coordinator).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden)
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
        group.MapGet("/", Get).WithName("getInterpretation").WithSummary("What a kit's results mean (stored, or provisional)");
        group.MapPost("/", Reinterpret).WithName("reinterpretKit").WithSummary("Interpret a kit again now (after a profile change)");
    }

    public static async Task<Results<Ok<InterpretationResponse>, ValidationProblem, ProblemHttpResult>> Get(
        string code, CommunityLeadDb db, ProfileCatalog catalog, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        var options = json.Value.SerializerOptions;
        var stored = await db.Interpretations.AsNoTracking()
            .Where(i => i.KitId == kit.Id && i.SupersededAtUtc == null).SingleOrDefaultAsync(ct);
        if (stored is not null)
            return TypedResults.Ok(Response(kit.Code, JsonSerializer.Deserialize<KitOutcome>(stored.OutcomeJson, options)!,
                new ProfileRef(stored.ProfileId, stored.ProfileVersion), stored.CreatedAtUtc, provisional: false));
        if (!await db.LabResults.AnyAsync(r => r.KitId == kit.Id && r.SupersededAtUtc == null, ct))
            return TypedResults.Problem(statusCode: 409, title: "This kit has no results yet.",
                detail: $"Kit {kit.Code} is {KebabEnum.Name(kit.State)}; it is interpreted once the lab's results are in.",
                extensions: new Dictionary<string, object?> { ["currentState"] = KebabEnum.Name(kit.State) });
        var facts = (await KitFactsLoader.LoadAsync(db, [kit.Id], ct, includeHeld: true))[kit.Id];
        var profile = catalog.For(kit.Kind);
        var outcome = CommunityLead.Rules.Interpretation.Interpreter.Interpret(facts, profile, catalog.ProgramRules);
        return TypedResults.Ok(Response(kit.Code, outcome, new ProfileRef(profile.Id, profile.Version), null, provisional: true));
    }

    public static async Task<Results<Ok<InterpretationResponse>, ValidationProblem, ProblemHttpResult>> Reinterpret(
        string code, CommunityLeadDb db, ProfileCatalog catalog, IOptions<JsonOptions> json, TimeProvider clock,
        HttpContext http, CancellationToken ct)
    {
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        if (!KitLifecycle.TryMove(kit.State, KitAction.Interpret, out _))
            return Problems.IllegalMove(kit.Code, kit.State, KitAction.Interpret);
        var now = clock.GetUtcNow().UtcDateTime;
        KitOutcome outcome;
        try
        {
            outcome = (await KitInterpreting.InterpretAndCommitAsync(db, catalog, new Dictionary<int, int> { [kit.Id] = kit.Version }, Actor.From(http.User), now, json.Value.SerializerOptions, ct))[kit.Id];
        }
        catch (DbUpdateConcurrencyException)
        {
            return Problems.ChangedMeanwhile(kit.Code);
        }
        ServiceMetrics.Interpreted([outcome.Band]);
        var profile = catalog.For(kit.Kind);
        return TypedResults.Ok(Response(kit.Code, outcome, new ProfileRef(profile.Id, profile.Version), now, provisional: false));
    }

    private static InterpretationResponse Response(string code, KitOutcome o, ProfileRef profile, DateTime? at, bool provisional) =>
        new(code, o.Band, profile, o.Findings, o.Messages, o.Flags, o.Pattern, o.Peak, o.Validity, at, provisional, o.Implausible);
}
