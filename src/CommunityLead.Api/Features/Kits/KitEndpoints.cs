using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Kits.Labels;
using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Api.Features.Kits;

public static class KitEndpoints
{
    // POST /api/kits                        issue a kit to a household          coordinator
    // GET  /api/kits?state=&householdId=    the work queue                      coordinator
    // GET  /api/kits/labels?codes=&stock=   a PDF sheet of labels (letter-30, a4-21)  coordinator
    // GET  /api/kits/{code}                 one kit (lab: without household)    coordinator, lab
    // POST /api/kits/{code}/collection      record the bottles                  coordinator
    // POST /api/kits/{code}/receipt         the kit arrived                     coordinator, lab
    // POST /api/kits/{code}/cancel|lost|reject   with a reason                  coordinator
    // POST /api/kits/{code}/replacement     a new kit for the same household    coordinator
    // POST /api/kits/{code}/close           done after the letter               coordinator
    public static void MapKits(this IEndpointRouteBuilder app)
    {
        var kits = app.MapGroup("/api/kits").WithTags("Kits").AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden)
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);

        var coordinator = kits.MapGroup("").RequireAuthorization(Policies.Coordinator);
        coordinator.MapPost("/", KitMoves.Issue);
        coordinator.MapGet("/", KitQueries.List);
        coordinator.MapGet("/labels", KitLabels.Sheet).Produces(StatusCodes.Status200OK, contentType: "application/pdf");
        coordinator.MapPost("/{code}/collection", CollectionRecording.Record);
        coordinator.MapPost("/{code}/cancel", KitMoves.Cancel);
        coordinator.MapPost("/{code}/lost", KitMoves.MarkLost);
        coordinator.MapPost("/{code}/reject", KitMoves.Reject);
        coordinator.MapPost("/{code}/replacement", KitMoves.Replace);
        coordinator.MapPost("/{code}/close", KitMoves.Close);

        var readers = kits.MapGroup("").RequireAuthorization(Policies.KitReader);
        readers.MapGet("/{code}", KitQueries.Get);

        var receivers = kits.MapGroup("").RequireAuthorization(Policies.KitReceiver);
        receivers.MapPost("/{code}/receipt", KitMoves.Receive);
    }
}
