using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>Action blocks: sends with their arguments, waits, enable, disable and start.</summary>
internal sealed class ActionParser
{
    private readonly TokenCursor _cursor;

    public ActionParser(TokenCursor cursor) => _cursor = cursor;

    internal List<ActionSyntax> ParseBlock()
    {
        _cursor.Expect(TokenKind.LeftBrace, "'{' to open an action block");
        var actions = new List<ActionSyntax>();
        while (_cursor.Current.Kind != TokenKind.RightBrace)
        {
            var step = _cursor.Current;
            if (step.IsWord("send"))
            {
                _cursor.Next();
                actions.Add(ParseSend(step.Location));
            }
            else if (step.IsWord("wait"))
            {
                _cursor.Next();
                actions.Add(new WaitSyntax(_cursor.ExpectQuantity("a wait duration"), step.Location));
            }
            else if (step.IsWord("enable"))
            {
                _cursor.Next();
                actions.Add(new EnableSyntax(_cursor.ExpectName("rule name"), step.Location));
            }
            else if (step.IsWord("disable"))
            {
                _cursor.Next();
                actions.Add(new DisableSyntax(_cursor.ExpectName("rule name"), step.Location));
            }
            else if (step.IsWord("start"))
            {
                _cursor.Next();
                actions.Add(new StartSyntax(_cursor.ExpectName("procedure name"), step.Location));
            }
            else
            {
                throw _cursor.Fail(DiagnosticCode.UnexpectedToken, step.Location, $"expected an action (send, wait, enable, disable, start) or '}}', found {step.Describe()}");
            }
        }

        _cursor.Next();
        return actions;
    }

    /// <summary>"TARGET COMMAND(name = value, ...)", the part of a send after the keyword.</summary>
    internal SendSyntax ParseSend(SourceLocation location)
    {
        var target = _cursor.ExpectName("command target");
        var command = _cursor.ExpectName("command name");
        var arguments = new List<ArgumentSyntax>();
        if (_cursor.Current.Kind == TokenKind.LeftParen)
        {
            _cursor.Next();
            if (_cursor.Current.Kind != TokenKind.RightParen)
            {
                arguments.Add(ParseArgument());
                while (_cursor.Current.Kind == TokenKind.Comma)
                {
                    _cursor.Next();
                    arguments.Add(ParseArgument());
                }
            }

            _cursor.Expect(TokenKind.RightParen, "',' or ')' after an argument");
        }

        return new SendSyntax(target, command, arguments, location);
    }

    private ArgumentSyntax ParseArgument()
    {
        var name = _cursor.ExpectName("argument name");
        _cursor.Expect(TokenKind.Equals, $"'=' after argument '{name.Text}'");
        var value = _cursor.Current;
        if (value.Kind == TokenKind.Number)
        {
            return new ArgumentSyntax(name, _cursor.ExpectQuantity("an argument value"), null, name.Location);
        }

        if (value.Kind == TokenKind.Word)
        {
            return new ArgumentSyntax(name, null, _cursor.ExpectName("argument value", allowKeyword: true), name.Location);
        }

        throw _cursor.Fail(DiagnosticCode.UnexpectedToken, value.Location, $"expected a value for argument '{name.Text}', found {value.Describe()}");
    }
}
