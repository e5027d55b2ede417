using CommunityLead.Api.Infrastructure;
using FluentValidation;

namespace CommunityLead.Api.Features.Results;

public sealed record ResultRequest(string? Code, string? Secret);

public static class ResultEndpoints
{
    // POST /api/results          a household's result, by kit code and the secret on its letter   anyone
    // POST /api/results/letter   the same household's letter (PDF)                                anyone
    // Both: a wrong code and a wrong secret get the same 404; every lookup counts against the client address's limit.
    public static void MapResults(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/results").WithTags("Household results").AllowAnonymous()
            .AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status429TooManyRequests);
        group.MapPost("/", ResultLookup.Result).WithName("lookUpResult")
            .WithSummary("A household's result in plain words, by its kit code and the secret printed on its letter");
        group.MapPost("/letter", ResultLookup.Letter).WithName("downloadResultLetter")
            .WithSummary("The household's letter, by its kit code and the secret printed on it").Produces(StatusCodes.Status200OK, contentType: "application/pdf");
    }
}

public sealed class ResultRequestValidator : AbstractValidator<ResultRequest>
{
    public ResultRequestValidator()
    {
        RuleFor(r => r.Code).NotEmpty().WithMessage("Type the kit code from your letter.").MaximumLength(20);
        RuleFor(r => r.Secret).NotEmpty().WithMessage("Type the secret code from your letter.").MaximumLength(20);
    }
}
