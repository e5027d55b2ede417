using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Tests.Data;

/// <summary>Only a lost race may be answered "changed meanwhile, post again"; any other failed save is an error.</summary>
public class StoreErrorsTests
{
    private static DbUpdateException FailedSave(CommunityLeadFactory app, Action<CommunityLeadDb> change) => app.WithDb(db =>
    {
        change(db);
        return Assert.ThrowsAny<DbUpdateException>(() => db.SaveChanges());
    });

    [Fact]
    public void StoreErrors_SameUniqueKeyStoredTwice_IsALostRace()
    {
        using var app = new CommunityLeadFactory();
        app.CreateKey(Roles.Lab, "partner-lab");

        var error = FailedSave(app, db => db.ApiKeys.Add(new ApiKey
        {
            Label = "partner-lab", Role = Roles.Lab, KeyId = "0123456789abcdef", Salt = [1], SecretHash = [1],
        }));

        Assert.True(StoreErrors.IsLostRace(error));
    }

    [Fact]
    public void StoreErrors_RowForAKitThatDoesNotExist_IsNotALostRace()
    {
        using var app = new CommunityLeadFactory();

        var error = FailedSave(app, db => db.Attention.Add(AttentionItem.Raise(404, "NONE", AttentionFlag.Urgent, "Detail.", DateTime.UtcNow)));

        Assert.False(StoreErrors.IsLostRace(error));
    }

    [PostgresFact]
    public async Task StoreErrors_ValueLongerThanItsColumn_IsNotALostRace()
    {
        // What the batch intake used to report as "raced, post it again" when PostgreSQL refused an over-long value.
        using var app = new CommunityLeadFactory();
        var kit = await Fixtures.IssueKitAsync(app.CreateClient(Roles.Coordinator));
        var kitId = app.WithDb(db => db.Kits.Single(k => k.Code == kit).Id);

        var error = FailedSave(app, db => db.Attention.Add(AttentionItem.Raise(kitId, kit, AttentionFlag.Urgent,
            new string('d', AttentionItem.DetailMaxLength + 1), DateTime.UtcNow)));

        Assert.False(StoreErrors.IsLostRace(error));
    }
}
