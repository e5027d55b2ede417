using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Areas;

public static class AreaEndpoints
{
    // GET  /api/areas           the program's areas, active or not           coordinator, admin, health
    // POST /api/areas           add one { code, name }                      coordinator, admin
    // PUT  /api/areas/{code}    rename and/or deactivate { name, active }   coordinator, admin
    public static void MapAreas(this IEndpointRouteBuilder app)
    {
        var areas = app.MapGroup("/api/areas").WithTags("Areas").AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        // The health department reads the codes its reports filter and group by.
        areas.MapGroup("").RequireAuthorization(Policies.AreaReader).MapGet("/", List).WithName("listAreas")
            .WithSummary("The areas a household may be in, active or not");
        var keepers = areas.MapGroup("").RequireAuthorization(Policies.AreaKeeper);
        keepers.MapPost("/", Add).WithName("addArea").WithSummary("Add an area to the list")
            .ProducesValidationProblem().ProducesProblem(StatusCodes.Status409Conflict);
        keepers.MapPut("/{code}", Change).WithName("changeArea").WithSummary("Rename an area, or make it active or inactive")
            .ProducesValidationProblem().ProducesProblem(StatusCodes.Status404NotFound);
    }

    public static async Task<Ok<List<AreaResponse>>> List(CommunityLeadDb db, CancellationToken ct) =>
        TypedResults.Ok(await db.Areas.AsNoTracking().OrderBy(a => a.Code).Select(a => new AreaResponse(a.Code, a.Name, a.Active)).ToListAsync(ct));

    public static async Task<Results<Created<AreaResponse>, ProblemHttpResult>> Add(
        NewAreaRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct)
    {
        var code = AreaCodes.Normal(request.Code!);
        if (await db.Areas.AnyAsync(a => a.Code == code, ct))
            return TypedResults.Problem(statusCode: 409, title: "This area exists already.",
                detail: $"Area '{code}' is on the list; rename or activate it with PUT /api/areas/{code}.");
        var area = new Area { Code = code, Name = request.Name!.Trim() };
        db.Areas.Add(area);
        db.AuditTrail.Add(Audit.Area(Actor.From(http.User), clock.GetUtcNow().UtcDateTime, code, "add"));
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateException e) when (StoreErrors.IsLostRace(e))
        {
            return TypedResults.Problem(statusCode: 409, title: "This area exists already.", detail: $"Area '{code}' was added meanwhile.");
        }
        return TypedResults.Created($"/api/areas/{code}", new AreaResponse(area.Code, area.Name, area.Active));
    }

    public static async Task<Results<Ok<AreaResponse>, ProblemHttpResult>> Change(
        string code, AreaChangeRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http, CancellationToken ct)
    {
        var normal = AreaCodes.Normal(code);
        var area = await db.Areas.SingleOrDefaultAsync(a => a.Code == normal, ct);
        if (area is null)
            return TypedResults.Problem(statusCode: 404, title: "No such area.", detail: $"No area has the code '{normal}'. Add it with POST /api/areas.");
        var changed = new List<string>();
        if (request.Name?.Trim() is { } name && name != area.Name) (area.Name, changed) = (name, [.. changed, "name"]);
        if (request.Active is { } active && active != area.Active) (area.Active, changed) = (active, [.. changed, "active"]);
        if (changed.Count > 0)
        {
            db.AuditTrail.Add(Audit.Area(Actor.From(http.User), clock.GetUtcNow().UtcDateTime, normal, "change", $"changed: {string.Join(", ", changed)}"));
            await db.SaveChangesAsync(ct);
        }
        return TypedResults.Ok(new AreaResponse(area.Code, area.Name, area.Active));
    }
}
