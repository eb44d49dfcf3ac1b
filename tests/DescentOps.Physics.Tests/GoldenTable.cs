using System.Globalization;

namespace DescentOps.Physics.Tests;

/// <summary>Reads the CSV tables under shared/reference that the outside libraries generated.</summary>
internal static class GoldenTable
{
    public static IReadOnlyList<double[]> Read(string fileName)
    {
        var path = Path.Combine(AppContext.BaseDirectory, "reference", fileName);
        var rows = new List<double[]>();
        var headerSeen = false;
        foreach (var line in File.ReadLines(path))
        {
            if (line.StartsWith('#') || line.Length == 0) continue;
            if (!headerSeen)
            {
                headerSeen = true;
                continue;
            }

            rows.Add(line.Split(',').Select(s => double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray());
        }

        return rows;
    }
}
