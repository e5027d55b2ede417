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
    /// <summary>
    /// Far above any concentration in any unit (a billion µg/L is a kilogram per litre), and small enough that the
    /// squared deviations behind the standard deviation stay finite: 1e308 passes as a double, its square does not.
    /// </summary>
    public const double LargestResult = 1e9;

    public MdlValidator()
    {
        RuleFor(r => r.Spiked).NotNull().Must(s => s is null || s.Count is >= 7 and <= 1000)
            .WithMessage("Give at least 7 (and at most 1000) spiked replicate results.");
        RuleForEach(r => r.Spiked).Must(InRange).WithMessage(Range("replicate"));
        // Appendix B asks for at least seven method blanks too; none at all means no blank-based MDL.
        RuleFor(r => r.Blanks).Must(b => b is null || b.Count == 0 || b.Count is >= 7 and <= 10000)
            .WithMessage("Give no blanks, or at least 7 (and at most 10,000) method blank results.");
        RuleForEach(r => r.Blanks).Must(InRange).WithMessage(Range("blank result"));
    }

    private static bool InRange(double value) => double.IsFinite(value) && Math.Abs(value) <= LargestResult;

    private static string Range(string what) => $"Each {what} is a number between -{LargestResult:0e0} and {LargestResult:0e0}.";
}
