using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Data;

/// <summary>
/// The same model on PostgreSQL. A context of its own only so that its migrations (Data/Migrations/Postgres)
/// are kept apart from SQLite's: the two providers write different DDL for the same change.
/// </summary>
public sealed class PostgresCommunityLeadDb(DbContextOptions<PostgresCommunityLeadDb> options) : CommunityLeadDb(options)
{
    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        base.ConfigureConventions(configurationBuilder);
        // A collection time is what the household's own clock said, offset included ("06:40-05:00"), and the
        // letter repeats it that way. PostgreSQL's timestamptz keeps only the instant, so these columns hold the
        // same ISO 8601 text SQLite holds; every query that orders or filters by time uses the *Utc columns.
        configurationBuilder.Properties<DateTimeOffset>().HaveConversion<OffsetTextConverter>().HaveMaxLength(40);
    }
}
