using CommunityLead.Rules.Sampling;
using FluentValidation;

namespace CommunityLead.Api.Features.Kits;

/// <summary>Shared bounds for times people type: not before the program could exist, not absurdly far ahead.</summary>
internal static class SaneTimes
{
    public static readonly DateTimeOffset Earliest = new(2000, 1, 1, 0, 0, 0, TimeSpan.Zero);

    public static IRuleBuilderOptions<T, DateTimeOffset?> InSaneRange<T>(this IRuleBuilder<T, DateTimeOffset?> rule, TimeProvider clock) =>
        rule.Must(t => t is null || (t >= Earliest && t <= clock.GetUtcNow().AddYears(1)))
            .WithMessage("This date is outside the range a sample could have (2000 to one year from now).");
}

public sealed class IssueKitValidator : AbstractValidator<IssueKitRequest>
{
    public IssueKitValidator(TimeProvider clock)
    {
        RuleFor(r => r.HouseholdId).NotNull().NotEqual(Guid.Empty);
        RuleFor(r => r.Kind).NotNull();
        RuleFor(r => r.IssuedAt).InSaneRange(clock)
            .Must(t => t is null || t <= clock.GetUtcNow().AddMinutes(15)).WithMessage("A kit cannot be issued in the future.");
    }
}

public sealed class CollectionValidator : AbstractValidator<CollectionRequest>
{
    public CollectionValidator(TimeProvider clock)
    {
        RuleFor(r => r.Samples).NotEmpty().WithMessage("Record at least one bottle.")
            .Must(s => s is null || s.Count <= 30).WithMessage("A kit holds at most 30 bottles.");
        // A null in the list ("samples": [null]) is a bottle with nothing said about it, not one to skip.
        RuleForEach(r => r.Samples).NotNull().WithMessage("Each bottle is an object with its fields; remove the null.")
            .SetValidator(new SampleValidator(clock));
    }
}

public sealed class SampleValidator : AbstractValidator<SampleRequest>
{
    public SampleValidator(TimeProvider clock)
    {
        RuleFor(s => s.Bottle).NotNull();
        RuleFor(s => s.Position).NotNull().InclusiveBetween(1, 30).When(s => s.Bottle == BottleType.Sequential)
            .WithMessage("Sequential bottles need a position from 1 to 30.");
        RuleFor(s => s.Position).Null().When(s => s.Bottle != BottleType.Sequential)
            .WithMessage("Only sequential bottles have a position.");
        RuleFor(s => s.Location).NotNull().When(s => s.Bottle == BottleType.Soil)
            .WithMessage("Soil samples need the location they were taken from.");
        RuleFor(s => s.Location).Null().When(s => s.Bottle is not null && s.Bottle != BottleType.Soil)
            .WithMessage("Only soil samples have a location.");
        RuleFor(s => s.VolumeMl).NotNull().When(s => s.Bottle is not null && s.Bottle != BottleType.Soil)
            .WithMessage("Water bottles need their volume in mL.");
        RuleFor(s => s.VolumeMl).InclusiveBetween(10, 5000);
        RuleFor(s => s.CollectedAt).NotNull().InSaneRange(clock);
        RuleFor(s => s.WaterLastUsedAt).InSaneRange(clock);
        RuleFor(s => s.WaterLastUsedAt).Null().When(s => s.Bottle is BottleType.Flushed or BottleType.Soil)
            .WithMessage("Only bottles of standing water have a time the water was last used.");
        RuleFor(s => s.FlushSeconds).InclusiveBetween(0, 3600);
        RuleFor(s => s.FlushSeconds).Null().When(s => s.Bottle is not null && s.Bottle != BottleType.Flushed)
            .WithMessage("Only flushed bottles have a flush time.");
        RuleFor(s => s.TapNote).MaximumLength(200);
    }
}

public sealed class ReceiptValidator : AbstractValidator<ReceiptRequest>
{
    public ReceiptValidator(TimeProvider clock)
    {
        RuleFor(r => r.ReceivedAt).Cascade(CascadeMode.Stop).NotNull().GreaterThanOrEqualTo(SaneTimes.Earliest)
            .Must(t => t <= clock.GetUtcNow().AddMinutes(15)).WithMessage("A kit cannot be received in the future.");
        RuleFor(r => r.Note).MaximumLength(500);
    }
}

public sealed class ReasonValidator : AbstractValidator<ReasonRequest>
{
    public ReasonValidator() =>
        RuleFor(r => r.Reason).NotEmpty().WithMessage("Say why, in a few words.").MinimumLength(3).MaximumLength(500);
}

public sealed class ReplacementValidator : AbstractValidator<ReplacementRequest>
{
    public ReplacementValidator() => RuleFor(r => r.Reason).MaximumLength(500);
}
