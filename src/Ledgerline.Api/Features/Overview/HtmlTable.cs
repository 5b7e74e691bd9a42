using System.Text;
using System.Text.Encodings.Web;

namespace Ledgerline.Api.Features.Overview;

/// <summary>A plain data table: the numbers behind a chart, for screen readers and for copying into a spreadsheet.</summary>
public sealed class HtmlTable(string caption, params string[] headers)
{
    private readonly List<string[]> _rows = [];

    public HtmlTable Row(params string[] cells)
    {
        _rows.Add(cells);
        return this;
    }

    public override string ToString()
    {
        var html = new StringBuilder("<table><caption>").Append(Encode(caption)).Append("</caption><thead><tr>");
        foreach (var header in headers)
        {
            html.Append("<th scope=\"col\">").Append(Encode(header)).Append("</th>");
        }

        html.Append("</tr></thead><tbody>");
        foreach (var row in _rows)
        {
            html.Append("<tr>");
            for (var i = 0; i < row.Length; i++)
            {
                html.Append(i == 0 ? "<th scope=\"row\">" : "<td>").Append(Encode(row[i])).Append(i == 0 ? "</th>" : "</td>");
            }

            html.Append("</tr>");
        }

        return html.Append("</tbody></table>").ToString();
    }

    private static string Encode(string text) => HtmlEncoder.Default.Encode(text);
}
