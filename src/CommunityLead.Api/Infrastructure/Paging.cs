using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Infrastructure;

/// <summary>The same page and page-size rules, and words, for every list.</summary>
public static class Paging
{
    public static ValidationProblem? Check(int page, int pageSize, int largest)
    {
        if (page < 1) return Problems.Field("page", "Pages are numbered from 1.");
        if (pageSize < 1 || pageSize > largest) return Problems.Field("pageSize", $"Use a page size from 1 to {largest}.");
        return null;
    }
}
