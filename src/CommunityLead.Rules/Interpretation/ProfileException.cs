namespace CommunityLead.Rules.Interpretation;

/// <summary>A broken rule profile: names the file and the field (a path such as <c>levels[2].unit</c>).</summary>
public sealed class ProfileException(string fileName, string field, string problem)
    : Exception($"Rule profile {fileName}: {field}: {problem}")
{
    public string FileName { get; } = fileName;
    public string Field { get; } = field;
}
