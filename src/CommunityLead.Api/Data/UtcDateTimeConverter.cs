using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace CommunityLead.Api.Data;

/// <summary>
/// Every DateTime column holds UTC. SQLite forgets the kind, so it is restored on read; responses then carry
/// a "Z" and never look like local time.
/// </summary>
public sealed class UtcDateTimeConverter() : ValueConverter<DateTime, DateTime>(
    v => v.Kind == DateTimeKind.Utc ? v : v.ToUniversalTime(),
    v => DateTime.SpecifyKind(v, DateTimeKind.Utc));
