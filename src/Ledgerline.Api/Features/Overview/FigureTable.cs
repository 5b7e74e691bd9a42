namespace Ledgerline.Api.Features.Overview;

/// <summary>A plain data table: the numbers behind a chart, for screen readers and for copying into a spreadsheet.</summary>
public sealed class FigureTable(string caption, params string[] headers)
{
    private readonly List<string[]> _rows = [];

    public string Caption { get; } = caption;

    public IReadOnlyList<string> Headers { get; } = headers;

    public IReadOnlyList<string[]> Rows => _rows;

    public FigureTable Row(params string[] cells)
    {
        _rows.Add(cells);
        return this;
    }
}
