namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// An API key's public id and a salted hash of its secret. The secret itself is shown once and never stored.
/// </summary>
public class ApiKey
{
    public int Id { get; set; }
    public required string Label { get; set; }
    public required string Role { get; set; }
    /// <summary>Public part of the key, used to find the row without comparing secrets.</summary>
    public required string KeyId { get; set; }
    public required byte[] Salt { get; set; }
    public required byte[] SecretHash { get; set; }
    public DateTime CreatedAtUtc { get; set; }
    public DateTime? RevokedAtUtc { get; set; }
}
