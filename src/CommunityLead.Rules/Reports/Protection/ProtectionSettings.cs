namespace CommunityLead.Rules.Reports.Protection;

/// <param name="Threshold">Counts from 1 to this are never shown (zero may be).</param>
/// <param name="MinimumRange">
/// The narrowest range (largest minus smallest possible value) anyone holding every published number can narrow a
/// hidden count to.
/// </param>
public sealed record ProtectionSettings(int Threshold, int MinimumRange);
