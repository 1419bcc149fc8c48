using PhaseSlope.Validation;
using PhaseSlope.Validation.Sections;

// Writes docs/validation.md from the code: every number on the page is computed here, now.
// Usage: PhaseSlope.Validation [OUTPUT]  (stdout without OUTPUT). docs/make-validation.sh runs it.
var page = new Page();
Intro.Write(page);
foreach (var section in SectionList.All)
{
    section(page);
}

string text = page.ToString();
if (args.Length == 0)
{
    Console.Out.Write(text);
}
else
{
    File.WriteAllText(args[0], text, new System.Text.UTF8Encoding(false));
}
