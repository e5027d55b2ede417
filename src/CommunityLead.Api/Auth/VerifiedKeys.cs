using System.Collections.Concurrent;
using System.Security.Cryptography;
using System.Text;

namespace CommunityLead.Api.Auth;

/// <summary>
/// Keys verified in the last <see cref="Lifetime"/>, so a client sending a thousand requests a second is not looked up
/// in the database a thousand times (the look-up was a quarter of a kit read's cost). Entries are found by the SHA-256
/// of the whole presented key, never by the key itself, and only keys that verified are kept, so the map holds at
/// most one entry per live key and a flood of wrong keys adds nothing. A key revoked here (the keys command, in this
/// process) is dropped at once; on another instance it keeps working for at most <see cref="Lifetime"/>.
/// </summary>
public sealed class VerifiedKeys(TimeProvider clock)
{
    public static readonly TimeSpan Lifetime = TimeSpan.FromSeconds(10);

    private readonly ConcurrentDictionary<string, (ApiKeyService.Verified Key, DateTimeOffset Until)> verified = new();

    public ApiKeyService.Verified? Find(string presented)
    {
        var fingerprint = Fingerprint(presented);
        if (!verified.TryGetValue(fingerprint, out var entry)) return null;
        if (clock.GetUtcNow() < entry.Until) return entry.Key;
        verified.TryRemove(fingerprint, out _);
        return null;
    }

    public void Remember(string presented, ApiKeyService.Verified key) =>
        verified[Fingerprint(presented)] = (key, clock.GetUtcNow() + Lifetime);

    /// <summary>After a key is revoked: nothing verified before it is trusted again without a look-up.</summary>
    public void Forget() => verified.Clear();

    private static string Fingerprint(string presented) => Convert.ToBase64String(SHA256.HashData(Encoding.UTF8.GetBytes(presented)));
}
