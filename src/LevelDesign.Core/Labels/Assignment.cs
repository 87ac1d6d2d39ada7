namespace LevelDesign.Core.Labels;

/// <summary>
/// Minimum-cost one-to-one assignment of rows to columns (rows ≤ columns), the Hungarian method with
/// potentials, O(rows²·columns). Used so that no two dressed states ever carry the same bare label.
/// </summary>
public static class Assignment
{
    /// <summary>Returns, for each row, the column assigned to it.</summary>
    public static int[] Solve(double[,] cost)
    {
        int n = cost.GetLength(0), m = cost.GetLength(1);
        if (n > m) throw new ArgumentException("assignment needs at least as many columns as rows");
        var u = new double[n + 1];
        var v = new double[m + 1];
        var p = new int[m + 1];   // p[j]: row (1-based) matched to column j
        var way = new int[m + 1];
        for (int i = 1; i <= n; i++)
        {
            p[0] = i;
            int j0 = 0;
            var minv = new double[m + 1];
            var used = new bool[m + 1];
            Array.Fill(minv, double.PositiveInfinity);
            do
            {
                used[j0] = true;
                int i0 = p[j0], j1 = 0;
                double delta = double.PositiveInfinity;
                for (int j = 1; j <= m; j++)
                {
                    if (used[j]) continue;
                    double cur = cost[i0 - 1, j - 1] - u[i0] - v[j];
                    if (cur < minv[j]) { minv[j] = cur; way[j] = j0; }
                    if (minv[j] < delta) { delta = minv[j]; j1 = j; }
                }
                for (int j = 0; j <= m; j++)
                {
                    if (used[j]) { u[p[j]] += delta; v[j] -= delta; }
                    else minv[j] -= delta;
                }
                j0 = j1;
            } while (p[j0] != 0);
            do
            {
                int j1 = way[j0];
                p[j0] = p[j1];
                j0 = j1;
            } while (j0 != 0);
        }
        var result = new int[n];
        for (int j = 1; j <= m; j++) if (p[j] != 0) result[p[j] - 1] = j - 1;
        return result;
    }
}
