using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Api.Infrastructure.OpenApi;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Households;

public static class HouseholdEndpoints
{
    // GET  /api/households?search=  find homes by name, phone, email, street or postal code
    // POST /api/households        sign a household up
    // GET  /api/households/{id}   read it, with its kits
    // PUT  /api/households/{id}   replace its details (If-Match: the ETag of the read, to refuse a stale edit)
    public static void MapHouseholds(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/households").WithTags("Households")
            .RequireAuthorization(Policies.Coordinator).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapGet("/", HouseholdSearch.Search).WithName("searchHouseholds")
            .WithSummary("Find households by name, phone, email, street or postal code");
        group.MapPost("/", SignUp).WithName("signUpHousehold").WithSummary("Sign a household up")
            .ProducesValidationProblem();
        group.MapGet("/{id:guid}", Get).WithName("getHousehold").WithSummary("Read a household with its kits (and its ETag)")
            .ProducesProblem(StatusCodes.Status404NotFound).WithResponseHeader(StatusCodes.Status200OK, "ETag", "The version to send back in If-Match when editing");
        group.MapPut("/{id:guid}", Update).WithName("updateHousehold")
            .WithSummary("Replace a household's details; with If-Match, a stale edit is refused with 412")
            .WithRequestHeader("If-Match", "The ETag of the read this edit is based on")
            .ProducesValidationProblem().ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status412PreconditionFailed);
    }

    public static async Task<Created<HouseholdCreated>> SignUp(
        HouseholdRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http)
    {
        var now = clock.GetUtcNow().UtcDateTime;
        var household = HouseholdMapping.NewHousehold(request, now);
        db.Households.Add(household);
        db.AuditTrail.Add(Audit.Household(Actor.From(http.User), now, household.Id, "sign-up"));
        await db.SaveChangesAsync();
        return TypedResults.Created($"/api/households/{household.Id}", new HouseholdCreated(household.Id));
    }

    public static async Task<Results<Ok<HouseholdResponse>, ProblemHttpResult>> Get(Guid id, CommunityLeadDb db, HttpContext http)
    {
        var found = await db.Households.AsNoTracking().Where(h => h.Id == id).Select(h => new
            {
                h.Version,
                Response = new HouseholdResponse(
                    h.Id, h.Name,
                    new AddressResponse(h.Address.Line1, h.Address.Line2, h.Address.City, h.Address.Region, h.Address.PostalCode),
                    h.Phone, h.Email, h.Language, h.ConsentVersion, h.ConsentGivenAt, h.AreaCode, h.WaterSource,
                    h.YearBuilt, h.ServiceLine, h.ChildUnder6, h.Pregnant, h.FilterInUse, h.CreatedAtUtc, h.UpdatedAtUtc,
                    h.Kits.OrderBy(k => k.IssuedAtUtc).Select(k => new HouseholdKit(k.Code, k.Kind, k.State, k.IssuedAtUtc)).ToList()),
            })
            .SingleOrDefaultAsync();
        if (found is null) return Problems.HouseholdNotFound(id);
        http.Response.Headers.ETag = HouseholdVersions.ETag(found.Version);
        return TypedResults.Ok(found.Response);
    }

    /// <summary>
    /// Two staff members may edit one home. With If-Match (the ETag of their read) an edit made on stale details is
    /// refused with 412 instead of silently undoing the other's change; without it the last edit wins.
    /// </summary>
    public static async Task<Results<NoContent, ProblemHttpResult>> Update(
        Guid id, HouseholdRequest request, CommunityLeadDb db, TimeProvider clock, HttpContext http)
    {
        var household = await db.Households.SingleOrDefaultAsync(h => h.Id == id);
        if (household is null) return Problems.HouseholdNotFound(id);
        if (!HouseholdVersions.Matches(http.Request.Headers.IfMatch, household.Version))
            return HouseholdVersions.Stale(http, household.Version);
        var changed = household.Apply(request);
        if (changed.Count > 0)
        {
            var now = clock.GetUtcNow().UtcDateTime;
            household.UpdatedAtUtc = now;
            household.Version++;
            // Field names only: the trail must not become a second copy of personal data.
            db.AuditTrail.Add(Audit.Household(Actor.From(http.User), now, id, "update", $"changed: {string.Join(", ", changed)}"));
            try
            {
                await db.SaveChangesAsync();
            }
            catch (DbUpdateConcurrencyException)
            {
                // Someone saved this household between our read and our write.
                return HouseholdVersions.Stale(http, version: null);
            }
        }
        http.Response.Headers.ETag = HouseholdVersions.ETag(household.Version);
        return TypedResults.NoContent();
    }
}
