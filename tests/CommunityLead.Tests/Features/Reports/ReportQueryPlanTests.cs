using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Xunit.Abstractions;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>
/// The queries a report's decision reads, as each store plans them: every join by an index, the letters grouped along
/// their index, nothing sorted in a temporary tree. Reading every kit is a scan by nature (the set is decided over all
/// of them); what must never happen is a scan per kit.
/// </summary>
public class ReportQueryPlanTests(ITestOutputHelper output)
{
    private List<string> Plan(CommunityLeadDb db, IQueryable query) => Plan(db, query.ToQueryString());

    private List<string> Plan(CommunityLeadDb db, string sql)
    {
        var connection = db.Database.GetDbConnection();
        if (connection.State != System.Data.ConnectionState.Open) connection.Open();
        using var command = connection.CreateCommand();
        if (TestStore.IsPostgres)
        {
            // On a store this small PostgreSQL would rightly read whole tables; with that priced out, the plan shows
            // which index it has for each step.
            using var off = connection.CreateCommand();
            off.CommandText = "SET enable_seqscan = off";
            off.ExecuteNonQuery();
        }
        command.CommandText = (TestStore.IsPostgres ? "EXPLAIN " : "EXPLAIN QUERY PLAN ") + sql;
        using var reader = command.ExecuteReader();
        var lines = new List<string>();
        while (reader.Read()) lines.Add(reader.GetString(TestStore.IsPostgres ? 0 : 3));
        output.WriteLine(sql + Environment.NewLine + string.Join(Environment.NewLine, lines) + Environment.NewLine);
        return lines;
    }

    [Fact]
    public void ReportQueries_EveryJoinByAnIndex_NoTemporarySort()
    {
        using var app = new CommunityLeadFactory();
        app.WithDb(db =>
        {
            var kits = Plan(db, ReportKits.KitRows(db));
            var lead = Plan(db, ReportKits.FirstDrawLead(db));
            var days = Plan(db, ReportKits.DaysToLetter(db));
            if (TestStore.IsPostgres)
            {
                Assert.Contains(kits, l => l.Contains("\"PK_Households\""));
                Assert.Contains(lead, l => l.Contains("\"PK_LabBatches\""));
                Assert.Contains(days, l => l.Contains("Index Scan using \"IX_Letters_KitId"));
                // Seq Scan despite enable_seqscan=off means no index could serve; a Sort node means one was missing.
                Assert.All(kits.Concat(lead).Concat(days), l => Assert.DoesNotMatch(@"Seq Scan|(^|->)\s*Sort\b", l));
            }
            else
            {
                // SQLite's EXPLAIN QUERY PLAN: SEARCH is a look-up by index, SCAN a read of the whole table.
                Assert.Contains(kits, l => l.StartsWith("SEARCH h USING", StringComparison.Ordinal));
                // On SQLite the kits are read with their values joined into one text (ReportKitReading): the same plan.
                Assert.Equal(kits, Plan(db, ReportKitReading.Packed(ReportKits.KitRows(db).ToQueryString())));
                Assert.Contains(lead, l => l.StartsWith("SEARCH l0 USING INTEGER PRIMARY KEY", StringComparison.Ordinal));
                Assert.Contains(days, l => l.StartsWith("SCAN l USING", StringComparison.Ordinal) && l.Contains("INDEX IX_Letters_KitId"));
                Assert.All(kits.Concat(lead).Concat(days), l => Assert.DoesNotContain("TEMP B-TREE", l));
            }
            return 0;
        });
    }
}
