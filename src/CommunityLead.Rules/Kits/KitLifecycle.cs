namespace CommunityLead.Rules.Kits;

/// <summary>
/// The one place that knows which move is allowed from which state. Endpoints ask it before changing a
/// kit, and answer an illegal move with the current state and <see cref="AllowedActions"/>.
/// </summary>
public static class KitLifecycle
{
    private static readonly Dictionary<KitState, Dictionary<KitAction, KitState>> Moves = new()
    {
        [KitState.Issued] = new()
        {
            [KitAction.RecordCollection] = KitState.Collected,
            [KitAction.Receive] = KitState.Received,
            [KitAction.Cancel] = KitState.Cancelled,
            [KitAction.MarkLost] = KitState.Lost,
            [KitAction.Replace] = KitState.Cancelled,
        },
        [KitState.Collected] = new()
        {
            // A second collection record corrects the first (both are kept).
            [KitAction.RecordCollection] = KitState.Collected,
            [KitAction.Receive] = KitState.Received,
            [KitAction.Cancel] = KitState.Cancelled,
            [KitAction.MarkLost] = KitState.Lost,
            [KitAction.Reject] = KitState.Rejected,
            [KitAction.Replace] = KitState.Cancelled,
        },
        [KitState.Received] = new()
        {
            // Households often mail the paper form inside the kit, so collection may be typed in after receipt.
            [KitAction.RecordCollection] = KitState.Received,
            [KitAction.RecordResults] = KitState.Analyzed,
            [KitAction.Reject] = KitState.Rejected,
            [KitAction.MarkLost] = KitState.Lost,
            [KitAction.Replace] = KitState.Cancelled,
        },
        [KitState.Analyzed] = new()
        {
            [KitAction.RecordResults] = KitState.Analyzed,
            [KitAction.Interpret] = KitState.Interpreted,
            [KitAction.Replace] = KitState.Analyzed,
        },
        [KitState.Interpreted] = new()
        {
            [KitAction.RecordResults] = KitState.Analyzed,
            [KitAction.Interpret] = KitState.Interpreted,
            [KitAction.SendLetter] = KitState.LetterSent,
            [KitAction.Replace] = KitState.Interpreted,
        },
        [KitState.LetterSent] = new()
        {
            // A corrected result after the letter: back to analyzed, so it is interpreted and written again.
            // No send-letter here: the letter of the current interpretation was sent, so offering it again would
            // invite a second copy. A corrected result goes through analyzed and interpreted to a new letter.
            [KitAction.RecordResults] = KitState.Analyzed,
            [KitAction.Close] = KitState.Closed,
            [KitAction.Replace] = KitState.LetterSent,
        },
        [KitState.Closed] = new() { [KitAction.Replace] = KitState.Closed },
        [KitState.Cancelled] = new() { [KitAction.Replace] = KitState.Cancelled },
        // A kit reported lost sometimes turns up at the lab after all.
        [KitState.Lost] = new() { [KitAction.Receive] = KitState.Received, [KitAction.Replace] = KitState.Lost },
        [KitState.Rejected] = new() { [KitAction.Replace] = KitState.Rejected },
    };

    public static IReadOnlyList<KitAction> AllowedActions(KitState state) => [.. Moves[state].Keys];

    public static bool TryMove(KitState from, KitAction action, out KitState to) =>
        Moves[from].TryGetValue(action, out to);

    /// <summary>Actions that must carry a reason, because someone will later ask why.</summary>
    public static bool RequiresReason(KitAction action) =>
        action is KitAction.Cancel or KitAction.MarkLost or KitAction.Reject;

    public static bool IsTerminal(KitState state) =>
        state is KitState.Closed or KitState.Cancelled or KitState.Rejected;
}
