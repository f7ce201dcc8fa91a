// Syntax of the .jonq optical-train language.
// The grammar is deliberately generic about element kinds and their parameters:
// the checker validates kinds and parameters against its own tables, which gives
// better messages ("did you mean ...") than a keyword per kind would.
// No rule is recursive, so nesting depth is bounded by construction.
parser grammar JonquilParser;

options { tokenVocab = JonquilLexer; }

file          : sep* (topStatement (sep+ topStatement)* sep*)? EOF ;
sep           : NL | SEMI ;
// One top-level statement alone: an editor re-parses only the statements an edit touched.
statementOnly : topStatement EOF ;

topStatement  : useDecl
              | trainDecl
              | requireDecl
              | declaration
              ;

useDecl       : USE target=STRING ;

// 'lens obj { focal 3 mm }', 'material cover = index 1.523', 'probe trap'
declaration   : kind=IDENT name=IDENT (EQ args | block)? ;
block         : LBRACE sep* (property (sep+ property)*)? sep* RBRACE ;
property      : key=word args? ;

args          : arg+ ;
arg           : value (RANGE value)?
              | COMMA
              ;
value         : quantity
              | reference
              | STRING
              ;

quantity      : number unit? tolerance?
              | OD number
              ;
number        : sign=(MINUS | PLUS)? NUMBER ;
tolerance     : PLUSMINUS number unit? ;
unit          : SLASH? unitFactor ((SLASH | STAR | MIDDOT) unitFactor)* ;
unitFactor    : (IDENT | PERCENT | DEGREE) (CARET number)? ;

reference     : word (DOT word)? ;
word          : IDENT | AT | IN | FOR | OVER | FROM | TO | IS | THEN | EVERYWHERE
              | LINEAR | CIRCULAR | ELLIPTICAL | UNPOLARIZED | PARTIAL | RIGHT | LEFT
              ;

// 'train main { laser -> 150 mm -> hwp1 -> pbs1.through -> dump1 }'
trainDecl     : TRAIN name=IDENT? LBRACE sep* (path (sep+ path)*)? sep* RBRACE ;
path          : step (NL* ARROW NL* step)* ;
step          : distance
              | reference
              ;
distance      : quantity (IN medium=reference)? ;

// 'require { power at trap in 400 mW .. 600 mW }'; 'for line 532 nm' names one line of a source.
requireDecl   : REQUIRE LBRACE sep* (requirement (sep+ requirement)*)? sep* RBRACE ;
// 'yield >= 99 % over 2000 builds for power at trap >= 400 mW'; the word is checked later.
requirement   : (YIELD comparator=cmp bound=value (OVER builds=number buildsWord=IDENT)? FOR)? check ;
check         : measure place* condition? place* (COMMA extra)* band? ;
extra         : measure? condition ;
measure       : IDENT+ ;
place         : AT target=reference              # atPlace
              | EVERYWHERE                       # everywherePlace
              | FROM from=reference TO to=reference  # betweenPlace
              | FOR lineWord=IDENT line=value      # linePlace
              ;
condition     : cmp value hand=(RIGHT | LEFT)?    # compareCondition
              | IN low=value RANGE high=value    # rangeCondition
              | IS state                         # stateCondition
              ;
state         : (stateWord | quantity)+ ;
stateWord     : IDENT | LINEAR | CIRCULAR | ELLIPTICAL | UNPOLARIZED | PARTIAL | RIGHT | LEFT ;
band          : OVER IDENT low=value RANGE high=value ;
cmp           : LE | GE | LT | GT | EQEQ ;
