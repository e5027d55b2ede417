using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Kits.Labels;

/// <summary>GET /api/kits/labels?codes=A,B&amp;stock=letter-30: a PDF sheet of labels for issued kits.</summary>
public static class KitLabels
{
    /// <summary>Ten sheets of the smaller stock: a day's mailing, and a bounded PDF.</summary>
    public const int MostCodes = 300;

    public static async Task<Results<FileContentHttpResult, ValidationProblem>> Sheet(
        CommunityLeadDb db, CancellationToken ct, string? codes = null, string? stock = null)
    {
        var chosen = LabelStock.All.FirstOrDefault(s => s.Name == (stock ?? LabelStock.Letter30.Name));
        if (chosen is null)
            return Problems.Field("stock", $"Use one of: {string.Join(", ", LabelStock.All.Select(s => s.Name))}.");
        var asked = (codes ?? "").Split([',', ' ', '\n', '\r', '\t'], StringSplitOptions.RemoveEmptyEntries);
        if (asked.Length == 0) return Problems.Field("codes", "Name at least one kit code, separated by commas.");
        if (asked.Length > MostCodes) return Problems.Field("codes", $"At most {MostCodes} codes per sheet request.");

        var canonical = new List<string>();
        foreach (var text in asked)
        {
            var parsed = KitCode.Parse(text);
            if (!parsed.IsValid) return Problems.Field("codes", $"{text}: {parsed.Error}");
            canonical.Add(parsed.Code!);
        }
        var kits = await db.Kits.AsNoTracking().Where(k => canonical.Contains(k.Code))
            .Select(k => new { k.Code, k.Kind, k.Household!.Language, k.Household.ServiceLine })
            .ToDictionaryAsync(k => k.Code, ct);
        var missing = canonical.Where(c => !kits.ContainsKey(c)).ToList();
        if (missing.Count > 0) return Problems.Field("codes", $"No kit was issued with code {string.Join(", ", missing)}.");

        var labels = canonical.Select(c => new KitLabel(c, BottleLine(kits[c].Kind, kits[c].Language, kits[c].ServiceLine))).ToList();
        return TypedResults.File(LabelSheet.Render(labels, chosen), "application/pdf", $"kit-labels-{chosen.Name}.pdf");
    }

    /// <summary>The bottles a household fills, in its letter language, as on the kit's instructions.</summary>
    public static string BottleLine(KitKind kind, LetterLanguage language, ServiceLineMaterial serviceLine)
    {
        var es = language == LetterLanguage.Es;
        return kind switch
        {
            KitKind.Water when serviceLine == ServiceLineMaterial.Lead =>
                es ? "Primera agua · Quinto litro · Después de correr" : "First draw · Fifth liter · Flushed",
            KitKind.Water => es ? "Primera agua · Después de correr" : "First draw · Flushed",
            KitKind.WaterSequential => es ? "Botellas de la serie 1, 2, 3… · Después de correr" : "Sequential bottles 1, 2, 3… · Flushed",
            _ => es ? "Tierra: zona de juegos, huerto, borde del techo, patio" : "Soil: play area, garden, drip line, yard",
        };
    }
}
