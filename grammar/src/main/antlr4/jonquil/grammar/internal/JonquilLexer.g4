// Tokens of the .jonq optical-train language.
// Newlines are tokens: one fact per line is the language's unit of layout.
lexer grammar JonquilLexer;

channels { COMMENTS, ERRORS }

// Structural keywords.
USE         : 'use' ;
TRAIN       : 'train' ;
REQUIRE     : 'require' ;
YIELD       : 'yield' ;
// Connecting words. Reserved so that a number before them never reads them as a unit.
AT          : 'at' ;
IN          : 'in' ;
FOR         : 'for' ;
OVER        : 'over' ;
FROM        : 'from' ;
TO          : 'to' ;
IS          : 'is' ;
THEN        : 'then' ;
EVERYWHERE  : 'everywhere' ;
// Polarization-state words: reserved for the same reason ('partial 0.9 linear 0 deg').
LINEAR      : 'linear' ;
CIRCULAR    : 'circular' ;
ELLIPTICAL  : 'elliptical' ;
UNPOLARIZED : 'unpolarized' ;
PARTIAL     : 'partial' ;
RIGHT       : 'right' ;
LEFT        : 'left' ;
// Optical density is written before its number: 'OD 3'.
OD          : 'OD' ;

ARROW       : '->' ;
RANGE       : '..' ;
PLUSMINUS   : '\u00B1' | '+-' ;
LE          : '<=' | '\u2264' ;
GE          : '>=' | '\u2265' ;
LT          : '<' ;
GT          : '>' ;
EQEQ        : '==' ;
EQ          : '=' ;
LBRACE      : '{' ;
RBRACE      : '}' ;
LPAREN      : '(' ;
RPAREN      : ')' ;
COMMA       : ',' ;
SEMI        : ';' ;
DOT         : '.' ;
SLASH       : '/' ;
STAR        : '*' ;
MIDDOT      : '\u00B7' ;
CARET       : '^' ;
PERCENT     : '%' ;
DEGREE      : '\u00B0' [CF]? ;
PLUS        : '+' ;
MINUS       : '-' | '\u2212' ;

NUMBER      : DIGITS ('.' DIGITS)? EXPONENT?
            | '.' DIGITS EXPONENT?
            ;
IDENT       : [\p{L}_] [\p{L}\p{N}_]* ;
STRING      : '"' (~["\\\r\n] | '\\' ~[\r\n])* '"' ;
// A string that reaches the end of its line: a token of its own, so the checker can name it.
UNTERMINATED_STRING : '"' (~["\\\r\n] | '\\' ~[\r\n])* ;

LINE_COMMENT  : '//' ~[\r\n]* -> channel(COMMENTS) ;
BLOCK_COMMENT : '/*' .*? '*/' -> channel(COMMENTS) ;
// Only a comment with no '*/' anywhere after it is unterminated (a '.*? EOF' rule would
// outmatch every closed comment, since the lexer takes the longest match).
UNTERMINATED_COMMENT : '/*' (~'*' | '*'+ ~[*/])* '*'* EOF -> channel(ERRORS) ;

NL          : '\r'? '\n' | '\r' ;
WS          : [ \t\f\uFEFF]+ -> skip ;
// Anything else becomes one token, kept out of the parser's way, that the checker reports in plain words.
ERROR_CHAR  : . -> channel(ERRORS) ;

fragment DIGITS   : [0-9]+ ;
fragment EXPONENT : [eE] [+\-]? DIGITS ;
