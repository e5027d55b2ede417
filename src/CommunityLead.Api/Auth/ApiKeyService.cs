using System.Security.Cryptography;
using System.Text;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Auth;

/// <summary>
/// Keys look like "clk_&lt;id&gt;_&lt;secret&gt;". The id finds the row; the secret is compared as a salted
/// SHA-256 hash in constant time. A 256-bit random secret needs no slow password hash: it can't be guessed.
/// </summary>
public sealed class ApiKeyService(CommunityLeadDb db, TimeProvider clock, VerifiedKeys recent)
{
    private const string Prefix = "clk";

    /// <summary>The audit trail names a key by its label, in a subject key of 64 characters (the label column holds 100).</summary>
    public const int LabelMaxLength = 64;

    /// <summary>Random bytes of the public id, written as hex (twice as many characters).</summary>
    public const int KeyIdBytes = 8;

    public sealed record Created(string Label, string Role, string Key);
    public sealed record Verified(string Label, string Role);

    public async Task<Created> CreateAsync(string role, string label, CancellationToken ct = default)
    {
        if (!Roles.All.Contains(role))
            throw new KeyCommandException($"Unknown role '{role}'. Roles: {string.Join(", ", Roles.All)}.");
        if (string.IsNullOrWhiteSpace(label) || label.Length > LabelMaxLength)
            throw new KeyCommandException($"A label of 1 to {LabelMaxLength} characters is required.");
        if (await db.ApiKeys.AnyAsync(k => k.Label == label, ct))
            throw new KeyCommandException($"A key labelled '{label}' already exists; labels are never reused.");

        var keyId = Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(KeyIdBytes));
        var secret = Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(32));
        var salt = RandomNumberGenerator.GetBytes(16);
        db.ApiKeys.Add(new ApiKey
        {
            Label = label, Role = role, KeyId = keyId, Salt = salt,
            SecretHash = Hash(salt, secret), CreatedAtUtc = clock.GetUtcNow().UtcDateTime,
        });
        db.AuditTrail.Add(new AuditEntry
        {
            AtUtc = clock.GetUtcNow().UtcDateTime, ActorLabel = "command-line", ActorRole = Roles.Admin,
            Subject = "key", SubjectKey = label, Action = "create-key", Detail = $"role {role}",
        });
        await db.SaveChangesAsync(ct);
        return new Created(label, role, $"{Prefix}_{keyId}_{secret}");
    }

    /// <summary>
    /// The public id part of a presented key, when it has the shape of one (16 hex digits), for limits and logs;
    /// never the secret. Anything else (a pasted password, text with line breaks) gives null, so it is never logged.
    /// </summary>
    public static string? KeyIdOf(string presented)
    {
        var parts = presented.Split('_');
        return parts.Length == 3 && parts[0] == Prefix && parts[1].Length == KeyIdBytes * 2 && parts[1].All(char.IsAsciiHexDigitLower)
            ? parts[1]
            : null;
    }

    /// <summary>The key's label and role, from <see cref="VerifiedKeys"/> when it was verified a few seconds ago.</summary>
    public async Task<Verified?> VerifyAsync(string presented, CancellationToken ct = default)
    {
        if (recent.Find(presented) is { } known) return known;
        var parts = presented.Split('_');
        if (parts.Length != 3 || parts[0] != Prefix) return null;
        var keyId = parts[1];
        var row = await db.ApiKeys.AsNoTracking()
            .Where(k => k.KeyId == keyId && k.RevokedAtUtc == null)
            .Select(k => new { k.Label, k.Role, k.Salt, k.SecretHash })
            .SingleOrDefaultAsync(ct);
        if (row is null) return null;
        if (!CryptographicOperations.FixedTimeEquals(Hash(row.Salt, parts[2]), row.SecretHash)) return null;
        var verified = new Verified(row.Label, row.Role);
        recent.Remember(presented, verified);
        return verified;
    }

    public async Task RevokeAsync(string label, CancellationToken ct = default)
    {
        var key = await db.ApiKeys.SingleOrDefaultAsync(k => k.Label == label, ct)
            ?? throw new KeyCommandException($"No key labelled '{label}'.");
        if (key.RevokedAtUtc is not null) return;
        key.RevokedAtUtc = clock.GetUtcNow().UtcDateTime;
        db.AuditTrail.Add(new AuditEntry
        {
            AtUtc = key.RevokedAtUtc.Value, ActorLabel = "command-line", ActorRole = Roles.Admin,
            Subject = "key", SubjectKey = label, Action = "revoke-key",
        });
        await db.SaveChangesAsync(ct);
        recent.Forget();
    }

    private static byte[] Hash(byte[] salt, string secret) => SHA256.HashData([.. salt, .. Encoding.UTF8.GetBytes(secret)]);
}

public sealed class KeyCommandException(string message) : Exception(message);
