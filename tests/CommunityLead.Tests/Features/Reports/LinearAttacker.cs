using Google.OrTools.LinearSolver;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>
/// Everything someone holding every published count can work out, as a linear program (GLOP, LP relaxation). The
/// unknowns are the finest cells. Every published count is a sum over one dimension's margin of the finest table
/// within a month and an outcome leaf, so the program holds, for each kind, month and leaf, the kits' split over each
/// dimension (y) and their number (z), each split adding up to z. That is exact, not a shortcut: margins that agree on
/// their total can always be filled in by a full table (their product divided by the total), so nothing the finest
/// cells would add can narrow a range further. Written apart from the service's code.
/// </summary>
public sealed class LinearAttacker
{
    /// <summary>Far above any store here: a count the published numbers leave unbounded comes out at this.</summary>
    private const double Bound = 100_000;
    private readonly Solver solver = Solver.CreateSolver("GLOP");
    private readonly Dictionary<(string Kind, int Month, int Leaf), Variable> totals = [];
    private readonly Dictionary<(string Kind, string Dimension, int Month, string Value, int Leaf), Variable> splits = [];

    public LinearAttacker(string[] kinds, Dictionary<string, string[]> dimensions)
    {
        foreach (var kind in kinds)
            for (var m = 1; m <= 12; m++)
                for (var l = 0; l < 8; l++)
                {
                    var z = totals[(kind, m, l)] = solver.MakeNumVar(0, Bound, "");
                    foreach (var (d, values) in dimensions)
                    {
                        var sum = solver.MakeConstraint(0, 0);
                        sum.SetCoefficient(z, -1);
                        foreach (var v in values)
                            sum.SetCoefficient(splits[(kind, d, m, v, l)] = solver.MakeNumVar(0, Bound, ""), 1);
                    }
                }
    }

    private IEnumerable<Variable> Terms(PublishedCell c) =>
        from m in PublishedCells.Months(c.Period)
        from l in PublishedCells.Leaves(c.Column)
        select c.Dimension.Length == 0 ? totals[(c.Kind, m, l)] : splits[(c.Kind, c.Dimension, m, c.Value, l)];

    public void Published(PublishedCell c, int value)
    {
        var equal = solver.MakeConstraint(value, value);
        foreach (var v in Terms(c)) equal.SetCoefficient(v, 1);
    }

    public Solver.ResultStatus Feasible()
    {
        solver.Objective().Clear();
        return solver.Solve();
    }

    public (double Min, double Max) Range(PublishedCell c)
    {
        double Solve(bool maximize)
        {
            var objective = solver.Objective();
            objective.Clear();
            foreach (var v in Terms(c)) objective.SetCoefficient(v, 1);
            if (maximize) objective.SetMaximization(); else objective.SetMinimization();
            var status = solver.Solve();
            // GLOP starts from the last basis; should that ever fail, it solves again from scratch.
            if (status != Solver.ResultStatus.OPTIMAL && status != Solver.ResultStatus.UNBOUNDED)
            {
                solver.Reset();
                status = solver.Solve();
            }
            if (status == Solver.ResultStatus.UNBOUNDED) return double.PositiveInfinity;
            Assert.True(status == Solver.ResultStatus.OPTIMAL, $"{status} when {(maximize ? "maximising" : "minimising")} {c}");
            return objective.Value();
        }
        return (Solve(false), Solve(true));
    }
}
