using System.Xml;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;

namespace LoadDiff.Reports;

/// <summary>JUnit XML for CI dashboards: one testcase per case and combination, a failure element for each that fails.</summary>
public static class CheckJUnitWriter
{
    /// <summary>Writes the check result as JUnit XML.</summary>
    public static void Write(CheckResult result, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(output);
        var settings = new XmlWriterSettings { Indent = true, OmitXmlDeclaration = false, NewLineChars = "\n" };
        using XmlWriter x = XmlWriter.Create(output, settings);
        IReadOnlyList<LoadDiff.Core.Sections.SectionGateCase> gate = result.SectionGate?.Cases ?? [];
        string tests = (result.Comparisons.Count + gate.Count).ToString(System.Globalization.CultureInfo.InvariantCulture);
        string failures = (result.FailureCount + gate.Count(g => !g.Passes)).ToString(System.Globalization.CultureInfo.InvariantCulture);
        x.WriteStartDocument();
        x.WriteStartElement("testsuites");
        x.WriteAttributeString("name", "loaddiff check");
        x.WriteAttributeString("tests", tests);
        x.WriteAttributeString("failures", failures);
        x.WriteAttributeString("errors", "0");
        x.WriteStartElement("testsuite");
        x.WriteAttributeString("name", SafeText.Xml($"{result.SubstitutePath} against {result.OriginalPath}"));
        x.WriteAttributeString("tests", tests);
        x.WriteAttributeString("failures", failures);
        x.WriteAttributeString("errors", "0");
        x.WriteAttributeString("skipped", "0");
        foreach (CaseComparison c in result.Comparisons)
        {
            x.WriteStartElement("testcase");
            x.WriteAttributeString("classname", c.Kind == EntryKind.Case ? "loaddiff.check.case" : "loaddiff.check.combination");
            x.WriteAttributeString("name", SafeText.Xml(c.Name));
            if (!c.Equivalent)
            {
                x.WriteStartElement("failure");
                x.WriteAttributeString("message", SafeText.Xml(CheckWords.FailureReason(c, result)));
                x.WriteAttributeString("type", c.Presence == OnlyIn.Both ? "not-equivalent" : "missing");
                x.WriteString(Lines([CheckWords.FailureReason(c, result), .. CheckWords.Explanation(c, result)]));
                x.WriteEndElement();
            }
            else if (c.Notes.Count > 0)
            {
                x.WriteElementString("system-out", SafeText.Xml("note: " + string.Join("; ", c.Notes)));
            }
            x.WriteEndElement();
        }
        foreach (LoadDiff.Core.Sections.SectionGateCase g in gate)
        {
            x.WriteStartElement("testcase");
            x.WriteAttributeString("classname", "loaddiff.check.section-gate");
            x.WriteAttributeString("name", SafeText.Xml(g.Name));
            if (!g.Passes)
            {
                x.WriteStartElement("failure");
                x.WriteAttributeString("message", SafeText.Xml(CheckWords.GateCase(g, result).Trim()));
                x.WriteAttributeString("type", "section-gate");
                x.WriteString(Lines(CheckWords.GateCase(g, result).Trim().Split('\n')));
                x.WriteEndElement();
            }
            x.WriteEndElement();
        }
        if (result.Warnings.Count > 0)
        {
            x.WriteElementString("system-err", Lines(result.Warnings.Select(v => "warning: " + v)));
        }
        x.WriteEndElement();
        x.WriteEndElement();
        x.WriteEndDocument();
        x.Flush();
        output.WriteLine();
    }

    // Each line made safe on its own, so the writer's own line breaks stay and no forbidden character reaches XmlWriter (which throws on them).
    private static string Lines(IEnumerable<string> lines) => string.Join("\n", lines.Select(SafeText.Xml));
}
