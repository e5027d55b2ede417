using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Infrastructure;

/// <summary>A setting that cannot be used: the program says which and refuses to start, instead of failing every request.</summary>
public sealed class SettingsException(IEnumerable<string> problems)
    : InvalidOperationException("A setting is not valid (appsettings.json, environment variables or arguments):\n  " +
                                string.Join("\n  ", problems))
{
    public SettingsException(string problem) : this([problem]) { }
}

/// <summary>The problems found in one settings section, each naming the setting as it is written in the files.</summary>
public sealed class SettingProblems(string section)
{
    private readonly List<string> problems = [];

    public void Check(bool ok, string key, string rule, object? value)
    {
        if (!ok) problems.Add($"{section}:{key} {rule}; it is {value ?? "empty"}.");
    }

    public void Positive(double value, string key) =>
        Check(double.IsFinite(value) && value > 0, key, "must be a number above zero", value);

    public void Positive(TimeSpan value, string key) =>
        Check(value > TimeSpan.Zero, key, "must be a duration longer than zero (like 00:01:00)", value);

    public void AtLeast(long value, long least, string key) => Check(value >= least, key, $"must be a whole number of at least {least}", value);

    public void Window(double low, double high, string lowKey, string highKey)
    {
        Positive(low, lowKey);
        Check(high > low, highKey, $"must be above {section}:{lowKey} ({low})", high);
    }

    internal ValidateOptionsResult Result => problems.Count == 0 ? ValidateOptionsResult.Success : ValidateOptionsResult.Fail(problems);
}

/// <summary>Checks an options class when it is first read; ValidateOnStart makes that the program's start.</summary>
internal sealed class SettingsCheck<T>(string section, Action<T, SettingProblems> rules) : IValidateOptions<T> where T : class
{
    public ValidateOptionsResult Validate(string? name, T options)
    {
        var problems = new SettingProblems(section);
        rules(options, problems);
        return problems.Result;
    }
}
