namespace DescentOps.Reports.Tests;

/// <summary>
/// A fact that needs Debian's chromium. On a developer's machine without it the test is skipped with a reason;
/// under CI (<c>CI=true</c>) it runs regardless and fails, because CI installs chromium first and a skip there
/// would hide a broken install step.
/// </summary>
public sealed class ChromiumFactAttribute : FactAttribute
{
    public ChromiumFactAttribute()
    {
        if (!HeadlessChromium.IsInstalled && !HeadlessChromium.UnderCi)
        {
            Skip = $"{HeadlessChromium.Executable} is not installed (apt-get install chromium); CI installs it and runs this test.";
        }
    }
}
