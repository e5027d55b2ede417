using CommunityLead.Api.Data.Entities;

namespace CommunityLead.Api.Features.Households;

/// <summary>Request → entity and entity → response by hand, so a client can only set what the contract lets it.</summary>
public static class HouseholdMapping
{
    /// <summary>Copies a validated request onto the household and returns the names of the fields that changed.</summary>
    public static List<string> Apply(this Household h, HouseholdRequest r)
    {
        var changed = new List<string>();
        void Set<T>(string field, T current, T next, Action<T> assign)
        {
            if (EqualityComparer<T>.Default.Equals(current, next)) return;
            assign(next);
            changed.Add(field);
        }
        var a = r.Address!;
        Set("name", h.Name, r.Name!.Trim(), v => h.Name = v);
        Set("address.line1", h.Address.Line1, a.Line1!.Trim(), v => h.Address.Line1 = v);
        Set("address.line2", h.Address.Line2, Blank(a.Line2), v => h.Address.Line2 = v);
        Set("address.city", h.Address.City, a.City!.Trim(), v => h.Address.City = v);
        Set("address.region", h.Address.Region, Blank(a.Region), v => h.Address.Region = v);
        Set("address.postalCode", h.Address.PostalCode, a.PostalCode!.Trim(), v => h.Address.PostalCode = v);
        Set("phone", h.Phone, Blank(r.Phone), v => h.Phone = v);
        Set("email", h.Email, Blank(r.Email), v => h.Email = v);
        Set("language", h.Language, r.Language!.Value, v => h.Language = v);
        Set("consentVersion", h.ConsentVersion, r.ConsentVersion!.Trim(), v => h.ConsentVersion = v);
        Set("consentGivenAt", h.ConsentGivenAt, r.ConsentGivenAt!.Value, v => h.ConsentGivenAt = v);
        Set("areaCode", h.AreaCode, Areas.AreaCodes.Normal(r.AreaCode!), v => h.AreaCode = v);
        Set("waterSource", h.WaterSource, r.WaterSource!.Value, v => h.WaterSource = v);
        Set("yearBuilt", h.YearBuilt, r.YearBuilt, v => h.YearBuilt = v);
        Set("serviceLine", h.ServiceLine, r.ServiceLine!.Value, v => h.ServiceLine = v);
        Set("childUnder6", h.ChildUnder6, r.ChildUnder6!.Value, v => h.ChildUnder6 = v);
        Set("pregnant", h.Pregnant, r.Pregnant!.Value, v => h.Pregnant = v);
        Set("filterInUse", h.FilterInUse, r.FilterInUse!.Value, v => h.FilterInUse = v);
        return changed;
    }

    public static Household NewHousehold(HouseholdRequest r, DateTime nowUtc)
    {
        var h = new Household
        {
            // Random, not sequential: an id must not reveal how many homes signed up or in what order.
            Id = Guid.NewGuid(),
            Name = "", ConsentVersion = "", AreaCode = "",
            Address = new PostalAddress { Line1 = "", City = "", PostalCode = "" },
            CreatedAtUtc = nowUtc, UpdatedAtUtc = nowUtc,
        };
        h.Apply(r);
        return h;
    }

    private static string? Blank(string? s) => string.IsNullOrWhiteSpace(s) ? null : s.Trim();
}
