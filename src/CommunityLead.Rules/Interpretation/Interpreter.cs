namespace CommunityLead.Rules.Interpretation;

/// <summary>What a kit's results mean for its household. Pure: the same facts and profile give the same answer.</summary>
public static partial class Interpreter
{
    public static Interpretation Interpret(KitFacts kit, RuleProfile profile, ProgramRules program) =>
        throw new NotSupportedException("Being written.");
}
