using System.Globalization;
using System.Numerics;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Derivatives;

/// <summary>Reads an expression in the plain-text notation of <see cref="MeasurableExpression"/>
/// (symbols T, P, v, s, alpha, kappa_T, cp; whole numbers; + − * / ^ with an integer exponent;
/// parentheses) into its canonical form, so that a formula written by hand (a textbook identity)
/// can be compared with a derived one.</summary>
public static class ExpressionParser
{
    /// <summary>The canonical form of <paramref name="text"/>.</summary>
    /// <exception cref="InvalidInputException">The text is not an expression of the notation.</exception>
    public static MeasurableExpression Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var reader = new Reader(text);
        var (n, d) = reader.Sum();
        reader.End();
        return MeasurableExpression.Of(n, d);
    }

    /// <summary>A recursive-descent reader over the text; each value is a ratio (N, D).</summary>
    private sealed class Reader(string text)
    {
        private int _at;

        public (Polynomial N, Polynomial D) Sum()
        {
            var value = Product();
            while (Peek() is '+' or '-')
            {
                char op = text[_at++];
                var (n, d) = Product();
                value = (value.N * d + (op == '+' ? n : -n) * value.D, value.D * d);
            }

            return value;
        }

        public void End()
        {
            if (Peek() is char c)
            {
                throw Fail($"unexpected '{c}'");
            }
        }

        private (Polynomial N, Polynomial D) Product()
        {
            var value = Power();
            while (Peek() is '*' or '/')
            {
                char op = text[_at++];
                var (n, d) = Power();
                value = op == '*' ? (value.N * n, value.D * d) : (value.N * d, value.D * n);
            }

            return value;
        }

        private (Polynomial N, Polynomial D) Power()
        {
            var value = Unary();
            if (Peek() == '^')
            {
                _at++;
                bool negative = Peek() == '-';
                if (negative)
                {
                    _at++;
                }

                int start = _at;
                while (_at < text.Length && char.IsAsciiDigit(text[_at]))
                {
                    _at++;
                }

                if (start == _at)
                {
                    throw Fail("'^' needs a whole-number exponent");
                }

                int k = int.Parse(text.AsSpan(start, _at - start), CultureInfo.InvariantCulture);
                var (n, d) = (Polynomial.Constant(1), Polynomial.Constant(1));
                for (int i = 0; i < k; i++)
                {
                    n *= value.N;
                    d *= value.D;
                }

                value = negative ? (d, n) : (n, d);
            }

            return value;
        }

        private (Polynomial N, Polynomial D) Unary()
        {
            if (Peek() == '-')
            {
                _at++;
                var (n, d) = Unary();
                return (-n, d);
            }

            return Atom();
        }

        private (Polynomial N, Polynomial D) Atom()
        {
            char? c = Peek();
            if (c == '(')
            {
                _at++;
                var value = Sum();
                if (Peek() != ')')
                {
                    throw Fail("missing ')'");
                }

                _at++;
                return value;
            }

            int start = _at;
            if (c is char digit && char.IsAsciiDigit(digit))
            {
                while (_at < text.Length && char.IsAsciiDigit(text[_at]))
                {
                    _at++;
                }

                return (Polynomial.Constant(BigInteger.Parse(text.AsSpan(start, _at - start), CultureInfo.InvariantCulture)), Polynomial.Constant(1));
            }

            while (_at < text.Length && (char.IsAsciiLetter(text[_at]) || text[_at] == '_'))
            {
                _at++;
            }

            string symbol = text[start.._at];
            return MeasurableQuantities.FromSymbol(symbol) is { } quantity
                ? (Polynomial.Of(quantity), Polynomial.Constant(1))
                : throw Fail(symbol.Length == 0 ? "expected a symbol, a number or '('" : $"unknown symbol '{symbol}' (T, P, v, s, alpha, kappa_T, cp)");
        }

        private char? Peek()
        {
            while (_at < text.Length && text[_at] == ' ')
            {
                _at++;
            }

            return _at < text.Length ? text[_at] : null;
        }

        private InvalidInputException Fail(string problem)
            => new("expression", double.NaN, $"expression '{text}' at position {_at + 1}: {problem}");
    }
}
