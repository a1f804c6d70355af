using System;
using System.Globalization;
using System.IO;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Serialization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>
/// Writes <see cref="RunResults"/> as JSON and reads it back to equal values (docs/run-file-format.md): camelCase
/// properties, concentrations as <c>{"value": 1.25, "unit": "µg/L"}</c>, roles as the run-file tokens ("sample",
/// "spike" …), other enumerations and flags by name, numbers in round-trip precision.
/// </summary>
public static class RunResultsJson
{
    private static readonly JsonSerializerOptions Options = CreateOptions();

    /// <summary>Writes results (indented).</summary>
    /// <param name="results">The results.</param>
    /// <param name="writer">Where to write; not disposed.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static void Write(RunResults results, TextWriter writer)
    {
        Guard.NotNull(results, nameof(results));
        Guard.NotNull(writer, nameof(writer));
        writer.Write(JsonSerializer.Serialize(results, Options));
        writer.Write('\n');
    }

    /// <summary>Writes the results of a report (see <see cref="RunResults.From"/>).</summary>
    /// <param name="report">The report.</param>
    /// <param name="writer">Where to write; not disposed.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static void Write(RunReport report, TextWriter writer) => Write(RunResults.From(report), writer);

    /// <summary>Writes results to a UTF-8 file.</summary>
    /// <param name="results">The results.</param>
    /// <param name="path">Path of the file; created or replaced.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="IOException">The file cannot be written.</exception>
    public static void WriteFile(RunResults results, string path)
    {
        Guard.NotNull(path, nameof(path));
        using var writer = new StreamWriter(path, false, new UTF8Encoding(false));
        Write(results, writer);
    }

    /// <summary>Reads results written by <see cref="Write(RunResults, TextWriter)"/>.</summary>
    /// <param name="reader">The JSON text; not disposed.</param>
    /// <returns>The results.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="reader"/> is null.</exception>
    /// <exception cref="RunFileException">The text is not valid JSON, does not match the schema, or has another
    /// <c>format</c> tag (the problem names the line, position and JSON path).</exception>
    public static RunResults Read(TextReader reader)
    {
        Guard.NotNull(reader, nameof(reader));
        RunResults? results;
        try
        {
            results = JsonSerializer.Deserialize<RunResults>(reader.ReadToEnd(), Options);
        }
        catch (JsonException ex)
        {
            throw new RunFileException(new[] { new RunFileProblem((int)(ex.LineNumber ?? -1) + 1, (int)(ex.BytePositionInLine ?? -1) + 1, ex.Path, null, ex.Message) });
        }

        if (results is null || results.Format != RunResults.CurrentFormat)
        {
            throw new RunFileException(new[] { new RunFileProblem(0, 0, "format", results?.Format, "expected a results document with format '" + RunResults.CurrentFormat + "'") });
        }

        return results;
    }

    private static JsonSerializerOptions CreateOptions()
    {
        var o = new JsonSerializerOptions
        {
            PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
            WriteIndented = true,
            Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
            NumberHandling = JsonNumberHandling.Strict,
        };
        o.Converters.Add(new ConcentrationConverter());
        o.Converters.Add(new RoleConverter());
        o.Converters.Add(new JsonStringEnumConverter());
        return o;
    }

    private sealed class ConcentrationConverter : JsonConverter<Concentration>
    {
        public override Concentration Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
        {
            if (reader.TokenType != JsonTokenType.StartObject)
            {
                throw new JsonException("A concentration must be an object {\"value\": number, \"unit\": \"symbol\"}.");
            }

            double? value = null;
            string? unit = null;
            while (reader.Read() && reader.TokenType != JsonTokenType.EndObject)
            {
                string? name = reader.GetString();
                reader.Read();
                if (name == "value" && reader.TokenType == JsonTokenType.Number)
                {
                    value = reader.GetDouble();
                }
                else if (name == "unit" && reader.TokenType == JsonTokenType.String)
                {
                    unit = reader.GetString();
                }
                else
                {
                    throw new JsonException("A concentration has only \"value\" (number) and \"unit\" (string); found '" + name + "'.");
                }
            }

            if (value is null || unit is null || RunText.Unit(unit, out ConcentrationUnit u) is string error)
            {
                throw new JsonException("A concentration needs a number \"value\" and a known \"unit\" (e.g. µg/L).");
            }

            return Concentration.From(value.Value, u);
        }

        public override void Write(Utf8JsonWriter writer, Concentration value, JsonSerializerOptions options)
        {
            writer.WriteStartObject();
            writer.WriteNumber("value", value.Value);
            writer.WriteString("unit", Concentration.SymbolOf(value.Unit));
            writer.WriteEndObject();
        }
    }

    private sealed class RoleConverter : JsonConverter<InjectionRole>
    {
        public override InjectionRole Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
            reader.TokenType == JsonTokenType.String && RunText.Role(reader.GetString()!, out InjectionRole role) is null
                ? role
                : throw new JsonException("A role must be one of: " + RunText.RoleList + ".");

        public override void Write(Utf8JsonWriter writer, InjectionRole value, JsonSerializerOptions options) =>
            writer.WriteStringValue(RunText.Token(value));
    }
}
