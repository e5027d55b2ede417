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
        // Appendix B asks for at least seven method blanks too; none at all means no blank-based MDL.
        RuleFor(r => r.Blanks).Must(b => b is null || b.Count == 0 || b.Count is >= 7 and <= 10000)
            .WithMessage("Give no blanks, or at least 7 (and at most 10,000) method blank results.");
        RuleForEach(r => r.Blanks).Must(double.IsFinite).WithMessage("Each blank result is a finite number.");
    }
}
