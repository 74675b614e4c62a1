using System.Xml;
using System.Xml.Schema;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>Validates JUnit XML against the common structure in Schemas/junit.xsd (written from memory) with System.Xml.Schema.</summary>
public static class JUnitSchema
{
    private static XmlSchemaSet Load()
    {
        var set = new XmlSchemaSet { XmlResolver = null };
        using var reader = XmlReader.Create(Path.Combine(CliProcess.RepoRoot, "tests", "LoadDiff.Cli.Tests", "Schemas", "junit.xsd"),
            new XmlReaderSettings { DtdProcessing = DtdProcessing.Prohibit, XmlResolver = null });
        set.Add(null, reader);
        set.Compile();
        return set;
    }

    /// <summary>The schema's errors and warnings for the document (none when it is valid).</summary>
    public static List<string> Errors(string xml)
    {
        var errors = new List<string>();
        var settings = new XmlReaderSettings { ValidationType = ValidationType.Schema, Schemas = Load(), XmlResolver = null, DtdProcessing = DtdProcessing.Prohibit };
        settings.ValidationFlags |= XmlSchemaValidationFlags.ReportValidationWarnings;
        settings.ValidationEventHandler += (_, e) => errors.Add($"{e.Severity}: {e.Message} (line {e.Exception?.LineNumber})");
        using var reader = XmlReader.Create(new StringReader(xml), settings);
        while (reader.Read())
        {
        }
        return errors;
    }
}
