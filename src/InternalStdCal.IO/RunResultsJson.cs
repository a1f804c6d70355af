using System;
using System.Collections;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Reflection;
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
    /// <exception cref="RunFileException">The text is not valid JSON, does not match the schema (including a number beyond
    /// the range of a double, or null where the schema holds a list, list element or name), or has another
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

        if (FirstNull(results, "$") is string at)
        {
            throw new RunFileException(new[] { new RunFileProblem(0, 0, at, "null", "null where the results schema requires a value (a missing list reads as empty; null does not)") });
        }

        return results;
    }

    /// <summary>The JSON path of the first null that the results types declare non-nullable (System.Text.Json 8 lets such
    /// nulls through), or null when there is none. Reads the compiler's nullable metadata, so new members are covered.</summary>
    private static string? FirstNull(object value, string path)
    {
        foreach (PropertyInfo p in value.GetType().GetProperties(BindingFlags.Public | BindingFlags.Instance))
        {
            if (p.PropertyType.IsValueType || p.GetIndexParameters().Length > 0)
            {
                continue;
            }

            string at = path + "." + Options.PropertyNamingPolicy!.ConvertName(p.Name);
            object? v = p.GetValue(value);
            if (v is null)
            {
                if ((NullableFlag(p.CustomAttributes, "NullableAttribute") ?? NullableFlag(p.DeclaringType!.CustomAttributes, "NullableContextAttribute")) == 1)
                {
                    return at;
                }

                continue;
            }

            if (v is string || v is not IEnumerable items)
            {
                continue;
            }

            int i = 0;
            foreach (object? x in items)
            {
                string element = at + "[" + i++.ToString(CultureInfo.InvariantCulture) + "]";
                if (x is null)
                {
                    return element;
                }

                if (x.GetType().Namespace == typeof(RunResults).Namespace && FirstNull(x, element) is string inner)
                {
                    return inner;
                }
            }
        }

        return null;
    }

    /// <summary>First flag of a compiler nullable attribute: 1 = not null, 2 = may be null; null when absent.</summary>
    private static byte? NullableFlag(IEnumerable<CustomAttributeData> attributes, string name)
    {
        foreach (CustomAttributeData a in attributes)
        {
            if (a.AttributeType.FullName == "System.Runtime.CompilerServices." + name)
            {
                object? v = a.ConstructorArguments[0].Value;
                return v is byte b ? b : v is IReadOnlyList<CustomAttributeTypedArgument> list ? (byte?)list[0].Value : null;
            }
        }

        return null;
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
        o.Converters.Add(new FiniteDoubleConverter());
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

            if (value is not double v || double.IsNaN(v) || double.IsInfinity(v) || unit is null || RunText.Unit(unit, out ConcentrationUnit u) is string)
            {
                throw new JsonException("A concentration needs a finite number \"value\" and a known \"unit\" (e.g. µg/L).");
            }

            try
            {
                return Concentration.From(v, u);
            }
            catch (ArgumentException ex)
            {
                throw new JsonException("Not a concentration: " + ex.Message, ex);
            }
        }

        public override void Write(Utf8JsonWriter writer, Concentration value, JsonSerializerOptions options)
        {
            writer.WriteStartObject();
            writer.WriteNumber("value", value.Value);
            writer.WriteString("unit", Concentration.SymbolOf(value.Unit));
            writer.WriteEndObject();
        }
    }

    /// <summary>Numbers as System.Text.Json reads them, except that out-of-range numbers (1e400 reads as infinity) are
    /// refused: the library never returns ∞ silently.</summary>
    private sealed class FiniteDoubleConverter : JsonConverter<double>
    {
        public override double Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
        {
            if (reader.TokenType != JsonTokenType.Number)
            {
                throw new JsonException("Expected a number.");
            }

            double v = reader.GetDouble();
            return double.IsNaN(v) || double.IsInfinity(v) ? throw new JsonException("A number must be finite; found one out of the range of a double.") : v;
        }

        public override void Write(Utf8JsonWriter writer, double value, JsonSerializerOptions options) => writer.WriteNumberValue(value);
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
