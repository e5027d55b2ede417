namespace CommunityLead.Rules.Reports;

internal static class Ascending
{
    /// <summary>
    /// The values sorted, lowest first. LINQ's Order() sorts an index map through a comparison delegate, several
    /// times slower than sorting the doubles in place; a report sorts hundreds of thousands of them.
    /// </summary>
    public static double[] Of(IEnumerable<double> values)
    {
        var sorted = values.ToArray();
        Array.Sort(sorted);
        return sorted;
    }
}
