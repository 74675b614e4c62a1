using System.Xml;
using System.Xml.Linq;
using System.Xml.Schema;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary><c>check --format junit</c> against the common JUnit structure (Schemas/junit.xsd, written from memory), validated with System.Xml.Schema.</summary>
public class JUnitSchemaTests
{
    private static List<string> Validate(string xml) => JUnitSchema.Errors(xml);

    [Fact]
    public void Failing_check_writes_junit_that_the_schema_accepts_with_one_testcase_per_case()
    {
        CliRun run = CliProcess.Run("check", "fixtures/footbridge/detailed.loads.json", "fixtures/footbridge/simplified-no-tank.loads.json", "--format", "junit");
        Assert.True(run.ExitCode == 1, run.ToString());
        Assert.Empty(Validate(run.Stdout));
        XDocument doc = XDocument.Parse(run.Stdout);
        XElement suite = doc.Root!.Element("testsuite")!;
        Assert.Equal(6, suite.Elements("testcase").Count());
        Assert.Equal("3", (string?)suite.Attribute("failures"));
        Assert.Equal(["vehicle", "uls-vehicle", "characteristic"],
            suite.Elements("testcase").Where(c => c.Element("failure") is not null).Select(c => (string)c.Attribute("name")!));
        Assert.All(suite.Descendants("failure"), f => Assert.False(string.IsNullOrWhiteSpace((string?)f.Attribute("message"))));
    }

    [Fact]
    public void Passing_check_writes_junit_that_the_schema_accepts()
    {
        CliRun run = CliProcess.Run("check", "fixtures/tank-wall/detailed.loads.json", "fixtures/tank-wall/simplified.loads.json", "--format", "junit");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Empty(Validate(run.Stdout));
        Assert.Empty(XDocument.Parse(run.Stdout).Descendants("failure"));
    }

    [Fact]
    public void The_schema_rejects_what_dashboards_cannot_read()
    {
        // Guards the guard: a testcase without a name and a failure without a message must not pass.
        Assert.NotEmpty(Validate("<testsuites><testsuite name=\"s\" tests=\"1\"><testcase classname=\"c\"/></testsuite></testsuites>"));
        Assert.NotEmpty(Validate("<testsuites><testsuite name=\"s\" tests=\"1\"><testcase name=\"a\"><failure>x</failure></testcase></testsuite></testsuites>"));
        Assert.NotEmpty(Validate("<testsuites><testcase name=\"a\"/></testsuites>"));
    }
}
