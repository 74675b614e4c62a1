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
        string tests = result.Comparisons.Count.ToString(System.Globalization.CultureInfo.InvariantCulture);
        string failures = result.FailureCount.ToString(System.Globalization.CultureInfo.InvariantCulture);
        x.WriteStartDocument();
        x.WriteStartElement("testsuites");
        x.WriteAttributeString("name", "loaddiff check");
        x.WriteAttributeString("tests", tests);
        x.WriteAttributeString("failures", failures);
        x.WriteAttributeString("errors", "0");
        x.WriteStartElement("testsuite");
        x.WriteAttributeString("name", $"{result.SubstitutePath} against {result.OriginalPath}");
        x.WriteAttributeString("tests", tests);
        x.WriteAttributeString("failures", failures);
        x.WriteAttributeString("errors", "0");
        x.WriteAttributeString("skipped", "0");
        foreach (CaseComparison c in result.Comparisons)
        {
            x.WriteStartElement("testcase");
            x.WriteAttributeString("classname", c.Kind == EntryKind.Case ? "loaddiff.check.case" : "loaddiff.check.combination");
            x.WriteAttributeString("name", c.Name);
            if (!c.Equivalent)
            {
                x.WriteStartElement("failure");
                x.WriteAttributeString("message", CheckWords.FailureReason(c, result));
                x.WriteAttributeString("type", c.Presence == OnlyIn.Both ? "not-equivalent" : "missing");
                x.WriteString(c.Residual is null ? CheckWords.FailureReason(c, result) : CheckWords.Missing(c, result));
                x.WriteEndElement();
            }
            x.WriteEndElement();
        }
        x.WriteEndElement();
        x.WriteEndElement();
        x.WriteEndDocument();
        x.Flush();
        output.WriteLine();
    }
}
