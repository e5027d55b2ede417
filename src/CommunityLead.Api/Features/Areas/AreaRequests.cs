using FluentValidation;

namespace CommunityLead.Api.Features.Areas;

public sealed record AreaResponse(string Code, string Name, bool Active);

public sealed record NewAreaRequest(string? Code, string? Name);

/// <summary>Rename, deactivate (households already in it keep it; new ones can't choose it) or activate again.</summary>
public sealed record AreaChangeRequest(string? Name, bool? Active);

public static class AreaCodes
{
    /// <summary>What households and reports write: lower case, digits and dashes, up to 40.</summary>
    public const string Pattern = "^[A-Za-z0-9][A-Za-z0-9-]{0,39}$";
    public const string Hint = "Use 1 to 40 letters, digits or dashes, like 'harbour' or 'north-3'.";

    public static string Normal(string code) => code.Trim().ToLowerInvariant();
}

public sealed class NewAreaValidator : AbstractValidator<NewAreaRequest>
{
    public NewAreaValidator()
    {
        RuleFor(a => a.Code).NotEmpty().Must(c => c is null || System.Text.RegularExpressions.Regex.IsMatch(c.Trim(), AreaCodes.Pattern))
            .WithMessage(AreaCodes.Hint);
        RuleFor(a => a.Name).NotEmpty().MaximumLength(100);
    }
}

public sealed class AreaChangeValidator : AbstractValidator<AreaChangeRequest>
{
    public AreaChangeValidator()
    {
        RuleFor(a => a.Name).NotEmpty().MaximumLength(100).When(a => a.Name is not null);
        RuleFor(a => a).Must(a => a.Name is not null || a.Active is not null).WithName("body")
            .WithMessage("Send a new name, active (true or false), or both.");
    }
}
