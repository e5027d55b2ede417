using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>Where the lead seems to come from; null members where the kit can't tell.</summary>
    private sealed record Sources(SourcePattern? Pattern, SequentialPeak? Peak, Band PeakBand, bool FifthLiterHigher)
    {
        /// <summary>
        /// A flushed result at least this share of the first draw counts as "as high" [practice: our choice,
        /// lab results near the level easily differ by 30 %].
        /// </summary>
        public const double AsHighShare = 0.7;

        /// <summary>Sequential bottles with no volume recorded are taken as the kit's 1-liter bottles [practice].</summary>
        public const int DefaultBottleMl = 1000;

        public static Sources Find(KitFacts kit, IReadOnlyList<Finding> findings, Levels levels, ProgramRules program)
        {
            var lead = findings.Where(f => f.Analyte == Analyte.Lead && f.Bottle != BottleType.Soil).ToList();
            var high = levels.Water(Analyte.Lead).Lowest?.Value;
            var (peak, peakBand) = FindPeak(kit, lead, program);
            return new Sources(FindPattern(lead, high), peak, peakBand, FifthHigher(lead));
        }

        /// <summary>
        /// First draw against flushed lead. "High" means at or above the lowest lead level in effect (the caution
        /// level if there is one, else the action level); not detected is low.
        /// - Both low → no sign of a lead source at this tap.
        /// - Flushed high, or flushed at least 70 % of the first draw ("as high or higher") → service line or
        ///   pipes further out.
        /// - Otherwise (first draw high, flushed low and well under it) → the faucet or nearby plumbing.
        /// A flushed result still high after a big drop is never called faucet-only: the faucet advice ("running
        /// the tap helps") would not make that water safe.
        /// </summary>
        private static SourcePattern? FindPattern(List<Finding> lead, double? high)
        {
            var first = Highest(lead, BottleType.FirstDraw);
            var flushed = Highest(lead, BottleType.Flushed);
            if (first is null || flushed is null || high is not { } level) return null;
            double Detected(Finding f) => f.BelowReportingLimit ? 0 : f.Value;
            bool IsHigh(Finding f) => !f.BelowReportingLimit && AtOrAbove(f.Value, level);
            if (!IsHigh(first) && !IsHigh(flushed)) return SourcePattern.NoSourceAtThisTap;
            if (IsHigh(flushed) || (Detected(flushed) > 0 && AtOrAbove(Detected(flushed), AsHighShare * Detected(first))))
                return SourcePattern.ServiceLineOrFurther;
            return SourcePattern.FaucetOrNearbyPlumbing;
        }

        /// <summary>
        /// The sequential bottle where lead peaks (the earliest, on a tie), among bottles where lead was detected;
        /// none if lead was found in none. Litres before it: the volumes of every earlier position, a missing
        /// or unanalysed one counted as a 1-liter bottle. Pipe length = volume / (π·(d/2)²): 19 mm inner
        /// diameter holds about 0.29 L per meter (DOMAIN.md §3).
        /// </summary>
        private static (SequentialPeak?, Band) FindPeak(KitFacts kit, List<Finding> lead, ProgramRules program)
        {
            var top = lead.Where(f => f is { Bottle: BottleType.Sequential, Position: not null, BelowReportingLimit: false })
                .OrderByDescending(f => f.Value).ThenBy(f => f.Position).FirstOrDefault();
            if (top?.Position is not { } position) return (null, Band.NotDetected);
            var volumes = kit.Results.Where(r => r is { Bottle: BottleType.Sequential, Position: not null, VolumeMl: not null })
                .GroupBy(r => r.Position!.Value).ToDictionary(g => g.Key, g => g.First().VolumeMl!.Value);
            var litres = Enumerable.Range(1, position - 1).Sum(p => volumes.GetValueOrDefault(p, DefaultBottleMl)) / 1000.0;
            return (new SequentialPeak(position, top.Value, litres, PipeMetres(litres, program.PipeInnerDiameterMm)), top.Band);
        }

        public static double PipeMetres(double litres, double innerDiameterMm)
        {
            var radiusM = innerDiameterMm / 2000.0;
            return litres / 1000.0 / (Math.PI * radiusM * radiusM);
        }

        /// <summary>
        /// LCRI kits: a fifth liter above caution level and higher than the first liter points past the faucet,
        /// usually to the service line (the fifth liter is taken to catch service-line water; DOMAIN.md §3).
        /// </summary>
        private static bool FifthHigher(List<Finding> lead)
        {
            var fifth = Highest(lead, BottleType.FifthLiter);
            var first = Highest(lead, BottleType.FirstDraw);
            return fifth is { BelowReportingLimit: false, Band: >= Band.Advisory }
                && (first is null || first.BelowReportingLimit || fifth.Value > first.Value);
        }

        private static Finding? Highest(List<Finding> lead, BottleType bottle) =>
            lead.Where(f => f.Bottle == bottle).OrderBy(f => f.BelowReportingLimit).ThenByDescending(f => f.Value).FirstOrDefault();
    }
}
