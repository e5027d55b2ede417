namespace CommunityLead.Rules.Kits;

public enum KitState
{
    Issued,
    Collected,
    Received,
    Analyzed,
    Interpreted,
    LetterSent,
    Closed,
    Cancelled,
    Lost,
    Rejected,
}

/// <summary>What a person or the lab can do to a kit. Each move is allowed only from certain states.</summary>
public enum KitAction
{
    RecordCollection,
    Receive,
    RecordResults,
    Interpret,
    SendLetter,
    Close,
    Cancel,
    MarkLost,
    Reject,
    Replace,
}
