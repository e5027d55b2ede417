using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Data;

/// <summary>
/// The program's store, on SQLite. Handlers use it directly; there is no repository layer over EF Core.
/// <see cref="PostgresCommunityLeadDb"/> is the same model on PostgreSQL with its own migrations;
/// DEVELOPERS.md says how to add a migration for both.
/// </summary>
public class CommunityLeadDb : DbContext
{
    public CommunityLeadDb(DbContextOptions<CommunityLeadDb> options) : base(options) { }

    /// <summary>For a provider's derived context, which needs options typed to itself.</summary>
    protected CommunityLeadDb(DbContextOptions options) : base(options) { }

    public DbSet<Household> Households => Set<Household>();
    public DbSet<Kit> Kits => Set<Kit>();
    public DbSet<Collection> Collections => Set<Collection>();
    public DbSet<Sample> Samples => Set<Sample>();
    public DbSet<KitFlag> KitFlags => Set<KitFlag>();
    public DbSet<AuditEntry> AuditTrail => Set<AuditEntry>();
    public DbSet<ApiKey> ApiKeys => Set<ApiKey>();
    public DbSet<LabBatch> LabBatches => Set<LabBatch>();
    public DbSet<LabResult> LabResults => Set<LabResult>();
    public DbSet<LabQcEntry> LabQc => Set<LabQcEntry>();
    public DbSet<AttentionItem> Attention => Set<AttentionItem>();
    public DbSet<KitInterpretation> Interpretations => Set<KitInterpretation>();
    public DbSet<IssuedLetter> Letters => Set<IssuedLetter>();
    public DbSet<Area> Areas => Set<Area>();
    public DbSet<ReportInputs> ReportInputs => Set<ReportInputs>();

    protected override void OnModelCreating(ModelBuilder modelBuilder) =>
        modelBuilder.ApplyConfigurationsFromAssembly(typeof(CommunityLeadDb).Assembly);

    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        // Enums as their names: the database stays readable and a reordered enum can't corrupt rows.
        configurationBuilder.Properties<Enum>().HaveConversion<string>().HaveMaxLength(40);
        configurationBuilder.Properties<DateTime>().HaveConversion<UtcDateTimeConverter>();
    }

    public override int SaveChanges(bool acceptAllChangesOnSuccess)
    {
        BeforeSave();
        return base.SaveChanges(acceptAllChangesOnSuccess);
    }

    public override Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default)
    {
        BeforeSave();
        return base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken);
    }

    private void BeforeSave()
    {
        // Each Entries() call would scan every tracked entity for changes again (a 10,000-row batch tracks 20,000
        // and more): scan once here, and let the save scan once more after PeriodMonth is set.
        ChangeTracker.DetectChanges();
        var autoDetect = ChangeTracker.AutoDetectChangesEnabled;
        ChangeTracker.AutoDetectChangesEnabled = false;
        try
        {
            // Every kit's report period follows its dates, whichever feature changed them.
            foreach (var kit in ChangeTracker.Entries<Kit>().Where(e => e.State is EntityState.Added or EntityState.Modified))
            {
                var date = kit.Entity.CollectedAtUtc ?? kit.Entity.IssuedAtUtc;
                kit.Entity.PeriodMonth = date.Year * 100 + date.Month;
            }
            // The triggers in the database are the real guard; this fails earlier with a clearer message.
            if (ChangeTracker.Entries<AuditEntry>().Any(e => e.State is EntityState.Modified or EntityState.Deleted))
                throw new InvalidOperationException("The audit trail is append-only.");
        }
        finally
        {
            ChangeTracker.AutoDetectChangesEnabled = autoDetect;
        }
    }
}
