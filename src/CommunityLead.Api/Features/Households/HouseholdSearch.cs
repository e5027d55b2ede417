using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Households;

public sealed record HouseholdSummary(
    Guid Id, string Name, string AddressLine1, string City, string PostalCode, string AreaCode, int Kits, string? Phone = null, string? Email = null);

public sealed record HouseholdPage(IReadOnlyList<HouseholdSummary> Items, int Page, int PageSize, int Total);

/// <summary>Finding a home when it calls: by part of its name, phone, email, street or postal code.</summary>
public static class HouseholdSearch
{
    /// <summary>What people put between a phone number's digits; the search compares digits only.</summary>
    private static readonly string[] PhoneMarks = [" ", "-", ".", "(", ")", "+"];

    public static async Task<Results<Ok<HouseholdPage>, ValidationProblem>> Search(
        CommunityLeadDb db, CancellationToken ct, string? search = null, string? areaCode = null, int page = 1, int pageSize = 25)
    {
        if (search is { Length: > 100 }) return Problems.Field("search", "Search for at most 100 characters.");
        if (Paging.Check(page, pageSize, largest: 100) is { } badPage) return badPage;
        var query = db.Households.AsNoTracking();
        if (!string.IsNullOrWhiteSpace(areaCode)) query = query.Where(h => h.AreaCode == areaCode.Trim().ToLowerInvariant());
        if (!string.IsNullOrWhiteSpace(search))
        {
            // Matched literally (% and _ mean themselves), the same way on both stores. Case is ignored through
            // lower(), which on SQLite folds only A–Z: "ángela" finds "Ángela" on PostgreSQL but not on SQLite, so
            // the text exactly as typed is tried as well, and "Ángela" finds "Ángela" everywhere.
            var typed = search.Trim();
            var folded = typed.ToLowerInvariant();
            // A caller reads out "555 0114" for a number stored as "+1 (555) 011-4": when the search is a phone
            // number, its digits are looked for among the stored number's digits (replace() runs on both stores).
            var digits = PhoneDigits(typed);
            var isPhone = digits.Length > 0;
            query = query.Where(h => h.Name.Contains(typed) || h.Name.ToLower().Contains(folded)
                || h.Phone!.Contains(typed) || h.Email!.ToLower().Contains(folded)
                || h.Address.Line1.Contains(typed) || h.Address.Line1.ToLower().Contains(folded)
                || h.Address.PostalCode.ToLower().Contains(folded)
                || (isPhone && h.Phone!.Replace(" ", "").Replace("-", "").Replace(".", "").Replace("(", "").Replace(")", "")
                    .Replace("+", "").Contains(digits)));
        }
        var total = await query.CountAsync(ct);
        var items = await query.OrderBy(h => h.Name).ThenBy(h => h.Id).Skip((page - 1) * pageSize).Take(pageSize)
            .Select(h => new HouseholdSummary(h.Id, h.Name, h.Address.Line1, h.Address.City, h.Address.PostalCode, h.AreaCode, h.Kits.Count, h.Phone, h.Email))
            .ToListAsync(ct);
        return TypedResults.Ok(new HouseholdPage(items, page, pageSize, total));
    }

    /// <summary>The digits of a search that reads as a phone number (four digits or more, only phone marks between), else "".</summary>
    private static string PhoneDigits(string typed)
    {
        var digits = new string(typed.Where(char.IsAsciiDigit).ToArray());
        return digits.Length >= 4 && typed.All(c => char.IsAsciiDigit(c) || PhoneMarks.Contains(c.ToString())) ? digits : "";
    }
}
