using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Reflection;
using System.Xml.Linq;
using Xunit;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>
/// One row of a bad-input table: an entry point (the member's name without the <c>InternalStdCal.</c> prefix,
/// <c>#ctor</c> for constructors, as in the XML documentation IDs), what is wrong, the call, and what must come out.
/// </summary>
public sealed class BadInputCase
{
    public BadInputCase(string entryPoint, string input, Func<object?> invoke, Type exception, string? paramName, params string[] fragments)
        : this(entryPoint, input, () => { _ = invoke(); }, exception, paramName, fragments)
    {
    }

    public BadInputCase(string entryPoint, string input, Action invoke, Type exception, string? paramName, params string[] fragments)
    {
        EntryPoint = entryPoint;
        Input = input;
        Invoke = invoke;
        Exception = exception;
        ParamName = paramName;
        Fragments = fragments;
    }

    public string EntryPoint { get; }

    public string Input { get; }

    public Action Invoke { get; }

    public Type Exception { get; }

    public string? ParamName { get; }

    public IReadOnlyList<string> Fragments { get; }

    public override string ToString() => $"{EntryPoint}: {Input}";
}

/// <summary>An absurd but valid magnitude: the call must give finite numbers or a documented argument exception.</summary>
public sealed class MagnitudeCase
{
    public MagnitudeCase(string entryPoint, string input, Func<IEnumerable<double>> invoke)
    {
        EntryPoint = entryPoint;
        Input = input;
        Invoke = invoke;
    }

    public string EntryPoint { get; }

    public string Input { get; }

    public Func<IEnumerable<double>> Invoke { get; }

    public override string ToString() => $"{EntryPoint}: {Input}";
}

/// <summary>Builds the tables and checks rows against the member's XML documentation.</summary>
internal static class BadInput
{
    // Texts Guard.cs puts after "it must be" (common practice: state the allowed range in the message).
    internal const string FinitePositive = "a finite number > 0";
    internal const string FiniteNonNegative = "a finite number >= 0";
    internal const string Finite = "a finite number (not NaN or infinity)";

    private static readonly Lazy<Dictionary<string, List<string>>> Docs = new(() => LoadDocs("exception", "cref"));

    private static readonly Lazy<Dictionary<string, List<string>>> ParamDocs = new(() => LoadDocs("param", "name"));

    internal static IEnumerable<object[]> Rows(IEnumerable<BadInputCase> cases) => cases.Select(c => new object[] { c.ToString(), c });

    internal static IEnumerable<object[]> Rows(IEnumerable<MagnitudeCase> cases) => cases.Select(c => new object[] { c.ToString(), c });

    internal static string Text(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>
    /// The call throws exactly the expected type, documented in an <c>&lt;exception&gt;</c> tag of the member,
    /// with the expected <see cref="ArgumentException.ParamName"/> and every fragment in the message.
    /// </summary>
    internal static void AssertRejected(BadInputCase c)
    {
        Exception? e = Record.Exception(c.Invoke);
        Assert.True(e is not null, $"{c}: no exception; expected {c.Exception.Name}.");
        Assert.True(
            e!.GetType() == c.Exception,
            $"{c}: threw {e.GetType().Name} (param '{(e as ArgumentException)?.ParamName}'): {e.Message}; expected {c.Exception.Name}.");
        if (e is ArgumentException a)
        {
            Assert.True(c.ParamName == a.ParamName, $"{c}: ParamName '{a.ParamName}', expected '{c.ParamName}'. Message: {e.Message}");
        }

        foreach (string fragment in c.Fragments)
        {
            Assert.True(e.Message.Contains(fragment, StringComparison.Ordinal), $"{c}: message lacks '{fragment}': {e.Message}");
        }

        AssertDocumented(c.EntryPoint, e.GetType());
    }

    /// <summary>Finite numbers, or an argument exception (documented, naming a parameter).</summary>
    internal static void AssertFiniteOrRejected(MagnitudeCase c)
    {
        double[] values;
        try
        {
            values = c.Invoke().ToArray();
        }
        catch (ArgumentException e)
        {
            Assert.False(string.IsNullOrEmpty(e.ParamName), $"{c}: {e.GetType().Name} without ParamName: {e.Message}");
            string name = e.ParamName!.Split('[')[0];
            Assert.True(Parameters(c.EntryPoint).Contains(name), $"{c}: ParamName '{e.ParamName}' is not a documented parameter of the entry point: {e.Message}");
            AssertDocumented(c.EntryPoint, e.GetType());
            return;
        }
        catch (InvalidOperationException e)
        {
            // A state the arguments cannot be blamed for (e.g. a model that is not finite there): documented, with a message.
            Assert.False(string.IsNullOrWhiteSpace(e.Message), $"{c}: InvalidOperationException without a message.");
            AssertDocumented(c.EntryPoint, e.GetType());
            return;
        }

        for (int i = 0; i < values.Length; i++)
        {
            Assert.True(double.IsFinite(values[i]), $"{c}: result {i} is {Text(values[i])}.");
        }
    }

    /// <summary>Some overload of the member documents the thrown type or one of its base argument exceptions.</summary>
    internal static void AssertDocumented(string entryPoint, Type thrown)
    {
        var documented = Documented(entryPoint);
        Assert.True(documented.Count > 0, $"{entryPoint}: no XML documentation found.");
        for (Type? t = thrown; t is not null && typeof(Exception).IsAssignableFrom(t); t = t.BaseType)
        {
            if (documented.Contains("T:" + t.FullName))
            {
                return;
            }

            if (t == typeof(ArgumentException))
            {
                break;
            }
        }

        Assert.Fail($"{entryPoint}: throws {thrown.Name} but documents only [{string.Join(", ", documented)}].");
    }

    private static HashSet<string> Parameters(string entryPoint)
    {
        var result = new HashSet<string>(StringComparer.Ordinal);
        string id = "M:InternalStdCal." + entryPoint;
        foreach (var (key, names) in ParamDocs.Value)
        {
            if (key.StartsWith(id + "(", StringComparison.Ordinal) || key.StartsWith(id + "``", StringComparison.Ordinal))
            {
                result.UnionWith(names.Where(n => n != InheritDoc));
            }
        }

        if (result.Count == 0 && Docs.Value.Any(d => (d.Key.StartsWith(id + "(", StringComparison.Ordinal) || d.Key == id) && d.Value.Contains(InheritDoc)))
        {
            result.UnionWith(InheritedFrom(ParamDocs.Value, "M:", entryPoint));
        }

        if (result.Count == 0)
        {
            result.Add("value"); // a property setter
        }

        return result;
    }

    private static HashSet<string> Documented(string entryPoint)
    {
        var result = new HashSet<string>(StringComparer.Ordinal);
        bool found = false;
        foreach (string prefix in new[] { "M:", "P:" })
        {
            string id = prefix + "InternalStdCal." + entryPoint;
            foreach (var (key, crefs) in Docs.Value)
            {
                if (key == id || key.StartsWith(id + "(", StringComparison.Ordinal) || key.StartsWith(id + "``", StringComparison.Ordinal))
                {
                    found = true;
                    result.UnionWith(crefs.Where(x => x != InheritDoc));
                    if (crefs.Contains(InheritDoc))
                    {
                        result.UnionWith(Inherited(prefix, entryPoint));
                    }
                }
            }
        }

        return found ? result : new HashSet<string>();
    }

    // <inheritdoc/> on a member that implements an interface member (IQuantity<T>): read that member's tags.
    private static IEnumerable<string> Inherited(string prefix, string entryPoint) => InheritedFrom(Docs.Value, prefix, entryPoint);

    private static IEnumerable<string> InheritedFrom(Dictionary<string, List<string>> docs, string prefix, string entryPoint)
    {
        string member = "." + entryPoint.Substring(entryPoint.LastIndexOf('.') + 1) + "(";
        return docs
            .Where(d => d.Key.StartsWith(prefix, StringComparison.Ordinal) && d.Key.Contains(member, StringComparison.Ordinal) && IsInterfaceMember(d.Key, member))
            .SelectMany(d => d.Value);
    }

    private static bool IsInterfaceMember(string key, string member)
    {
        string type = key.Substring(0, key.IndexOf(member, StringComparison.Ordinal));
        string simple = type.Substring(type.LastIndexOf('.') + 1);
        return simple.Length > 1 && simple[0] == 'I' && char.IsUpper(simple[1]);
    }

    private const string InheritDoc = "<inheritdoc>";

    private static Dictionary<string, List<string>> LoadDocs(string element, string attribute)
    {
        var docs = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        foreach (string file in new[] { "InternalStdCal.xml", "InternalStdCal.IO.xml" })
        {
            string path = Path.Combine(AppContext.BaseDirectory, file);
            foreach (XElement member in XDocument.Load(path).Descendants("member"))
            {
                string name = (string)member.Attribute("name")!;
                var crefs = member.Elements(element).Select(x => (string)x.Attribute(attribute)!).ToList();
                if (member.Element("inheritdoc") is not null)
                {
                    crefs.Add(InheritDoc);
                }

                docs[name] = crefs;
            }
        }

        return docs;
    }
}
