using System.Text.Json;
using System.Text.Json.Nodes;

namespace DescentOps.Scenarios.Format;

/// <summary>
/// Writes the JSON Schema (draft 2020-12) of the scenario format from <see cref="ScenarioFormat.Root"/>,
/// so editors that validate YAML against a JSON Schema complete and check scenario files. Quantities are
/// strings "number unit"; the schema checks their shape, the loader checks dimension and range.
/// </summary>
public static class ScenarioJsonSchema
{
    public static string Generate()
    {
        var schema = Section(ScenarioFormat.Root);
        schema.Insert(0, "$schema", "https://json-schema.org/draft/2020-12/schema");
        schema.Insert(1, "$id", "descentops-scenario-1.schema.json");
        schema.Insert(2, "title", "DescentOps scenario (" + ScenarioFormat.Version + ")");
        return schema.ToJsonString(new JsonSerializerOptions { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping }) + "\n";
    }

    private static JsonObject Field(FieldSpec field) => field switch
    {
        SectionField section => Section(section),
        ListField list => new JsonObject
        {
            ["type"] = "array",
            ["description"] = list.Description,
            ["minItems"] = list.MinItems,
            ["maxItems"] = list.MaxItems,
            ["items"] = Section(list.Item),
        },
        QuantityField quantity => new JsonObject
        {
            ["type"] = "string",
            ["description"] = $"{quantity.Description} A number and a unit of {quantity.Kind.ToString().ToLowerInvariant()} ({quantity.Kind.ExampleUnits()}).",
            ["pattern"] = QuantityPattern,
        },
        NumberField number => new JsonObject
        {
            ["type"] = "number",
            ["description"] = number.Description,
            ["minimum"] = number.Min,
            ["maximum"] = number.Max,
        },
        IntegerField integer => new JsonObject { ["type"] = "integer", ["description"] = integer.Description },
        ChoiceField choice => new JsonObject
        {
            ["type"] = "string",
            ["description"] = choice.Description,
            ["enum"] = new JsonArray([.. choice.Options.Select(o => (JsonNode)o)]),
        },
        TextField text => text.IsIdentifier
            ? new JsonObject { ["type"] = "string", ["description"] = text.Description, ["pattern"] = TextField.IdentifierPattern }
            : new JsonObject { ["type"] = "string", ["description"] = text.Description },
        _ => throw new InvalidOperationException($"No schema for {field.GetType().Name}."),
    };

    /// <summary>A number, optional spaces, then a unit symbol made of letters, °, %, /, ², ^ and digits.</summary>
    public const string QuantityPattern = @"^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*[A-Za-z°%µ][A-Za-z0-9°%µ/²³^]*$";

    private static JsonObject Section(SectionField section)
    {
        var properties = new JsonObject();
        foreach (var field in section.Fields) properties[field.Name] = Field(field);
        var result = new JsonObject
        {
            ["type"] = "object",
            ["description"] = section.Description,
            ["properties"] = properties,
            ["additionalProperties"] = false,
        };
        var required = section.Fields.Where(f => f.Required).Select(f => (JsonNode)f.Name).ToArray();
        if (required.Length > 0) result["required"] = new JsonArray(required);
        return result;
    }
}
