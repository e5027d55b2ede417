using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Areas;
using FluentValidation;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Households;

public sealed class HouseholdValidator : AbstractValidator<HouseholdRequest>
{
    // At least seven digits, with the separators people actually type.
    private const string PhonePattern = @"^\+?[0-9][0-9 ().\-]{5,23}[0-9]$";
    private const string EmailPattern = @"^[^@\s]+@[^@\s]+\.[^@\s]+$";
    private static readonly DateTimeOffset Earliest = new(2000, 1, 1, 0, 0, 0, TimeSpan.Zero);

    private readonly CommunityLeadDb db;
    private readonly IHttpContextAccessor http;

    public HouseholdValidator(TimeProvider clock, CommunityLeadDb db, IHttpContextAccessor http)
    {
        (this.db, this.http) = (db, http);
        RuleFor(h => h.Name).NotEmpty().MaximumLength(200);
        RuleFor(h => h.Address).NotNull().SetValidator(new AddressValidator()!);
        // A blank phone or email means "none" (the mapping stores null), so only a non-blank one is checked.
        RuleFor(h => h.Phone).MaximumLength(40).Matches(PhonePattern).When(h => !string.IsNullOrWhiteSpace(h.Phone))
            .WithMessage("Use digits, with spaces, dashes, dots or brackets if you like, e.g. +1 555 0107.");
        RuleFor(h => h.Email).MaximumLength(254).Matches(EmailPattern).When(h => !string.IsNullOrWhiteSpace(h.Email))
            .WithMessage("This does not look like an email address.");
        RuleFor(h => h.Language).NotNull();
        RuleFor(h => h.ConsentVersion).NotEmpty().MaximumLength(50);
        RuleFor(h => h.ConsentGivenAt).Cascade(CascadeMode.Stop).NotNull()
            .GreaterThanOrEqualTo(Earliest).WithMessage("Consent cannot be dated before 2000.")
            .Must(at => at <= clock.GetUtcNow().AddMinutes(15)).WithMessage("Consent cannot be dated in the future.");
        RuleFor(h => h.AreaCode).Cascade(CascadeMode.Stop).NotEmpty().Matches(AreaCodes.Pattern).WithMessage(AreaCodes.Hint)
            .CustomAsync(async (code, context, ct) =>
            {
                // A managed list, so a typo cannot split a report group; the answer names the codes to choose from.
                var wanted = AreaCodes.Normal(code!);
                var known = await db.Areas.AsNoTracking().OrderBy(a => a.Code).Select(a => new { a.Code, a.Active }).ToListAsync(ct);
                // The list is the program's to start: until it names an area, any well-formed code is taken, as v1 of
                // the contract promised (an upgraded store already has its households' codes listed).
                if (known.Count == 0) return;
                if (known.Any(a => a.Code == wanted && a.Active)) return;
                // A household edited after its area was deactivated keeps it; new homes cannot choose it.
                if (known.Any(a => a.Code == wanted) && await EditedHouseholdHasAsync(wanted, ct)) return;
                var active = known.Where(a => a.Active).Select(a => a.Code).ToList();
                context.AddFailure(active.Count == 0
                        ? "Every area of the program is inactive: make one active (PUT /api/areas/{code})."
                        : $"'{code}' is not one of the program's areas. Use one of: {string.Join(", ", active)}.");
            });
        RuleFor(h => h.WaterSource).NotNull();
        RuleFor(h => h.YearBuilt).Cascade(CascadeMode.Stop)
            .GreaterThanOrEqualTo(1700).WithMessage("A year built before 1700 is almost certainly a typo.")
            .Must(y => y is null || y <= clock.GetUtcNow().Year).WithMessage("The year built cannot be in the future.");
        RuleFor(h => h.ServiceLine).NotNull();
        RuleFor(h => h.ChildUnder6).NotNull().WithMessage("Say whether a child under 6 lives or stays often in the home.");
        RuleFor(h => h.Pregnant).NotNull().WithMessage("Say whether anyone in the home is pregnant.");
        RuleFor(h => h.FilterInUse).NotNull();
    }

    private async Task<bool> EditedHouseholdHasAsync(string area, CancellationToken ct) =>
        http.HttpContext?.Request.RouteValues["id"] is string id && Guid.TryParse(id, out var household)
        && await db.Households.AnyAsync(h => h.Id == household && h.AreaCode == area, ct);
}

public sealed class AddressValidator : AbstractValidator<AddressRequest>
{
    public AddressValidator()
    {
        RuleFor(a => a.Line1).NotEmpty().MaximumLength(200);
        RuleFor(a => a.Line2).MaximumLength(200);
        RuleFor(a => a.City).NotEmpty().MaximumLength(100);
        RuleFor(a => a.Region).MaximumLength(100);
        RuleFor(a => a.PostalCode).NotEmpty().MaximumLength(20);
    }
}
