using System.Net;
using System.Text;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;
using static CommunityLead.Tests.Auth.AuthenticationTests;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Auth;

public class ApiKeyTests
{
    [Fact]
    public void ApiKey_Stored_OnlyAsSaltedHashNeverTheSecret()
    {
        using var app = new CommunityLeadFactory();
        var first = Secret(app.CreateKey(Roles.Lab, "partner-lab"));
        var second = Secret(app.CreateKey(Roles.Lab, "partner-lab-2"));

        var rows = app.WithDb(db => db.ApiKeys.OrderBy(k => k.Id).ToList());
        Assert.Equal(2, rows.Count);
        foreach (var (row, secret) in rows.Zip([first, second]))
        {
            var stored = string.Join("|", row.Label, row.Role, row.KeyId,
                Convert.ToHexStringLower(row.SecretHash), Convert.ToHexStringLower(row.Salt), Encoding.UTF8.GetString(row.SecretHash));
            Assert.DoesNotContain(secret, stored);
            Assert.DoesNotContain(secret[..16], stored);
            Assert.Equal(32, row.SecretHash.Length);
            Assert.True(row.Salt.Length >= 16, "A salt of at least 128 bits.");
        }
        Assert.NotEqual(Convert.ToHexString(rows[0].Salt), Convert.ToHexString(rows[1].Salt));
    }

    [SqliteFact]
    public void ApiKey_Secret_AppearsNowhereInTheDatabaseFiles()
    {
        using var app = new CommunityLeadFactory();
        var key = app.CreateKey(Roles.Admin, "ops");
        SqliteConnection.ClearAllPools();

        var files = string.Concat(new[] { app.DatabaseFile, app.DatabaseFile + "-wal" }.Where(File.Exists).Select(file =>
        {
            using var stream = new FileStream(file, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
            using var reader = new StreamReader(stream, Encoding.Latin1);
            return reader.ReadToEnd();
        }));
        Assert.Contains(key.Split('_')[1], files); // the public id is stored, so the scan does see the row
        Assert.DoesNotContain(Secret(key), files, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public async Task ApiKey_OneSecretCharacterChanged_Is401()
    {
        using var app = new CommunityLeadFactory();
        var key = app.CreateKey(Roles.Admin, "ops");
        await Expect(await ClientWith(app, $"Bearer {key}").GetAsync("/api/admin/keys"), HttpStatusCode.OK);

        var last = key[^1];
        var flipped = key[..^1] + (last == '0' ? '1' : '0');
        await ExpectProblem(await ClientWith(app, $"Bearer {flipped}").GetAsync("/api/admin/keys"), HttpStatusCode.Unauthorized);

        var firstOfSecret = key.LastIndexOf('_') + 1;
        var flippedFirst = key[..firstOfSecret] + (key[firstOfSecret] == 'a' ? 'b' : 'a') + key[(firstOfSecret + 1)..];
        await ExpectProblem(await ClientWith(app, $"Bearer {flippedFirst}").GetAsync("/api/admin/keys"), HttpStatusCode.Unauthorized);
    }

    [Fact]
    public async Task ApiKey_SecretOfAnotherKey_Is401()
    {
        using var app = new CommunityLeadFactory();
        var admin = app.CreateKey(Roles.Admin, "ops");
        var other = app.CreateKey(Roles.Lab, "partner-lab");
        var mixed = admin[..admin.LastIndexOf('_')] + other[other.LastIndexOf('_')..];
        await ExpectProblem(await ClientWith(app, $"Bearer {mixed}").GetAsync("/api/admin/keys"), HttpStatusCode.Unauthorized);
    }

    [Fact]
    public async Task ApiKey_SameLabelTwice_Throws()
    {
        using var app = new CommunityLeadFactory();
        using var scope = app.Services.CreateScope();
        var keys = scope.ServiceProvider.GetRequiredService<ApiKeyService>();
        await keys.CreateAsync(Roles.Lab, "partner-lab");

        var again = await Assert.ThrowsAsync<KeyCommandException>(() => keys.CreateAsync(Roles.Coordinator, "partner-lab"));
        Assert.Contains("partner-lab", again.Message);

        // Never reused, even after the first key is revoked: the audit trail names keys by label.
        await keys.RevokeAsync("partner-lab");
        await Assert.ThrowsAsync<KeyCommandException>(() => keys.CreateAsync(Roles.Lab, "partner-lab"));
        Assert.Equal(1, app.WithDb(db => db.ApiKeys.Count()));
    }

    [Fact]
    public async Task ApiKey_Listing_ShowsLabelsAndRolesButNoSecret()
    {
        using var app = new CommunityLeadFactory();
        var key = app.CreateKey(Roles.Admin, "ops");
        var response = await ClientWith(app, $"Bearer {key}").GetAsync("/api/admin/keys");
        await Expect(response, HttpStatusCode.OK);
        var text = await response.Content.ReadAsStringAsync();
        Assert.Contains("\"ops\"", text);
        Assert.DoesNotContain(Secret(key), text);
        Assert.DoesNotContain(key.Split('_')[1], text);
    }

    /// <summary>Keys read "clk_&lt;id&gt;_&lt;secret&gt;"; the secret is the part that must never be stored.</summary>
    private static string Secret(string key)
    {
        var parts = key.Split('_');
        Assert.Equal(3, parts.Length);
        Assert.True(parts[2].Length >= 32, $"A secret of at least 128 bits, got '{parts[2]}'.");
        return parts[2];
    }
}
