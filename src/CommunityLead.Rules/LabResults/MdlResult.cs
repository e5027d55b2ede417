namespace CommunityLead.Rules.LabResults;

/// <param name="MdlSpiked">MDL_s, from the spiked replicates.</param>
/// <param name="MdlBlank">MDL_b, from the method blanks; null when none were given.</param>
/// <param name="Mdl">The method detection limit: the larger of the two.</param>
/// <param name="T">The one-sided 99% Student t used for the spiked replicates, with N − 1 degrees of freedom.</param>
/// <param name="N">How many spiked replicates were used.</param>
public sealed record MdlResult(double MdlSpiked, double? MdlBlank, double Mdl, double T, int N);
