using System.Text;

namespace DescentOps.Reports.Html;

/// <summary>
/// Escapes text for XHTML-compatible HTML: the report must parse as XML too, so besides the usual five
/// characters, control characters that XML 1.0 forbids are replaced (a log may carry any text in its data).
/// </summary>
public static class HtmlText
{
    public static string Escape(string? text)
    {
        if (string.IsNullOrEmpty(text)) return "";
        var builder = new StringBuilder(text.Length + 16);
        foreach (var c in text)
        {
            switch (c)
            {
                case '&': builder.Append("&amp;"); break;
                case '<': builder.Append("&lt;"); break;
                case '>': builder.Append("&gt;"); break;
                case '"': builder.Append("&quot;"); break;
                case '\'': builder.Append("&#39;"); break;
                case '\t' or '\n' or '\r': builder.Append(c); break;
                case < ' ' or '\uFFFE' or '\uFFFF': builder.Append('\uFFFD'); break;
                default: builder.Append(c); break;
            }
        }

        return builder.ToString();
    }
}
