using CommunityLead.Rules.Kits;

namespace CommunityLead.Tests.Rules.Kits;

public class KitLifecycleTests
{
    // The whole intended move table, written out independently of KitLifecycle's dictionary.
    private static readonly (KitState From, KitAction Action, KitState To)[] LegalMoves =
    [
        (KitState.Issued, KitAction.RecordCollection, KitState.Collected),
        (KitState.Issued, KitAction.Receive, KitState.Received),
        (KitState.Issued, KitAction.Cancel, KitState.Cancelled),
        (KitState.Issued, KitAction.MarkLost, KitState.Lost),
        (KitState.Issued, KitAction.Replace, KitState.Cancelled),
        (KitState.Collected, KitAction.RecordCollection, KitState.Collected),
        (KitState.Collected, KitAction.Receive, KitState.Received),
        (KitState.Collected, KitAction.Cancel, KitState.Cancelled),
        (KitState.Collected, KitAction.MarkLost, KitState.Lost),
        (KitState.Collected, KitAction.Reject, KitState.Rejected),
        (KitState.Collected, KitAction.Replace, KitState.Cancelled),
        (KitState.Received, KitAction.RecordCollection, KitState.Received),
        (KitState.Received, KitAction.RecordResults, KitState.Analyzed),
        (KitState.Received, KitAction.Reject, KitState.Rejected),
        (KitState.Received, KitAction.MarkLost, KitState.Lost),
        (KitState.Received, KitAction.Replace, KitState.Cancelled),
        (KitState.Analyzed, KitAction.RecordResults, KitState.Analyzed),
        (KitState.Analyzed, KitAction.Interpret, KitState.Interpreted),
        (KitState.Analyzed, KitAction.Replace, KitState.Analyzed),
        (KitState.Interpreted, KitAction.RecordResults, KitState.Analyzed),
        (KitState.Interpreted, KitAction.Interpret, KitState.Interpreted),
        (KitState.Interpreted, KitAction.SendLetter, KitState.LetterSent),
        (KitState.Interpreted, KitAction.Replace, KitState.Interpreted),
        (KitState.LetterSent, KitAction.RecordResults, KitState.Analyzed),
        (KitState.LetterSent, KitAction.Close, KitState.Closed),
        (KitState.LetterSent, KitAction.Replace, KitState.LetterSent),
        (KitState.Closed, KitAction.Replace, KitState.Closed),
        (KitState.Cancelled, KitAction.Replace, KitState.Cancelled),
        (KitState.Lost, KitAction.Receive, KitState.Received),
        (KitState.Lost, KitAction.Replace, KitState.Lost),
        (KitState.Rejected, KitAction.Replace, KitState.Rejected),
    ];

    public static TheoryData<KitState> AllStates => [.. Enum.GetValues<KitState>()];

    [Theory]
    [MemberData(nameof(AllStates))]
    public void AllowedActions_AnyState_IncludesReplace(KitState state)
    {
        Assert.Contains(KitAction.Replace, KitLifecycle.AllowedActions(state));
        Assert.True(KitLifecycle.TryMove(state, KitAction.Replace, out _));
    }

    [Fact]
    public void TryMove_EveryStateAndAction_MatchesMoveTable()
    {
        foreach (var from in Enum.GetValues<KitState>())
            foreach (var action in Enum.GetValues<KitAction>())
            {
                var expected = LegalMoves.Where(m => m.From == from && m.Action == action).Select(m => (KitState?)m.To).SingleOrDefault();
                var allowed = KitLifecycle.TryMove(from, action, out var to);
                Assert.True(expected is not null == allowed, $"{action} from {from}: allowed={allowed}");
                if (expected is { } target) Assert.Equal(target, to);
                Assert.Equal(allowed, KitLifecycle.AllowedActions(from).Contains(action));
            }
    }

    [Theory]
    [InlineData(KitState.Issued, KitAction.RecordCollection, KitState.Collected)]
    [InlineData(KitState.Collected, KitAction.Receive, KitState.Received)]
    [InlineData(KitState.Received, KitAction.RecordResults, KitState.Analyzed)]
    [InlineData(KitState.Analyzed, KitAction.Interpret, KitState.Interpreted)]
    [InlineData(KitState.Interpreted, KitAction.SendLetter, KitState.LetterSent)]
    [InlineData(KitState.LetterSent, KitAction.Close, KitState.Closed)]
    [InlineData(KitState.Interpreted, KitAction.RecordResults, KitState.Analyzed)]
    [InlineData(KitState.Issued, KitAction.Replace, KitState.Cancelled)]
    [InlineData(KitState.Lost, KitAction.Receive, KitState.Received)]
    public void TryMove_LegalMove_GoesToExpectedState(KitState from, KitAction action, KitState expected)
    {
        Assert.True(KitLifecycle.TryMove(from, action, out var to));
        Assert.Equal(expected, to);
    }

    [Theory]
    [InlineData(KitState.Issued, KitAction.Close)]
    [InlineData(KitState.Issued, KitAction.RecordResults)]
    [InlineData(KitState.Issued, KitAction.Reject)]
    [InlineData(KitState.Analyzed, KitAction.Cancel)]
    [InlineData(KitState.Received, KitAction.Cancel)]
    [InlineData(KitState.Received, KitAction.Interpret)]
    [InlineData(KitState.Analyzed, KitAction.SendLetter)]
    [InlineData(KitState.LetterSent, KitAction.SendLetter)]
    [InlineData(KitState.LetterSent, KitAction.Interpret)]
    [InlineData(KitState.Closed, KitAction.Receive)]
    [InlineData(KitState.Cancelled, KitAction.RecordCollection)]
    [InlineData(KitState.Rejected, KitAction.RecordResults)]
    [InlineData(KitState.Lost, KitAction.RecordResults)]
    public void TryMove_IllegalMove_IsRefused(KitState from, KitAction action)
    {
        Assert.False(KitLifecycle.TryMove(from, action, out _));
        Assert.DoesNotContain(action, KitLifecycle.AllowedActions(from));
    }

    [Theory]
    [InlineData(KitAction.Cancel, true)]
    [InlineData(KitAction.MarkLost, true)]
    [InlineData(KitAction.Reject, true)]
    [InlineData(KitAction.RecordCollection, false)]
    [InlineData(KitAction.Receive, false)]
    [InlineData(KitAction.RecordResults, false)]
    [InlineData(KitAction.Interpret, false)]
    [InlineData(KitAction.SendLetter, false)]
    [InlineData(KitAction.Close, false)]
    [InlineData(KitAction.Replace, false)]
    public void RequiresReason_Action_OnlyCancelLostReject(KitAction action, bool expected) =>
        Assert.Equal(expected, KitLifecycle.RequiresReason(action));

    [Theory]
    [InlineData(KitState.Closed, true)]
    [InlineData(KitState.Cancelled, true)]
    [InlineData(KitState.Rejected, true)]
    [InlineData(KitState.Lost, false)]
    [InlineData(KitState.Issued, false)]
    [InlineData(KitState.LetterSent, false)]
    public void IsTerminal_State_OnlyClosedCancelledRejected(KitState state, bool expected) =>
        Assert.Equal(expected, KitLifecycle.IsTerminal(state));

    [Fact]
    public void TryMove_LostKitTurnsUp_CanBeReceivedAndAnalyzed()
    {
        Assert.True(KitLifecycle.TryMove(KitState.Issued, KitAction.MarkLost, out var lost));
        Assert.True(KitLifecycle.TryMove(lost, KitAction.Receive, out var received));
        Assert.True(KitLifecycle.TryMove(received, KitAction.RecordResults, out var analyzed));
        Assert.Equal((KitState.Lost, KitState.Received, KitState.Analyzed), (lost, received, analyzed));
    }

    [Theory]
    [InlineData(KitState.Closed)]
    [InlineData(KitState.Cancelled)]
    [InlineData(KitState.Rejected)]
    public void AllowedActions_TerminalState_IsOnlyReplace(KitState state) =>
        Assert.Equal([KitAction.Replace], KitLifecycle.AllowedActions(state));
}
