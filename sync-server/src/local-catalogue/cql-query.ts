/**
 * The part of CQL (the Library of Congress "CQL: Contextual Query Language" 1.2) the local
 * catalogue understands: `index relation term` clauses with `=`, `==`, `all`, `any`, `exact`
 * and `adj`, joined by `and`, `or`, `not` and parentheses; a bare term searches titles and names.
 */
export type CqlNode =
  | { readonly kind: 'clause'; readonly index: string; readonly relation: string; readonly term: string }
  | { readonly kind: 'boolean'; readonly op: 'and' | 'or' | 'not'; readonly left: CqlNode; readonly right: CqlNode };

export class CqlSyntaxError extends Error {}

const RELATIONS = ['==', '=', 'all', 'any', 'exact', 'adj'];
const BOOLEANS = ['and', 'or', 'not'];

function tokenize(query: string): string[] {
  const tokens: string[] = [];
  const pattern = /\s*(?:"((?:[^"\\]|\\.)*)"|(==|=|\(|\))|([^\s()="]+))/y;
  let at = 0;
  while (query.slice(at).trim() !== '') {
    pattern.lastIndex = at;
    const match = pattern.exec(query);
    if (!match) throw new CqlSyntaxError(`cannot read the query from "${query.slice(at).trim()}"`);
    // A quoted term keeps a leading quote mark, so it is never taken for an index or a boolean.
    tokens.push(match[1] !== undefined ? `"${match[1].replace(/\\(.)/g, '$1')}` : (match[2] ?? match[3]!));
    at = pattern.lastIndex;
  }
  return tokens;
}

/** Parses a query; throws `CqlSyntaxError` for what it cannot read. */
export function parseCql(query: string): CqlNode {
  const tokens = tokenize(query);
  let position = 0;
  const peek = () => tokens[position];
  const next = () => {
    const token = tokens[position++];
    if (token === undefined) throw new CqlSyntaxError('the query ends too early');
    return token;
  };
  const term = (token: string) => (token.startsWith('"') ? token.slice(1) : token);

  function clause(): CqlNode {
    const first = next();
    if (first === '(') {
      const inner = expression();
      if (next() !== ')') throw new CqlSyntaxError('a parenthesis is not closed');
      return inner;
    }
    const relation = peek();
    if (relation && RELATIONS.includes(relation.toLowerCase()) && !first.startsWith('"')) {
      position++;
      return { kind: 'clause', index: first.toLowerCase(), relation: relation.toLowerCase(), term: term(next()) };
    }
    return { kind: 'clause', index: 'cql.serverchoice', relation: '=', term: term(first) };
  }

  function expression(): CqlNode {
    let left = clause();
    while (peek() && BOOLEANS.includes(peek()!.toLowerCase())) {
      const op = next().toLowerCase() as 'and' | 'or' | 'not';
      left = { kind: 'boolean', op, left, right: clause() };
    }
    return left;
  }

  const tree = expression();
  if (position < tokens.length) throw new CqlSyntaxError(`unexpected "${tokens[position]}"`);
  return tree;
}
