namespace CommunityLead.Rules.Interpretation;

/// <summary>Reads and validates a rule profile file; a broken file names itself and the field.</summary>
public static partial class ProfileReader
{
    public static RuleProfile Read(string fileName, string json) =>
        throw new NotSupportedException("Being written.");
}

public sealed class ProfileException(string fileName, string field, string problem)
    : Exception($"Rule profile {fileName}: {field}: {problem}")
{
    public string FileName { get; } = fileName;
    public string Field { get; } = field;
}
