using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Tests.Data;

/// <summary>
/// A large batch looks up every one of its kit codes at once. EF Core 10 sends such a list as one parameter per
/// value by default, and SQLite refuses more than 32,766 parameters in a statement (SQLITE_MAX_VARIABLE_NUMBER
/// since 3.32, sqlite.org/limits.html): a 100,000-row batch of 50,000 kits was answered 500. The store is set to
/// send a list as one array parameter (a JSON array on SQLite, an array on PostgreSQL) whatever its length.
/// </summary>
public class LargeListQueryTests
{
    [Fact]
    public void Store_QueryOverFiftyThousandKitCodes_RunsAsOneParameter()
    {
        using var app = new CommunityLeadFactory();
        var codes = Enumerable.Range(0, 50_000).Select(i => $"CODE-{i:D5}").ToList();

        var (sql, found) = app.WithDb(db =>
        {
            var query = db.Kits.Where(k => codes.Contains(k.Code)).Select(k => k.Id);
            return (query.ToQueryString(), query.ToList());
        });

        // Ran at all: with a parameter per code SQLite throws "too many SQL variables" here.
        Assert.Empty(found);
        Assert.DoesNotContain("@codes2", sql);
    }
}
