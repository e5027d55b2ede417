using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Kits.Labels;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Api.Infrastructure.OpenApi;

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
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);

        var coordinator = kits.MapGroup("").RequireAuthorization(Policies.Coordinator);
        coordinator.MapPost("/", KitMoves.Issue).WithName("issueKit").WithSummary("Issue a kit to a household")
            .ProducesProblem(StatusCodes.Status404NotFound);
        coordinator.MapGet("/", KitQueries.List).WithName("listKits").WithSummary("The work queue: kits by state or household")
            .WithQuery<CommunityLead.Rules.Kits.KitState>("state", "Only kits in this state");
        coordinator.MapGet("/labels", KitLabels.Sheet).WithName("kitLabels")
            .WithSummary("A PDF sheet of kit labels: code as text, Code 128 and QR, and the bottles")
            .Produces(StatusCodes.Status200OK, contentType: "application/pdf");
        coordinator.MapPost("/{code}/collection", CollectionRecording.Record).WithName("recordCollection")
            .WithSummary("Record how and when the household took its samples").KitMove();
        coordinator.MapPost("/{code}/cancel", KitMoves.Cancel).WithName("cancelKit").WithSummary("Cancel a kit with a reason").KitMove();
        coordinator.MapPost("/{code}/lost", KitMoves.MarkLost).WithName("markKitLost").WithSummary("Mark a kit lost with a reason").KitMove();
        coordinator.MapPost("/{code}/reject", KitMoves.Reject).WithName("rejectKit").WithSummary("Reject a returned kit with a reason").KitMove();
        coordinator.MapPost("/{code}/replacement", KitMoves.Replace).WithName("replaceKit").WithSummary("Issue a replacement for a kit").KitMove();
        coordinator.MapPost("/{code}/close", KitMoves.Close).WithName("closeKit").WithSummary("Close a kit whose letter was sent").KitMove();

        var readers = kits.MapGroup("").RequireAuthorization(Policies.KitReader);
        readers.MapGet("/{code}", KitQueries.Get).WithName("getKit").WithSummary("Read a kit: state, samples, flags and history")
            .ProducesProblem(StatusCodes.Status404NotFound);

        var receivers = kits.MapGroup("").RequireAuthorization(Policies.KitReceiver);
        receivers.MapPost("/{code}/receipt", KitMoves.Receive).WithName("receiveKit").WithSummary("Record that the kit reached the lab").KitMove();
    }
}
