using CommunityLead.Rules.LabResults;
using FluentValidation;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.LabResults;

public sealed record MdlRequest(IReadOnlyList<double>? Spiked, IReadOnlyList<double>? Blanks);

public sealed record MdlResponse(double MdlSpiked, double? MdlBlank, double Mdl, double T, int N);

/// <summary>POST /api/lab/mdl: the method detection limit of 40 CFR 136 Appendix B, Revision 2.</summary>
public static class DetectionLimitCalculation
{
    public static Ok<MdlResponse> Calculate(MdlRequest request)
    {
        var result = MethodDetectionLimit.Compute(request.Spiked!, request.Blanks ?? []);
        return TypedResults.Ok(new MdlResponse(result.MdlSpiked, result.MdlBlank, result.Mdl, result.T, result.N));
    }
}

public sealed class MdlValidator : AbstractValidator<MdlRequest>
{
    public MdlValidator()
    {
        RuleFor(r => r.Spiked).NotNull().Must(s => s is null || s.Count is >= 7 and <= 1000)
            .WithMessage("Give at least 7 (and at most 1000) spiked replicate results.");
        RuleForEach(r => r.Spiked).Must(double.IsFinite).WithMessage("Each replicate is a finite number.");
        RuleFor(r => r.Blanks).Must(b => b is null || b.Count <= 10000).WithMessage("At most 10,000 blank results.");
        RuleForEach(r => r.Blanks).Must(double.IsFinite).WithMessage("Each blank result is a finite number.");
    }
}
