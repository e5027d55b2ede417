using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>Settings of the "Interpretation" section: which profiles the program follows, and its own levels.</summary>
public sealed class InterpretationOptions
{
    /// <summary>Folder of profile files; empty = seed-data/profiles.</summary>
    public string? ProfilesFolder { get; set; }
    public string WaterProfile { get; set; } = "us-lcri";
    public string SoilProfile { get; set; } = "us-soil-hazard";
    /// <summary>A stricter advisory level for lead in water, if the program wants one (µg/L).</summary>
    public double? AdvisoryLeadUgL { get; set; }
    /// <summary>
    /// Lead in water at or above this is urgent: call the household now. No rule sets this number; 50 µg/L
    /// (five times the LCRI action level) is the program's choice, common practice rather than a standard.
    /// </summary>
    public double UrgentLeadUgL { get; set; } = 50;
    /// <summary>Inner diameter assumed when turning a sequential profile's volume into pipe length (19 mm = ¾ in).</summary>
    public double PipeInnerDiameterMm { get; set; } = 19;
    /// <summary>
    /// How often each instance looks for kits whose results are in but not interpreted (also once at start-up);
    /// zero or less: at start-up only. Cheap: it reads analyzed kits by index and batches of the last interval.
    /// </summary>
    public TimeSpan SweepInterval { get; set; } = TimeSpan.FromMinutes(5);
    /// <summary>"Interpretation:Plausibility": results checked with the lab before any letter (defaults and their sources beside them).</summary>
    public PlausibilityLimits Plausibility { get; set; } = new();

    public ProgramRules ProgramRules => new(AdvisoryLeadUgL, UrgentLeadUgL, PipeInnerDiameterMm) { Plausibility = Plausibility };
}
