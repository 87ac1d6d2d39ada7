namespace LevelDesign.Core.Composite;

/// <summary>
/// Where a composite Hamiltonian can be non-zero: its lower-triangle positions ("slots", the diagonal first, slot
/// s = (s, s)) and the matching full compressed-row layout, so that each point only fills in values.
/// </summary>
internal sealed class HermitianPattern
{
    public HermitianPattern(int dimension, int[] slotRow, int[] slotColumn)
    {
        Dimension = dimension;
        SlotRow = slotRow;
        SlotColumn = slotColumn;
        var rows = new List<(int Column, int Slot)>[dimension];
        for (int i = 0; i < dimension; i++) rows[i] = [];
        for (int slot = 0; slot < slotRow.Length; slot++)
        {
            rows[slotRow[slot]].Add((slotColumn[slot], slot));
            if (slotRow[slot] != slotColumn[slot]) rows[slotColumn[slot]].Add((slotRow[slot], slot));
        }
        RowStart = new int[dimension + 1];
        var columns = new List<int>();
        var sources = new List<int>();
        for (int r = 0; r < dimension; r++)
        {
            rows[r].Sort((a, b) => a.Column.CompareTo(b.Column));
            foreach (var (c, slot) in rows[r]) { columns.Add(c); sources.Add(slot); }
            RowStart[r + 1] = columns.Count;
        }
        Columns = columns.ToArray();
        SourceSlot = sources.ToArray();
    }

    public int Dimension { get; }
    public int[] SlotRow { get; }
    public int[] SlotColumn { get; }
    public int SlotCount => SlotRow.Length;

    /// <summary>Full (both triangles) compressed-row layout; entry p takes its value from slot SourceSlot[p].</summary>
    public int[] RowStart { get; }
    public int[] Columns { get; }
    public int[] SourceSlot { get; }
}
