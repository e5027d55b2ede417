using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>One realistic kit and what the interpreter must decide about it.</summary>
/// <param name="Codes">Message codes that must be present.</param>
/// <param name="Absent">Message codes that must not be present.</param>
/// <param name="Peak">Expected sequential peak: position and pipe meters (19 mm unless the program says otherwise).</param>
internal sealed record InterpreterCase(
    KitFacts Kit,
    Band Band,
    SourcePattern? Pattern,
    AttentionFlag[] Flags,
    string[] Codes,
    string[]? Absent = null,
    RuleProfile? Profile = null,
    ProgramRules? Program = null,
    (int Position, double Metres)? Peak = null);
