#!/usr/bin/env node
import { createRequire as __WEBPACK_EXTERNAL_createRequire } from "module";
/******/ var __webpack_modules__ = ({

/***/ 2463:
/***/ ((module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.MissingRefError = exports.ValidationError = exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = exports.Ajv = void 0;
const core_1 = __nccwpck_require__(3893);
const draft7_1 = __nccwpck_require__(9941);
const discriminator_1 = __nccwpck_require__(8886);
const draft7MetaSchema = __nccwpck_require__(2079);
const META_SUPPORT_DATA = ["/properties"];
const META_SCHEMA_ID = "http://json-schema.org/draft-07/schema";
class Ajv extends core_1.default {
    _addVocabularies() {
        super._addVocabularies();
        draft7_1.default.forEach((v) => this.addVocabulary(v));
        if (this.opts.discriminator)
            this.addKeyword(discriminator_1.default);
    }
    _addDefaultMetaSchema() {
        super._addDefaultMetaSchema();
        if (!this.opts.meta)
            return;
        const metaSchema = this.opts.$data
            ? this.$dataMetaSchema(draft7MetaSchema, META_SUPPORT_DATA)
            : draft7MetaSchema;
        this.addMetaSchema(metaSchema, META_SCHEMA_ID, false);
        this.refs["http://json-schema.org/schema"] = META_SCHEMA_ID;
    }
    defaultMeta() {
        return (this.opts.defaultMeta =
            super.defaultMeta() || (this.getSchema(META_SCHEMA_ID) ? META_SCHEMA_ID : undefined));
    }
}
exports.Ajv = Ajv;
module.exports = exports = Ajv;
module.exports.Ajv = Ajv;
Object.defineProperty(exports, "__esModule", ({ value: true }));
exports["default"] = Ajv;
var validate_1 = __nccwpck_require__(7881);
Object.defineProperty(exports, "KeywordCxt", ({ enumerable: true, get: function () { return validate_1.KeywordCxt; } }));
var codegen_1 = __nccwpck_require__(1436);
Object.defineProperty(exports, "_", ({ enumerable: true, get: function () { return codegen_1._; } }));
Object.defineProperty(exports, "str", ({ enumerable: true, get: function () { return codegen_1.str; } }));
Object.defineProperty(exports, "stringify", ({ enumerable: true, get: function () { return codegen_1.stringify; } }));
Object.defineProperty(exports, "nil", ({ enumerable: true, get: function () { return codegen_1.nil; } }));
Object.defineProperty(exports, "Name", ({ enumerable: true, get: function () { return codegen_1.Name; } }));
Object.defineProperty(exports, "CodeGen", ({ enumerable: true, get: function () { return codegen_1.CodeGen; } }));
var validation_error_1 = __nccwpck_require__(3021);
Object.defineProperty(exports, "ValidationError", ({ enumerable: true, get: function () { return validation_error_1.default; } }));
var ref_error_1 = __nccwpck_require__(3162);
Object.defineProperty(exports, "MissingRefError", ({ enumerable: true, get: function () { return ref_error_1.default; } }));
//# sourceMappingURL=ajv.js.map

/***/ }),

/***/ 567:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.regexpCode = exports.getEsmExportName = exports.getProperty = exports.safeStringify = exports.stringify = exports.strConcat = exports.addCodeArg = exports.str = exports._ = exports.nil = exports._Code = exports.Name = exports.IDENTIFIER = exports._CodeOrName = void 0;
// eslint-disable-next-line @typescript-eslint/no-extraneous-class
class _CodeOrName {
}
exports._CodeOrName = _CodeOrName;
exports.IDENTIFIER = /^[a-z$_][a-z$_0-9]*$/i;
class Name extends _CodeOrName {
    constructor(s) {
        super();
        if (!exports.IDENTIFIER.test(s))
            throw new Error("CodeGen: name must be a valid identifier");
        this.str = s;
    }
    toString() {
        return this.str;
    }
    emptyStr() {
        return false;
    }
    get names() {
        return { [this.str]: 1 };
    }
}
exports.Name = Name;
class _Code extends _CodeOrName {
    constructor(code) {
        super();
        this._items = typeof code === "string" ? [code] : code;
    }
    toString() {
        return this.str;
    }
    emptyStr() {
        if (this._items.length > 1)
            return false;
        const item = this._items[0];
        return item === "" || item === '""';
    }
    get str() {
        var _a;
        return ((_a = this._str) !== null && _a !== void 0 ? _a : (this._str = this._items.reduce((s, c) => `${s}${c}`, "")));
    }
    get names() {
        var _a;
        return ((_a = this._names) !== null && _a !== void 0 ? _a : (this._names = this._items.reduce((names, c) => {
            if (c instanceof Name)
                names[c.str] = (names[c.str] || 0) + 1;
            return names;
        }, {})));
    }
}
exports._Code = _Code;
exports.nil = new _Code("");
function _(strs, ...args) {
    const code = [strs[0]];
    let i = 0;
    while (i < args.length) {
        addCodeArg(code, args[i]);
        code.push(strs[++i]);
    }
    return new _Code(code);
}
exports._ = _;
const plus = new _Code("+");
function str(strs, ...args) {
    const expr = [safeStringify(strs[0])];
    let i = 0;
    while (i < args.length) {
        expr.push(plus);
        addCodeArg(expr, args[i]);
        expr.push(plus, safeStringify(strs[++i]));
    }
    optimize(expr);
    return new _Code(expr);
}
exports.str = str;
function addCodeArg(code, arg) {
    if (arg instanceof _Code)
        code.push(...arg._items);
    else if (arg instanceof Name)
        code.push(arg);
    else
        code.push(interpolate(arg));
}
exports.addCodeArg = addCodeArg;
function optimize(expr) {
    let i = 1;
    while (i < expr.length - 1) {
        if (expr[i] === plus) {
            const res = mergeExprItems(expr[i - 1], expr[i + 1]);
            if (res !== undefined) {
                expr.splice(i - 1, 3, res);
                continue;
            }
            expr[i++] = "+";
        }
        i++;
    }
}
function mergeExprItems(a, b) {
    if (b === '""')
        return a;
    if (a === '""')
        return b;
    if (typeof a == "string") {
        if (b instanceof Name || a[a.length - 1] !== '"')
            return;
        if (typeof b != "string")
            return `${a.slice(0, -1)}${b}"`;
        if (b[0] === '"')
            return a.slice(0, -1) + b.slice(1);
        return;
    }
    if (typeof b == "string" && b[0] === '"' && !(a instanceof Name))
        return `"${a}${b.slice(1)}`;
    return;
}
function strConcat(c1, c2) {
    return c2.emptyStr() ? c1 : c1.emptyStr() ? c2 : str `${c1}${c2}`;
}
exports.strConcat = strConcat;
// TODO do not allow arrays here
function interpolate(x) {
    return typeof x == "number" || typeof x == "boolean" || x === null
        ? x
        : safeStringify(Array.isArray(x) ? x.join(",") : x);
}
function stringify(x) {
    return new _Code(safeStringify(x));
}
exports.stringify = stringify;
function safeStringify(x) {
    return JSON.stringify(x)
        .replace(/\u2028/g, "\\u2028")
        .replace(/\u2029/g, "\\u2029");
}
exports.safeStringify = safeStringify;
function getProperty(key) {
    return typeof key == "string" && exports.IDENTIFIER.test(key) ? new _Code(`.${key}`) : _ `[${key}]`;
}
exports.getProperty = getProperty;
//Does best effort to format the name properly
function getEsmExportName(key) {
    if (typeof key == "string" && exports.IDENTIFIER.test(key)) {
        return new _Code(`${key}`);
    }
    throw new Error(`CodeGen: invalid export name: ${key}, use explicit $id name mapping`);
}
exports.getEsmExportName = getEsmExportName;
function regexpCode(rx) {
    return new _Code(rx.toString());
}
exports.regexpCode = regexpCode;
//# sourceMappingURL=code.js.map

/***/ }),

/***/ 1436:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.or = exports.and = exports.not = exports.CodeGen = exports.operators = exports.varKinds = exports.ValueScopeName = exports.ValueScope = exports.Scope = exports.Name = exports.regexpCode = exports.stringify = exports.getProperty = exports.nil = exports.strConcat = exports.str = exports._ = void 0;
const code_1 = __nccwpck_require__(567);
const scope_1 = __nccwpck_require__(7788);
var code_2 = __nccwpck_require__(567);
Object.defineProperty(exports, "_", ({ enumerable: true, get: function () { return code_2._; } }));
Object.defineProperty(exports, "str", ({ enumerable: true, get: function () { return code_2.str; } }));
Object.defineProperty(exports, "strConcat", ({ enumerable: true, get: function () { return code_2.strConcat; } }));
Object.defineProperty(exports, "nil", ({ enumerable: true, get: function () { return code_2.nil; } }));
Object.defineProperty(exports, "getProperty", ({ enumerable: true, get: function () { return code_2.getProperty; } }));
Object.defineProperty(exports, "stringify", ({ enumerable: true, get: function () { return code_2.stringify; } }));
Object.defineProperty(exports, "regexpCode", ({ enumerable: true, get: function () { return code_2.regexpCode; } }));
Object.defineProperty(exports, "Name", ({ enumerable: true, get: function () { return code_2.Name; } }));
var scope_2 = __nccwpck_require__(7788);
Object.defineProperty(exports, "Scope", ({ enumerable: true, get: function () { return scope_2.Scope; } }));
Object.defineProperty(exports, "ValueScope", ({ enumerable: true, get: function () { return scope_2.ValueScope; } }));
Object.defineProperty(exports, "ValueScopeName", ({ enumerable: true, get: function () { return scope_2.ValueScopeName; } }));
Object.defineProperty(exports, "varKinds", ({ enumerable: true, get: function () { return scope_2.varKinds; } }));
exports.operators = {
    GT: new code_1._Code(">"),
    GTE: new code_1._Code(">="),
    LT: new code_1._Code("<"),
    LTE: new code_1._Code("<="),
    EQ: new code_1._Code("==="),
    NEQ: new code_1._Code("!=="),
    NOT: new code_1._Code("!"),
    OR: new code_1._Code("||"),
    AND: new code_1._Code("&&"),
    ADD: new code_1._Code("+"),
};
class Node {
    optimizeNodes() {
        return this;
    }
    optimizeNames(_names, _constants) {
        return this;
    }
}
class Def extends Node {
    constructor(varKind, name, rhs) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.rhs = rhs;
    }
    render({ es5, _n }) {
        const varKind = es5 ? scope_1.varKinds.var : this.varKind;
        const rhs = this.rhs === undefined ? "" : ` = ${this.rhs}`;
        return `${varKind} ${this.name}${rhs};` + _n;
    }
    optimizeNames(names, constants) {
        if (!names[this.name.str])
            return;
        if (this.rhs)
            this.rhs = optimizeExpr(this.rhs, names, constants);
        return this;
    }
    get names() {
        return this.rhs instanceof code_1._CodeOrName ? this.rhs.names : {};
    }
}
class Assign extends Node {
    constructor(lhs, rhs, sideEffects) {
        super();
        this.lhs = lhs;
        this.rhs = rhs;
        this.sideEffects = sideEffects;
    }
    render({ _n }) {
        return `${this.lhs} = ${this.rhs};` + _n;
    }
    optimizeNames(names, constants) {
        if (this.lhs instanceof code_1.Name && !names[this.lhs.str] && !this.sideEffects)
            return;
        this.rhs = optimizeExpr(this.rhs, names, constants);
        return this;
    }
    get names() {
        const names = this.lhs instanceof code_1.Name ? {} : { ...this.lhs.names };
        return addExprNames(names, this.rhs);
    }
}
class AssignOp extends Assign {
    constructor(lhs, op, rhs, sideEffects) {
        super(lhs, rhs, sideEffects);
        this.op = op;
    }
    render({ _n }) {
        return `${this.lhs} ${this.op}= ${this.rhs};` + _n;
    }
}
class Label extends Node {
    constructor(label) {
        super();
        this.label = label;
        this.names = {};
    }
    render({ _n }) {
        return `${this.label}:` + _n;
    }
}
class Break extends Node {
    constructor(label) {
        super();
        this.label = label;
        this.names = {};
    }
    render({ _n }) {
        const label = this.label ? ` ${this.label}` : "";
        return `break${label};` + _n;
    }
}
class Throw extends Node {
    constructor(error) {
        super();
        this.error = error;
    }
    render({ _n }) {
        return `throw ${this.error};` + _n;
    }
    get names() {
        return this.error.names;
    }
}
class AnyCode extends Node {
    constructor(code) {
        super();
        this.code = code;
    }
    render({ _n }) {
        return `${this.code};` + _n;
    }
    optimizeNodes() {
        return `${this.code}` ? this : undefined;
    }
    optimizeNames(names, constants) {
        this.code = optimizeExpr(this.code, names, constants);
        return this;
    }
    get names() {
        return this.code instanceof code_1._CodeOrName ? this.code.names : {};
    }
}
class ParentNode extends Node {
    constructor(nodes = []) {
        super();
        this.nodes = nodes;
    }
    render(opts) {
        return this.nodes.reduce((code, n) => code + n.render(opts), "");
    }
    optimizeNodes() {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
            const n = nodes[i].optimizeNodes();
            if (Array.isArray(n))
                nodes.splice(i, 1, ...n);
            else if (n)
                nodes[i] = n;
            else
                nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : undefined;
    }
    optimizeNames(names, constants) {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
            // iterating backwards improves 1-pass optimization
            const n = nodes[i];
            if (n.optimizeNames(names, constants))
                continue;
            subtractNames(names, n.names);
            nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : undefined;
    }
    get names() {
        return this.nodes.reduce((names, n) => addNames(names, n.names), {});
    }
}
class BlockNode extends ParentNode {
    render(opts) {
        return "{" + opts._n + super.render(opts) + "}" + opts._n;
    }
}
class Root extends ParentNode {
}
class Else extends BlockNode {
}
Else.kind = "else";
class If extends BlockNode {
    constructor(condition, nodes) {
        super(nodes);
        this.condition = condition;
    }
    render(opts) {
        let code = `if(${this.condition})` + super.render(opts);
        if (this.else)
            code += "else " + this.else.render(opts);
        return code;
    }
    optimizeNodes() {
        super.optimizeNodes();
        const cond = this.condition;
        if (cond === true)
            return this.nodes; // else is ignored here
        let e = this.else;
        if (e) {
            const ns = e.optimizeNodes();
            e = this.else = Array.isArray(ns) ? new Else(ns) : ns;
        }
        if (e) {
            if (cond === false)
                return e instanceof If ? e : e.nodes;
            if (this.nodes.length)
                return this;
            return new If(not(cond), e instanceof If ? [e] : e.nodes);
        }
        if (cond === false || !this.nodes.length)
            return undefined;
        return this;
    }
    optimizeNames(names, constants) {
        var _a;
        this.else = (_a = this.else) === null || _a === void 0 ? void 0 : _a.optimizeNames(names, constants);
        if (!(super.optimizeNames(names, constants) || this.else))
            return;
        this.condition = optimizeExpr(this.condition, names, constants);
        return this;
    }
    get names() {
        const names = super.names;
        addExprNames(names, this.condition);
        if (this.else)
            addNames(names, this.else.names);
        return names;
    }
}
If.kind = "if";
class For extends BlockNode {
}
For.kind = "for";
class ForLoop extends For {
    constructor(iteration) {
        super();
        this.iteration = iteration;
    }
    render(opts) {
        return `for(${this.iteration})` + super.render(opts);
    }
    optimizeNames(names, constants) {
        if (!super.optimizeNames(names, constants))
            return;
        this.iteration = optimizeExpr(this.iteration, names, constants);
        return this;
    }
    get names() {
        return addNames(super.names, this.iteration.names);
    }
}
class ForRange extends For {
    constructor(varKind, name, from, to) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.from = from;
        this.to = to;
    }
    render(opts) {
        const varKind = opts.es5 ? scope_1.varKinds.var : this.varKind;
        const { name, from, to } = this;
        return `for(${varKind} ${name}=${from}; ${name}<${to}; ${name}++)` + super.render(opts);
    }
    get names() {
        const names = addExprNames(super.names, this.from);
        return addExprNames(names, this.to);
    }
}
class ForIter extends For {
    constructor(loop, varKind, name, iterable) {
        super();
        this.loop = loop;
        this.varKind = varKind;
        this.name = name;
        this.iterable = iterable;
    }
    render(opts) {
        return `for(${this.varKind} ${this.name} ${this.loop} ${this.iterable})` + super.render(opts);
    }
    optimizeNames(names, constants) {
        if (!super.optimizeNames(names, constants))
            return;
        this.iterable = optimizeExpr(this.iterable, names, constants);
        return this;
    }
    get names() {
        return addNames(super.names, this.iterable.names);
    }
}
class Func extends BlockNode {
    constructor(name, args, async) {
        super();
        this.name = name;
        this.args = args;
        this.async = async;
    }
    render(opts) {
        const _async = this.async ? "async " : "";
        return `${_async}function ${this.name}(${this.args})` + super.render(opts);
    }
}
Func.kind = "func";
class Return extends ParentNode {
    render(opts) {
        return "return " + super.render(opts);
    }
}
Return.kind = "return";
class Try extends BlockNode {
    render(opts) {
        let code = "try" + super.render(opts);
        if (this.catch)
            code += this.catch.render(opts);
        if (this.finally)
            code += this.finally.render(opts);
        return code;
    }
    optimizeNodes() {
        var _a, _b;
        super.optimizeNodes();
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNodes();
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNodes();
        return this;
    }
    optimizeNames(names, constants) {
        var _a, _b;
        super.optimizeNames(names, constants);
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNames(names, constants);
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNames(names, constants);
        return this;
    }
    get names() {
        const names = super.names;
        if (this.catch)
            addNames(names, this.catch.names);
        if (this.finally)
            addNames(names, this.finally.names);
        return names;
    }
}
class Catch extends BlockNode {
    constructor(error) {
        super();
        this.error = error;
    }
    render(opts) {
        return `catch(${this.error})` + super.render(opts);
    }
}
Catch.kind = "catch";
class Finally extends BlockNode {
    render(opts) {
        return "finally" + super.render(opts);
    }
}
Finally.kind = "finally";
class CodeGen {
    constructor(extScope, opts = {}) {
        this._values = {};
        this._blockStarts = [];
        this._constants = {};
        this.opts = { ...opts, _n: opts.lines ? "\n" : "" };
        this._extScope = extScope;
        this._scope = new scope_1.Scope({ parent: extScope });
        this._nodes = [new Root()];
    }
    toString() {
        return this._root.render(this.opts);
    }
    // returns unique name in the internal scope
    name(prefix) {
        return this._scope.name(prefix);
    }
    // reserves unique name in the external scope
    scopeName(prefix) {
        return this._extScope.name(prefix);
    }
    // reserves unique name in the external scope and assigns value to it
    scopeValue(prefixOrName, value) {
        const name = this._extScope.value(prefixOrName, value);
        const vs = this._values[name.prefix] || (this._values[name.prefix] = new Set());
        vs.add(name);
        return name;
    }
    getScopeValue(prefix, keyOrRef) {
        return this._extScope.getValue(prefix, keyOrRef);
    }
    // return code that assigns values in the external scope to the names that are used internally
    // (same names that were returned by gen.scopeName or gen.scopeValue)
    scopeRefs(scopeName) {
        return this._extScope.scopeRefs(scopeName, this._values);
    }
    scopeCode() {
        return this._extScope.scopeCode(this._values);
    }
    _def(varKind, nameOrPrefix, rhs, constant) {
        const name = this._scope.toName(nameOrPrefix);
        if (rhs !== undefined && constant)
            this._constants[name.str] = rhs;
        this._leafNode(new Def(varKind, name, rhs));
        return name;
    }
    // `const` declaration (`var` in es5 mode)
    const(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.const, nameOrPrefix, rhs, _constant);
    }
    // `let` declaration with optional assignment (`var` in es5 mode)
    let(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.let, nameOrPrefix, rhs, _constant);
    }
    // `var` declaration with optional assignment
    var(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.var, nameOrPrefix, rhs, _constant);
    }
    // assignment code
    assign(lhs, rhs, sideEffects) {
        return this._leafNode(new Assign(lhs, rhs, sideEffects));
    }
    // `+=` code
    add(lhs, rhs) {
        return this._leafNode(new AssignOp(lhs, exports.operators.ADD, rhs));
    }
    // appends passed SafeExpr to code or executes Block
    code(c) {
        if (typeof c == "function")
            c();
        else if (c !== code_1.nil)
            this._leafNode(new AnyCode(c));
        return this;
    }
    // returns code for object literal for the passed argument list of key-value pairs
    object(...keyValues) {
        const code = ["{"];
        for (const [key, value] of keyValues) {
            if (code.length > 1)
                code.push(",");
            code.push(key);
            if (key !== value || this.opts.es5) {
                code.push(":");
                (0, code_1.addCodeArg)(code, value);
            }
        }
        code.push("}");
        return new code_1._Code(code);
    }
    // `if` clause (or statement if `thenBody` and, optionally, `elseBody` are passed)
    if(condition, thenBody, elseBody) {
        this._blockNode(new If(condition));
        if (thenBody && elseBody) {
            this.code(thenBody).else().code(elseBody).endIf();
        }
        else if (thenBody) {
            this.code(thenBody).endIf();
        }
        else if (elseBody) {
            throw new Error('CodeGen: "else" body without "then" body');
        }
        return this;
    }
    // `else if` clause - invalid without `if` or after `else` clauses
    elseIf(condition) {
        return this._elseNode(new If(condition));
    }
    // `else` clause - only valid after `if` or `else if` clauses
    else() {
        return this._elseNode(new Else());
    }
    // end `if` statement (needed if gen.if was used only with condition)
    endIf() {
        return this._endBlockNode(If, Else);
    }
    _for(node, forBody) {
        this._blockNode(node);
        if (forBody)
            this.code(forBody).endFor();
        return this;
    }
    // a generic `for` clause (or statement if `forBody` is passed)
    for(iteration, forBody) {
        return this._for(new ForLoop(iteration), forBody);
    }
    // `for` statement for a range of values
    forRange(nameOrPrefix, from, to, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.let) {
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForRange(varKind, name, from, to), () => forBody(name));
    }
    // `for-of` statement (in es5 mode replace with a normal for loop)
    forOf(nameOrPrefix, iterable, forBody, varKind = scope_1.varKinds.const) {
        const name = this._scope.toName(nameOrPrefix);
        if (this.opts.es5) {
            const arr = iterable instanceof code_1.Name ? iterable : this.var("_arr", iterable);
            return this.forRange("_i", 0, (0, code_1._) `${arr}.length`, (i) => {
                this.var(name, (0, code_1._) `${arr}[${i}]`);
                forBody(name);
            });
        }
        return this._for(new ForIter("of", varKind, name, iterable), () => forBody(name));
    }
    // `for-in` statement.
    // With option `ownProperties` replaced with a `for-of` loop for object keys
    forIn(nameOrPrefix, obj, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.const) {
        if (this.opts.ownProperties) {
            return this.forOf(nameOrPrefix, (0, code_1._) `Object.keys(${obj})`, forBody);
        }
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForIter("in", varKind, name, obj), () => forBody(name));
    }
    // end `for` loop
    endFor() {
        return this._endBlockNode(For);
    }
    // `label` statement
    label(label) {
        return this._leafNode(new Label(label));
    }
    // `break` statement
    break(label) {
        return this._leafNode(new Break(label));
    }
    // `return` statement
    return(value) {
        const node = new Return();
        this._blockNode(node);
        this.code(value);
        if (node.nodes.length !== 1)
            throw new Error('CodeGen: "return" should have one node');
        return this._endBlockNode(Return);
    }
    // `try` statement
    try(tryBody, catchCode, finallyCode) {
        if (!catchCode && !finallyCode)
            throw new Error('CodeGen: "try" without "catch" and "finally"');
        const node = new Try();
        this._blockNode(node);
        this.code(tryBody);
        if (catchCode) {
            const error = this.name("e");
            this._currNode = node.catch = new Catch(error);
            catchCode(error);
        }
        if (finallyCode) {
            this._currNode = node.finally = new Finally();
            this.code(finallyCode);
        }
        return this._endBlockNode(Catch, Finally);
    }
    // `throw` statement
    throw(error) {
        return this._leafNode(new Throw(error));
    }
    // start self-balancing block
    block(body, nodeCount) {
        this._blockStarts.push(this._nodes.length);
        if (body)
            this.code(body).endBlock(nodeCount);
        return this;
    }
    // end the current self-balancing block
    endBlock(nodeCount) {
        const len = this._blockStarts.pop();
        if (len === undefined)
            throw new Error("CodeGen: not in self-balancing block");
        const toClose = this._nodes.length - len;
        if (toClose < 0 || (nodeCount !== undefined && toClose !== nodeCount)) {
            throw new Error(`CodeGen: wrong number of nodes: ${toClose} vs ${nodeCount} expected`);
        }
        this._nodes.length = len;
        return this;
    }
    // `function` heading (or definition if funcBody is passed)
    func(name, args = code_1.nil, async, funcBody) {
        this._blockNode(new Func(name, args, async));
        if (funcBody)
            this.code(funcBody).endFunc();
        return this;
    }
    // end function definition
    endFunc() {
        return this._endBlockNode(Func);
    }
    optimize(n = 1) {
        while (n-- > 0) {
            this._root.optimizeNodes();
            this._root.optimizeNames(this._root.names, this._constants);
        }
    }
    _leafNode(node) {
        this._currNode.nodes.push(node);
        return this;
    }
    _blockNode(node) {
        this._currNode.nodes.push(node);
        this._nodes.push(node);
    }
    _endBlockNode(N1, N2) {
        const n = this._currNode;
        if (n instanceof N1 || (N2 && n instanceof N2)) {
            this._nodes.pop();
            return this;
        }
        throw new Error(`CodeGen: not in block "${N2 ? `${N1.kind}/${N2.kind}` : N1.kind}"`);
    }
    _elseNode(node) {
        const n = this._currNode;
        if (!(n instanceof If)) {
            throw new Error('CodeGen: "else" without "if"');
        }
        this._currNode = n.else = node;
        return this;
    }
    get _root() {
        return this._nodes[0];
    }
    get _currNode() {
        const ns = this._nodes;
        return ns[ns.length - 1];
    }
    set _currNode(node) {
        const ns = this._nodes;
        ns[ns.length - 1] = node;
    }
}
exports.CodeGen = CodeGen;
function addNames(names, from) {
    for (const n in from)
        names[n] = (names[n] || 0) + (from[n] || 0);
    return names;
}
function addExprNames(names, from) {
    return from instanceof code_1._CodeOrName ? addNames(names, from.names) : names;
}
function optimizeExpr(expr, names, constants) {
    if (expr instanceof code_1.Name)
        return replaceName(expr);
    if (!canOptimize(expr))
        return expr;
    return new code_1._Code(expr._items.reduce((items, c) => {
        if (c instanceof code_1.Name)
            c = replaceName(c);
        if (c instanceof code_1._Code)
            items.push(...c._items);
        else
            items.push(c);
        return items;
    }, []));
    function replaceName(n) {
        const c = constants[n.str];
        if (c === undefined || names[n.str] !== 1)
            return n;
        delete names[n.str];
        return c;
    }
    function canOptimize(e) {
        return (e instanceof code_1._Code &&
            e._items.some((c) => c instanceof code_1.Name && names[c.str] === 1 && constants[c.str] !== undefined));
    }
}
function subtractNames(names, from) {
    for (const n in from)
        names[n] = (names[n] || 0) - (from[n] || 0);
}
function not(x) {
    return typeof x == "boolean" || typeof x == "number" || x === null ? !x : (0, code_1._) `!${par(x)}`;
}
exports.not = not;
const andCode = mappend(exports.operators.AND);
// boolean AND (&&) expression with the passed arguments
function and(...args) {
    return args.reduce(andCode);
}
exports.and = and;
const orCode = mappend(exports.operators.OR);
// boolean OR (||) expression with the passed arguments
function or(...args) {
    return args.reduce(orCode);
}
exports.or = or;
function mappend(op) {
    return (x, y) => (x === code_1.nil ? y : y === code_1.nil ? x : (0, code_1._) `${par(x)} ${op} ${par(y)}`);
}
function par(x) {
    return x instanceof code_1.Name ? x : (0, code_1._) `(${x})`;
}
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 7788:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.ValueScope = exports.ValueScopeName = exports.Scope = exports.varKinds = exports.UsedValueState = void 0;
const code_1 = __nccwpck_require__(567);
class ValueError extends Error {
    constructor(name) {
        super(`CodeGen: "code" for ${name} not defined`);
        this.value = name.value;
    }
}
var UsedValueState;
(function (UsedValueState) {
    UsedValueState[UsedValueState["Started"] = 0] = "Started";
    UsedValueState[UsedValueState["Completed"] = 1] = "Completed";
})(UsedValueState || (exports.UsedValueState = UsedValueState = {}));
exports.varKinds = {
    const: new code_1.Name("const"),
    let: new code_1.Name("let"),
    var: new code_1.Name("var"),
};
class Scope {
    constructor({ prefixes, parent } = {}) {
        this._names = {};
        this._prefixes = prefixes;
        this._parent = parent;
    }
    toName(nameOrPrefix) {
        return nameOrPrefix instanceof code_1.Name ? nameOrPrefix : this.name(nameOrPrefix);
    }
    name(prefix) {
        return new code_1.Name(this._newName(prefix));
    }
    _newName(prefix) {
        const ng = this._names[prefix] || this._nameGroup(prefix);
        return `${prefix}${ng.index++}`;
    }
    _nameGroup(prefix) {
        var _a, _b;
        if (((_b = (_a = this._parent) === null || _a === void 0 ? void 0 : _a._prefixes) === null || _b === void 0 ? void 0 : _b.has(prefix)) || (this._prefixes && !this._prefixes.has(prefix))) {
            throw new Error(`CodeGen: prefix "${prefix}" is not allowed in this scope`);
        }
        return (this._names[prefix] = { prefix, index: 0 });
    }
}
exports.Scope = Scope;
class ValueScopeName extends code_1.Name {
    constructor(prefix, nameStr) {
        super(nameStr);
        this.prefix = prefix;
    }
    setValue(value, { property, itemIndex }) {
        this.value = value;
        this.scopePath = (0, code_1._) `.${new code_1.Name(property)}[${itemIndex}]`;
    }
}
exports.ValueScopeName = ValueScopeName;
const line = (0, code_1._) `\n`;
class ValueScope extends Scope {
    constructor(opts) {
        super(opts);
        this._values = {};
        this._scope = opts.scope;
        this.opts = { ...opts, _n: opts.lines ? line : code_1.nil };
    }
    get() {
        return this._scope;
    }
    name(prefix) {
        return new ValueScopeName(prefix, this._newName(prefix));
    }
    value(nameOrPrefix, value) {
        var _a;
        if (value.ref === undefined)
            throw new Error("CodeGen: ref must be passed in value");
        const name = this.toName(nameOrPrefix);
        const { prefix } = name;
        const valueKey = (_a = value.key) !== null && _a !== void 0 ? _a : value.ref;
        let vs = this._values[prefix];
        if (vs) {
            const _name = vs.get(valueKey);
            if (_name)
                return _name;
        }
        else {
            vs = this._values[prefix] = new Map();
        }
        vs.set(valueKey, name);
        const s = this._scope[prefix] || (this._scope[prefix] = []);
        const itemIndex = s.length;
        s[itemIndex] = value.ref;
        name.setValue(value, { property: prefix, itemIndex });
        return name;
    }
    getValue(prefix, keyOrRef) {
        const vs = this._values[prefix];
        if (!vs)
            return;
        return vs.get(keyOrRef);
    }
    scopeRefs(scopeName, values = this._values) {
        return this._reduceValues(values, (name) => {
            if (name.scopePath === undefined)
                throw new Error(`CodeGen: name "${name}" has no value`);
            return (0, code_1._) `${scopeName}${name.scopePath}`;
        });
    }
    scopeCode(values = this._values, usedValues, getCode) {
        return this._reduceValues(values, (name) => {
            if (name.value === undefined)
                throw new Error(`CodeGen: name "${name}" has no value`);
            return name.value.code;
        }, usedValues, getCode);
    }
    _reduceValues(values, valueCode, usedValues = {}, getCode) {
        let code = code_1.nil;
        for (const prefix in values) {
            const vs = values[prefix];
            if (!vs)
                continue;
            const nameSet = (usedValues[prefix] = usedValues[prefix] || new Map());
            vs.forEach((name) => {
                if (nameSet.has(name))
                    return;
                nameSet.set(name, UsedValueState.Started);
                let c = valueCode(name);
                if (c) {
                    const def = this.opts.es5 ? exports.varKinds.var : exports.varKinds.const;
                    code = (0, code_1._) `${code}${def} ${name} = ${c};${this.opts._n}`;
                }
                else if ((c = getCode === null || getCode === void 0 ? void 0 : getCode(name))) {
                    code = (0, code_1._) `${code}${c}${this.opts._n}`;
                }
                else {
                    throw new ValueError(name);
                }
                nameSet.set(name, UsedValueState.Completed);
            });
        }
        return code;
    }
}
exports.ValueScope = ValueScope;
//# sourceMappingURL=scope.js.map

/***/ }),

/***/ 1283:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.extendErrors = exports.resetErrorsCount = exports.reportExtraError = exports.reportError = exports.keyword$DataError = exports.keywordError = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const names_1 = __nccwpck_require__(630);
exports.keywordError = {
    message: ({ keyword }) => (0, codegen_1.str) `must pass "${keyword}" keyword validation`,
};
exports.keyword$DataError = {
    message: ({ keyword, schemaType }) => schemaType
        ? (0, codegen_1.str) `"${keyword}" keyword must be ${schemaType} ($data)`
        : (0, codegen_1.str) `"${keyword}" keyword is invalid ($data)`,
};
function reportError(cxt, error = exports.keywordError, errorPaths, overrideAllErrors) {
    const { it } = cxt;
    const { gen, compositeRule, allErrors } = it;
    const errObj = errorObjectCode(cxt, error, errorPaths);
    if (overrideAllErrors !== null && overrideAllErrors !== void 0 ? overrideAllErrors : (compositeRule || allErrors)) {
        addError(gen, errObj);
    }
    else {
        returnErrors(it, (0, codegen_1._) `[${errObj}]`);
    }
}
exports.reportError = reportError;
function reportExtraError(cxt, error = exports.keywordError, errorPaths) {
    const { it } = cxt;
    const { gen, compositeRule, allErrors } = it;
    const errObj = errorObjectCode(cxt, error, errorPaths);
    addError(gen, errObj);
    if (!(compositeRule || allErrors)) {
        returnErrors(it, names_1.default.vErrors);
    }
}
exports.reportExtraError = reportExtraError;
function resetErrorsCount(gen, errsCount) {
    gen.assign(names_1.default.errors, errsCount);
    gen.if((0, codegen_1._) `${names_1.default.vErrors} !== null`, () => gen.if(errsCount, () => gen.assign((0, codegen_1._) `${names_1.default.vErrors}.length`, errsCount), () => gen.assign(names_1.default.vErrors, null)));
}
exports.resetErrorsCount = resetErrorsCount;
function extendErrors({ gen, keyword, schemaValue, data, errsCount, it, }) {
    /* istanbul ignore if */
    if (errsCount === undefined)
        throw new Error("ajv implementation error");
    const err = gen.name("err");
    gen.forRange("i", errsCount, names_1.default.errors, (i) => {
        gen.const(err, (0, codegen_1._) `${names_1.default.vErrors}[${i}]`);
        gen.if((0, codegen_1._) `${err}.instancePath === undefined`, () => gen.assign((0, codegen_1._) `${err}.instancePath`, (0, codegen_1.strConcat)(names_1.default.instancePath, it.errorPath)));
        gen.assign((0, codegen_1._) `${err}.schemaPath`, (0, codegen_1.str) `${it.errSchemaPath}/${keyword}`);
        if (it.opts.verbose) {
            gen.assign((0, codegen_1._) `${err}.schema`, schemaValue);
            gen.assign((0, codegen_1._) `${err}.data`, data);
        }
    });
}
exports.extendErrors = extendErrors;
function addError(gen, errObj) {
    const err = gen.const("err", errObj);
    gen.if((0, codegen_1._) `${names_1.default.vErrors} === null`, () => gen.assign(names_1.default.vErrors, (0, codegen_1._) `[${err}]`), (0, codegen_1._) `${names_1.default.vErrors}.push(${err})`);
    gen.code((0, codegen_1._) `${names_1.default.errors}++`);
}
function returnErrors(it, errs) {
    const { gen, validateName, schemaEnv } = it;
    if (schemaEnv.$async) {
        gen.throw((0, codegen_1._) `new ${it.ValidationError}(${errs})`);
    }
    else {
        gen.assign((0, codegen_1._) `${validateName}.errors`, errs);
        gen.return(false);
    }
}
const E = {
    keyword: new codegen_1.Name("keyword"),
    schemaPath: new codegen_1.Name("schemaPath"), // also used in JTD errors
    params: new codegen_1.Name("params"),
    propertyName: new codegen_1.Name("propertyName"),
    message: new codegen_1.Name("message"),
    schema: new codegen_1.Name("schema"),
    parentSchema: new codegen_1.Name("parentSchema"),
};
function errorObjectCode(cxt, error, errorPaths) {
    const { createErrors } = cxt.it;
    if (createErrors === false)
        return (0, codegen_1._) `{}`;
    return errorObject(cxt, error, errorPaths);
}
function errorObject(cxt, error, errorPaths = {}) {
    const { gen, it } = cxt;
    const keyValues = [
        errorInstancePath(it, errorPaths),
        errorSchemaPath(cxt, errorPaths),
    ];
    extraErrorProps(cxt, error, keyValues);
    return gen.object(...keyValues);
}
function errorInstancePath({ errorPath }, { instancePath }) {
    const instPath = instancePath
        ? (0, codegen_1.str) `${errorPath}${(0, util_1.getErrorPath)(instancePath, util_1.Type.Str)}`
        : errorPath;
    return [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, instPath)];
}
function errorSchemaPath({ keyword, it: { errSchemaPath } }, { schemaPath, parentSchema }) {
    let schPath = parentSchema ? errSchemaPath : (0, codegen_1.str) `${errSchemaPath}/${keyword}`;
    if (schemaPath) {
        schPath = (0, codegen_1.str) `${schPath}${(0, util_1.getErrorPath)(schemaPath, util_1.Type.Str)}`;
    }
    return [E.schemaPath, schPath];
}
function extraErrorProps(cxt, { params, message }, keyValues) {
    const { keyword, data, schemaValue, it } = cxt;
    const { opts, propertyName, topSchemaRef, schemaPath } = it;
    keyValues.push([E.keyword, keyword], [E.params, typeof params == "function" ? params(cxt) : params || (0, codegen_1._) `{}`]);
    if (opts.messages) {
        keyValues.push([E.message, typeof message == "function" ? message(cxt) : message]);
    }
    if (opts.verbose) {
        keyValues.push([E.schema, schemaValue], [E.parentSchema, (0, codegen_1._) `${topSchemaRef}${schemaPath}`], [names_1.default.data, data]);
    }
    if (propertyName)
        keyValues.push([E.propertyName, propertyName]);
}
//# sourceMappingURL=errors.js.map

/***/ }),

/***/ 2718:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.resolveSchema = exports.getCompilingSchema = exports.resolveRef = exports.compileSchema = exports.SchemaEnv = void 0;
const codegen_1 = __nccwpck_require__(1436);
const validation_error_1 = __nccwpck_require__(3021);
const names_1 = __nccwpck_require__(630);
const resolve_1 = __nccwpck_require__(4090);
const util_1 = __nccwpck_require__(4464);
const validate_1 = __nccwpck_require__(7881);
class SchemaEnv {
    constructor(env) {
        var _a;
        this.refs = {};
        this.dynamicAnchors = {};
        let schema;
        if (typeof env.schema == "object")
            schema = env.schema;
        this.schema = env.schema;
        this.schemaId = env.schemaId;
        this.root = env.root || this;
        this.baseId = (_a = env.baseId) !== null && _a !== void 0 ? _a : (0, resolve_1.normalizeId)(schema === null || schema === void 0 ? void 0 : schema[env.schemaId || "$id"]);
        this.schemaPath = env.schemaPath;
        this.localRefs = env.localRefs;
        this.meta = env.meta;
        this.$async = schema === null || schema === void 0 ? void 0 : schema.$async;
        this.refs = {};
    }
}
exports.SchemaEnv = SchemaEnv;
// let codeSize = 0
// let nodeCount = 0
// Compiles schema in SchemaEnv
function compileSchema(sch) {
    // TODO refactor - remove compilations
    const _sch = getCompilingSchema.call(this, sch);
    if (_sch)
        return _sch;
    const rootId = (0, resolve_1.getFullPath)(this.opts.uriResolver, sch.root.baseId); // TODO if getFullPath removed 1 tests fails
    const { es5, lines } = this.opts.code;
    const { ownProperties } = this.opts;
    const gen = new codegen_1.CodeGen(this.scope, { es5, lines, ownProperties });
    let _ValidationError;
    if (sch.$async) {
        _ValidationError = gen.scopeValue("Error", {
            ref: validation_error_1.default,
            code: (0, codegen_1._) `require("ajv/dist/runtime/validation_error").default`,
        });
    }
    const validateName = gen.scopeName("validate");
    sch.validateName = validateName;
    const schemaCxt = {
        gen,
        allErrors: this.opts.allErrors,
        data: names_1.default.data,
        parentData: names_1.default.parentData,
        parentDataProperty: names_1.default.parentDataProperty,
        dataNames: [names_1.default.data],
        dataPathArr: [codegen_1.nil], // TODO can its length be used as dataLevel if nil is removed?
        dataLevel: 0,
        dataTypes: [],
        definedProperties: new Set(),
        topSchemaRef: gen.scopeValue("schema", this.opts.code.source === true
            ? { ref: sch.schema, code: (0, codegen_1.stringify)(sch.schema) }
            : { ref: sch.schema }),
        validateName,
        ValidationError: _ValidationError,
        schema: sch.schema,
        schemaEnv: sch,
        rootId,
        baseId: sch.baseId || rootId,
        schemaPath: codegen_1.nil,
        errSchemaPath: sch.schemaPath || (this.opts.jtd ? "" : "#"),
        errorPath: (0, codegen_1._) `""`,
        opts: this.opts,
        self: this,
    };
    let sourceCode;
    try {
        this._compilations.add(sch);
        (0, validate_1.validateFunctionCode)(schemaCxt);
        gen.optimize(this.opts.code.optimize);
        // gen.optimize(1)
        const validateCode = gen.toString();
        sourceCode = `${gen.scopeRefs(names_1.default.scope)}return ${validateCode}`;
        // console.log((codeSize += sourceCode.length), (nodeCount += gen.nodeCount))
        if (this.opts.code.process)
            sourceCode = this.opts.code.process(sourceCode, sch);
        // console.log("\n\n\n *** \n", sourceCode)
        const makeValidate = new Function(`${names_1.default.self}`, `${names_1.default.scope}`, sourceCode);
        const validate = makeValidate(this, this.scope.get());
        this.scope.value(validateName, { ref: validate });
        validate.errors = null;
        validate.schema = sch.schema;
        validate.schemaEnv = sch;
        if (sch.$async)
            validate.$async = true;
        if (this.opts.code.source === true) {
            validate.source = { validateName, validateCode, scopeValues: gen._values };
        }
        if (this.opts.unevaluated) {
            const { props, items } = schemaCxt;
            validate.evaluated = {
                props: props instanceof codegen_1.Name ? undefined : props,
                items: items instanceof codegen_1.Name ? undefined : items,
                dynamicProps: props instanceof codegen_1.Name,
                dynamicItems: items instanceof codegen_1.Name,
            };
            if (validate.source)
                validate.source.evaluated = (0, codegen_1.stringify)(validate.evaluated);
        }
        sch.validate = validate;
        return sch;
    }
    catch (e) {
        delete sch.validate;
        delete sch.validateName;
        if (sourceCode)
            this.logger.error("Error compiling schema, function code:", sourceCode);
        // console.log("\n\n\n *** \n", sourceCode, this.opts)
        throw e;
    }
    finally {
        this._compilations.delete(sch);
    }
}
exports.compileSchema = compileSchema;
function resolveRef(root, baseId, ref) {
    var _a;
    ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, ref);
    const schOrFunc = root.refs[ref];
    if (schOrFunc)
        return schOrFunc;
    let _sch = resolve.call(this, root, ref);
    if (_sch === undefined) {
        const schema = (_a = root.localRefs) === null || _a === void 0 ? void 0 : _a[ref]; // TODO maybe localRefs should hold SchemaEnv
        const { schemaId } = this.opts;
        if (schema)
            _sch = new SchemaEnv({ schema, schemaId, root, baseId });
    }
    if (_sch === undefined)
        return;
    return (root.refs[ref] = inlineOrCompile.call(this, _sch));
}
exports.resolveRef = resolveRef;
function inlineOrCompile(sch) {
    if ((0, resolve_1.inlineRef)(sch.schema, this.opts.inlineRefs))
        return sch.schema;
    return sch.validate ? sch : compileSchema.call(this, sch);
}
// Index of schema compilation in the currently compiled list
function getCompilingSchema(schEnv) {
    for (const sch of this._compilations) {
        if (sameSchemaEnv(sch, schEnv))
            return sch;
    }
}
exports.getCompilingSchema = getCompilingSchema;
function sameSchemaEnv(s1, s2) {
    return s1.schema === s2.schema && s1.root === s2.root && s1.baseId === s2.baseId;
}
// resolve and compile the references ($ref)
// TODO returns AnySchemaObject (if the schema can be inlined) or validation function
function resolve(root, // information about the root schema for the current schema
ref // reference to resolve
) {
    let sch;
    while (typeof (sch = this.refs[ref]) == "string")
        ref = sch;
    return sch || this.schemas[ref] || resolveSchema.call(this, root, ref);
}
// Resolve schema, its root and baseId
function resolveSchema(root, // root object with properties schema, refs TODO below SchemaEnv is assigned to it
ref // reference to resolve
) {
    const p = this.opts.uriResolver.parse(ref);
    const refPath = (0, resolve_1._getFullPath)(this.opts.uriResolver, p);
    let baseId = (0, resolve_1.getFullPath)(this.opts.uriResolver, root.baseId, undefined);
    // TODO `Object.keys(root.schema).length > 0` should not be needed - but removing breaks 2 tests
    if (Object.keys(root.schema).length > 0 && refPath === baseId) {
        return getJsonPointer.call(this, p, root);
    }
    const id = (0, resolve_1.normalizeId)(refPath);
    const schOrRef = this.refs[id] || this.schemas[id];
    if (typeof schOrRef == "string") {
        const sch = resolveSchema.call(this, root, schOrRef);
        if (typeof (sch === null || sch === void 0 ? void 0 : sch.schema) !== "object")
            return;
        return getJsonPointer.call(this, p, sch);
    }
    if (typeof (schOrRef === null || schOrRef === void 0 ? void 0 : schOrRef.schema) !== "object")
        return;
    if (!schOrRef.validate)
        compileSchema.call(this, schOrRef);
    if (id === (0, resolve_1.normalizeId)(ref)) {
        const { schema } = schOrRef;
        const { schemaId } = this.opts;
        const schId = schema[schemaId];
        if (schId)
            baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        return new SchemaEnv({ schema, schemaId, root, baseId });
    }
    return getJsonPointer.call(this, p, schOrRef);
}
exports.resolveSchema = resolveSchema;
const PREVENT_SCOPE_CHANGE = new Set([
    "properties",
    "patternProperties",
    "enum",
    "dependencies",
    "definitions",
]);
function getJsonPointer(parsedRef, { baseId, schema, root }) {
    var _a;
    if (((_a = parsedRef.fragment) === null || _a === void 0 ? void 0 : _a[0]) !== "/")
        return;
    for (const part of parsedRef.fragment.slice(1).split("/")) {
        if (typeof schema === "boolean")
            return;
        const partSchema = schema[(0, util_1.unescapeFragment)(part)];
        if (partSchema === undefined)
            return;
        schema = partSchema;
        // TODO PREVENT_SCOPE_CHANGE could be defined in keyword def?
        const schId = typeof schema === "object" && schema[this.opts.schemaId];
        if (!PREVENT_SCOPE_CHANGE.has(part) && schId) {
            baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        }
    }
    let env;
    if (typeof schema != "boolean" && schema.$ref && !(0, util_1.schemaHasRulesButRef)(schema, this.RULES)) {
        const $ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schema.$ref);
        env = resolveSchema.call(this, root, $ref);
    }
    // even though resolution failed we need to return SchemaEnv to throw exception
    // so that compileAsync loads missing schema.
    const { schemaId } = this.opts;
    env = env || new SchemaEnv({ schema, schemaId, root, baseId });
    if (env.schema !== env.root.schema)
        return env;
    return undefined;
}
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 630:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const names = {
    // validation function arguments
    data: new codegen_1.Name("data"), // data passed to validation function
    // args passed from referencing schema
    valCxt: new codegen_1.Name("valCxt"), // validation/data context - should not be used directly, it is destructured to the names below
    instancePath: new codegen_1.Name("instancePath"),
    parentData: new codegen_1.Name("parentData"),
    parentDataProperty: new codegen_1.Name("parentDataProperty"),
    rootData: new codegen_1.Name("rootData"), // root data - same as the data passed to the first/top validation function
    dynamicAnchors: new codegen_1.Name("dynamicAnchors"), // used to support recursiveRef and dynamicRef
    // function scoped variables
    vErrors: new codegen_1.Name("vErrors"), // null or array of validation errors
    errors: new codegen_1.Name("errors"), // counter of validation errors
    this: new codegen_1.Name("this"),
    // "globals"
    self: new codegen_1.Name("self"),
    scope: new codegen_1.Name("scope"),
    // JTD serialize/parse name for JSON string and position
    json: new codegen_1.Name("json"),
    jsonPos: new codegen_1.Name("jsonPos"),
    jsonLen: new codegen_1.Name("jsonLen"),
    jsonPart: new codegen_1.Name("jsonPart"),
};
exports["default"] = names;
//# sourceMappingURL=names.js.map

/***/ }),

/***/ 3162:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const resolve_1 = __nccwpck_require__(4090);
class MissingRefError extends Error {
    constructor(resolver, baseId, ref, msg) {
        super(msg || `can't resolve reference ${ref} from id ${baseId}`);
        this.missingRef = (0, resolve_1.resolveUrl)(resolver, baseId, ref);
        this.missingSchema = (0, resolve_1.normalizeId)((0, resolve_1.getFullPath)(resolver, this.missingRef));
    }
}
exports["default"] = MissingRefError;
//# sourceMappingURL=ref_error.js.map

/***/ }),

/***/ 4090:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.getSchemaRefs = exports.resolveUrl = exports.normalizeId = exports._getFullPath = exports.getFullPath = exports.inlineRef = void 0;
const util_1 = __nccwpck_require__(4464);
const equal = __nccwpck_require__(3430);
const traverse = __nccwpck_require__(1167);
// TODO refactor to use keyword definitions
const SIMPLE_INLINED = new Set([
    "type",
    "format",
    "pattern",
    "maxLength",
    "minLength",
    "maxProperties",
    "minProperties",
    "maxItems",
    "minItems",
    "maximum",
    "minimum",
    "uniqueItems",
    "multipleOf",
    "required",
    "enum",
    "const",
]);
function inlineRef(schema, limit = true) {
    if (typeof schema == "boolean")
        return true;
    if (limit === true)
        return !hasRef(schema);
    if (!limit)
        return false;
    return countKeys(schema) <= limit;
}
exports.inlineRef = inlineRef;
const REF_KEYWORDS = new Set([
    "$ref",
    "$recursiveRef",
    "$recursiveAnchor",
    "$dynamicRef",
    "$dynamicAnchor",
]);
function hasRef(schema) {
    for (const key in schema) {
        if (REF_KEYWORDS.has(key))
            return true;
        const sch = schema[key];
        if (Array.isArray(sch) && sch.some(hasRef))
            return true;
        if (typeof sch == "object" && hasRef(sch))
            return true;
    }
    return false;
}
function countKeys(schema) {
    let count = 0;
    for (const key in schema) {
        if (key === "$ref")
            return Infinity;
        count++;
        if (SIMPLE_INLINED.has(key))
            continue;
        if (typeof schema[key] == "object") {
            (0, util_1.eachItem)(schema[key], (sch) => (count += countKeys(sch)));
        }
        if (count === Infinity)
            return Infinity;
    }
    return count;
}
function getFullPath(resolver, id = "", normalize) {
    if (normalize !== false)
        id = normalizeId(id);
    const p = resolver.parse(id);
    return _getFullPath(resolver, p);
}
exports.getFullPath = getFullPath;
function _getFullPath(resolver, p) {
    const serialized = resolver.serialize(p);
    return serialized.split("#")[0] + "#";
}
exports._getFullPath = _getFullPath;
const TRAILING_SLASH_HASH = /#\/?$/;
function normalizeId(id) {
    return id ? id.replace(TRAILING_SLASH_HASH, "") : "";
}
exports.normalizeId = normalizeId;
function resolveUrl(resolver, baseId, id) {
    id = normalizeId(id);
    return resolver.resolve(baseId, id);
}
exports.resolveUrl = resolveUrl;
const ANCHOR = /^[a-z_][-a-z0-9._]*$/i;
function getSchemaRefs(schema, baseId) {
    if (typeof schema == "boolean")
        return {};
    const { schemaId, uriResolver } = this.opts;
    const schId = normalizeId(schema[schemaId] || baseId);
    const baseIds = { "": schId };
    const pathPrefix = getFullPath(uriResolver, schId, false);
    const localRefs = {};
    const schemaRefs = new Set();
    traverse(schema, { allKeys: true }, (sch, jsonPtr, _, parentJsonPtr) => {
        if (parentJsonPtr === undefined)
            return;
        const fullPath = pathPrefix + jsonPtr;
        let innerBaseId = baseIds[parentJsonPtr];
        if (typeof sch[schemaId] == "string")
            innerBaseId = addRef.call(this, sch[schemaId]);
        addAnchor.call(this, sch.$anchor);
        addAnchor.call(this, sch.$dynamicAnchor);
        baseIds[jsonPtr] = innerBaseId;
        function addRef(ref) {
            // eslint-disable-next-line @typescript-eslint/unbound-method
            const _resolve = this.opts.uriResolver.resolve;
            ref = normalizeId(innerBaseId ? _resolve(innerBaseId, ref) : ref);
            if (schemaRefs.has(ref))
                throw ambiguos(ref);
            schemaRefs.add(ref);
            let schOrRef = this.refs[ref];
            if (typeof schOrRef == "string")
                schOrRef = this.refs[schOrRef];
            if (typeof schOrRef == "object") {
                checkAmbiguosRef(sch, schOrRef.schema, ref);
            }
            else if (ref !== normalizeId(fullPath)) {
                if (ref[0] === "#") {
                    checkAmbiguosRef(sch, localRefs[ref], ref);
                    localRefs[ref] = sch;
                }
                else {
                    this.refs[ref] = fullPath;
                }
            }
            return ref;
        }
        function addAnchor(anchor) {
            if (typeof anchor == "string") {
                if (!ANCHOR.test(anchor))
                    throw new Error(`invalid anchor "${anchor}"`);
                addRef.call(this, `#${anchor}`);
            }
        }
    });
    return localRefs;
    function checkAmbiguosRef(sch1, sch2, ref) {
        if (sch2 !== undefined && !equal(sch1, sch2))
            throw ambiguos(ref);
    }
    function ambiguos(ref) {
        return new Error(`reference "${ref}" resolves to more than one schema`);
    }
}
exports.getSchemaRefs = getSchemaRefs;
//# sourceMappingURL=resolve.js.map

/***/ }),

/***/ 7353:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.getRules = exports.isJSONType = void 0;
const _jsonTypes = ["string", "number", "integer", "boolean", "null", "object", "array"];
const jsonTypes = new Set(_jsonTypes);
function isJSONType(x) {
    return typeof x == "string" && jsonTypes.has(x);
}
exports.isJSONType = isJSONType;
function getRules() {
    const groups = {
        number: { type: "number", rules: [] },
        string: { type: "string", rules: [] },
        array: { type: "array", rules: [] },
        object: { type: "object", rules: [] },
    };
    return {
        types: { ...groups, integer: true, boolean: true, null: true },
        rules: [{ rules: [] }, groups.number, groups.string, groups.array, groups.object],
        post: { rules: [] },
        all: {},
        keywords: {},
    };
}
exports.getRules = getRules;
//# sourceMappingURL=rules.js.map

/***/ }),

/***/ 4464:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.checkStrictMode = exports.getErrorPath = exports.Type = exports.useFunc = exports.setEvaluated = exports.evaluatedPropsToName = exports.mergeEvaluated = exports.eachItem = exports.unescapeJsonPointer = exports.escapeJsonPointer = exports.escapeFragment = exports.unescapeFragment = exports.schemaRefOrVal = exports.schemaHasRulesButRef = exports.schemaHasRules = exports.checkUnknownRules = exports.alwaysValidSchema = exports.toHash = void 0;
const codegen_1 = __nccwpck_require__(1436);
const code_1 = __nccwpck_require__(567);
// TODO refactor to use Set
function toHash(arr) {
    const hash = {};
    for (const item of arr)
        hash[item] = true;
    return hash;
}
exports.toHash = toHash;
function alwaysValidSchema(it, schema) {
    if (typeof schema == "boolean")
        return schema;
    if (Object.keys(schema).length === 0)
        return true;
    checkUnknownRules(it, schema);
    return !schemaHasRules(schema, it.self.RULES.all);
}
exports.alwaysValidSchema = alwaysValidSchema;
function checkUnknownRules(it, schema = it.schema) {
    const { opts, self } = it;
    if (!opts.strictSchema)
        return;
    if (typeof schema === "boolean")
        return;
    const rules = self.RULES.keywords;
    for (const key in schema) {
        if (!rules[key])
            checkStrictMode(it, `unknown keyword: "${key}"`);
    }
}
exports.checkUnknownRules = checkUnknownRules;
function schemaHasRules(schema, rules) {
    if (typeof schema == "boolean")
        return !schema;
    for (const key in schema)
        if (rules[key])
            return true;
    return false;
}
exports.schemaHasRules = schemaHasRules;
function schemaHasRulesButRef(schema, RULES) {
    if (typeof schema == "boolean")
        return !schema;
    for (const key in schema)
        if (key !== "$ref" && RULES.all[key])
            return true;
    return false;
}
exports.schemaHasRulesButRef = schemaHasRulesButRef;
function schemaRefOrVal({ topSchemaRef, schemaPath }, schema, keyword, $data) {
    if (!$data) {
        if (typeof schema == "number" || typeof schema == "boolean")
            return schema;
        if (typeof schema == "string")
            return (0, codegen_1._) `${schema}`;
    }
    return (0, codegen_1._) `${topSchemaRef}${schemaPath}${(0, codegen_1.getProperty)(keyword)}`;
}
exports.schemaRefOrVal = schemaRefOrVal;
function unescapeFragment(str) {
    return unescapeJsonPointer(decodeURIComponent(str));
}
exports.unescapeFragment = unescapeFragment;
function escapeFragment(str) {
    return encodeURIComponent(escapeJsonPointer(str));
}
exports.escapeFragment = escapeFragment;
function escapeJsonPointer(str) {
    if (typeof str == "number")
        return `${str}`;
    return str.replace(/~/g, "~0").replace(/\//g, "~1");
}
exports.escapeJsonPointer = escapeJsonPointer;
function unescapeJsonPointer(str) {
    return str.replace(/~1/g, "/").replace(/~0/g, "~");
}
exports.unescapeJsonPointer = unescapeJsonPointer;
function eachItem(xs, f) {
    if (Array.isArray(xs)) {
        for (const x of xs)
            f(x);
    }
    else {
        f(xs);
    }
}
exports.eachItem = eachItem;
function makeMergeEvaluated({ mergeNames, mergeToName, mergeValues, resultToName, }) {
    return (gen, from, to, toName) => {
        const res = to === undefined
            ? from
            : to instanceof codegen_1.Name
                ? (from instanceof codegen_1.Name ? mergeNames(gen, from, to) : mergeToName(gen, from, to), to)
                : from instanceof codegen_1.Name
                    ? (mergeToName(gen, to, from), from)
                    : mergeValues(from, to);
        return toName === codegen_1.Name && !(res instanceof codegen_1.Name) ? resultToName(gen, res) : res;
    };
}
exports.mergeEvaluated = {
    props: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true && ${from} !== undefined`, () => {
            gen.if((0, codegen_1._) `${from} === true`, () => gen.assign(to, true), () => gen.assign(to, (0, codegen_1._) `${to} || {}`).code((0, codegen_1._) `Object.assign(${to}, ${from})`));
        }),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true`, () => {
            if (from === true) {
                gen.assign(to, true);
            }
            else {
                gen.assign(to, (0, codegen_1._) `${to} || {}`);
                setEvaluated(gen, to, from);
            }
        }),
        mergeValues: (from, to) => (from === true ? true : { ...from, ...to }),
        resultToName: evaluatedPropsToName,
    }),
    items: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true && ${from} !== undefined`, () => gen.assign(to, (0, codegen_1._) `${from} === true ? true : ${to} > ${from} ? ${to} : ${from}`)),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._) `${to} !== true`, () => gen.assign(to, from === true ? true : (0, codegen_1._) `${to} > ${from} ? ${to} : ${from}`)),
        mergeValues: (from, to) => (from === true ? true : Math.max(from, to)),
        resultToName: (gen, items) => gen.var("items", items),
    }),
};
function evaluatedPropsToName(gen, ps) {
    if (ps === true)
        return gen.var("props", true);
    const props = gen.var("props", (0, codegen_1._) `{}`);
    if (ps !== undefined)
        setEvaluated(gen, props, ps);
    return props;
}
exports.evaluatedPropsToName = evaluatedPropsToName;
function setEvaluated(gen, props, ps) {
    Object.keys(ps).forEach((p) => gen.assign((0, codegen_1._) `${props}${(0, codegen_1.getProperty)(p)}`, true));
}
exports.setEvaluated = setEvaluated;
const snippets = {};
function useFunc(gen, f) {
    return gen.scopeValue("func", {
        ref: f,
        code: snippets[f.code] || (snippets[f.code] = new code_1._Code(f.code)),
    });
}
exports.useFunc = useFunc;
var Type;
(function (Type) {
    Type[Type["Num"] = 0] = "Num";
    Type[Type["Str"] = 1] = "Str";
})(Type || (exports.Type = Type = {}));
function getErrorPath(dataProp, dataPropType, jsPropertySyntax) {
    // let path
    if (dataProp instanceof codegen_1.Name) {
        const isNumber = dataPropType === Type.Num;
        return jsPropertySyntax
            ? isNumber
                ? (0, codegen_1._) `"[" + ${dataProp} + "]"`
                : (0, codegen_1._) `"['" + ${dataProp} + "']"`
            : isNumber
                ? (0, codegen_1._) `"/" + ${dataProp}`
                : (0, codegen_1._) `"/" + ${dataProp}.replace(/~/g, "~0").replace(/\\//g, "~1")`; // TODO maybe use global escapePointer
    }
    return jsPropertySyntax ? (0, codegen_1.getProperty)(dataProp).toString() : "/" + escapeJsonPointer(dataProp);
}
exports.getErrorPath = getErrorPath;
function checkStrictMode(it, msg, mode = it.opts.strictSchema) {
    if (!mode)
        return;
    msg = `strict mode: ${msg}`;
    if (mode === true)
        throw new Error(msg);
    it.self.logger.warn(msg);
}
exports.checkStrictMode = checkStrictMode;
//# sourceMappingURL=util.js.map

/***/ }),

/***/ 7692:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.shouldUseRule = exports.shouldUseGroup = exports.schemaHasRulesForType = void 0;
function schemaHasRulesForType({ schema, self }, type) {
    const group = self.RULES.types[type];
    return group && group !== true && shouldUseGroup(schema, group);
}
exports.schemaHasRulesForType = schemaHasRulesForType;
function shouldUseGroup(schema, group) {
    return group.rules.some((rule) => shouldUseRule(schema, rule));
}
exports.shouldUseGroup = shouldUseGroup;
function shouldUseRule(schema, rule) {
    var _a;
    return (schema[rule.keyword] !== undefined ||
        ((_a = rule.definition.implements) === null || _a === void 0 ? void 0 : _a.some((kwd) => schema[kwd] !== undefined)));
}
exports.shouldUseRule = shouldUseRule;
//# sourceMappingURL=applicability.js.map

/***/ }),

/***/ 5346:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.boolOrEmptySchema = exports.topBoolOrEmptySchema = void 0;
const errors_1 = __nccwpck_require__(1283);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const boolError = {
    message: "boolean schema is false",
};
function topBoolOrEmptySchema(it) {
    const { gen, schema, validateName } = it;
    if (schema === false) {
        falseSchemaError(it, false);
    }
    else if (typeof schema == "object" && schema.$async === true) {
        gen.return(names_1.default.data);
    }
    else {
        gen.assign((0, codegen_1._) `${validateName}.errors`, null);
        gen.return(true);
    }
}
exports.topBoolOrEmptySchema = topBoolOrEmptySchema;
function boolOrEmptySchema(it, valid) {
    const { gen, schema } = it;
    if (schema === false) {
        gen.var(valid, false); // TODO var
        falseSchemaError(it);
    }
    else {
        gen.var(valid, true); // TODO var
    }
}
exports.boolOrEmptySchema = boolOrEmptySchema;
function falseSchemaError(it, overrideAllErrors) {
    const { gen, data } = it;
    // TODO maybe some other interface should be used for non-keyword validation errors...
    const cxt = {
        gen,
        keyword: "false schema",
        data,
        schema: false,
        schemaCode: false,
        schemaValue: false,
        params: {},
        it,
    };
    (0, errors_1.reportError)(cxt, boolError, undefined, overrideAllErrors);
}
//# sourceMappingURL=boolSchema.js.map

/***/ }),

/***/ 6685:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.reportTypeError = exports.checkDataTypes = exports.checkDataType = exports.coerceAndCheckDataType = exports.getJSONTypes = exports.getSchemaTypes = exports.DataType = void 0;
const rules_1 = __nccwpck_require__(7353);
const applicability_1 = __nccwpck_require__(7692);
const errors_1 = __nccwpck_require__(1283);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
var DataType;
(function (DataType) {
    DataType[DataType["Correct"] = 0] = "Correct";
    DataType[DataType["Wrong"] = 1] = "Wrong";
})(DataType || (exports.DataType = DataType = {}));
function getSchemaTypes(schema) {
    const types = getJSONTypes(schema.type);
    const hasNull = types.includes("null");
    if (hasNull) {
        if (schema.nullable === false)
            throw new Error("type: null contradicts nullable: false");
    }
    else {
        if (!types.length && schema.nullable !== undefined) {
            throw new Error('"nullable" cannot be used without "type"');
        }
        if (schema.nullable === true)
            types.push("null");
    }
    return types;
}
exports.getSchemaTypes = getSchemaTypes;
// eslint-disable-next-line @typescript-eslint/no-redundant-type-constituents
function getJSONTypes(ts) {
    const types = Array.isArray(ts) ? ts : ts ? [ts] : [];
    if (types.every(rules_1.isJSONType))
        return types;
    throw new Error("type must be JSONType or JSONType[]: " + types.join(","));
}
exports.getJSONTypes = getJSONTypes;
function coerceAndCheckDataType(it, types) {
    const { gen, data, opts } = it;
    const coerceTo = coerceToTypes(types, opts.coerceTypes);
    const checkTypes = types.length > 0 &&
        !(coerceTo.length === 0 && types.length === 1 && (0, applicability_1.schemaHasRulesForType)(it, types[0]));
    if (checkTypes) {
        const wrongType = checkDataTypes(types, data, opts.strictNumbers, DataType.Wrong);
        gen.if(wrongType, () => {
            if (coerceTo.length)
                coerceData(it, types, coerceTo);
            else
                reportTypeError(it);
        });
    }
    return checkTypes;
}
exports.coerceAndCheckDataType = coerceAndCheckDataType;
const COERCIBLE = new Set(["string", "number", "integer", "boolean", "null"]);
function coerceToTypes(types, coerceTypes) {
    return coerceTypes
        ? types.filter((t) => COERCIBLE.has(t) || (coerceTypes === "array" && t === "array"))
        : [];
}
function coerceData(it, types, coerceTo) {
    const { gen, data, opts } = it;
    const dataType = gen.let("dataType", (0, codegen_1._) `typeof ${data}`);
    const coerced = gen.let("coerced", (0, codegen_1._) `undefined`);
    if (opts.coerceTypes === "array") {
        gen.if((0, codegen_1._) `${dataType} == 'object' && Array.isArray(${data}) && ${data}.length == 1`, () => gen
            .assign(data, (0, codegen_1._) `${data}[0]`)
            .assign(dataType, (0, codegen_1._) `typeof ${data}`)
            .if(checkDataTypes(types, data, opts.strictNumbers), () => gen.assign(coerced, data)));
    }
    gen.if((0, codegen_1._) `${coerced} !== undefined`);
    for (const t of coerceTo) {
        if (COERCIBLE.has(t) || (t === "array" && opts.coerceTypes === "array")) {
            coerceSpecificType(t);
        }
    }
    gen.else();
    reportTypeError(it);
    gen.endIf();
    gen.if((0, codegen_1._) `${coerced} !== undefined`, () => {
        gen.assign(data, coerced);
        assignParentData(it, coerced);
    });
    function coerceSpecificType(t) {
        switch (t) {
            case "string":
                gen
                    .elseIf((0, codegen_1._) `${dataType} == "number" || ${dataType} == "boolean"`)
                    .assign(coerced, (0, codegen_1._) `"" + ${data}`)
                    .elseIf((0, codegen_1._) `${data} === null`)
                    .assign(coerced, (0, codegen_1._) `""`);
                return;
            case "number":
                gen
                    .elseIf((0, codegen_1._) `${dataType} == "boolean" || ${data} === null
              || (${dataType} == "string" && ${data} && ${data} == +${data})`)
                    .assign(coerced, (0, codegen_1._) `+${data}`);
                return;
            case "integer":
                gen
                    .elseIf((0, codegen_1._) `${dataType} === "boolean" || ${data} === null
              || (${dataType} === "string" && ${data} && ${data} == +${data} && !(${data} % 1))`)
                    .assign(coerced, (0, codegen_1._) `+${data}`);
                return;
            case "boolean":
                gen
                    .elseIf((0, codegen_1._) `${data} === "false" || ${data} === 0 || ${data} === null`)
                    .assign(coerced, false)
                    .elseIf((0, codegen_1._) `${data} === "true" || ${data} === 1`)
                    .assign(coerced, true);
                return;
            case "null":
                gen.elseIf((0, codegen_1._) `${data} === "" || ${data} === 0 || ${data} === false`);
                gen.assign(coerced, null);
                return;
            case "array":
                gen
                    .elseIf((0, codegen_1._) `${dataType} === "string" || ${dataType} === "number"
              || ${dataType} === "boolean" || ${data} === null`)
                    .assign(coerced, (0, codegen_1._) `[${data}]`);
        }
    }
}
function assignParentData({ gen, parentData, parentDataProperty }, expr) {
    // TODO use gen.property
    gen.if((0, codegen_1._) `${parentData} !== undefined`, () => gen.assign((0, codegen_1._) `${parentData}[${parentDataProperty}]`, expr));
}
function checkDataType(dataType, data, strictNums, correct = DataType.Correct) {
    const EQ = correct === DataType.Correct ? codegen_1.operators.EQ : codegen_1.operators.NEQ;
    let cond;
    switch (dataType) {
        case "null":
            return (0, codegen_1._) `${data} ${EQ} null`;
        case "array":
            cond = (0, codegen_1._) `Array.isArray(${data})`;
            break;
        case "object":
            cond = (0, codegen_1._) `${data} && typeof ${data} == "object" && !Array.isArray(${data})`;
            break;
        case "integer":
            cond = numCond((0, codegen_1._) `!(${data} % 1) && !isNaN(${data})`);
            break;
        case "number":
            cond = numCond();
            break;
        default:
            return (0, codegen_1._) `typeof ${data} ${EQ} ${dataType}`;
    }
    return correct === DataType.Correct ? cond : (0, codegen_1.not)(cond);
    function numCond(_cond = codegen_1.nil) {
        return (0, codegen_1.and)((0, codegen_1._) `typeof ${data} == "number"`, _cond, strictNums ? (0, codegen_1._) `isFinite(${data})` : codegen_1.nil);
    }
}
exports.checkDataType = checkDataType;
function checkDataTypes(dataTypes, data, strictNums, correct) {
    if (dataTypes.length === 1) {
        return checkDataType(dataTypes[0], data, strictNums, correct);
    }
    let cond;
    const types = (0, util_1.toHash)(dataTypes);
    if (types.array && types.object) {
        const notObj = (0, codegen_1._) `typeof ${data} != "object"`;
        cond = types.null ? notObj : (0, codegen_1._) `!${data} || ${notObj}`;
        delete types.null;
        delete types.array;
        delete types.object;
    }
    else {
        cond = codegen_1.nil;
    }
    if (types.number)
        delete types.integer;
    for (const t in types)
        cond = (0, codegen_1.and)(cond, checkDataType(t, data, strictNums, correct));
    return cond;
}
exports.checkDataTypes = checkDataTypes;
const typeError = {
    message: ({ schema }) => `must be ${schema}`,
    params: ({ schema, schemaValue }) => typeof schema == "string" ? (0, codegen_1._) `{type: ${schema}}` : (0, codegen_1._) `{type: ${schemaValue}}`,
};
function reportTypeError(it) {
    const cxt = getTypeErrorContext(it);
    (0, errors_1.reportError)(cxt, typeError);
}
exports.reportTypeError = reportTypeError;
function getTypeErrorContext(it) {
    const { gen, data, schema } = it;
    const schemaCode = (0, util_1.schemaRefOrVal)(it, schema, "type");
    return {
        gen,
        keyword: "type",
        data,
        schema: schema.type,
        schemaCode,
        schemaValue: schemaCode,
        parentSchema: schema,
        params: {},
        it,
    };
}
//# sourceMappingURL=dataType.js.map

/***/ }),

/***/ 1699:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.assignDefaults = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
function assignDefaults(it, ty) {
    const { properties, items } = it.schema;
    if (ty === "object" && properties) {
        for (const key in properties) {
            assignDefault(it, key, properties[key].default);
        }
    }
    else if (ty === "array" && Array.isArray(items)) {
        items.forEach((sch, i) => assignDefault(it, i, sch.default));
    }
}
exports.assignDefaults = assignDefaults;
function assignDefault(it, prop, defaultValue) {
    const { gen, compositeRule, data, opts } = it;
    if (defaultValue === undefined)
        return;
    const childData = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(prop)}`;
    if (compositeRule) {
        (0, util_1.checkStrictMode)(it, `default is ignored for: ${childData}`);
        return;
    }
    let condition = (0, codegen_1._) `${childData} === undefined`;
    if (opts.useDefaults === "empty") {
        condition = (0, codegen_1._) `${condition} || ${childData} === null || ${childData} === ""`;
    }
    // `${childData} === undefined` +
    // (opts.useDefaults === "empty" ? ` || ${childData} === null || ${childData} === ""` : "")
    gen.if(condition, (0, codegen_1._) `${childData} = ${(0, codegen_1.stringify)(defaultValue)}`);
}
//# sourceMappingURL=defaults.js.map

/***/ }),

/***/ 7881:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.getData = exports.KeywordCxt = exports.validateFunctionCode = void 0;
const boolSchema_1 = __nccwpck_require__(5346);
const dataType_1 = __nccwpck_require__(6685);
const applicability_1 = __nccwpck_require__(7692);
const dataType_2 = __nccwpck_require__(6685);
const defaults_1 = __nccwpck_require__(1699);
const keyword_1 = __nccwpck_require__(5202);
const subschema_1 = __nccwpck_require__(6200);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const resolve_1 = __nccwpck_require__(4090);
const util_1 = __nccwpck_require__(4464);
const errors_1 = __nccwpck_require__(1283);
// schema compilation - generates validation function, subschemaCode (below) is used for subschemas
function validateFunctionCode(it) {
    if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
            topSchemaObjCode(it);
            return;
        }
    }
    validateFunction(it, () => (0, boolSchema_1.topBoolOrEmptySchema)(it));
}
exports.validateFunctionCode = validateFunctionCode;
function validateFunction({ gen, validateName, schema, schemaEnv, opts }, body) {
    if (opts.code.es5) {
        gen.func(validateName, (0, codegen_1._) `${names_1.default.data}, ${names_1.default.valCxt}`, schemaEnv.$async, () => {
            gen.code((0, codegen_1._) `"use strict"; ${funcSourceUrl(schema, opts)}`);
            destructureValCxtES5(gen, opts);
            gen.code(body);
        });
    }
    else {
        gen.func(validateName, (0, codegen_1._) `${names_1.default.data}, ${destructureValCxt(opts)}`, schemaEnv.$async, () => gen.code(funcSourceUrl(schema, opts)).code(body));
    }
}
function destructureValCxt(opts) {
    return (0, codegen_1._) `{${names_1.default.instancePath}="", ${names_1.default.parentData}, ${names_1.default.parentDataProperty}, ${names_1.default.rootData}=${names_1.default.data}${opts.dynamicRef ? (0, codegen_1._) `, ${names_1.default.dynamicAnchors}={}` : codegen_1.nil}}={}`;
}
function destructureValCxtES5(gen, opts) {
    gen.if(names_1.default.valCxt, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.instancePath}`);
        gen.var(names_1.default.parentData, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.parentData}`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.parentDataProperty}`);
        gen.var(names_1.default.rootData, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.rootData}`);
        if (opts.dynamicRef)
            gen.var(names_1.default.dynamicAnchors, (0, codegen_1._) `${names_1.default.valCxt}.${names_1.default.dynamicAnchors}`);
    }, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._) `""`);
        gen.var(names_1.default.parentData, (0, codegen_1._) `undefined`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._) `undefined`);
        gen.var(names_1.default.rootData, names_1.default.data);
        if (opts.dynamicRef)
            gen.var(names_1.default.dynamicAnchors, (0, codegen_1._) `{}`);
    });
}
function topSchemaObjCode(it) {
    const { schema, opts, gen } = it;
    validateFunction(it, () => {
        if (opts.$comment && schema.$comment)
            commentKeyword(it);
        checkNoDefault(it);
        gen.let(names_1.default.vErrors, null);
        gen.let(names_1.default.errors, 0);
        if (opts.unevaluated)
            resetEvaluated(it);
        typeAndKeywords(it);
        returnResults(it);
    });
    return;
}
function resetEvaluated(it) {
    // TODO maybe some hook to execute it in the end to check whether props/items are Name, as in assignEvaluated
    const { gen, validateName } = it;
    it.evaluated = gen.const("evaluated", (0, codegen_1._) `${validateName}.evaluated`);
    gen.if((0, codegen_1._) `${it.evaluated}.dynamicProps`, () => gen.assign((0, codegen_1._) `${it.evaluated}.props`, (0, codegen_1._) `undefined`));
    gen.if((0, codegen_1._) `${it.evaluated}.dynamicItems`, () => gen.assign((0, codegen_1._) `${it.evaluated}.items`, (0, codegen_1._) `undefined`));
}
function funcSourceUrl(schema, opts) {
    const schId = typeof schema == "object" && schema[opts.schemaId];
    return schId && (opts.code.source || opts.code.process) ? (0, codegen_1._) `/*# sourceURL=${schId} */` : codegen_1.nil;
}
// schema compilation - this function is used recursively to generate code for sub-schemas
function subschemaCode(it, valid) {
    if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
            subSchemaObjCode(it, valid);
            return;
        }
    }
    (0, boolSchema_1.boolOrEmptySchema)(it, valid);
}
function schemaCxtHasRules({ schema, self }) {
    if (typeof schema == "boolean")
        return !schema;
    for (const key in schema)
        if (self.RULES.all[key])
            return true;
    return false;
}
function isSchemaObj(it) {
    return typeof it.schema != "boolean";
}
function subSchemaObjCode(it, valid) {
    const { schema, gen, opts } = it;
    if (opts.$comment && schema.$comment)
        commentKeyword(it);
    updateContext(it);
    checkAsyncSchema(it);
    const errsCount = gen.const("_errs", names_1.default.errors);
    typeAndKeywords(it, errsCount);
    // TODO var
    gen.var(valid, (0, codegen_1._) `${errsCount} === ${names_1.default.errors}`);
}
function checkKeywords(it) {
    (0, util_1.checkUnknownRules)(it);
    checkRefsAndKeywords(it);
}
function typeAndKeywords(it, errsCount) {
    if (it.opts.jtd)
        return schemaKeywords(it, [], false, errsCount);
    const types = (0, dataType_1.getSchemaTypes)(it.schema);
    const checkedTypes = (0, dataType_1.coerceAndCheckDataType)(it, types);
    schemaKeywords(it, types, !checkedTypes, errsCount);
}
function checkRefsAndKeywords(it) {
    const { schema, errSchemaPath, opts, self } = it;
    if (schema.$ref && opts.ignoreKeywordsWithRef && (0, util_1.schemaHasRulesButRef)(schema, self.RULES)) {
        self.logger.warn(`$ref: keywords ignored in schema at path "${errSchemaPath}"`);
    }
}
function checkNoDefault(it) {
    const { schema, opts } = it;
    if (schema.default !== undefined && opts.useDefaults && opts.strictSchema) {
        (0, util_1.checkStrictMode)(it, "default is ignored in the schema root");
    }
}
function updateContext(it) {
    const schId = it.schema[it.opts.schemaId];
    if (schId)
        it.baseId = (0, resolve_1.resolveUrl)(it.opts.uriResolver, it.baseId, schId);
}
function checkAsyncSchema(it) {
    if (it.schema.$async && !it.schemaEnv.$async)
        throw new Error("async schema in sync schema");
}
function commentKeyword({ gen, schemaEnv, schema, errSchemaPath, opts }) {
    const msg = schema.$comment;
    if (opts.$comment === true) {
        gen.code((0, codegen_1._) `${names_1.default.self}.logger.log(${msg})`);
    }
    else if (typeof opts.$comment == "function") {
        const schemaPath = (0, codegen_1.str) `${errSchemaPath}/$comment`;
        const rootName = gen.scopeValue("root", { ref: schemaEnv.root });
        gen.code((0, codegen_1._) `${names_1.default.self}.opts.$comment(${msg}, ${schemaPath}, ${rootName}.schema)`);
    }
}
function returnResults(it) {
    const { gen, schemaEnv, validateName, ValidationError, opts } = it;
    if (schemaEnv.$async) {
        // TODO assign unevaluated
        gen.if((0, codegen_1._) `${names_1.default.errors} === 0`, () => gen.return(names_1.default.data), () => gen.throw((0, codegen_1._) `new ${ValidationError}(${names_1.default.vErrors})`));
    }
    else {
        gen.assign((0, codegen_1._) `${validateName}.errors`, names_1.default.vErrors);
        if (opts.unevaluated)
            assignEvaluated(it);
        gen.return((0, codegen_1._) `${names_1.default.errors} === 0`);
    }
}
function assignEvaluated({ gen, evaluated, props, items }) {
    if (props instanceof codegen_1.Name)
        gen.assign((0, codegen_1._) `${evaluated}.props`, props);
    if (items instanceof codegen_1.Name)
        gen.assign((0, codegen_1._) `${evaluated}.items`, items);
}
function schemaKeywords(it, types, typeErrors, errsCount) {
    const { gen, schema, data, allErrors, opts, self } = it;
    const { RULES } = self;
    if (schema.$ref && (opts.ignoreKeywordsWithRef || !(0, util_1.schemaHasRulesButRef)(schema, RULES))) {
        gen.block(() => keywordCode(it, "$ref", RULES.all.$ref.definition)); // TODO typecast
        return;
    }
    if (!opts.jtd)
        checkStrictTypes(it, types);
    gen.block(() => {
        for (const group of RULES.rules)
            groupKeywords(group);
        groupKeywords(RULES.post);
    });
    function groupKeywords(group) {
        if (!(0, applicability_1.shouldUseGroup)(schema, group))
            return;
        if (group.type) {
            gen.if((0, dataType_2.checkDataType)(group.type, data, opts.strictNumbers));
            iterateKeywords(it, group);
            if (types.length === 1 && types[0] === group.type && typeErrors) {
                gen.else();
                (0, dataType_2.reportTypeError)(it);
            }
            gen.endIf();
        }
        else {
            iterateKeywords(it, group);
        }
        // TODO make it "ok" call?
        if (!allErrors)
            gen.if((0, codegen_1._) `${names_1.default.errors} === ${errsCount || 0}`);
    }
}
function iterateKeywords(it, group) {
    const { gen, schema, opts: { useDefaults }, } = it;
    if (useDefaults)
        (0, defaults_1.assignDefaults)(it, group.type);
    gen.block(() => {
        for (const rule of group.rules) {
            if ((0, applicability_1.shouldUseRule)(schema, rule)) {
                keywordCode(it, rule.keyword, rule.definition, group.type);
            }
        }
    });
}
function checkStrictTypes(it, types) {
    if (it.schemaEnv.meta || !it.opts.strictTypes)
        return;
    checkContextTypes(it, types);
    if (!it.opts.allowUnionTypes)
        checkMultipleTypes(it, types);
    checkKeywordTypes(it, it.dataTypes);
}
function checkContextTypes(it, types) {
    if (!types.length)
        return;
    if (!it.dataTypes.length) {
        it.dataTypes = types;
        return;
    }
    types.forEach((t) => {
        if (!includesType(it.dataTypes, t)) {
            strictTypesError(it, `type "${t}" not allowed by context "${it.dataTypes.join(",")}"`);
        }
    });
    narrowSchemaTypes(it, types);
}
function checkMultipleTypes(it, ts) {
    if (ts.length > 1 && !(ts.length === 2 && ts.includes("null"))) {
        strictTypesError(it, "use allowUnionTypes to allow union type keyword");
    }
}
function checkKeywordTypes(it, ts) {
    const rules = it.self.RULES.all;
    for (const keyword in rules) {
        const rule = rules[keyword];
        if (typeof rule == "object" && (0, applicability_1.shouldUseRule)(it.schema, rule)) {
            const { type } = rule.definition;
            if (type.length && !type.some((t) => hasApplicableType(ts, t))) {
                strictTypesError(it, `missing type "${type.join(",")}" for keyword "${keyword}"`);
            }
        }
    }
}
function hasApplicableType(schTs, kwdT) {
    return schTs.includes(kwdT) || (kwdT === "number" && schTs.includes("integer"));
}
function includesType(ts, t) {
    return ts.includes(t) || (t === "integer" && ts.includes("number"));
}
function narrowSchemaTypes(it, withTypes) {
    const ts = [];
    for (const t of it.dataTypes) {
        if (includesType(withTypes, t))
            ts.push(t);
        else if (withTypes.includes("integer") && t === "number")
            ts.push("integer");
    }
    it.dataTypes = ts;
}
function strictTypesError(it, msg) {
    const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
    msg += ` at "${schemaPath}" (strictTypes)`;
    (0, util_1.checkStrictMode)(it, msg, it.opts.strictTypes);
}
class KeywordCxt {
    constructor(it, def, keyword) {
        (0, keyword_1.validateKeywordUsage)(it, def, keyword);
        this.gen = it.gen;
        this.allErrors = it.allErrors;
        this.keyword = keyword;
        this.data = it.data;
        this.schema = it.schema[keyword];
        this.$data = def.$data && it.opts.$data && this.schema && this.schema.$data;
        this.schemaValue = (0, util_1.schemaRefOrVal)(it, this.schema, keyword, this.$data);
        this.schemaType = def.schemaType;
        this.parentSchema = it.schema;
        this.params = {};
        this.it = it;
        this.def = def;
        if (this.$data) {
            this.schemaCode = it.gen.const("vSchema", getData(this.$data, it));
        }
        else {
            this.schemaCode = this.schemaValue;
            if (!(0, keyword_1.validSchemaType)(this.schema, def.schemaType, def.allowUndefined)) {
                throw new Error(`${keyword} value must be ${JSON.stringify(def.schemaType)}`);
            }
        }
        if ("code" in def ? def.trackErrors : def.errors !== false) {
            this.errsCount = it.gen.const("_errs", names_1.default.errors);
        }
    }
    result(condition, successAction, failAction) {
        this.failResult((0, codegen_1.not)(condition), successAction, failAction);
    }
    failResult(condition, successAction, failAction) {
        this.gen.if(condition);
        if (failAction)
            failAction();
        else
            this.error();
        if (successAction) {
            this.gen.else();
            successAction();
            if (this.allErrors)
                this.gen.endIf();
        }
        else {
            if (this.allErrors)
                this.gen.endIf();
            else
                this.gen.else();
        }
    }
    pass(condition, failAction) {
        this.failResult((0, codegen_1.not)(condition), undefined, failAction);
    }
    fail(condition) {
        if (condition === undefined) {
            this.error();
            if (!this.allErrors)
                this.gen.if(false); // this branch will be removed by gen.optimize
            return;
        }
        this.gen.if(condition);
        this.error();
        if (this.allErrors)
            this.gen.endIf();
        else
            this.gen.else();
    }
    fail$data(condition) {
        if (!this.$data)
            return this.fail(condition);
        const { schemaCode } = this;
        this.fail((0, codegen_1._) `${schemaCode} !== undefined && (${(0, codegen_1.or)(this.invalid$data(), condition)})`);
    }
    error(append, errorParams, errorPaths) {
        if (errorParams) {
            this.setParams(errorParams);
            this._error(append, errorPaths);
            this.setParams({});
            return;
        }
        this._error(append, errorPaths);
    }
    _error(append, errorPaths) {
        ;
        (append ? errors_1.reportExtraError : errors_1.reportError)(this, this.def.error, errorPaths);
    }
    $dataError() {
        (0, errors_1.reportError)(this, this.def.$dataError || errors_1.keyword$DataError);
    }
    reset() {
        if (this.errsCount === undefined)
            throw new Error('add "trackErrors" to keyword definition');
        (0, errors_1.resetErrorsCount)(this.gen, this.errsCount);
    }
    ok(cond) {
        if (!this.allErrors)
            this.gen.if(cond);
    }
    setParams(obj, assign) {
        if (assign)
            Object.assign(this.params, obj);
        else
            this.params = obj;
    }
    block$data(valid, codeBlock, $dataValid = codegen_1.nil) {
        this.gen.block(() => {
            this.check$data(valid, $dataValid);
            codeBlock();
        });
    }
    check$data(valid = codegen_1.nil, $dataValid = codegen_1.nil) {
        if (!this.$data)
            return;
        const { gen, schemaCode, schemaType, def } = this;
        gen.if((0, codegen_1.or)((0, codegen_1._) `${schemaCode} === undefined`, $dataValid));
        if (valid !== codegen_1.nil)
            gen.assign(valid, true);
        if (schemaType.length || def.validateSchema) {
            gen.elseIf(this.invalid$data());
            this.$dataError();
            if (valid !== codegen_1.nil)
                gen.assign(valid, false);
        }
        gen.else();
    }
    invalid$data() {
        const { gen, schemaCode, schemaType, def, it } = this;
        return (0, codegen_1.or)(wrong$DataType(), invalid$DataSchema());
        function wrong$DataType() {
            if (schemaType.length) {
                /* istanbul ignore if */
                if (!(schemaCode instanceof codegen_1.Name))
                    throw new Error("ajv implementation error");
                const st = Array.isArray(schemaType) ? schemaType : [schemaType];
                return (0, codegen_1._) `${(0, dataType_2.checkDataTypes)(st, schemaCode, it.opts.strictNumbers, dataType_2.DataType.Wrong)}`;
            }
            return codegen_1.nil;
        }
        function invalid$DataSchema() {
            if (def.validateSchema) {
                const validateSchemaRef = gen.scopeValue("validate$data", { ref: def.validateSchema }); // TODO value.code for standalone
                return (0, codegen_1._) `!${validateSchemaRef}(${schemaCode})`;
            }
            return codegen_1.nil;
        }
    }
    subschema(appl, valid) {
        const subschema = (0, subschema_1.getSubschema)(this.it, appl);
        (0, subschema_1.extendSubschemaData)(subschema, this.it, appl);
        (0, subschema_1.extendSubschemaMode)(subschema, appl);
        const nextContext = { ...this.it, ...subschema, items: undefined, props: undefined };
        subschemaCode(nextContext, valid);
        return nextContext;
    }
    mergeEvaluated(schemaCxt, toName) {
        const { it, gen } = this;
        if (!it.opts.unevaluated)
            return;
        if (it.props !== true && schemaCxt.props !== undefined) {
            it.props = util_1.mergeEvaluated.props(gen, schemaCxt.props, it.props, toName);
        }
        if (it.items !== true && schemaCxt.items !== undefined) {
            it.items = util_1.mergeEvaluated.items(gen, schemaCxt.items, it.items, toName);
        }
    }
    mergeValidEvaluated(schemaCxt, valid) {
        const { it, gen } = this;
        if (it.opts.unevaluated && (it.props !== true || it.items !== true)) {
            gen.if(valid, () => this.mergeEvaluated(schemaCxt, codegen_1.Name));
            return true;
        }
    }
}
exports.KeywordCxt = KeywordCxt;
function keywordCode(it, keyword, def, ruleType) {
    const cxt = new KeywordCxt(it, def, keyword);
    if ("code" in def) {
        def.code(cxt, ruleType);
    }
    else if (cxt.$data && def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
    }
    else if ("macro" in def) {
        (0, keyword_1.macroKeywordCode)(cxt, def);
    }
    else if (def.compile || def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
    }
}
const JSON_POINTER = /^\/(?:[^~]|~0|~1)*$/;
const RELATIVE_JSON_POINTER = /^([0-9]+)(#|\/(?:[^~]|~0|~1)*)?$/;
function getData($data, { dataLevel, dataNames, dataPathArr }) {
    let jsonPointer;
    let data;
    if ($data === "")
        return names_1.default.rootData;
    if ($data[0] === "/") {
        if (!JSON_POINTER.test($data))
            throw new Error(`Invalid JSON-pointer: ${$data}`);
        jsonPointer = $data;
        data = names_1.default.rootData;
    }
    else {
        const matches = RELATIVE_JSON_POINTER.exec($data);
        if (!matches)
            throw new Error(`Invalid JSON-pointer: ${$data}`);
        const up = +matches[1];
        jsonPointer = matches[2];
        if (jsonPointer === "#") {
            if (up >= dataLevel)
                throw new Error(errorMsg("property/index", up));
            return dataPathArr[dataLevel - up];
        }
        if (up > dataLevel)
            throw new Error(errorMsg("data", up));
        data = dataNames[dataLevel - up];
        if (!jsonPointer)
            return data;
    }
    let expr = data;
    const segments = jsonPointer.split("/");
    for (const segment of segments) {
        if (segment) {
            data = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)((0, util_1.unescapeJsonPointer)(segment))}`;
            expr = (0, codegen_1._) `${expr} && ${data}`;
        }
    }
    return expr;
    function errorMsg(pointerType, up) {
        return `Cannot access ${pointerType} ${up} levels up, current level is ${dataLevel}`;
    }
}
exports.getData = getData;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 5202:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateKeywordUsage = exports.validSchemaType = exports.funcKeywordCode = exports.macroKeywordCode = void 0;
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const code_1 = __nccwpck_require__(8484);
const errors_1 = __nccwpck_require__(1283);
function macroKeywordCode(cxt, def) {
    const { gen, keyword, schema, parentSchema, it } = cxt;
    const macroSchema = def.macro.call(it.self, schema, parentSchema, it);
    const schemaRef = useKeyword(gen, keyword, macroSchema);
    if (it.opts.validateSchema !== false)
        it.self.validateSchema(macroSchema, true);
    const valid = gen.name("valid");
    cxt.subschema({
        schema: macroSchema,
        schemaPath: codegen_1.nil,
        errSchemaPath: `${it.errSchemaPath}/${keyword}`,
        topSchemaRef: schemaRef,
        compositeRule: true,
    }, valid);
    cxt.pass(valid, () => cxt.error(true));
}
exports.macroKeywordCode = macroKeywordCode;
function funcKeywordCode(cxt, def) {
    var _a;
    const { gen, keyword, schema, parentSchema, $data, it } = cxt;
    checkAsyncKeyword(it, def);
    const validate = !$data && def.compile ? def.compile.call(it.self, schema, parentSchema, it) : def.validate;
    const validateRef = useKeyword(gen, keyword, validate);
    const valid = gen.let("valid");
    cxt.block$data(valid, validateKeyword);
    cxt.ok((_a = def.valid) !== null && _a !== void 0 ? _a : valid);
    function validateKeyword() {
        if (def.errors === false) {
            assignValid();
            if (def.modifying)
                modifyData(cxt);
            reportErrs(() => cxt.error());
        }
        else {
            const ruleErrs = def.async ? validateAsync() : validateSync();
            if (def.modifying)
                modifyData(cxt);
            reportErrs(() => addErrs(cxt, ruleErrs));
        }
    }
    function validateAsync() {
        const ruleErrs = gen.let("ruleErrs", null);
        gen.try(() => assignValid((0, codegen_1._) `await `), (e) => gen.assign(valid, false).if((0, codegen_1._) `${e} instanceof ${it.ValidationError}`, () => gen.assign(ruleErrs, (0, codegen_1._) `${e}.errors`), () => gen.throw(e)));
        return ruleErrs;
    }
    function validateSync() {
        const validateErrs = (0, codegen_1._) `${validateRef}.errors`;
        gen.assign(validateErrs, null);
        assignValid(codegen_1.nil);
        return validateErrs;
    }
    function assignValid(_await = def.async ? (0, codegen_1._) `await ` : codegen_1.nil) {
        const passCxt = it.opts.passContext ? names_1.default.this : names_1.default.self;
        const passSchema = !(("compile" in def && !$data) || def.schema === false);
        gen.assign(valid, (0, codegen_1._) `${_await}${(0, code_1.callValidateCode)(cxt, validateRef, passCxt, passSchema)}`, def.modifying);
    }
    function reportErrs(errors) {
        var _a;
        gen.if((0, codegen_1.not)((_a = def.valid) !== null && _a !== void 0 ? _a : valid), errors);
    }
}
exports.funcKeywordCode = funcKeywordCode;
function modifyData(cxt) {
    const { gen, data, it } = cxt;
    gen.if(it.parentData, () => gen.assign(data, (0, codegen_1._) `${it.parentData}[${it.parentDataProperty}]`));
}
function addErrs(cxt, errs) {
    const { gen } = cxt;
    gen.if((0, codegen_1._) `Array.isArray(${errs})`, () => {
        gen
            .assign(names_1.default.vErrors, (0, codegen_1._) `${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`)
            .assign(names_1.default.errors, (0, codegen_1._) `${names_1.default.vErrors}.length`);
        (0, errors_1.extendErrors)(cxt);
    }, () => cxt.error());
}
function checkAsyncKeyword({ schemaEnv }, def) {
    if (def.async && !schemaEnv.$async)
        throw new Error("async keyword in sync schema");
}
function useKeyword(gen, keyword, result) {
    if (result === undefined)
        throw new Error(`keyword "${keyword}" failed to compile`);
    return gen.scopeValue("keyword", typeof result == "function" ? { ref: result } : { ref: result, code: (0, codegen_1.stringify)(result) });
}
function validSchemaType(schema, schemaType, allowUndefined = false) {
    // TODO add tests
    return (!schemaType.length ||
        schemaType.some((st) => st === "array"
            ? Array.isArray(schema)
            : st === "object"
                ? schema && typeof schema == "object" && !Array.isArray(schema)
                : typeof schema == st || (allowUndefined && typeof schema == "undefined")));
}
exports.validSchemaType = validSchemaType;
function validateKeywordUsage({ schema, opts, self, errSchemaPath }, def, keyword) {
    /* istanbul ignore if */
    if (Array.isArray(def.keyword) ? !def.keyword.includes(keyword) : def.keyword !== keyword) {
        throw new Error("ajv implementation error");
    }
    const deps = def.dependencies;
    if (deps === null || deps === void 0 ? void 0 : deps.some((kwd) => !Object.prototype.hasOwnProperty.call(schema, kwd))) {
        throw new Error(`parent schema must have dependencies of ${keyword}: ${deps.join(",")}`);
    }
    if (def.validateSchema) {
        const valid = def.validateSchema(schema[keyword]);
        if (!valid) {
            const msg = `keyword "${keyword}" value is invalid at path "${errSchemaPath}": ` +
                self.errorsText(def.validateSchema.errors);
            if (opts.validateSchema === "log")
                self.logger.error(msg);
            else
                throw new Error(msg);
        }
    }
}
exports.validateKeywordUsage = validateKeywordUsage;
//# sourceMappingURL=keyword.js.map

/***/ }),

/***/ 6200:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.extendSubschemaMode = exports.extendSubschemaData = exports.getSubschema = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
function getSubschema(it, { keyword, schemaProp, schema, schemaPath, errSchemaPath, topSchemaRef }) {
    if (keyword !== undefined && schema !== undefined) {
        throw new Error('both "keyword" and "schema" passed, only one allowed');
    }
    if (keyword !== undefined) {
        const sch = it.schema[keyword];
        return schemaProp === undefined
            ? {
                schema: sch,
                schemaPath: (0, codegen_1._) `${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}`,
                errSchemaPath: `${it.errSchemaPath}/${keyword}`,
            }
            : {
                schema: sch[schemaProp],
                schemaPath: (0, codegen_1._) `${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}${(0, codegen_1.getProperty)(schemaProp)}`,
                errSchemaPath: `${it.errSchemaPath}/${keyword}/${(0, util_1.escapeFragment)(schemaProp)}`,
            };
    }
    if (schema !== undefined) {
        if (schemaPath === undefined || errSchemaPath === undefined || topSchemaRef === undefined) {
            throw new Error('"schemaPath", "errSchemaPath" and "topSchemaRef" are required with "schema"');
        }
        return {
            schema,
            schemaPath,
            topSchemaRef,
            errSchemaPath,
        };
    }
    throw new Error('either "keyword" or "schema" must be passed');
}
exports.getSubschema = getSubschema;
function extendSubschemaData(subschema, it, { dataProp, dataPropType: dpType, data, dataTypes, propertyName }) {
    if (data !== undefined && dataProp !== undefined) {
        throw new Error('both "data" and "dataProp" passed, only one allowed');
    }
    const { gen } = it;
    if (dataProp !== undefined) {
        const { errorPath, dataPathArr, opts } = it;
        const nextData = gen.let("data", (0, codegen_1._) `${it.data}${(0, codegen_1.getProperty)(dataProp)}`, true);
        dataContextProps(nextData);
        subschema.errorPath = (0, codegen_1.str) `${errorPath}${(0, util_1.getErrorPath)(dataProp, dpType, opts.jsPropertySyntax)}`;
        subschema.parentDataProperty = (0, codegen_1._) `${dataProp}`;
        subschema.dataPathArr = [...dataPathArr, subschema.parentDataProperty];
    }
    if (data !== undefined) {
        const nextData = data instanceof codegen_1.Name ? data : gen.let("data", data, true); // replaceable if used once?
        dataContextProps(nextData);
        if (propertyName !== undefined)
            subschema.propertyName = propertyName;
        // TODO something is possibly wrong here with not changing parentDataProperty and not appending dataPathArr
    }
    if (dataTypes)
        subschema.dataTypes = dataTypes;
    function dataContextProps(_nextData) {
        subschema.data = _nextData;
        subschema.dataLevel = it.dataLevel + 1;
        subschema.dataTypes = [];
        it.definedProperties = new Set();
        subschema.parentData = it.data;
        subschema.dataNames = [...it.dataNames, _nextData];
    }
}
exports.extendSubschemaData = extendSubschemaData;
function extendSubschemaMode(subschema, { jtdDiscriminator, jtdMetadata, compositeRule, createErrors, allErrors }) {
    if (compositeRule !== undefined)
        subschema.compositeRule = compositeRule;
    if (createErrors !== undefined)
        subschema.createErrors = createErrors;
    if (allErrors !== undefined)
        subschema.allErrors = allErrors;
    subschema.jtdDiscriminator = jtdDiscriminator; // not inherited
    subschema.jtdMetadata = jtdMetadata; // not inherited
}
exports.extendSubschemaMode = extendSubschemaMode;
//# sourceMappingURL=subschema.js.map

/***/ }),

/***/ 3893:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = void 0;
var validate_1 = __nccwpck_require__(7881);
Object.defineProperty(exports, "KeywordCxt", ({ enumerable: true, get: function () { return validate_1.KeywordCxt; } }));
var codegen_1 = __nccwpck_require__(1436);
Object.defineProperty(exports, "_", ({ enumerable: true, get: function () { return codegen_1._; } }));
Object.defineProperty(exports, "str", ({ enumerable: true, get: function () { return codegen_1.str; } }));
Object.defineProperty(exports, "stringify", ({ enumerable: true, get: function () { return codegen_1.stringify; } }));
Object.defineProperty(exports, "nil", ({ enumerable: true, get: function () { return codegen_1.nil; } }));
Object.defineProperty(exports, "Name", ({ enumerable: true, get: function () { return codegen_1.Name; } }));
Object.defineProperty(exports, "CodeGen", ({ enumerable: true, get: function () { return codegen_1.CodeGen; } }));
const validation_error_1 = __nccwpck_require__(3021);
const ref_error_1 = __nccwpck_require__(3162);
const rules_1 = __nccwpck_require__(7353);
const compile_1 = __nccwpck_require__(2718);
const codegen_2 = __nccwpck_require__(1436);
const resolve_1 = __nccwpck_require__(4090);
const dataType_1 = __nccwpck_require__(6685);
const util_1 = __nccwpck_require__(4464);
const $dataRefSchema = __nccwpck_require__(3837);
const uri_1 = __nccwpck_require__(6285);
const defaultRegExp = (str, flags) => new RegExp(str, flags);
defaultRegExp.code = "new RegExp";
const META_IGNORE_OPTIONS = ["removeAdditional", "useDefaults", "coerceTypes"];
const EXT_SCOPE_NAMES = new Set([
    "validate",
    "serialize",
    "parse",
    "wrapper",
    "root",
    "schema",
    "keyword",
    "pattern",
    "formats",
    "validate$data",
    "func",
    "obj",
    "Error",
]);
const removedOptions = {
    errorDataPath: "",
    format: "`validateFormats: false` can be used instead.",
    nullable: '"nullable" keyword is supported by default.',
    jsonPointers: "Deprecated jsPropertySyntax can be used instead.",
    extendRefs: "Deprecated ignoreKeywordsWithRef can be used instead.",
    missingRefs: "Pass empty schema with $id that should be ignored to ajv.addSchema.",
    processCode: "Use option `code: {process: (code, schemaEnv: object) => string}`",
    sourceCode: "Use option `code: {source: true}`",
    strictDefaults: "It is default now, see option `strict`.",
    strictKeywords: "It is default now, see option `strict`.",
    uniqueItems: '"uniqueItems" keyword is always validated.',
    unknownFormats: "Disable strict mode or pass `true` to `ajv.addFormat` (or `formats` option).",
    cache: "Map is used as cache, schema object as key.",
    serialize: "Map is used as cache, schema object as key.",
    ajvErrors: "It is default now.",
};
const deprecatedOptions = {
    ignoreKeywordsWithRef: "",
    jsPropertySyntax: "",
    unicode: '"minLength"/"maxLength" account for unicode characters by default.',
};
const MAX_EXPRESSION = 200;
// eslint-disable-next-line complexity
function requiredOptions(o) {
    var _a, _b, _c, _d, _e, _f, _g, _h, _j, _k, _l, _m, _o, _p, _q, _r, _s, _t, _u, _v, _w, _x, _y, _z, _0;
    const s = o.strict;
    const _optz = (_a = o.code) === null || _a === void 0 ? void 0 : _a.optimize;
    const optimize = _optz === true || _optz === undefined ? 1 : _optz || 0;
    const regExp = (_c = (_b = o.code) === null || _b === void 0 ? void 0 : _b.regExp) !== null && _c !== void 0 ? _c : defaultRegExp;
    const uriResolver = (_d = o.uriResolver) !== null && _d !== void 0 ? _d : uri_1.default;
    return {
        strictSchema: (_f = (_e = o.strictSchema) !== null && _e !== void 0 ? _e : s) !== null && _f !== void 0 ? _f : true,
        strictNumbers: (_h = (_g = o.strictNumbers) !== null && _g !== void 0 ? _g : s) !== null && _h !== void 0 ? _h : true,
        strictTypes: (_k = (_j = o.strictTypes) !== null && _j !== void 0 ? _j : s) !== null && _k !== void 0 ? _k : "log",
        strictTuples: (_m = (_l = o.strictTuples) !== null && _l !== void 0 ? _l : s) !== null && _m !== void 0 ? _m : "log",
        strictRequired: (_p = (_o = o.strictRequired) !== null && _o !== void 0 ? _o : s) !== null && _p !== void 0 ? _p : false,
        code: o.code ? { ...o.code, optimize, regExp } : { optimize, regExp },
        loopRequired: (_q = o.loopRequired) !== null && _q !== void 0 ? _q : MAX_EXPRESSION,
        loopEnum: (_r = o.loopEnum) !== null && _r !== void 0 ? _r : MAX_EXPRESSION,
        meta: (_s = o.meta) !== null && _s !== void 0 ? _s : true,
        messages: (_t = o.messages) !== null && _t !== void 0 ? _t : true,
        inlineRefs: (_u = o.inlineRefs) !== null && _u !== void 0 ? _u : true,
        schemaId: (_v = o.schemaId) !== null && _v !== void 0 ? _v : "$id",
        addUsedSchema: (_w = o.addUsedSchema) !== null && _w !== void 0 ? _w : true,
        validateSchema: (_x = o.validateSchema) !== null && _x !== void 0 ? _x : true,
        validateFormats: (_y = o.validateFormats) !== null && _y !== void 0 ? _y : true,
        unicodeRegExp: (_z = o.unicodeRegExp) !== null && _z !== void 0 ? _z : true,
        int32range: (_0 = o.int32range) !== null && _0 !== void 0 ? _0 : true,
        uriResolver: uriResolver,
    };
}
class Ajv {
    constructor(opts = {}) {
        this.schemas = {};
        this.refs = {};
        this.formats = Object.create(null);
        this._compilations = new Set();
        this._loading = {};
        this._cache = new Map();
        opts = this.opts = { ...opts, ...requiredOptions(opts) };
        const { es5, lines } = this.opts.code;
        this.scope = new codegen_2.ValueScope({ scope: {}, prefixes: EXT_SCOPE_NAMES, es5, lines });
        this.logger = getLogger(opts.logger);
        const formatOpt = opts.validateFormats;
        opts.validateFormats = false;
        this.RULES = (0, rules_1.getRules)();
        checkOptions.call(this, removedOptions, opts, "NOT SUPPORTED");
        checkOptions.call(this, deprecatedOptions, opts, "DEPRECATED", "warn");
        this._metaOpts = getMetaSchemaOptions.call(this);
        if (opts.formats)
            addInitialFormats.call(this);
        this._addVocabularies();
        this._addDefaultMetaSchema();
        if (opts.keywords)
            addInitialKeywords.call(this, opts.keywords);
        if (typeof opts.meta == "object")
            this.addMetaSchema(opts.meta);
        addInitialSchemas.call(this);
        opts.validateFormats = formatOpt;
    }
    _addVocabularies() {
        this.addKeyword("$async");
    }
    _addDefaultMetaSchema() {
        const { $data, meta, schemaId } = this.opts;
        let _dataRefSchema = $dataRefSchema;
        if (schemaId === "id") {
            _dataRefSchema = { ...$dataRefSchema };
            _dataRefSchema.id = _dataRefSchema.$id;
            delete _dataRefSchema.$id;
        }
        if (meta && $data)
            this.addMetaSchema(_dataRefSchema, _dataRefSchema[schemaId], false);
    }
    defaultMeta() {
        const { meta, schemaId } = this.opts;
        return (this.opts.defaultMeta = typeof meta == "object" ? meta[schemaId] || meta : undefined);
    }
    validate(schemaKeyRef, // key, ref or schema object
    // eslint-disable-next-line @typescript-eslint/no-redundant-type-constituents
    data // to be validated
    ) {
        let v;
        if (typeof schemaKeyRef == "string") {
            v = this.getSchema(schemaKeyRef);
            if (!v)
                throw new Error(`no schema with key or ref "${schemaKeyRef}"`);
        }
        else {
            v = this.compile(schemaKeyRef);
        }
        const valid = v(data);
        if (!("$async" in v))
            this.errors = v.errors;
        return valid;
    }
    compile(schema, _meta) {
        const sch = this._addSchema(schema, _meta);
        return (sch.validate || this._compileSchemaEnv(sch));
    }
    compileAsync(schema, meta) {
        if (typeof this.opts.loadSchema != "function") {
            throw new Error("options.loadSchema should be a function");
        }
        const { loadSchema } = this.opts;
        return runCompileAsync.call(this, schema, meta);
        async function runCompileAsync(_schema, _meta) {
            await loadMetaSchema.call(this, _schema.$schema);
            const sch = this._addSchema(_schema, _meta);
            return sch.validate || _compileAsync.call(this, sch);
        }
        async function loadMetaSchema($ref) {
            if ($ref && !this.getSchema($ref)) {
                await runCompileAsync.call(this, { $ref }, true);
            }
        }
        async function _compileAsync(sch) {
            try {
                return this._compileSchemaEnv(sch);
            }
            catch (e) {
                if (!(e instanceof ref_error_1.default))
                    throw e;
                checkLoaded.call(this, e);
                await loadMissingSchema.call(this, e.missingSchema);
                return _compileAsync.call(this, sch);
            }
        }
        function checkLoaded({ missingSchema: ref, missingRef }) {
            if (this.refs[ref]) {
                throw new Error(`AnySchema ${ref} is loaded but ${missingRef} cannot be resolved`);
            }
        }
        async function loadMissingSchema(ref) {
            const _schema = await _loadSchema.call(this, ref);
            if (!this.refs[ref])
                await loadMetaSchema.call(this, _schema.$schema);
            if (!this.refs[ref])
                this.addSchema(_schema, ref, meta);
        }
        async function _loadSchema(ref) {
            const p = this._loading[ref];
            if (p)
                return p;
            try {
                return await (this._loading[ref] = loadSchema(ref));
            }
            finally {
                delete this._loading[ref];
            }
        }
    }
    // Adds schema to the instance
    addSchema(schema, // If array is passed, `key` will be ignored
    key, // Optional schema key. Can be passed to `validate` method instead of schema object or id/ref. One schema per instance can have empty `id` and `key`.
    _meta, // true if schema is a meta-schema. Used internally, addMetaSchema should be used instead.
    _validateSchema = this.opts.validateSchema // false to skip schema validation. Used internally, option validateSchema should be used instead.
    ) {
        if (Array.isArray(schema)) {
            for (const sch of schema)
                this.addSchema(sch, undefined, _meta, _validateSchema);
            return this;
        }
        let id;
        if (typeof schema === "object") {
            const { schemaId } = this.opts;
            id = schema[schemaId];
            if (id !== undefined && typeof id != "string") {
                throw new Error(`schema ${schemaId} must be string`);
            }
        }
        key = (0, resolve_1.normalizeId)(key || id);
        this._checkUnique(key);
        this.schemas[key] = this._addSchema(schema, _meta, key, _validateSchema, true);
        return this;
    }
    // Add schema that will be used to validate other schemas
    // options in META_IGNORE_OPTIONS are alway set to false
    addMetaSchema(schema, key, // schema key
    _validateSchema = this.opts.validateSchema // false to skip schema validation, can be used to override validateSchema option for meta-schema
    ) {
        this.addSchema(schema, key, true, _validateSchema);
        return this;
    }
    //  Validate schema against its meta-schema
    validateSchema(schema, throwOrLogError) {
        if (typeof schema == "boolean")
            return true;
        let $schema;
        $schema = schema.$schema;
        if ($schema !== undefined && typeof $schema != "string") {
            throw new Error("$schema must be a string");
        }
        $schema = $schema || this.opts.defaultMeta || this.defaultMeta();
        if (!$schema) {
            this.logger.warn("meta-schema not available");
            this.errors = null;
            return true;
        }
        const valid = this.validate($schema, schema);
        if (!valid && throwOrLogError) {
            const message = "schema is invalid: " + this.errorsText();
            if (this.opts.validateSchema === "log")
                this.logger.error(message);
            else
                throw new Error(message);
        }
        return valid;
    }
    // Get compiled schema by `key` or `ref`.
    // (`key` that was passed to `addSchema` or full schema reference - `schema.$id` or resolved id)
    getSchema(keyRef) {
        let sch;
        while (typeof (sch = getSchEnv.call(this, keyRef)) == "string")
            keyRef = sch;
        if (sch === undefined) {
            const { schemaId } = this.opts;
            const root = new compile_1.SchemaEnv({ schema: {}, schemaId });
            sch = compile_1.resolveSchema.call(this, root, keyRef);
            if (!sch)
                return;
            this.refs[keyRef] = sch;
        }
        return (sch.validate || this._compileSchemaEnv(sch));
    }
    // Remove cached schema(s).
    // If no parameter is passed all schemas but meta-schemas are removed.
    // If RegExp is passed all schemas with key/id matching pattern but meta-schemas are removed.
    // Even if schema is referenced by other schemas it still can be removed as other schemas have local references.
    removeSchema(schemaKeyRef) {
        if (schemaKeyRef instanceof RegExp) {
            this._removeAllSchemas(this.schemas, schemaKeyRef);
            this._removeAllSchemas(this.refs, schemaKeyRef);
            return this;
        }
        switch (typeof schemaKeyRef) {
            case "undefined":
                this._removeAllSchemas(this.schemas);
                this._removeAllSchemas(this.refs);
                this._cache.clear();
                return this;
            case "string": {
                const sch = getSchEnv.call(this, schemaKeyRef);
                if (typeof sch == "object")
                    this._cache.delete(sch.schema);
                delete this.schemas[schemaKeyRef];
                delete this.refs[schemaKeyRef];
                return this;
            }
            case "object": {
                const cacheKey = schemaKeyRef;
                this._cache.delete(cacheKey);
                let id = schemaKeyRef[this.opts.schemaId];
                if (id) {
                    id = (0, resolve_1.normalizeId)(id);
                    delete this.schemas[id];
                    delete this.refs[id];
                }
                return this;
            }
            default:
                throw new Error("ajv.removeSchema: invalid parameter");
        }
    }
    // add "vocabulary" - a collection of keywords
    addVocabulary(definitions) {
        for (const def of definitions)
            this.addKeyword(def);
        return this;
    }
    addKeyword(kwdOrDef, def // deprecated
    ) {
        let keyword;
        if (typeof kwdOrDef == "string") {
            keyword = kwdOrDef;
            if (typeof def == "object") {
                this.logger.warn("these parameters are deprecated, see docs for addKeyword");
                def.keyword = keyword;
            }
        }
        else if (typeof kwdOrDef == "object" && def === undefined) {
            def = kwdOrDef;
            keyword = def.keyword;
            if (Array.isArray(keyword) && !keyword.length) {
                throw new Error("addKeywords: keyword must be string or non-empty array");
            }
        }
        else {
            throw new Error("invalid addKeywords parameters");
        }
        checkKeyword.call(this, keyword, def);
        if (!def) {
            (0, util_1.eachItem)(keyword, (kwd) => addRule.call(this, kwd));
            return this;
        }
        keywordMetaschema.call(this, def);
        const definition = {
            ...def,
            type: (0, dataType_1.getJSONTypes)(def.type),
            schemaType: (0, dataType_1.getJSONTypes)(def.schemaType),
        };
        (0, util_1.eachItem)(keyword, definition.type.length === 0
            ? (k) => addRule.call(this, k, definition)
            : (k) => definition.type.forEach((t) => addRule.call(this, k, definition, t)));
        return this;
    }
    getKeyword(keyword) {
        const rule = this.RULES.all[keyword];
        return typeof rule == "object" ? rule.definition : !!rule;
    }
    // Remove keyword
    removeKeyword(keyword) {
        // TODO return type should be Ajv
        const { RULES } = this;
        delete RULES.keywords[keyword];
        delete RULES.all[keyword];
        for (const group of RULES.rules) {
            const i = group.rules.findIndex((rule) => rule.keyword === keyword);
            if (i >= 0)
                group.rules.splice(i, 1);
        }
        return this;
    }
    // Add format
    addFormat(name, format) {
        if (typeof format == "string")
            format = new RegExp(format);
        this.formats[name] = format;
        return this;
    }
    errorsText(errors = this.errors, // optional array of validation errors
    { separator = ", ", dataVar = "data" } = {} // optional options with properties `separator` and `dataVar`
    ) {
        if (!errors || errors.length === 0)
            return "No errors";
        return errors
            .map((e) => `${dataVar}${e.instancePath} ${e.message}`)
            .reduce((text, msg) => text + separator + msg);
    }
    $dataMetaSchema(metaSchema, keywordsJsonPointers) {
        const rules = this.RULES.all;
        metaSchema = JSON.parse(JSON.stringify(metaSchema));
        for (const jsonPointer of keywordsJsonPointers) {
            const segments = jsonPointer.split("/").slice(1); // first segment is an empty string
            let keywords = metaSchema;
            for (const seg of segments)
                keywords = keywords[seg];
            for (const key in rules) {
                const rule = rules[key];
                if (typeof rule != "object")
                    continue;
                const { $data } = rule.definition;
                const schema = keywords[key];
                if ($data && schema)
                    keywords[key] = schemaOrData(schema);
            }
        }
        return metaSchema;
    }
    _removeAllSchemas(schemas, regex) {
        for (const keyRef in schemas) {
            const sch = schemas[keyRef];
            if (!regex || regex.test(keyRef)) {
                if (typeof sch == "string") {
                    delete schemas[keyRef];
                }
                else if (sch && !sch.meta) {
                    this._cache.delete(sch.schema);
                    delete schemas[keyRef];
                }
            }
        }
    }
    _addSchema(schema, meta, baseId, validateSchema = this.opts.validateSchema, addSchema = this.opts.addUsedSchema) {
        let id;
        const { schemaId } = this.opts;
        if (typeof schema == "object") {
            id = schema[schemaId];
        }
        else {
            if (this.opts.jtd)
                throw new Error("schema must be object");
            else if (typeof schema != "boolean")
                throw new Error("schema must be object or boolean");
        }
        let sch = this._cache.get(schema);
        if (sch !== undefined)
            return sch;
        baseId = (0, resolve_1.normalizeId)(id || baseId);
        const localRefs = resolve_1.getSchemaRefs.call(this, schema, baseId);
        sch = new compile_1.SchemaEnv({ schema, schemaId, meta, baseId, localRefs });
        this._cache.set(sch.schema, sch);
        if (addSchema && !baseId.startsWith("#")) {
            // TODO atm it is allowed to overwrite schemas without id (instead of not adding them)
            if (baseId)
                this._checkUnique(baseId);
            this.refs[baseId] = sch;
        }
        if (validateSchema)
            this.validateSchema(schema, true);
        return sch;
    }
    _checkUnique(id) {
        if (this.schemas[id] || this.refs[id]) {
            throw new Error(`schema with key or id "${id}" already exists`);
        }
    }
    _compileSchemaEnv(sch) {
        if (sch.meta)
            this._compileMetaSchema(sch);
        else
            compile_1.compileSchema.call(this, sch);
        /* istanbul ignore if */
        if (!sch.validate)
            throw new Error("ajv implementation error");
        return sch.validate;
    }
    _compileMetaSchema(sch) {
        const currentOpts = this.opts;
        this.opts = this._metaOpts;
        try {
            compile_1.compileSchema.call(this, sch);
        }
        finally {
            this.opts = currentOpts;
        }
    }
}
Ajv.ValidationError = validation_error_1.default;
Ajv.MissingRefError = ref_error_1.default;
exports["default"] = Ajv;
function checkOptions(checkOpts, options, msg, log = "error") {
    for (const key in checkOpts) {
        const opt = key;
        if (opt in options)
            this.logger[log](`${msg}: option ${key}. ${checkOpts[opt]}`);
    }
}
function getSchEnv(keyRef) {
    keyRef = (0, resolve_1.normalizeId)(keyRef); // TODO tests fail without this line
    return this.schemas[keyRef] || this.refs[keyRef];
}
function addInitialSchemas() {
    const optsSchemas = this.opts.schemas;
    if (!optsSchemas)
        return;
    if (Array.isArray(optsSchemas))
        this.addSchema(optsSchemas);
    else
        for (const key in optsSchemas)
            this.addSchema(optsSchemas[key], key);
}
function addInitialFormats() {
    for (const name in this.opts.formats) {
        const format = this.opts.formats[name];
        if (format)
            this.addFormat(name, format);
    }
}
function addInitialKeywords(defs) {
    if (Array.isArray(defs)) {
        this.addVocabulary(defs);
        return;
    }
    this.logger.warn("keywords option as map is deprecated, pass array");
    for (const keyword in defs) {
        const def = defs[keyword];
        if (!def.keyword)
            def.keyword = keyword;
        this.addKeyword(def);
    }
}
function getMetaSchemaOptions() {
    const metaOpts = { ...this.opts };
    for (const opt of META_IGNORE_OPTIONS)
        delete metaOpts[opt];
    return metaOpts;
}
const noLogs = { log() { }, warn() { }, error() { } };
function getLogger(logger) {
    if (logger === false)
        return noLogs;
    if (logger === undefined)
        return console;
    if (logger.log && logger.warn && logger.error)
        return logger;
    throw new Error("logger must implement log, warn and error methods");
}
const KEYWORD_NAME = /^[a-z_$][a-z0-9_$:-]*$/i;
function checkKeyword(keyword, def) {
    const { RULES } = this;
    (0, util_1.eachItem)(keyword, (kwd) => {
        if (RULES.keywords[kwd])
            throw new Error(`Keyword ${kwd} is already defined`);
        if (!KEYWORD_NAME.test(kwd))
            throw new Error(`Keyword ${kwd} has invalid name`);
    });
    if (!def)
        return;
    if (def.$data && !("code" in def || "validate" in def)) {
        throw new Error('$data keyword must have "code" or "validate" function');
    }
}
function addRule(keyword, definition, dataType) {
    var _a;
    const post = definition === null || definition === void 0 ? void 0 : definition.post;
    if (dataType && post)
        throw new Error('keyword with "post" flag cannot have "type"');
    const { RULES } = this;
    let ruleGroup = post ? RULES.post : RULES.rules.find(({ type: t }) => t === dataType);
    if (!ruleGroup) {
        ruleGroup = { type: dataType, rules: [] };
        RULES.rules.push(ruleGroup);
    }
    RULES.keywords[keyword] = true;
    if (!definition)
        return;
    const rule = {
        keyword,
        definition: {
            ...definition,
            type: (0, dataType_1.getJSONTypes)(definition.type),
            schemaType: (0, dataType_1.getJSONTypes)(definition.schemaType),
        },
    };
    if (definition.before)
        addBeforeRule.call(this, ruleGroup, rule, definition.before);
    else
        ruleGroup.rules.push(rule);
    RULES.all[keyword] = rule;
    (_a = definition.implements) === null || _a === void 0 ? void 0 : _a.forEach((kwd) => this.addKeyword(kwd));
}
function addBeforeRule(ruleGroup, rule, before) {
    const i = ruleGroup.rules.findIndex((_rule) => _rule.keyword === before);
    if (i >= 0) {
        ruleGroup.rules.splice(i, 0, rule);
    }
    else {
        ruleGroup.rules.push(rule);
        this.logger.warn(`rule ${before} is not defined`);
    }
}
function keywordMetaschema(def) {
    let { metaSchema } = def;
    if (metaSchema === undefined)
        return;
    if (def.$data && this.opts.$data)
        metaSchema = schemaOrData(metaSchema);
    def.validateSchema = this.compile(metaSchema, true);
}
const $dataRef = {
    $ref: "https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#",
};
function schemaOrData(schema) {
    return { anyOf: [schema, $dataRef] };
}
//# sourceMappingURL=core.js.map

/***/ }),

/***/ 4951:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
// https://github.com/ajv-validator/ajv/issues/889
const equal = __nccwpck_require__(3430);
equal.code = 'require("ajv/dist/runtime/equal").default';
exports["default"] = equal;
//# sourceMappingURL=equal.js.map

/***/ }),

/***/ 6214:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
// https://mathiasbynens.be/notes/javascript-encoding
// https://github.com/bestiejs/punycode.js - punycode.ucs2.decode
function ucs2length(str) {
    const len = str.length;
    let length = 0;
    let pos = 0;
    let value;
    while (pos < len) {
        length++;
        value = str.charCodeAt(pos++);
        if (value >= 0xd800 && value <= 0xdbff && pos < len) {
            // high surrogate, and there is a next character
            value = str.charCodeAt(pos);
            if ((value & 0xfc00) === 0xdc00)
                pos++; // low surrogate
        }
    }
    return length;
}
exports["default"] = ucs2length;
ucs2length.code = 'require("ajv/dist/runtime/ucs2length").default';
//# sourceMappingURL=ucs2length.js.map

/***/ }),

/***/ 6285:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const uri = __nccwpck_require__(4352);
uri.code = 'require("ajv/dist/runtime/uri").default';
exports["default"] = uri;
//# sourceMappingURL=uri.js.map

/***/ }),

/***/ 3021:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
class ValidationError extends Error {
    constructor(errors) {
        super("validation failed");
        this.errors = errors;
        this.ajv = this.validation = true;
    }
}
exports["default"] = ValidationError;
//# sourceMappingURL=validation_error.js.map

/***/ }),

/***/ 3448:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateAdditionalItems = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { len } }) => (0, codegen_1.str) `must NOT have more than ${len} items`,
    params: ({ params: { len } }) => (0, codegen_1._) `{limit: ${len}}`,
};
const def = {
    keyword: "additionalItems",
    type: "array",
    schemaType: ["boolean", "object"],
    before: "uniqueItems",
    error,
    code(cxt) {
        const { parentSchema, it } = cxt;
        const { items } = parentSchema;
        if (!Array.isArray(items)) {
            (0, util_1.checkStrictMode)(it, '"additionalItems" is ignored when "items" is not an array of schemas');
            return;
        }
        validateAdditionalItems(cxt, items);
    },
};
function validateAdditionalItems(cxt, items) {
    const { gen, schema, data, keyword, it } = cxt;
    it.items = true;
    const len = gen.const("len", (0, codegen_1._) `${data}.length`);
    if (schema === false) {
        cxt.setParams({ len: items.length });
        cxt.pass((0, codegen_1._) `${len} <= ${items.length}`);
    }
    else if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
        const valid = gen.var("valid", (0, codegen_1._) `${len} <= ${items.length}`); // TODO var
        gen.if((0, codegen_1.not)(valid), () => validateItems(valid));
        cxt.ok(valid);
    }
    function validateItems(valid) {
        gen.forRange("i", items.length, len, (i) => {
            cxt.subschema({ keyword, dataProp: i, dataPropType: util_1.Type.Num }, valid);
            if (!it.allErrors)
                gen.if((0, codegen_1.not)(valid), () => gen.break());
        });
    }
}
exports.validateAdditionalItems = validateAdditionalItems;
exports["default"] = def;
//# sourceMappingURL=additionalItems.js.map

/***/ }),

/***/ 2431:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: "must NOT have additional properties",
    params: ({ params }) => (0, codegen_1._) `{additionalProperty: ${params.additionalProperty}}`,
};
const def = {
    keyword: "additionalProperties",
    type: ["object"],
    schemaType: ["boolean", "object"],
    allowUndefined: true,
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, schema, parentSchema, data, errsCount, it } = cxt;
        /* istanbul ignore if */
        if (!errsCount)
            throw new Error("ajv implementation error");
        const { allErrors, opts } = it;
        it.props = true;
        if (opts.removeAdditional !== "all" && (0, util_1.alwaysValidSchema)(it, schema))
            return;
        const props = (0, code_1.allSchemaProperties)(parentSchema.properties);
        const patProps = (0, code_1.allSchemaProperties)(parentSchema.patternProperties);
        checkAdditionalProperties();
        cxt.ok((0, codegen_1._) `${errsCount} === ${names_1.default.errors}`);
        function checkAdditionalProperties() {
            gen.forIn("key", data, (key) => {
                if (!props.length && !patProps.length)
                    additionalPropertyCode(key);
                else
                    gen.if(isAdditional(key), () => additionalPropertyCode(key));
            });
        }
        function isAdditional(key) {
            let definedProp;
            if (props.length > 8) {
                // TODO maybe an option instead of hard-coded 8?
                const propsSchema = (0, util_1.schemaRefOrVal)(it, parentSchema.properties, "properties");
                definedProp = (0, code_1.isOwnProperty)(gen, propsSchema, key);
            }
            else if (props.length) {
                definedProp = (0, codegen_1.or)(...props.map((p) => (0, codegen_1._) `${key} === ${p}`));
            }
            else {
                definedProp = codegen_1.nil;
            }
            if (patProps.length) {
                definedProp = (0, codegen_1.or)(definedProp, ...patProps.map((p) => (0, codegen_1._) `${(0, code_1.usePattern)(cxt, p)}.test(${key})`));
            }
            return (0, codegen_1.not)(definedProp);
        }
        function deleteAdditional(key) {
            gen.code((0, codegen_1._) `delete ${data}[${key}]`);
        }
        function additionalPropertyCode(key) {
            if (opts.removeAdditional === "all" || (opts.removeAdditional && schema === false)) {
                deleteAdditional(key);
                return;
            }
            if (schema === false) {
                cxt.setParams({ additionalProperty: key });
                cxt.error();
                if (!allErrors)
                    gen.break();
                return;
            }
            if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
                const valid = gen.name("valid");
                if (opts.removeAdditional === "failing") {
                    applyAdditionalSchema(key, valid, false);
                    gen.if((0, codegen_1.not)(valid), () => {
                        cxt.reset();
                        deleteAdditional(key);
                    });
                }
                else {
                    applyAdditionalSchema(key, valid);
                    if (!allErrors)
                        gen.if((0, codegen_1.not)(valid), () => gen.break());
                }
            }
        }
        function applyAdditionalSchema(key, valid, errors) {
            const subschema = {
                keyword: "additionalProperties",
                dataProp: key,
                dataPropType: util_1.Type.Str,
            };
            if (errors === false) {
                Object.assign(subschema, {
                    compositeRule: true,
                    createErrors: false,
                    allErrors: false,
                });
            }
            cxt.subschema(subschema, valid);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=additionalProperties.js.map

/***/ }),

/***/ 9205:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: "allOf",
    schemaType: "array",
    code(cxt) {
        const { gen, schema, it } = cxt;
        /* istanbul ignore if */
        if (!Array.isArray(schema))
            throw new Error("ajv implementation error");
        const valid = gen.name("valid");
        schema.forEach((sch, i) => {
            if ((0, util_1.alwaysValidSchema)(it, sch))
                return;
            const schCxt = cxt.subschema({ keyword: "allOf", schemaProp: i }, valid);
            cxt.ok(valid);
            cxt.mergeEvaluated(schCxt);
        });
    },
};
exports["default"] = def;
//# sourceMappingURL=allOf.js.map

/***/ }),

/***/ 9380:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const def = {
    keyword: "anyOf",
    schemaType: "array",
    trackErrors: true,
    code: code_1.validateUnion,
    error: { message: "must match a schema in anyOf" },
};
exports["default"] = def;
//# sourceMappingURL=anyOf.js.map

/***/ }),

/***/ 6182:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { min, max } }) => max === undefined
        ? (0, codegen_1.str) `must contain at least ${min} valid item(s)`
        : (0, codegen_1.str) `must contain at least ${min} and no more than ${max} valid item(s)`,
    params: ({ params: { min, max } }) => max === undefined ? (0, codegen_1._) `{minContains: ${min}}` : (0, codegen_1._) `{minContains: ${min}, maxContains: ${max}}`,
};
const def = {
    keyword: "contains",
    type: "array",
    schemaType: ["object", "boolean"],
    before: "uniqueItems",
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        let min;
        let max;
        const { minContains, maxContains } = parentSchema;
        if (it.opts.next) {
            min = minContains === undefined ? 1 : minContains;
            max = maxContains;
        }
        else {
            min = 1;
        }
        const len = gen.const("len", (0, codegen_1._) `${data}.length`);
        cxt.setParams({ min, max });
        if (max === undefined && min === 0) {
            (0, util_1.checkStrictMode)(it, `"minContains" == 0 without "maxContains": "contains" keyword ignored`);
            return;
        }
        if (max !== undefined && min > max) {
            (0, util_1.checkStrictMode)(it, `"minContains" > "maxContains" is always invalid`);
            cxt.fail();
            return;
        }
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
            let cond = (0, codegen_1._) `${len} >= ${min}`;
            if (max !== undefined)
                cond = (0, codegen_1._) `${cond} && ${len} <= ${max}`;
            cxt.pass(cond);
            return;
        }
        it.items = true;
        const valid = gen.name("valid");
        if (max === undefined && min === 1) {
            validateItems(valid, () => gen.if(valid, () => gen.break()));
        }
        else if (min === 0) {
            gen.let(valid, true);
            if (max !== undefined)
                gen.if((0, codegen_1._) `${data}.length > 0`, validateItemsWithCount);
        }
        else {
            gen.let(valid, false);
            validateItemsWithCount();
        }
        cxt.result(valid, () => cxt.reset());
        function validateItemsWithCount() {
            const schValid = gen.name("_valid");
            const count = gen.let("count", 0);
            validateItems(schValid, () => gen.if(schValid, () => checkLimits(count)));
        }
        function validateItems(_valid, block) {
            gen.forRange("i", 0, len, (i) => {
                cxt.subschema({
                    keyword: "contains",
                    dataProp: i,
                    dataPropType: util_1.Type.Num,
                    compositeRule: true,
                }, _valid);
                block();
            });
        }
        function checkLimits(count) {
            gen.code((0, codegen_1._) `${count}++`);
            if (max === undefined) {
                gen.if((0, codegen_1._) `${count} >= ${min}`, () => gen.assign(valid, true).break());
            }
            else {
                gen.if((0, codegen_1._) `${count} > ${max}`, () => gen.assign(valid, false).break());
                if (min === 1)
                    gen.assign(valid, true);
                else
                    gen.if((0, codegen_1._) `${count} >= ${min}`, () => gen.assign(valid, true));
            }
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=contains.js.map

/***/ }),

/***/ 5826:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateSchemaDeps = exports.validatePropertyDeps = exports.error = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const code_1 = __nccwpck_require__(8484);
exports.error = {
    message: ({ params: { property, depsCount, deps } }) => {
        const property_ies = depsCount === 1 ? "property" : "properties";
        return (0, codegen_1.str) `must have ${property_ies} ${deps} when property ${property} is present`;
    },
    params: ({ params: { property, depsCount, deps, missingProperty } }) => (0, codegen_1._) `{property: ${property},
    missingProperty: ${missingProperty},
    depsCount: ${depsCount},
    deps: ${deps}}`, // TODO change to reference
};
const def = {
    keyword: "dependencies",
    type: "object",
    schemaType: "object",
    error: exports.error,
    code(cxt) {
        const [propDeps, schDeps] = splitDependencies(cxt);
        validatePropertyDeps(cxt, propDeps);
        validateSchemaDeps(cxt, schDeps);
    },
};
function splitDependencies({ schema }) {
    const propertyDeps = {};
    const schemaDeps = {};
    for (const key in schema) {
        if (key === "__proto__")
            continue;
        const deps = Array.isArray(schema[key]) ? propertyDeps : schemaDeps;
        deps[key] = schema[key];
    }
    return [propertyDeps, schemaDeps];
}
function validatePropertyDeps(cxt, propertyDeps = cxt.schema) {
    const { gen, data, it } = cxt;
    if (Object.keys(propertyDeps).length === 0)
        return;
    const missing = gen.let("missing");
    for (const prop in propertyDeps) {
        const deps = propertyDeps[prop];
        if (deps.length === 0)
            continue;
        const hasProperty = (0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties);
        cxt.setParams({
            property: prop,
            depsCount: deps.length,
            deps: deps.join(", "),
        });
        if (it.allErrors) {
            gen.if(hasProperty, () => {
                for (const depProp of deps) {
                    (0, code_1.checkReportMissingProp)(cxt, depProp);
                }
            });
        }
        else {
            gen.if((0, codegen_1._) `${hasProperty} && (${(0, code_1.checkMissingProp)(cxt, deps, missing)})`);
            (0, code_1.reportMissingProp)(cxt, missing);
            gen.else();
        }
    }
}
exports.validatePropertyDeps = validatePropertyDeps;
function validateSchemaDeps(cxt, schemaDeps = cxt.schema) {
    const { gen, data, keyword, it } = cxt;
    const valid = gen.name("valid");
    for (const prop in schemaDeps) {
        if ((0, util_1.alwaysValidSchema)(it, schemaDeps[prop]))
            continue;
        gen.if((0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties), () => {
            const schCxt = cxt.subschema({ keyword, schemaProp: prop }, valid);
            cxt.mergeValidEvaluated(schCxt, valid);
        }, () => gen.var(valid, true) // TODO var
        );
        cxt.ok(valid);
    }
}
exports.validateSchemaDeps = validateSchemaDeps;
exports["default"] = def;
//# sourceMappingURL=dependencies.js.map

/***/ }),

/***/ 8584:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params }) => (0, codegen_1.str) `must match "${params.ifClause}" schema`,
    params: ({ params }) => (0, codegen_1._) `{failingKeyword: ${params.ifClause}}`,
};
const def = {
    keyword: "if",
    schemaType: ["object", "boolean"],
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, parentSchema, it } = cxt;
        if (parentSchema.then === undefined && parentSchema.else === undefined) {
            (0, util_1.checkStrictMode)(it, '"if" without "then" and "else" is ignored');
        }
        const hasThen = hasSchema(it, "then");
        const hasElse = hasSchema(it, "else");
        if (!hasThen && !hasElse)
            return;
        const valid = gen.let("valid", true);
        const schValid = gen.name("_valid");
        validateIf();
        cxt.reset();
        if (hasThen && hasElse) {
            const ifClause = gen.let("ifClause");
            cxt.setParams({ ifClause });
            gen.if(schValid, validateClause("then", ifClause), validateClause("else", ifClause));
        }
        else if (hasThen) {
            gen.if(schValid, validateClause("then"));
        }
        else {
            gen.if((0, codegen_1.not)(schValid), validateClause("else"));
        }
        cxt.pass(valid, () => cxt.error(true));
        function validateIf() {
            const schCxt = cxt.subschema({
                keyword: "if",
                compositeRule: true,
                createErrors: false,
                allErrors: false,
            }, schValid);
            cxt.mergeEvaluated(schCxt);
        }
        function validateClause(keyword, ifClause) {
            return () => {
                const schCxt = cxt.subschema({ keyword }, schValid);
                gen.assign(valid, schValid);
                cxt.mergeValidEvaluated(schCxt, valid);
                if (ifClause)
                    gen.assign(ifClause, (0, codegen_1._) `${keyword}`);
                else
                    cxt.setParams({ ifClause: keyword });
            };
        }
    },
};
function hasSchema(it, keyword) {
    const schema = it.schema[keyword];
    return schema !== undefined && !(0, util_1.alwaysValidSchema)(it, schema);
}
exports["default"] = def;
//# sourceMappingURL=if.js.map

/***/ }),

/***/ 8775:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const additionalItems_1 = __nccwpck_require__(3448);
const prefixItems_1 = __nccwpck_require__(6467);
const items_1 = __nccwpck_require__(5791);
const items2020_1 = __nccwpck_require__(2959);
const contains_1 = __nccwpck_require__(6182);
const dependencies_1 = __nccwpck_require__(5826);
const propertyNames_1 = __nccwpck_require__(1372);
const additionalProperties_1 = __nccwpck_require__(2431);
const properties_1 = __nccwpck_require__(8778);
const patternProperties_1 = __nccwpck_require__(664);
const not_1 = __nccwpck_require__(8350);
const anyOf_1 = __nccwpck_require__(9380);
const oneOf_1 = __nccwpck_require__(2490);
const allOf_1 = __nccwpck_require__(9205);
const if_1 = __nccwpck_require__(8584);
const thenElse_1 = __nccwpck_require__(6829);
function getApplicator(draft2020 = false) {
    const applicator = [
        // any
        not_1.default,
        anyOf_1.default,
        oneOf_1.default,
        allOf_1.default,
        if_1.default,
        thenElse_1.default,
        // object
        propertyNames_1.default,
        additionalProperties_1.default,
        dependencies_1.default,
        properties_1.default,
        patternProperties_1.default,
    ];
    // array
    if (draft2020)
        applicator.push(prefixItems_1.default, items2020_1.default);
    else
        applicator.push(additionalItems_1.default, items_1.default);
    applicator.push(contains_1.default);
    return applicator;
}
exports["default"] = getApplicator;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 5791:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateTuple = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const code_1 = __nccwpck_require__(8484);
const def = {
    keyword: "items",
    type: "array",
    schemaType: ["object", "array", "boolean"],
    before: "uniqueItems",
    code(cxt) {
        const { schema, it } = cxt;
        if (Array.isArray(schema))
            return validateTuple(cxt, "additionalItems", schema);
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
            return;
        cxt.ok((0, code_1.validateArray)(cxt));
    },
};
function validateTuple(cxt, extraItems, schArr = cxt.schema) {
    const { gen, parentSchema, data, keyword, it } = cxt;
    checkStrictTuple(parentSchema);
    if (it.opts.unevaluated && schArr.length && it.items !== true) {
        it.items = util_1.mergeEvaluated.items(gen, schArr.length, it.items);
    }
    const valid = gen.name("valid");
    const len = gen.const("len", (0, codegen_1._) `${data}.length`);
    schArr.forEach((sch, i) => {
        if ((0, util_1.alwaysValidSchema)(it, sch))
            return;
        gen.if((0, codegen_1._) `${len} > ${i}`, () => cxt.subschema({
            keyword,
            schemaProp: i,
            dataProp: i,
        }, valid));
        cxt.ok(valid);
    });
    function checkStrictTuple(sch) {
        const { opts, errSchemaPath } = it;
        const l = schArr.length;
        const fullTuple = l === sch.minItems && (l === sch.maxItems || sch[extraItems] === false);
        if (opts.strictTuples && !fullTuple) {
            const msg = `"${keyword}" is ${l}-tuple, but minItems or maxItems/${extraItems} are not specified or different at path "${errSchemaPath}"`;
            (0, util_1.checkStrictMode)(it, msg, opts.strictTuples);
        }
    }
}
exports.validateTuple = validateTuple;
exports["default"] = def;
//# sourceMappingURL=items.js.map

/***/ }),

/***/ 2959:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const code_1 = __nccwpck_require__(8484);
const additionalItems_1 = __nccwpck_require__(3448);
const error = {
    message: ({ params: { len } }) => (0, codegen_1.str) `must NOT have more than ${len} items`,
    params: ({ params: { len } }) => (0, codegen_1._) `{limit: ${len}}`,
};
const def = {
    keyword: "items",
    type: "array",
    schemaType: ["object", "boolean"],
    before: "uniqueItems",
    error,
    code(cxt) {
        const { schema, parentSchema, it } = cxt;
        const { prefixItems } = parentSchema;
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
            return;
        if (prefixItems)
            (0, additionalItems_1.validateAdditionalItems)(cxt, prefixItems);
        else
            cxt.ok((0, code_1.validateArray)(cxt));
    },
};
exports["default"] = def;
//# sourceMappingURL=items2020.js.map

/***/ }),

/***/ 8350:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: "not",
    schemaType: ["object", "boolean"],
    trackErrors: true,
    code(cxt) {
        const { gen, schema, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
            cxt.fail();
            return;
        }
        const valid = gen.name("valid");
        cxt.subschema({
            keyword: "not",
            compositeRule: true,
            createErrors: false,
            allErrors: false,
        }, valid);
        cxt.failResult(valid, () => cxt.reset(), () => cxt.error());
    },
    error: { message: "must NOT be valid" },
};
exports["default"] = def;
//# sourceMappingURL=not.js.map

/***/ }),

/***/ 2490:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: "must match exactly one schema in oneOf",
    params: ({ params }) => (0, codegen_1._) `{passingSchemas: ${params.passing}}`,
};
const def = {
    keyword: "oneOf",
    schemaType: "array",
    trackErrors: true,
    error,
    code(cxt) {
        const { gen, schema, parentSchema, it } = cxt;
        /* istanbul ignore if */
        if (!Array.isArray(schema))
            throw new Error("ajv implementation error");
        if (it.opts.discriminator && parentSchema.discriminator)
            return;
        const schArr = schema;
        const valid = gen.let("valid", false);
        const passing = gen.let("passing", null);
        const schValid = gen.name("_valid");
        cxt.setParams({ passing });
        // TODO possibly fail straight away (with warning or exception) if there are two empty always valid schemas
        gen.block(validateOneOf);
        cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
        function validateOneOf() {
            schArr.forEach((sch, i) => {
                let schCxt;
                if ((0, util_1.alwaysValidSchema)(it, sch)) {
                    gen.var(schValid, true);
                }
                else {
                    schCxt = cxt.subschema({
                        keyword: "oneOf",
                        schemaProp: i,
                        compositeRule: true,
                    }, schValid);
                }
                if (i > 0) {
                    gen
                        .if((0, codegen_1._) `${schValid} && ${valid}`)
                        .assign(valid, false)
                        .assign(passing, (0, codegen_1._) `[${passing}, ${i}]`)
                        .else();
                }
                gen.if(schValid, () => {
                    gen.assign(valid, true);
                    gen.assign(passing, i);
                    if (schCxt)
                        cxt.mergeEvaluated(schCxt, codegen_1.Name);
                });
            });
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=oneOf.js.map

/***/ }),

/***/ 664:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const util_2 = __nccwpck_require__(4464);
const def = {
    keyword: "patternProperties",
    type: "object",
    schemaType: "object",
    code(cxt) {
        const { gen, schema, data, parentSchema, it } = cxt;
        const { opts } = it;
        const patterns = (0, code_1.allSchemaProperties)(schema);
        const alwaysValidPatterns = patterns.filter((p) => (0, util_1.alwaysValidSchema)(it, schema[p]));
        if (patterns.length === 0 ||
            (alwaysValidPatterns.length === patterns.length &&
                (!it.opts.unevaluated || it.props === true))) {
            return;
        }
        const checkProperties = opts.strictSchema && !opts.allowMatchingProperties && parentSchema.properties;
        const valid = gen.name("valid");
        if (it.props !== true && !(it.props instanceof codegen_1.Name)) {
            it.props = (0, util_2.evaluatedPropsToName)(gen, it.props);
        }
        const { props } = it;
        validatePatternProperties();
        function validatePatternProperties() {
            for (const pat of patterns) {
                if (checkProperties)
                    checkMatchingProperties(pat);
                if (it.allErrors) {
                    validateProperties(pat);
                }
                else {
                    gen.var(valid, true); // TODO var
                    validateProperties(pat);
                    gen.if(valid);
                }
            }
        }
        function checkMatchingProperties(pat) {
            for (const prop in checkProperties) {
                if (new RegExp(pat).test(prop)) {
                    (0, util_1.checkStrictMode)(it, `property ${prop} matches pattern ${pat} (use allowMatchingProperties)`);
                }
            }
        }
        function validateProperties(pat) {
            gen.forIn("key", data, (key) => {
                gen.if((0, codegen_1._) `${(0, code_1.usePattern)(cxt, pat)}.test(${key})`, () => {
                    const alwaysValid = alwaysValidPatterns.includes(pat);
                    if (!alwaysValid) {
                        cxt.subschema({
                            keyword: "patternProperties",
                            schemaProp: pat,
                            dataProp: key,
                            dataPropType: util_2.Type.Str,
                        }, valid);
                    }
                    if (it.opts.unevaluated && props !== true) {
                        gen.assign((0, codegen_1._) `${props}[${key}]`, true);
                    }
                    else if (!alwaysValid && !it.allErrors) {
                        // can short-circuit if `unevaluatedProperties` is not supported (opts.next === false)
                        // or if all properties were evaluated (props === true)
                        gen.if((0, codegen_1.not)(valid), () => gen.break());
                    }
                });
            });
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=patternProperties.js.map

/***/ }),

/***/ 6467:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const items_1 = __nccwpck_require__(5791);
const def = {
    keyword: "prefixItems",
    type: "array",
    schemaType: ["array"],
    before: "uniqueItems",
    code: (cxt) => (0, items_1.validateTuple)(cxt, "items"),
};
exports["default"] = def;
//# sourceMappingURL=prefixItems.js.map

/***/ }),

/***/ 8778:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const validate_1 = __nccwpck_require__(7881);
const code_1 = __nccwpck_require__(8484);
const util_1 = __nccwpck_require__(4464);
const additionalProperties_1 = __nccwpck_require__(2431);
const def = {
    keyword: "properties",
    type: "object",
    schemaType: "object",
    code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        if (it.opts.removeAdditional === "all" && parentSchema.additionalProperties === undefined) {
            additionalProperties_1.default.code(new validate_1.KeywordCxt(it, additionalProperties_1.default, "additionalProperties"));
        }
        const allProps = (0, code_1.allSchemaProperties)(schema);
        for (const prop of allProps) {
            it.definedProperties.add(prop);
        }
        if (it.opts.unevaluated && allProps.length && it.props !== true) {
            it.props = util_1.mergeEvaluated.props(gen, (0, util_1.toHash)(allProps), it.props);
        }
        const properties = allProps.filter((p) => !(0, util_1.alwaysValidSchema)(it, schema[p]));
        if (properties.length === 0)
            return;
        const valid = gen.name("valid");
        for (const prop of properties) {
            if (hasDefault(prop)) {
                applyPropertySchema(prop);
            }
            else {
                gen.if((0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties));
                applyPropertySchema(prop);
                if (!it.allErrors)
                    gen.else().var(valid, true);
                gen.endIf();
            }
            cxt.it.definedProperties.add(prop);
            cxt.ok(valid);
        }
        function hasDefault(prop) {
            return it.opts.useDefaults && !it.compositeRule && schema[prop].default !== undefined;
        }
        function applyPropertySchema(prop) {
            cxt.subschema({
                keyword: "properties",
                schemaProp: prop,
                dataProp: prop,
            }, valid);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=properties.js.map

/***/ }),

/***/ 1372:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: "property name must be valid",
    params: ({ params }) => (0, codegen_1._) `{propertyName: ${params.propertyName}}`,
};
const def = {
    keyword: "propertyNames",
    type: "object",
    schemaType: ["object", "boolean"],
    error,
    code(cxt) {
        const { gen, schema, data, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema))
            return;
        const valid = gen.name("valid");
        gen.forIn("key", data, (key) => {
            cxt.setParams({ propertyName: key });
            cxt.subschema({
                keyword: "propertyNames",
                data: key,
                dataTypes: ["string"],
                propertyName: key,
                compositeRule: true,
            }, valid);
            gen.if((0, codegen_1.not)(valid), () => {
                cxt.error(true);
                if (!it.allErrors)
                    gen.break();
            });
        });
        cxt.ok(valid);
    },
};
exports["default"] = def;
//# sourceMappingURL=propertyNames.js.map

/***/ }),

/***/ 6829:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: ["then", "else"],
    schemaType: ["object", "boolean"],
    code({ keyword, parentSchema, it }) {
        if (parentSchema.if === undefined)
            (0, util_1.checkStrictMode)(it, `"${keyword}" without "if" is ignored`);
    },
};
exports["default"] = def;
//# sourceMappingURL=thenElse.js.map

/***/ }),

/***/ 8484:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.validateUnion = exports.validateArray = exports.usePattern = exports.callValidateCode = exports.schemaProperties = exports.allSchemaProperties = exports.noPropertyInData = exports.propertyInData = exports.isOwnProperty = exports.hasPropFunc = exports.reportMissingProp = exports.checkMissingProp = exports.checkReportMissingProp = void 0;
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const names_1 = __nccwpck_require__(630);
const util_2 = __nccwpck_require__(4464);
function checkReportMissingProp(cxt, prop) {
    const { gen, data, it } = cxt;
    gen.if(noPropertyInData(gen, data, prop, it.opts.ownProperties), () => {
        cxt.setParams({ missingProperty: (0, codegen_1._) `${prop}` }, true);
        cxt.error();
    });
}
exports.checkReportMissingProp = checkReportMissingProp;
function checkMissingProp({ gen, data, it: { opts } }, properties, missing) {
    return (0, codegen_1.or)(...properties.map((prop) => (0, codegen_1.and)(noPropertyInData(gen, data, prop, opts.ownProperties), (0, codegen_1._) `${missing} = ${prop}`)));
}
exports.checkMissingProp = checkMissingProp;
function reportMissingProp(cxt, missing) {
    cxt.setParams({ missingProperty: missing }, true);
    cxt.error();
}
exports.reportMissingProp = reportMissingProp;
function hasPropFunc(gen) {
    return gen.scopeValue("func", {
        // eslint-disable-next-line @typescript-eslint/unbound-method
        ref: Object.prototype.hasOwnProperty,
        code: (0, codegen_1._) `Object.prototype.hasOwnProperty`,
    });
}
exports.hasPropFunc = hasPropFunc;
function isOwnProperty(gen, data, property) {
    return (0, codegen_1._) `${hasPropFunc(gen)}.call(${data}, ${property})`;
}
exports.isOwnProperty = isOwnProperty;
function propertyInData(gen, data, property, ownProperties) {
    const cond = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(property)} !== undefined`;
    return ownProperties ? (0, codegen_1._) `${cond} && ${isOwnProperty(gen, data, property)}` : cond;
}
exports.propertyInData = propertyInData;
function noPropertyInData(gen, data, property, ownProperties) {
    const cond = (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(property)} === undefined`;
    return ownProperties ? (0, codegen_1.or)(cond, (0, codegen_1.not)(isOwnProperty(gen, data, property))) : cond;
}
exports.noPropertyInData = noPropertyInData;
function allSchemaProperties(schemaMap) {
    return schemaMap ? Object.keys(schemaMap).filter((p) => p !== "__proto__") : [];
}
exports.allSchemaProperties = allSchemaProperties;
function schemaProperties(it, schemaMap) {
    return allSchemaProperties(schemaMap).filter((p) => !(0, util_1.alwaysValidSchema)(it, schemaMap[p]));
}
exports.schemaProperties = schemaProperties;
function callValidateCode({ schemaCode, data, it: { gen, topSchemaRef, schemaPath, errorPath }, it }, func, context, passSchema) {
    const dataAndSchema = passSchema ? (0, codegen_1._) `${schemaCode}, ${data}, ${topSchemaRef}${schemaPath}` : data;
    const valCxt = [
        [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, errorPath)],
        [names_1.default.parentData, it.parentData],
        [names_1.default.parentDataProperty, it.parentDataProperty],
        [names_1.default.rootData, names_1.default.rootData],
    ];
    if (it.opts.dynamicRef)
        valCxt.push([names_1.default.dynamicAnchors, names_1.default.dynamicAnchors]);
    const args = (0, codegen_1._) `${dataAndSchema}, ${gen.object(...valCxt)}`;
    return context !== codegen_1.nil ? (0, codegen_1._) `${func}.call(${context}, ${args})` : (0, codegen_1._) `${func}(${args})`;
}
exports.callValidateCode = callValidateCode;
const newRegExp = (0, codegen_1._) `new RegExp`;
function usePattern({ gen, it: { opts } }, pattern) {
    const u = opts.unicodeRegExp ? "u" : "";
    const { regExp } = opts.code;
    const rx = regExp(pattern, u);
    return gen.scopeValue("pattern", {
        key: rx.toString(),
        ref: rx,
        code: (0, codegen_1._) `${regExp.code === "new RegExp" ? newRegExp : (0, util_2.useFunc)(gen, regExp)}(${pattern}, ${u})`,
    });
}
exports.usePattern = usePattern;
function validateArray(cxt) {
    const { gen, data, keyword, it } = cxt;
    const valid = gen.name("valid");
    if (it.allErrors) {
        const validArr = gen.let("valid", true);
        validateItems(() => gen.assign(validArr, false));
        return validArr;
    }
    gen.var(valid, true);
    validateItems(() => gen.break());
    return valid;
    function validateItems(notValid) {
        const len = gen.const("len", (0, codegen_1._) `${data}.length`);
        gen.forRange("i", 0, len, (i) => {
            cxt.subschema({
                keyword,
                dataProp: i,
                dataPropType: util_1.Type.Num,
            }, valid);
            gen.if((0, codegen_1.not)(valid), notValid);
        });
    }
}
exports.validateArray = validateArray;
function validateUnion(cxt) {
    const { gen, schema, keyword, it } = cxt;
    /* istanbul ignore if */
    if (!Array.isArray(schema))
        throw new Error("ajv implementation error");
    const alwaysValid = schema.some((sch) => (0, util_1.alwaysValidSchema)(it, sch));
    if (alwaysValid && !it.opts.unevaluated)
        return;
    const valid = gen.let("valid", false);
    const schValid = gen.name("_valid");
    gen.block(() => schema.forEach((_sch, i) => {
        const schCxt = cxt.subschema({
            keyword,
            schemaProp: i,
            compositeRule: true,
        }, schValid);
        gen.assign(valid, (0, codegen_1._) `${valid} || ${schValid}`);
        const merged = cxt.mergeValidEvaluated(schCxt, schValid);
        // can short-circuit if `unevaluatedProperties/Items` not supported (opts.unevaluated !== true)
        // or if all properties and items were evaluated (it.props === true && it.items === true)
        if (!merged)
            gen.if((0, codegen_1.not)(valid));
    }));
    cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
}
exports.validateUnion = validateUnion;
//# sourceMappingURL=code.js.map

/***/ }),

/***/ 9872:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const def = {
    keyword: "id",
    code() {
        throw new Error('NOT SUPPORTED: keyword "id", use "$id" for schema ID');
    },
};
exports["default"] = def;
//# sourceMappingURL=id.js.map

/***/ }),

/***/ 7397:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const id_1 = __nccwpck_require__(9872);
const ref_1 = __nccwpck_require__(2996);
const core = [
    "$schema",
    "$id",
    "$defs",
    "$vocabulary",
    { keyword: "$comment" },
    "definitions",
    id_1.default,
    ref_1.default,
];
exports["default"] = core;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 2996:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.callRef = exports.getValidate = void 0;
const ref_error_1 = __nccwpck_require__(3162);
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const names_1 = __nccwpck_require__(630);
const compile_1 = __nccwpck_require__(2718);
const util_1 = __nccwpck_require__(4464);
const def = {
    keyword: "$ref",
    schemaType: "string",
    code(cxt) {
        const { gen, schema: $ref, it } = cxt;
        const { baseId, schemaEnv: env, validateName, opts, self } = it;
        const { root } = env;
        if (($ref === "#" || $ref === "#/") && baseId === root.baseId)
            return callRootRef();
        const schOrEnv = compile_1.resolveRef.call(self, root, baseId, $ref);
        if (schOrEnv === undefined)
            throw new ref_error_1.default(it.opts.uriResolver, baseId, $ref);
        if (schOrEnv instanceof compile_1.SchemaEnv)
            return callValidate(schOrEnv);
        return inlineRefSchema(schOrEnv);
        function callRootRef() {
            if (env === root)
                return callRef(cxt, validateName, env, env.$async);
            const rootName = gen.scopeValue("root", { ref: root });
            return callRef(cxt, (0, codegen_1._) `${rootName}.validate`, root, root.$async);
        }
        function callValidate(sch) {
            const v = getValidate(cxt, sch);
            callRef(cxt, v, sch, sch.$async);
        }
        function inlineRefSchema(sch) {
            const schName = gen.scopeValue("schema", opts.code.source === true ? { ref: sch, code: (0, codegen_1.stringify)(sch) } : { ref: sch });
            const valid = gen.name("valid");
            const schCxt = cxt.subschema({
                schema: sch,
                dataTypes: [],
                schemaPath: codegen_1.nil,
                topSchemaRef: schName,
                errSchemaPath: $ref,
            }, valid);
            cxt.mergeEvaluated(schCxt);
            cxt.ok(valid);
        }
    },
};
function getValidate(cxt, sch) {
    const { gen } = cxt;
    return sch.validate
        ? gen.scopeValue("validate", { ref: sch.validate })
        : (0, codegen_1._) `${gen.scopeValue("wrapper", { ref: sch })}.validate`;
}
exports.getValidate = getValidate;
function callRef(cxt, v, sch, $async) {
    const { gen, it } = cxt;
    const { allErrors, schemaEnv: env, opts } = it;
    const passCxt = opts.passContext ? names_1.default.this : codegen_1.nil;
    if ($async)
        callAsyncRef();
    else
        callSyncRef();
    function callAsyncRef() {
        if (!env.$async)
            throw new Error("async schema referenced by sync schema");
        const valid = gen.let("valid");
        gen.try(() => {
            gen.code((0, codegen_1._) `await ${(0, code_1.callValidateCode)(cxt, v, passCxt)}`);
            addEvaluatedFrom(v); // TODO will not work with async, it has to be returned with the result
            if (!allErrors)
                gen.assign(valid, true);
        }, (e) => {
            gen.if((0, codegen_1._) `!(${e} instanceof ${it.ValidationError})`, () => gen.throw(e));
            addErrorsFrom(e);
            if (!allErrors)
                gen.assign(valid, false);
        });
        cxt.ok(valid);
    }
    function callSyncRef() {
        cxt.result((0, code_1.callValidateCode)(cxt, v, passCxt), () => addEvaluatedFrom(v), () => addErrorsFrom(v));
    }
    function addErrorsFrom(source) {
        const errs = (0, codegen_1._) `${source}.errors`;
        gen.assign(names_1.default.vErrors, (0, codegen_1._) `${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`); // TODO tagged
        gen.assign(names_1.default.errors, (0, codegen_1._) `${names_1.default.vErrors}.length`);
    }
    function addEvaluatedFrom(source) {
        var _a;
        if (!it.opts.unevaluated)
            return;
        const schEvaluated = (_a = sch === null || sch === void 0 ? void 0 : sch.validate) === null || _a === void 0 ? void 0 : _a.evaluated;
        // TODO refactor
        if (it.props !== true) {
            if (schEvaluated && !schEvaluated.dynamicProps) {
                if (schEvaluated.props !== undefined) {
                    it.props = util_1.mergeEvaluated.props(gen, schEvaluated.props, it.props);
                }
            }
            else {
                const props = gen.var("props", (0, codegen_1._) `${source}.evaluated.props`);
                it.props = util_1.mergeEvaluated.props(gen, props, it.props, codegen_1.Name);
            }
        }
        if (it.items !== true) {
            if (schEvaluated && !schEvaluated.dynamicItems) {
                if (schEvaluated.items !== undefined) {
                    it.items = util_1.mergeEvaluated.items(gen, schEvaluated.items, it.items);
                }
            }
            else {
                const items = gen.var("items", (0, codegen_1._) `${source}.evaluated.items`);
                it.items = util_1.mergeEvaluated.items(gen, items, it.items, codegen_1.Name);
            }
        }
    }
}
exports.callRef = callRef;
exports["default"] = def;
//# sourceMappingURL=ref.js.map

/***/ }),

/***/ 8886:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const types_1 = __nccwpck_require__(7115);
const compile_1 = __nccwpck_require__(2718);
const ref_error_1 = __nccwpck_require__(3162);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { discrError, tagName } }) => discrError === types_1.DiscrError.Tag
        ? `tag "${tagName}" must be string`
        : `value of tag "${tagName}" must be in oneOf`,
    params: ({ params: { discrError, tag, tagName } }) => (0, codegen_1._) `{error: ${discrError}, tag: ${tagName}, tagValue: ${tag}}`,
};
const def = {
    keyword: "discriminator",
    type: "object",
    schemaType: "object",
    error,
    code(cxt) {
        const { gen, data, schema, parentSchema, it } = cxt;
        const { oneOf } = parentSchema;
        if (!it.opts.discriminator) {
            throw new Error("discriminator: requires discriminator option");
        }
        const tagName = schema.propertyName;
        if (typeof tagName != "string")
            throw new Error("discriminator: requires propertyName");
        if (schema.mapping)
            throw new Error("discriminator: mapping is not supported");
        if (!oneOf)
            throw new Error("discriminator: requires oneOf keyword");
        const valid = gen.let("valid", false);
        const tag = gen.const("tag", (0, codegen_1._) `${data}${(0, codegen_1.getProperty)(tagName)}`);
        gen.if((0, codegen_1._) `typeof ${tag} == "string"`, () => validateMapping(), () => cxt.error(false, { discrError: types_1.DiscrError.Tag, tag, tagName }));
        cxt.ok(valid);
        function validateMapping() {
            const mapping = getMapping();
            gen.if(false);
            for (const tagValue in mapping) {
                gen.elseIf((0, codegen_1._) `${tag} === ${tagValue}`);
                gen.assign(valid, applyTagSchema(mapping[tagValue]));
            }
            gen.else();
            cxt.error(false, { discrError: types_1.DiscrError.Mapping, tag, tagName });
            gen.endIf();
        }
        function applyTagSchema(schemaProp) {
            const _valid = gen.name("valid");
            const schCxt = cxt.subschema({ keyword: "oneOf", schemaProp }, _valid);
            cxt.mergeEvaluated(schCxt, codegen_1.Name);
            return _valid;
        }
        function getMapping() {
            var _a;
            const oneOfMapping = {};
            const topRequired = hasRequired(parentSchema);
            let tagRequired = true;
            for (let i = 0; i < oneOf.length; i++) {
                let sch = oneOf[i];
                if ((sch === null || sch === void 0 ? void 0 : sch.$ref) && !(0, util_1.schemaHasRulesButRef)(sch, it.self.RULES)) {
                    const ref = sch.$ref;
                    sch = compile_1.resolveRef.call(it.self, it.schemaEnv.root, it.baseId, ref);
                    if (sch instanceof compile_1.SchemaEnv)
                        sch = sch.schema;
                    if (sch === undefined)
                        throw new ref_error_1.default(it.opts.uriResolver, it.baseId, ref);
                }
                const propSch = (_a = sch === null || sch === void 0 ? void 0 : sch.properties) === null || _a === void 0 ? void 0 : _a[tagName];
                if (typeof propSch != "object") {
                    throw new Error(`discriminator: oneOf subschemas (or referenced schemas) must have "properties/${tagName}"`);
                }
                tagRequired = tagRequired && (topRequired || hasRequired(sch));
                addMappings(propSch, i);
            }
            if (!tagRequired)
                throw new Error(`discriminator: "${tagName}" must be required`);
            return oneOfMapping;
            function hasRequired({ required }) {
                return Array.isArray(required) && required.includes(tagName);
            }
            function addMappings(sch, i) {
                if (sch.const) {
                    addMapping(sch.const, i);
                }
                else if (sch.enum) {
                    for (const tagValue of sch.enum) {
                        addMapping(tagValue, i);
                    }
                }
                else {
                    throw new Error(`discriminator: "properties/${tagName}" must have "const" or "enum"`);
                }
            }
            function addMapping(tagValue, i) {
                if (typeof tagValue != "string" || tagValue in oneOfMapping) {
                    throw new Error(`discriminator: "${tagName}" values must be unique strings`);
                }
                oneOfMapping[tagValue] = i;
            }
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 7115:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.DiscrError = void 0;
var DiscrError;
(function (DiscrError) {
    DiscrError["Tag"] = "tag";
    DiscrError["Mapping"] = "mapping";
})(DiscrError || (exports.DiscrError = DiscrError = {}));
//# sourceMappingURL=types.js.map

/***/ }),

/***/ 9941:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const core_1 = __nccwpck_require__(7397);
const validation_1 = __nccwpck_require__(5481);
const applicator_1 = __nccwpck_require__(8775);
const format_1 = __nccwpck_require__(2601);
const metadata_1 = __nccwpck_require__(6620);
const draft7Vocabularies = [
    core_1.default,
    validation_1.default,
    (0, applicator_1.default)(),
    format_1.default,
    metadata_1.metadataVocabulary,
    metadata_1.contentVocabulary,
];
exports["default"] = draft7Vocabularies;
//# sourceMappingURL=draft7.js.map

/***/ }),

/***/ 6402:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message: ({ schemaCode }) => (0, codegen_1.str) `must match format "${schemaCode}"`,
    params: ({ schemaCode }) => (0, codegen_1._) `{format: ${schemaCode}}`,
};
const def = {
    keyword: "format",
    type: ["number", "string"],
    schemaType: "string",
    $data: true,
    error,
    code(cxt, ruleType) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const { opts, errSchemaPath, schemaEnv, self } = it;
        if (!opts.validateFormats)
            return;
        if ($data)
            validate$DataFormat();
        else
            validateFormat();
        function validate$DataFormat() {
            const fmts = gen.scopeValue("formats", {
                ref: self.formats,
                code: opts.code.formats,
            });
            const fDef = gen.const("fDef", (0, codegen_1._) `${fmts}[${schemaCode}]`);
            const fType = gen.let("fType");
            const format = gen.let("format");
            // TODO simplify
            gen.if((0, codegen_1._) `typeof ${fDef} == "object" && !(${fDef} instanceof RegExp)`, () => gen.assign(fType, (0, codegen_1._) `${fDef}.type || "string"`).assign(format, (0, codegen_1._) `${fDef}.validate`), () => gen.assign(fType, (0, codegen_1._) `"string"`).assign(format, fDef));
            cxt.fail$data((0, codegen_1.or)(unknownFmt(), invalidFmt()));
            function unknownFmt() {
                if (opts.strictSchema === false)
                    return codegen_1.nil;
                return (0, codegen_1._) `${schemaCode} && !${format}`;
            }
            function invalidFmt() {
                const callFormat = schemaEnv.$async
                    ? (0, codegen_1._) `(${fDef}.async ? await ${format}(${data}) : ${format}(${data}))`
                    : (0, codegen_1._) `${format}(${data})`;
                const validData = (0, codegen_1._) `(typeof ${format} == "function" ? ${callFormat} : ${format}.test(${data}))`;
                return (0, codegen_1._) `${format} && ${format} !== true && ${fType} === ${ruleType} && !${validData}`;
            }
        }
        function validateFormat() {
            const formatDef = self.formats[schema];
            if (!formatDef) {
                unknownFormat();
                return;
            }
            if (formatDef === true)
                return;
            const [fmtType, format, fmtRef] = getFormat(formatDef);
            if (fmtType === ruleType)
                cxt.pass(validCondition());
            function unknownFormat() {
                if (opts.strictSchema === false) {
                    self.logger.warn(unknownMsg());
                    return;
                }
                throw new Error(unknownMsg());
                function unknownMsg() {
                    return `unknown format "${schema}" ignored in schema at path "${errSchemaPath}"`;
                }
            }
            function getFormat(fmtDef) {
                const code = fmtDef instanceof RegExp
                    ? (0, codegen_1.regexpCode)(fmtDef)
                    : opts.code.formats
                        ? (0, codegen_1._) `${opts.code.formats}${(0, codegen_1.getProperty)(schema)}`
                        : undefined;
                const fmt = gen.scopeValue("formats", { key: schema, ref: fmtDef, code });
                if (typeof fmtDef == "object" && !(fmtDef instanceof RegExp)) {
                    return [fmtDef.type || "string", fmtDef.validate, (0, codegen_1._) `${fmt}.validate`];
                }
                return ["string", fmtDef, fmt];
            }
            function validCondition() {
                if (typeof formatDef == "object" && !(formatDef instanceof RegExp) && formatDef.async) {
                    if (!schemaEnv.$async)
                        throw new Error("async format in sync schema");
                    return (0, codegen_1._) `await ${fmtRef}(${data})`;
                }
                return typeof format == "function" ? (0, codegen_1._) `${fmtRef}(${data})` : (0, codegen_1._) `${fmtRef}.test(${data})`;
            }
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=format.js.map

/***/ }),

/***/ 2601:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const format_1 = __nccwpck_require__(6402);
const format = [format_1.default];
exports["default"] = format;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 6620:
/***/ ((__unused_webpack_module, exports) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
exports.contentVocabulary = exports.metadataVocabulary = void 0;
exports.metadataVocabulary = [
    "title",
    "description",
    "default",
    "deprecated",
    "readOnly",
    "writeOnly",
    "examples",
];
exports.contentVocabulary = [
    "contentMediaType",
    "contentEncoding",
    "contentSchema",
];
//# sourceMappingURL=metadata.js.map

/***/ }),

/***/ 8026:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const equal_1 = __nccwpck_require__(4951);
const error = {
    message: "must be equal to constant",
    params: ({ schemaCode }) => (0, codegen_1._) `{allowedValue: ${schemaCode}}`,
};
const def = {
    keyword: "const",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schemaCode, schema } = cxt;
        if ($data || (schema && typeof schema == "object")) {
            cxt.fail$data((0, codegen_1._) `!${(0, util_1.useFunc)(gen, equal_1.default)}(${data}, ${schemaCode})`);
        }
        else {
            cxt.fail((0, codegen_1._) `${schema} !== ${data}`);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=const.js.map

/***/ }),

/***/ 3200:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const equal_1 = __nccwpck_require__(4951);
const error = {
    message: "must be equal to one of the allowed values",
    params: ({ schemaCode }) => (0, codegen_1._) `{allowedValues: ${schemaCode}}`,
};
const def = {
    keyword: "enum",
    schemaType: "array",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        if (!$data && schema.length === 0)
            throw new Error("enum must have non-empty array");
        const useLoop = schema.length >= it.opts.loopEnum;
        let eql;
        const getEql = () => (eql !== null && eql !== void 0 ? eql : (eql = (0, util_1.useFunc)(gen, equal_1.default)));
        let valid;
        if (useLoop || $data) {
            valid = gen.let("valid");
            cxt.block$data(valid, loopEnum);
        }
        else {
            /* istanbul ignore if */
            if (!Array.isArray(schema))
                throw new Error("ajv implementation error");
            const vSchema = gen.const("vSchema", schemaCode);
            valid = (0, codegen_1.or)(...schema.map((_x, i) => equalCode(vSchema, i)));
        }
        cxt.pass(valid);
        function loopEnum() {
            gen.assign(valid, false);
            gen.forOf("v", schemaCode, (v) => gen.if((0, codegen_1._) `${getEql()}(${data}, ${v})`, () => gen.assign(valid, true).break()));
        }
        function equalCode(vSchema, i) {
            const sch = schema[i];
            return typeof sch === "object" && sch !== null
                ? (0, codegen_1._) `${getEql()}(${data}, ${vSchema}[${i}])`
                : (0, codegen_1._) `${data} === ${sch}`;
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=enum.js.map

/***/ }),

/***/ 5481:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const limitNumber_1 = __nccwpck_require__(3723);
const multipleOf_1 = __nccwpck_require__(8132);
const limitLength_1 = __nccwpck_require__(6962);
const pattern_1 = __nccwpck_require__(6023);
const limitProperties_1 = __nccwpck_require__(895);
const required_1 = __nccwpck_require__(4504);
const limitItems_1 = __nccwpck_require__(6296);
const uniqueItems_1 = __nccwpck_require__(5132);
const const_1 = __nccwpck_require__(8026);
const enum_1 = __nccwpck_require__(3200);
const validation = [
    // number
    limitNumber_1.default,
    multipleOf_1.default,
    // string
    limitLength_1.default,
    pattern_1.default,
    // object
    limitProperties_1.default,
    required_1.default,
    // array
    limitItems_1.default,
    uniqueItems_1.default,
    // any
    { keyword: "type", schemaType: ["string", "array"] },
    { keyword: "nullable", schemaType: "boolean" },
    const_1.default,
    enum_1.default,
];
exports["default"] = validation;
//# sourceMappingURL=index.js.map

/***/ }),

/***/ 6296:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message({ keyword, schemaCode }) {
        const comp = keyword === "maxItems" ? "more" : "fewer";
        return (0, codegen_1.str) `must NOT have ${comp} than ${schemaCode} items`;
    },
    params: ({ schemaCode }) => (0, codegen_1._) `{limit: ${schemaCode}}`,
};
const def = {
    keyword: ["maxItems", "minItems"],
    type: "array",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxItems" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._) `${data}.length ${op} ${schemaCode}`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitItems.js.map

/***/ }),

/***/ 6962:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const ucs2length_1 = __nccwpck_require__(6214);
const error = {
    message({ keyword, schemaCode }) {
        const comp = keyword === "maxLength" ? "more" : "fewer";
        return (0, codegen_1.str) `must NOT have ${comp} than ${schemaCode} characters`;
    },
    params: ({ schemaCode }) => (0, codegen_1._) `{limit: ${schemaCode}}`,
};
const def = {
    keyword: ["maxLength", "minLength"],
    type: "string",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode, it } = cxt;
        const op = keyword === "maxLength" ? codegen_1.operators.GT : codegen_1.operators.LT;
        const len = it.opts.unicode === false ? (0, codegen_1._) `${data}.length` : (0, codegen_1._) `${(0, util_1.useFunc)(cxt.gen, ucs2length_1.default)}(${data})`;
        cxt.fail$data((0, codegen_1._) `${len} ${op} ${schemaCode}`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitLength.js.map

/***/ }),

/***/ 3723:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const ops = codegen_1.operators;
const KWDs = {
    maximum: { okStr: "<=", ok: ops.LTE, fail: ops.GT },
    minimum: { okStr: ">=", ok: ops.GTE, fail: ops.LT },
    exclusiveMaximum: { okStr: "<", ok: ops.LT, fail: ops.GTE },
    exclusiveMinimum: { okStr: ">", ok: ops.GT, fail: ops.LTE },
};
const error = {
    message: ({ keyword, schemaCode }) => (0, codegen_1.str) `must be ${KWDs[keyword].okStr} ${schemaCode}`,
    params: ({ keyword, schemaCode }) => (0, codegen_1._) `{comparison: ${KWDs[keyword].okStr}, limit: ${schemaCode}}`,
};
const def = {
    keyword: Object.keys(KWDs),
    type: "number",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        cxt.fail$data((0, codegen_1._) `${data} ${KWDs[keyword].fail} ${schemaCode} || isNaN(${data})`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitNumber.js.map

/***/ }),

/***/ 895:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message({ keyword, schemaCode }) {
        const comp = keyword === "maxProperties" ? "more" : "fewer";
        return (0, codegen_1.str) `must NOT have ${comp} than ${schemaCode} properties`;
    },
    params: ({ schemaCode }) => (0, codegen_1._) `{limit: ${schemaCode}}`,
};
const def = {
    keyword: ["maxProperties", "minProperties"],
    type: "object",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxProperties" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._) `Object.keys(${data}).length ${op} ${schemaCode}`);
    },
};
exports["default"] = def;
//# sourceMappingURL=limitProperties.js.map

/***/ }),

/***/ 8132:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message: ({ schemaCode }) => (0, codegen_1.str) `must be multiple of ${schemaCode}`,
    params: ({ schemaCode }) => (0, codegen_1._) `{multipleOf: ${schemaCode}}`,
};
const def = {
    keyword: "multipleOf",
    type: "number",
    schemaType: "number",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, schemaCode, it } = cxt;
        // const bdt = bad$DataType(schemaCode, <string>def.schemaType, $data)
        const prec = it.opts.multipleOfPrecision;
        const res = gen.let("res");
        const invalid = prec
            ? (0, codegen_1._) `Math.abs(Math.round(${res}) - ${res}) > 1e-${prec}`
            : (0, codegen_1._) `${res} !== parseInt(${res})`;
        cxt.fail$data((0, codegen_1._) `(${schemaCode} === 0 || (${res} = ${data}/${schemaCode}, ${invalid}))`);
    },
};
exports["default"] = def;
//# sourceMappingURL=multipleOf.js.map

/***/ }),

/***/ 6023:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const util_1 = __nccwpck_require__(4464);
const codegen_1 = __nccwpck_require__(1436);
const error = {
    message: ({ schemaCode }) => (0, codegen_1.str) `must match pattern "${schemaCode}"`,
    params: ({ schemaCode }) => (0, codegen_1._) `{pattern: ${schemaCode}}`,
};
const def = {
    keyword: "pattern",
    type: "string",
    schemaType: "string",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const u = it.opts.unicodeRegExp ? "u" : "";
        if ($data) {
            const { regExp } = it.opts.code;
            const regExpCode = regExp.code === "new RegExp" ? (0, codegen_1._) `new RegExp` : (0, util_1.useFunc)(gen, regExp);
            const valid = gen.let("valid");
            gen.try(() => gen.assign(valid, (0, codegen_1._) `${regExpCode}(${schemaCode}, ${u}).test(${data})`), () => gen.assign(valid, false));
            cxt.fail$data((0, codegen_1._) `!${valid}`);
        }
        else {
            const regExp = (0, code_1.usePattern)(cxt, schema);
            cxt.fail$data((0, codegen_1._) `!${regExp}.test(${data})`);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=pattern.js.map

/***/ }),

/***/ 4504:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const code_1 = __nccwpck_require__(8484);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const error = {
    message: ({ params: { missingProperty } }) => (0, codegen_1.str) `must have required property '${missingProperty}'`,
    params: ({ params: { missingProperty } }) => (0, codegen_1._) `{missingProperty: ${missingProperty}}`,
};
const def = {
    keyword: "required",
    type: "object",
    schemaType: "array",
    $data: true,
    error,
    code(cxt) {
        const { gen, schema, schemaCode, data, $data, it } = cxt;
        const { opts } = it;
        if (!$data && schema.length === 0)
            return;
        const useLoop = schema.length >= opts.loopRequired;
        if (it.allErrors)
            allErrorsMode();
        else
            exitOnErrorMode();
        if (opts.strictRequired) {
            const props = cxt.parentSchema.properties;
            const { definedProperties } = cxt.it;
            for (const requiredKey of schema) {
                if ((props === null || props === void 0 ? void 0 : props[requiredKey]) === undefined && !definedProperties.has(requiredKey)) {
                    const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
                    const msg = `required property "${requiredKey}" is not defined at "${schemaPath}" (strictRequired)`;
                    (0, util_1.checkStrictMode)(it, msg, it.opts.strictRequired);
                }
            }
        }
        function allErrorsMode() {
            if (useLoop || $data) {
                cxt.block$data(codegen_1.nil, loopAllRequired);
            }
            else {
                for (const prop of schema) {
                    (0, code_1.checkReportMissingProp)(cxt, prop);
                }
            }
        }
        function exitOnErrorMode() {
            const missing = gen.let("missing");
            if (useLoop || $data) {
                const valid = gen.let("valid", true);
                cxt.block$data(valid, () => loopUntilMissing(missing, valid));
                cxt.ok(valid);
            }
            else {
                gen.if((0, code_1.checkMissingProp)(cxt, schema, missing));
                (0, code_1.reportMissingProp)(cxt, missing);
                gen.else();
            }
        }
        function loopAllRequired() {
            gen.forOf("prop", schemaCode, (prop) => {
                cxt.setParams({ missingProperty: prop });
                gen.if((0, code_1.noPropertyInData)(gen, data, prop, opts.ownProperties), () => cxt.error());
            });
        }
        function loopUntilMissing(missing, valid) {
            cxt.setParams({ missingProperty: missing });
            gen.forOf(missing, schemaCode, () => {
                gen.assign(valid, (0, code_1.propertyInData)(gen, data, missing, opts.ownProperties));
                gen.if((0, codegen_1.not)(valid), () => {
                    cxt.error();
                    gen.break();
                });
            }, codegen_1.nil);
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=required.js.map

/***/ }),

/***/ 5132:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {


Object.defineProperty(exports, "__esModule", ({ value: true }));
const dataType_1 = __nccwpck_require__(6685);
const codegen_1 = __nccwpck_require__(1436);
const util_1 = __nccwpck_require__(4464);
const equal_1 = __nccwpck_require__(4951);
const error = {
    message: ({ params: { i, j } }) => (0, codegen_1.str) `must NOT have duplicate items (items ## ${j} and ${i} are identical)`,
    params: ({ params: { i, j } }) => (0, codegen_1._) `{i: ${i}, j: ${j}}`,
};
const def = {
    keyword: "uniqueItems",
    type: "array",
    schemaType: "boolean",
    $data: true,
    error,
    code(cxt) {
        const { gen, data, $data, schema, parentSchema, schemaCode, it } = cxt;
        if (!$data && !schema)
            return;
        const valid = gen.let("valid");
        const itemTypes = parentSchema.items ? (0, dataType_1.getSchemaTypes)(parentSchema.items) : [];
        cxt.block$data(valid, validateUniqueItems, (0, codegen_1._) `${schemaCode} === false`);
        cxt.ok(valid);
        function validateUniqueItems() {
            const i = gen.let("i", (0, codegen_1._) `${data}.length`);
            const j = gen.let("j");
            cxt.setParams({ i, j });
            gen.assign(valid, true);
            gen.if((0, codegen_1._) `${i} > 1`, () => (canOptimize() ? loopN : loopN2)(i, j));
        }
        function canOptimize() {
            return itemTypes.length > 0 && !itemTypes.some((t) => t === "object" || t === "array");
        }
        function loopN(i, j) {
            const item = gen.name("item");
            const wrongType = (0, dataType_1.checkDataTypes)(itemTypes, item, it.opts.strictNumbers, dataType_1.DataType.Wrong);
            const indices = gen.const("indices", (0, codegen_1._) `{}`);
            gen.for((0, codegen_1._) `;${i}--;`, () => {
                gen.let(item, (0, codegen_1._) `${data}[${i}]`);
                gen.if(wrongType, (0, codegen_1._) `continue`);
                if (itemTypes.length > 1)
                    gen.if((0, codegen_1._) `typeof ${item} == "string"`, (0, codegen_1._) `${item} += "_"`);
                gen
                    .if((0, codegen_1._) `typeof ${indices}[${item}] == "number"`, () => {
                    gen.assign(j, (0, codegen_1._) `${indices}[${item}]`);
                    cxt.error();
                    gen.assign(valid, false).break();
                })
                    .code((0, codegen_1._) `${indices}[${item}] = ${i}`);
            });
        }
        function loopN2(i, j) {
            const eql = (0, util_1.useFunc)(gen, equal_1.default);
            const outer = gen.name("outer");
            gen.label(outer).for((0, codegen_1._) `;${i}--;`, () => gen.for((0, codegen_1._) `${j} = ${i}; ${j}--;`, () => gen.if((0, codegen_1._) `${eql}(${data}[${i}], ${data}[${j}])`, () => {
                cxt.error();
                gen.assign(valid, false).break(outer);
            })));
        }
    },
};
exports["default"] = def;
//# sourceMappingURL=uniqueItems.js.map

/***/ }),

/***/ 3430:
/***/ ((module) => {



// do not edit .js files directly - edit src/index.jst



module.exports = function equal(a, b) {
  if (a === b) return true;

  if (a && b && typeof a == 'object' && typeof b == 'object') {
    if (a.constructor !== b.constructor) return false;

    var length, i, keys;
    if (Array.isArray(a)) {
      length = a.length;
      if (length != b.length) return false;
      for (i = length; i-- !== 0;)
        if (!equal(a[i], b[i])) return false;
      return true;
    }



    if (a.constructor === RegExp) return a.source === b.source && a.flags === b.flags;
    if (a.valueOf !== Object.prototype.valueOf) return a.valueOf() === b.valueOf();
    if (a.toString !== Object.prototype.toString) return a.toString() === b.toString();

    keys = Object.keys(a);
    length = keys.length;
    if (length !== Object.keys(b).length) return false;

    for (i = length; i-- !== 0;)
      if (!Object.prototype.hasOwnProperty.call(b, keys[i])) return false;

    for (i = length; i-- !== 0;) {
      var key = keys[i];

      if (!equal(a[key], b[key])) return false;
    }

    return true;
  }

  // true if both NaN, false otherwise
  return a!==a && b!==b;
};


/***/ }),

/***/ 1167:
/***/ ((module) => {



var traverse = module.exports = function (schema, opts, cb) {
  // Legacy support for v0.3.1 and earlier.
  if (typeof opts == 'function') {
    cb = opts;
    opts = {};
  }

  cb = opts.cb || cb;
  var pre = (typeof cb == 'function') ? cb : cb.pre || function() {};
  var post = cb.post || function() {};

  _traverse(opts, pre, post, schema, '', schema);
};


traverse.keywords = {
  additionalItems: true,
  items: true,
  contains: true,
  additionalProperties: true,
  propertyNames: true,
  not: true,
  if: true,
  then: true,
  else: true
};

traverse.arrayKeywords = {
  items: true,
  allOf: true,
  anyOf: true,
  oneOf: true
};

traverse.propsKeywords = {
  $defs: true,
  definitions: true,
  properties: true,
  patternProperties: true,
  dependencies: true
};

traverse.skipKeywords = {
  default: true,
  enum: true,
  const: true,
  required: true,
  maximum: true,
  minimum: true,
  exclusiveMaximum: true,
  exclusiveMinimum: true,
  multipleOf: true,
  maxLength: true,
  minLength: true,
  pattern: true,
  format: true,
  maxItems: true,
  minItems: true,
  uniqueItems: true,
  maxProperties: true,
  minProperties: true
};


function _traverse(opts, pre, post, schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex) {
  if (schema && typeof schema == 'object' && !Array.isArray(schema)) {
    pre(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
    for (var key in schema) {
      var sch = schema[key];
      if (Array.isArray(sch)) {
        if (key in traverse.arrayKeywords) {
          for (var i=0; i<sch.length; i++)
            _traverse(opts, pre, post, sch[i], jsonPtr + '/' + key + '/' + i, rootSchema, jsonPtr, key, schema, i);
        }
      } else if (key in traverse.propsKeywords) {
        if (sch && typeof sch == 'object') {
          for (var prop in sch)
            _traverse(opts, pre, post, sch[prop], jsonPtr + '/' + key + '/' + escapeJsonPtr(prop), rootSchema, jsonPtr, key, schema, prop);
        }
      } else if (key in traverse.keywords || (opts.allKeys && !(key in traverse.skipKeywords))) {
        _traverse(opts, pre, post, sch, jsonPtr + '/' + key, rootSchema, jsonPtr, key, schema);
      }
    }
    post(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
  }
}


function escapeJsonPtr(str) {
  return str.replace(/~/g, '~0').replace(/\//g, '~1');
}


/***/ }),

/***/ 4006:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const pico = __nccwpck_require__(8016);
const utils = __nccwpck_require__(4059);

function picomatch(glob, options, returnState = false) {
  // default to os.platform()
  if (options && (options.windows === null || options.windows === undefined)) {
    // don't mutate the original options object
    options = { ...options, windows: utils.isWindows() };
  }

  return pico(glob, options, returnState);
}

Object.assign(picomatch, pico);
module.exports = picomatch;


/***/ }),

/***/ 5595:
/***/ ((module) => {



const WIN_SLASH = '\\\\/';
const WIN_NO_SLASH = `[^${WIN_SLASH}]`;

const DEFAULT_MAX_EXTGLOB_RECURSION = 0;

/**
 * Posix glob regex
 */

const DOT_LITERAL = '\\.';
const PLUS_LITERAL = '\\+';
const QMARK_LITERAL = '\\?';
const SLASH_LITERAL = '\\/';
const ONE_CHAR = '(?=.)';
const QMARK = '[^/]';
const END_ANCHOR = `(?:${SLASH_LITERAL}|$)`;
const START_ANCHOR = `(?:^|${SLASH_LITERAL})`;
const DOTS_SLASH = `${DOT_LITERAL}{1,2}${END_ANCHOR}`;
const NO_DOT = `(?!${DOT_LITERAL})`;
const NO_DOTS = `(?!${START_ANCHOR}${DOTS_SLASH})`;
const NO_DOT_SLASH = `(?!${DOT_LITERAL}{0,1}${END_ANCHOR})`;
const NO_DOTS_SLASH = `(?!${DOTS_SLASH})`;
const QMARK_NO_DOT = `[^.${SLASH_LITERAL}]`;
const STAR = `${QMARK}*?`;
const SEP = '/';

const POSIX_CHARS = {
  DOT_LITERAL,
  PLUS_LITERAL,
  QMARK_LITERAL,
  SLASH_LITERAL,
  ONE_CHAR,
  QMARK,
  END_ANCHOR,
  DOTS_SLASH,
  NO_DOT,
  NO_DOTS,
  NO_DOT_SLASH,
  NO_DOTS_SLASH,
  QMARK_NO_DOT,
  STAR,
  START_ANCHOR,
  SEP
};

/**
 * Windows glob regex
 */

const WINDOWS_CHARS = {
  ...POSIX_CHARS,

  SLASH_LITERAL: `[${WIN_SLASH}]`,
  QMARK: WIN_NO_SLASH,
  STAR: `${WIN_NO_SLASH}*?`,
  DOTS_SLASH: `${DOT_LITERAL}{1,2}(?:[${WIN_SLASH}]|$)`,
  NO_DOT: `(?!${DOT_LITERAL})`,
  NO_DOTS: `(?!(?:^|[${WIN_SLASH}])${DOT_LITERAL}{1,2}(?:[${WIN_SLASH}]|$))`,
  NO_DOT_SLASH: `(?!${DOT_LITERAL}{0,1}(?:[${WIN_SLASH}]|$))`,
  NO_DOTS_SLASH: `(?!${DOT_LITERAL}{1,2}(?:[${WIN_SLASH}]|$))`,
  QMARK_NO_DOT: `[^.${WIN_SLASH}]`,
  START_ANCHOR: `(?:^|[${WIN_SLASH}])`,
  END_ANCHOR: `(?:[${WIN_SLASH}]|$)`,
  SEP: '\\'
};

/**
 * POSIX Bracket Regex
 */

const POSIX_REGEX_SOURCE = {
  __proto__: null,
  alnum: 'a-zA-Z0-9',
  alpha: 'a-zA-Z',
  ascii: '\\x00-\\x7F',
  blank: ' \\t',
  cntrl: '\\x00-\\x1F\\x7F',
  digit: '0-9',
  graph: '\\x21-\\x7E',
  lower: 'a-z',
  print: '\\x20-\\x7E ',
  punct: '\\-!"#$%&\'()\\*+,./:;<=>?@[\\]^_`{|}~',
  space: ' \\t\\r\\n\\v\\f',
  upper: 'A-Z',
  word: 'A-Za-z0-9_',
  xdigit: 'A-Fa-f0-9'
};

module.exports = {
  DEFAULT_MAX_EXTGLOB_RECURSION,
  MAX_LENGTH: 1024 * 64,
  POSIX_REGEX_SOURCE,

  // regular expressions
  REGEX_BACKSLASH: /\\(?![*+?^${}(|)[\]])/g,
  REGEX_NON_SPECIAL_CHARS: /^[^@![\].,$*+?^{}()|\\/]+/,
  REGEX_SPECIAL_CHARS: /[-*+?.^${}(|)[\]]/,
  REGEX_SPECIAL_CHARS_BACKREF: /(\\?)((\W)(\3*))/g,
  REGEX_SPECIAL_CHARS_GLOBAL: /([-*+?.^${}(|)[\]])/g,
  REGEX_REMOVE_BACKSLASH: /(?:\[.*?[^\\]\]|\\(?=.))/g,

  // Replace globs with equivalent patterns to reduce parsing time.
  REPLACEMENTS: {
    __proto__: null,
    '***': '*',
    '**/**': '**',
    '**/**/**': '**'
  },

  // Digits
  CHAR_0: 48, /* 0 */
  CHAR_9: 57, /* 9 */

  // Alphabet chars.
  CHAR_UPPERCASE_A: 65, /* A */
  CHAR_LOWERCASE_A: 97, /* a */
  CHAR_UPPERCASE_Z: 90, /* Z */
  CHAR_LOWERCASE_Z: 122, /* z */

  CHAR_LEFT_PARENTHESES: 40, /* ( */
  CHAR_RIGHT_PARENTHESES: 41, /* ) */

  CHAR_ASTERISK: 42, /* * */

  // Non-alphabetic chars.
  CHAR_AMPERSAND: 38, /* & */
  CHAR_AT: 64, /* @ */
  CHAR_BACKWARD_SLASH: 92, /* \ */
  CHAR_CARRIAGE_RETURN: 13, /* \r */
  CHAR_CIRCUMFLEX_ACCENT: 94, /* ^ */
  CHAR_COLON: 58, /* : */
  CHAR_COMMA: 44, /* , */
  CHAR_DOT: 46, /* . */
  CHAR_DOUBLE_QUOTE: 34, /* " */
  CHAR_EQUAL: 61, /* = */
  CHAR_EXCLAMATION_MARK: 33, /* ! */
  CHAR_FORM_FEED: 12, /* \f */
  CHAR_FORWARD_SLASH: 47, /* / */
  CHAR_GRAVE_ACCENT: 96, /* ` */
  CHAR_HASH: 35, /* # */
  CHAR_HYPHEN_MINUS: 45, /* - */
  CHAR_LEFT_ANGLE_BRACKET: 60, /* < */
  CHAR_LEFT_CURLY_BRACE: 123, /* { */
  CHAR_LEFT_SQUARE_BRACKET: 91, /* [ */
  CHAR_LINE_FEED: 10, /* \n */
  CHAR_NO_BREAK_SPACE: 160, /* \u00A0 */
  CHAR_PERCENT: 37, /* % */
  CHAR_PLUS: 43, /* + */
  CHAR_QUESTION_MARK: 63, /* ? */
  CHAR_RIGHT_ANGLE_BRACKET: 62, /* > */
  CHAR_RIGHT_CURLY_BRACE: 125, /* } */
  CHAR_RIGHT_SQUARE_BRACKET: 93, /* ] */
  CHAR_SEMICOLON: 59, /* ; */
  CHAR_SINGLE_QUOTE: 39, /* ' */
  CHAR_SPACE: 32, /*   */
  CHAR_TAB: 9, /* \t */
  CHAR_UNDERSCORE: 95, /* _ */
  CHAR_VERTICAL_LINE: 124, /* | */
  CHAR_ZERO_WIDTH_NOBREAK_SPACE: 65279, /* \uFEFF */

  /**
   * Create EXTGLOB_CHARS
   */

  extglobChars(chars) {
    return {
      '!': { type: 'negate', open: '(?:(?!(?:', close: `))${chars.STAR})` },
      '?': { type: 'qmark', open: '(?:', close: ')?' },
      '+': { type: 'plus', open: '(?:', close: ')+' },
      '*': { type: 'star', open: '(?:', close: ')*' },
      '@': { type: 'at', open: '(?:', close: ')' }
    };
  },

  /**
   * Create GLOB_CHARS
   */

  globChars(win32) {
    return win32 === true ? WINDOWS_CHARS : POSIX_CHARS;
  }
};


/***/ }),

/***/ 8265:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const constants = __nccwpck_require__(5595);
const utils = __nccwpck_require__(4059);

/**
 * Constants
 */

const {
  MAX_LENGTH,
  POSIX_REGEX_SOURCE,
  REGEX_NON_SPECIAL_CHARS,
  REGEX_SPECIAL_CHARS_BACKREF,
  REPLACEMENTS
} = constants;

/**
 * Helpers
 */

const expandRange = (args, options) => {
  if (typeof options.expandRange === 'function') {
    return options.expandRange(...args, options);
  }

  args.sort();
  const value = `[${args.join('-')}]`;

  try {
    /* eslint-disable-next-line no-new */
    new RegExp(value);
  } catch (ex) {
    return args.map(v => utils.escapeRegex(v)).join('..');
  }

  return value;
};

/**
 * Create the message for a syntax error
 */

const syntaxError = (type, char) => {
  return `Missing ${type}: "${char}" - use "\\\\${char}" to match literal characters`;
};

const splitTopLevel = input => {
  const parts = [];
  let bracket = 0;
  let paren = 0;
  let quote = 0;
  let value = '';
  let escaped = false;

  for (const ch of input) {
    if (escaped === true) {
      value += ch;
      escaped = false;
      continue;
    }

    if (ch === '\\') {
      value += ch;
      escaped = true;
      continue;
    }

    if (ch === '"') {
      quote = quote === 1 ? 0 : 1;
      value += ch;
      continue;
    }

    if (quote === 0) {
      if (ch === '[') {
        bracket++;
      } else if (ch === ']' && bracket > 0) {
        bracket--;
      } else if (bracket === 0) {
        if (ch === '(') {
          paren++;
        } else if (ch === ')' && paren > 0) {
          paren--;
        } else if (ch === '|' && paren === 0) {
          parts.push(value);
          value = '';
          continue;
        }
      }
    }

    value += ch;
  }

  parts.push(value);
  return parts;
};

const isPlainBranch = branch => {
  let escaped = false;

  for (const ch of branch) {
    if (escaped === true) {
      escaped = false;
      continue;
    }

    if (ch === '\\') {
      escaped = true;
      continue;
    }

    if (/[?*+@!()[\]{}]/.test(ch)) {
      return false;
    }
  }

  return true;
};

const normalizeSimpleBranch = branch => {
  let value = branch.trim();
  let changed = true;

  while (changed === true) {
    changed = false;

    if (/^@\([^\\()[\]{}|]+\)$/.test(value)) {
      value = value.slice(2, -1);
      changed = true;
    }
  }

  if (!isPlainBranch(value)) {
    return;
  }

  return value.replace(/\\(.)/g, '$1');
};

const hasRepeatedCharPrefixOverlap = branches => {
  const values = branches.map(normalizeSimpleBranch).filter(Boolean);

  for (let i = 0; i < values.length; i++) {
    for (let j = i + 1; j < values.length; j++) {
      const a = values[i];
      const b = values[j];
      const char = a[0];

      if (!char || a !== char.repeat(a.length) || b !== char.repeat(b.length)) {
        continue;
      }

      if (a === b || a.startsWith(b) || b.startsWith(a)) {
        return true;
      }
    }
  }

  return false;
};

const parseRepeatedExtglob = (pattern, requireEnd = true) => {
  if ((pattern[0] !== '+' && pattern[0] !== '*') || pattern[1] !== '(') {
    return;
  }

  let bracket = 0;
  let paren = 0;
  let quote = 0;
  let escaped = false;

  for (let i = 1; i < pattern.length; i++) {
    const ch = pattern[i];

    if (escaped === true) {
      escaped = false;
      continue;
    }

    if (ch === '\\') {
      escaped = true;
      continue;
    }

    if (ch === '"') {
      quote = quote === 1 ? 0 : 1;
      continue;
    }

    if (quote === 1) {
      continue;
    }

    if (ch === '[') {
      bracket++;
      continue;
    }

    if (ch === ']' && bracket > 0) {
      bracket--;
      continue;
    }

    if (bracket > 0) {
      continue;
    }

    if (ch === '(') {
      paren++;
      continue;
    }

    if (ch === ')') {
      paren--;

      if (paren === 0) {
        if (requireEnd === true && i !== pattern.length - 1) {
          return;
        }

        return {
          type: pattern[0],
          body: pattern.slice(2, i),
          end: i
        };
      }
    }
  }
};

const buildCharClassStar = chars => {
  const source = chars.length === 1
    ? utils.escapeRegex(chars[0])
    : `[${chars.map(ch => utils.escapeRegex(ch)).join('')}]`;

  return `${source}*`;
};

const getStarExtglobSequenceChars = pattern => {
  let index = 0;
  const chars = [];

  while (index < pattern.length) {
    const match = parseRepeatedExtglob(pattern.slice(index), false);

    if (!match || match.type !== '*') {
      return;
    }

    const branches = splitTopLevel(match.body).map(branch => branch.trim());
    if (branches.length !== 1) {
      return;
    }

    const branch = normalizeSimpleBranch(branches[0]);
    if (!branch || branch.length !== 1) {
      return;
    }

    chars.push(branch);
    index += match.end + 1;
  }

  if (chars.length < 1) {
    return;
  }

  return chars;
};

const repeatedExtglobRecursion = pattern => {
  let depth = 0;
  let value = pattern.trim();
  let match = parseRepeatedExtglob(value);

  while (match) {
    depth++;
    value = match.body.trim();
    match = parseRepeatedExtglob(value);
  }

  return depth;
};

const analyzeRepeatedExtglob = (body, options) => {
  if (options.maxExtglobRecursion === false) {
    return { risky: false };
  }

  const max =
    typeof options.maxExtglobRecursion === 'number'
      ? options.maxExtglobRecursion
      : constants.DEFAULT_MAX_EXTGLOB_RECURSION;

  const branches = splitTopLevel(body).map(branch => branch.trim());

  if (branches.length > 1) {
    if (
      branches.some(branch => branch === '') ||
      branches.some(branch => /^[*?]+$/.test(branch)) ||
      hasRepeatedCharPrefixOverlap(branches)
    ) {
      return { risky: true };
    }
  }

  // A repeated extglob is "risky" (prone to catastrophic backtracking) when a
  // branch is itself a `*(...)` sequence, since that nests an unbounded quantifier
  // inside the outer `+(...)`/`*(...)`. When *every* branch reduces to single
  // characters we can emit one flat, ReDoS-safe character class that preserves the
  // meaning of ALL branches (e.g. `+(*(a)|*(b))` -> `[ab]*`), rather than dropping
  // every branch but the first.
  const safeChars = [];
  let sawStarSequence = false;
  let combinable = true;

  for (const branch of branches) {
    const chars = getStarExtglobSequenceChars(branch);
    if (chars) {
      sawStarSequence = true;
      safeChars.push(...chars);
      continue;
    }

    const literal = normalizeSimpleBranch(branch);
    if (literal && literal.length === 1) {
      safeChars.push(literal);
      continue;
    }

    combinable = false;

    if (repeatedExtglobRecursion(branch) > max) {
      return { risky: true };
    }
  }

  if (sawStarSequence) {
    return combinable
      ? { risky: true, safeOutput: buildCharClassStar([...new Set(safeChars)]) }
      : { risky: true };
  }

  return { risky: false };
};

/**
 * Parse the given input string.
 * @param {String} input
 * @param {Object} options
 * @return {Object}
 */

const parse = (input, options) => {
  if (typeof input !== 'string') {
    throw new TypeError('Expected a string');
  }

  input = REPLACEMENTS[input] || input;

  const opts = { ...options };
  const max = typeof opts.maxLength === 'number' ? Math.min(MAX_LENGTH, opts.maxLength) : MAX_LENGTH;

  let len = input.length;
  if (len > max) {
    throw new SyntaxError(`Input length: ${len}, exceeds maximum allowed length: ${max}`);
  }

  const bos = { type: 'bos', value: '', output: opts.prepend || '' };
  const tokens = [bos];

  const capture = opts.capture ? '' : '?:';

  // create constants based on platform, for windows or posix
  const PLATFORM_CHARS = constants.globChars(opts.windows);
  const EXTGLOB_CHARS = constants.extglobChars(PLATFORM_CHARS);

  const {
    DOT_LITERAL,
    PLUS_LITERAL,
    SLASH_LITERAL,
    ONE_CHAR,
    DOTS_SLASH,
    NO_DOT,
    NO_DOT_SLASH,
    NO_DOTS_SLASH,
    QMARK,
    QMARK_NO_DOT,
    STAR,
    START_ANCHOR
  } = PLATFORM_CHARS;

  const globstar = opts => {
    return `(${capture}(?:(?!${START_ANCHOR}${opts.dot ? DOTS_SLASH : DOT_LITERAL}).)*?)`;
  };

  const nodot = opts.dot ? '' : NO_DOT;
  const qmarkNoDot = opts.dot ? QMARK : QMARK_NO_DOT;
  let star = opts.bash === true ? globstar(opts) : STAR;

  if (opts.capture) {
    star = `(${star})`;
  }

  // minimatch options support
  if (typeof opts.noext === 'boolean') {
    opts.noextglob = opts.noext;
  }

  const state = {
    input,
    index: -1,
    start: 0,
    dot: opts.dot === true,
    consumed: '',
    output: '',
    prefix: '',
    backtrack: false,
    negated: false,
    brackets: 0,
    braces: 0,
    parens: 0,
    quotes: 0,
    globstar: false,
    tokens
  };

  input = utils.removePrefix(input, state);
  len = input.length;

  const extglobs = [];
  const braces = [];
  const stack = [];
  let prev = bos;
  let value;

  /**
   * Tokenizing helpers
   */

  const eos = () => state.index === len - 1;
  const peek = state.peek = (n = 1) => input[state.index + n];
  const advance = state.advance = () => input[++state.index] || '';
  const remaining = () => input.slice(state.index + 1);
  const consume = (value = '', num = 0) => {
    state.consumed += value;
    state.index += num;
  };

  const append = token => {
    state.output += token.output != null ? token.output : token.value;
    consume(token.value);
  };

  const negate = () => {
    let count = 1;

    while (peek() === '!' && (peek(2) !== '(' || peek(3) === '?')) {
      advance();
      state.start++;
      count++;
    }

    if (count % 2 === 0) {
      return false;
    }

    state.negated = true;
    state.start++;
    return true;
  };

  const increment = type => {
    state[type]++;
    stack.push(type);
  };

  const decrement = type => {
    state[type]--;
    stack.pop();
  };

  /**
   * Push tokens onto the tokens array. This helper speeds up
   * tokenizing by 1) helping us avoid backtracking as much as possible,
   * and 2) helping us avoid creating extra tokens when consecutive
   * characters are plain text. This improves performance and simplifies
   * lookbehinds.
   */

  const push = tok => {
    if (prev.type === 'globstar') {
      const isBrace = state.braces > 0 && (tok.type === 'comma' || tok.type === 'brace');
      const isExtglob = tok.extglob === true || (extglobs.length && (tok.type === 'pipe' || tok.type === 'paren'));

      if (tok.type !== 'slash' && tok.type !== 'paren' && !isBrace && !isExtglob) {
        state.output = state.output.slice(0, -prev.output.length);
        prev.type = 'star';
        prev.value = '*';
        prev.output = star;
        state.output += prev.output;
      }
    }

    if (extglobs.length && tok.type !== 'paren') {
      extglobs[extglobs.length - 1].inner += tok.value;
    }

    if (tok.value || tok.output) append(tok);
    if (prev && prev.type === 'text' && tok.type === 'text') {
      prev.output = (prev.output || prev.value) + tok.value;
      prev.value += tok.value;
      return;
    }

    tok.prev = prev;
    tokens.push(tok);
    prev = tok;
  };

  const extglobOpen = (type, value) => {
    const token = { ...EXTGLOB_CHARS[value], conditions: 1, inner: '' };

    token.prev = prev;
    token.parens = state.parens;
    token.output = state.output;
    token.startIndex = state.index;
    token.tokensIndex = tokens.length;
    const output = (opts.capture ? '(' : '') + token.open;

    increment('parens');
    push({ type, value, output: state.output ? '' : ONE_CHAR });
    push({ type: 'paren', extglob: true, value: advance(), output });
    extglobs.push(token);
  };

  const extglobClose = token => {
    const literal = input.slice(token.startIndex, state.index + 1);
    const body = input.slice(token.startIndex + 2, state.index);
    const analysis = analyzeRepeatedExtglob(body, opts);

    if ((token.type === 'plus' || token.type === 'star') && analysis.risky) {
      const safeOutput = analysis.safeOutput
        ? (token.output ? '' : ONE_CHAR) + (opts.capture ? `(${analysis.safeOutput})` : analysis.safeOutput)
        : undefined;
      const open = tokens[token.tokensIndex];

      open.type = 'text';
      open.value = literal;
      open.output = safeOutput || utils.escapeRegex(literal);

      for (let i = token.tokensIndex + 1; i < tokens.length; i++) {
        tokens[i].value = '';
        tokens[i].output = '';
        delete tokens[i].suffix;
      }

      state.output = token.output + open.output;
      state.backtrack = true;

      push({ type: 'paren', extglob: true, value, output: '' });
      decrement('parens');
      return;
    }

    let output = token.close + (opts.capture ? ')' : '');
    let rest;

    if (token.type === 'negate') {
      let extglobStar = star;

      if (token.inner && token.inner.length > 1 && token.inner.includes('/')) {
        extglobStar = globstar(opts);
      }

      if (extglobStar !== star || eos() || /^\)+$/.test(remaining())) {
        output = token.close = `)$))${extglobStar}`;
      }

      if (token.inner.includes('*') && (rest = remaining()) && /^\.[^\\/.]+$/.test(rest)) {
        // Any non-magical string (`.ts`) or even nested expression (`.{ts,tsx}`) can follow after the closing parenthesis.
        // In this case, we need to parse the string and use it in the output of the original pattern.
        // Suitable patterns: `/!(*.d).ts`, `/!(*.d).{ts,tsx}`, `**/!(*-dbg).@(js)`.
        //
        // Disabling the `fastpaths` option due to a problem with parsing strings as `.ts` in the pattern like `**/!(*.d).ts`.
        const expression = parse(rest, { ...options, fastpaths: false }).output;

        output = token.close = `)${expression})${extglobStar})`;
      }

      if (token.prev.type === 'bos') {
        state.negatedExtglob = true;
      }
    }

    push({ type: 'paren', extglob: true, value, output });
    decrement('parens');
  };

  /**
   * Fast paths
   */

  if (opts.fastpaths !== false && !/(^[*!]|[/()[\]{}"])/.test(input)) {
    let backslashes = false;

    let output = input.replace(REGEX_SPECIAL_CHARS_BACKREF, (m, esc, chars, first, rest, index) => {
      if (first === '\\') {
        backslashes = true;
        return m;
      }

      if (first === '?') {
        if (esc) {
          return esc + first + (rest ? QMARK.repeat(rest.length) : '');
        }
        if (index === 0) {
          return qmarkNoDot + (rest ? QMARK.repeat(rest.length) : '');
        }
        return QMARK.repeat(chars.length);
      }

      if (first === '.') {
        return DOT_LITERAL.repeat(chars.length);
      }

      if (first === '*') {
        if (esc) {
          return esc + first + (rest ? star : '');
        }
        return star;
      }
      return esc ? m : `\\${m}`;
    });

    if (backslashes === true) {
      if (opts.unescape === true) {
        output = output.replace(/\\/g, '');
      } else {
        output = output.replace(/\\+/g, m => {
          return m.length % 2 === 0 ? '\\\\' : (m ? '\\' : '');
        });
      }
    }

    if (output === input && opts.contains === true) {
      state.output = input;
      return state;
    }

    state.output = utils.wrapOutput(output, state, options);
    return state;
  }

  /**
   * Tokenize input until we reach end-of-string
   */

  while (!eos()) {
    value = advance();

    if (value === '\u0000') {
      continue;
    }

    /**
     * Escaped characters
     */

    if (value === '\\') {
      const next = peek();

      if (next === '/' && opts.bash !== true) {
        continue;
      }

      if (next === '.' || next === ';') {
        continue;
      }

      if (!next) {
        value += '\\';
        push({ type: 'text', value });
        continue;
      }

      // collapse slashes to reduce potential for exploits
      const match = /^\\+/.exec(remaining());
      let slashes = 0;

      if (match && match[0].length > 2) {
        slashes = match[0].length;
        state.index += slashes;
        if (slashes % 2 !== 0) {
          value += '\\';
        }
      }

      if (opts.unescape === true) {
        value = advance();
      } else {
        value += advance();
      }

      if (state.brackets === 0) {
        push({ type: 'text', value });
        continue;
      }
    }

    /**
     * If we're inside a regex character class, continue
     * until we reach the closing bracket.
     */

    if (state.brackets > 0 && (value !== ']' || prev.value === '[' || prev.value === '[^')) {
      if (opts.posix !== false && value === ':') {
        const inner = prev.value.slice(1);
        if (inner.includes('[')) {
          prev.posix = true;

          if (inner.includes(':')) {
            const idx = prev.value.lastIndexOf('[');
            const pre = prev.value.slice(0, idx);
            const rest = prev.value.slice(idx + 2);
            const posix = POSIX_REGEX_SOURCE[rest];
            if (posix) {
              prev.value = pre + posix;
              state.backtrack = true;
              advance();

              if (!bos.output && tokens.indexOf(prev) === 1) {
                bos.output = ONE_CHAR;
              }
              continue;
            }
          }
        }
      }

      if ((value === '[' && peek() !== ':') || (value === '-' && peek() === ']')) {
        value = `\\${value}`;
      }

      if (value === ']' && (prev.value === '[' || prev.value === '[^')) {
        value = `\\${value}`;
      }

      if (opts.posix === true && value === '!' && prev.value === '[') {
        value = '^';
      }

      prev.value += value;
      append({ value });
      continue;
    }

    /**
     * If we're inside a quoted string, continue
     * until we reach the closing double quote.
     */

    if (state.quotes === 1 && value !== '"') {
      value = utils.escapeRegex(value);
      prev.value += value;
      append({ value });
      continue;
    }

    /**
     * Double quotes
     */

    if (value === '"') {
      state.quotes = state.quotes === 1 ? 0 : 1;
      if (opts.keepQuotes === true) {
        push({ type: 'text', value });
      }
      continue;
    }

    /**
     * Parentheses
     */

    if (value === '(') {
      increment('parens');
      push({ type: 'paren', value });
      continue;
    }

    if (value === ')') {
      if (state.parens === 0 && opts.strictBrackets === true) {
        throw new SyntaxError(syntaxError('opening', '('));
      }

      const extglob = extglobs[extglobs.length - 1];
      if (extglob && state.parens === extglob.parens + 1) {
        extglobClose(extglobs.pop());
        continue;
      }

      push({ type: 'paren', value, output: state.parens ? ')' : '\\)' });
      decrement('parens');
      continue;
    }

    /**
     * Square brackets
     */

    if (value === '[') {
      if (opts.nobracket === true || !remaining().includes(']')) {
        if (opts.nobracket !== true && opts.strictBrackets === true) {
          throw new SyntaxError(syntaxError('closing', ']'));
        }

        value = `\\${value}`;
      } else {
        increment('brackets');
      }

      push({ type: 'bracket', value });
      continue;
    }

    if (value === ']') {
      if (opts.nobracket === true || (prev && prev.type === 'bracket' && prev.value.length === 1)) {
        push({ type: 'text', value, output: `\\${value}` });
        continue;
      }

      if (state.brackets === 0) {
        if (opts.strictBrackets === true) {
          throw new SyntaxError(syntaxError('opening', '['));
        }

        push({ type: 'text', value, output: `\\${value}` });
        continue;
      }

      decrement('brackets');

      const prevValue = prev.value.slice(1);
      if (prev.posix !== true && prevValue[0] === '^' && !prevValue.includes('/')) {
        value = `/${value}`;
      }

      prev.value += value;
      append({ value });

      // when literal brackets are explicitly disabled
      // assume we should match with a regex character class
      if (opts.literalBrackets === false || utils.hasRegexChars(prevValue)) {
        continue;
      }

      const escaped = utils.escapeRegex(prev.value);
      state.output = state.output.slice(0, -prev.value.length);

      // when literal brackets are explicitly enabled
      // assume we should escape the brackets to match literal characters
      if (opts.literalBrackets === true) {
        state.output += escaped;
        prev.value = escaped;
        continue;
      }

      // when the user specifies nothing, try to match both
      prev.value = `(${capture}${escaped}|${prev.value})`;
      state.output += prev.value;
      continue;
    }

    /**
     * Braces
     */

    if (value === '{' && opts.nobrace !== true) {
      increment('braces');

      const open = {
        type: 'brace',
        value,
        output: '(',
        outputIndex: state.output.length,
        tokensIndex: state.tokens.length
      };

      braces.push(open);
      push(open);
      continue;
    }

    if (value === '}') {
      const brace = braces[braces.length - 1];

      if (opts.nobrace === true || !brace) {
        push({ type: 'text', value, output: value });
        continue;
      }

      let output = ')';

      if (brace.dots === true) {
        const arr = tokens.slice();
        const range = [];

        for (let i = arr.length - 1; i >= 0; i--) {
          tokens.pop();
          if (arr[i].type === 'brace') {
            break;
          }
          if (arr[i].type !== 'dots') {
            range.unshift(arr[i].value);
          }
        }

        output = expandRange(range, opts);
        state.backtrack = true;
      }

      if (brace.comma !== true && brace.dots !== true) {
        const out = state.output.slice(0, brace.outputIndex);
        const toks = state.tokens.slice(brace.tokensIndex);
        brace.value = brace.output = '\\{';
        value = output = '\\}';
        state.output = out;
        for (const t of toks) {
          state.output += (t.output || t.value);
        }
      }

      push({ type: 'brace', value, output });
      decrement('braces');
      braces.pop();
      continue;
    }

    /**
     * Pipes
     */

    if (value === '|') {
      if (extglobs.length > 0) {
        extglobs[extglobs.length - 1].conditions++;
      }
      push({ type: 'text', value });
      continue;
    }

    /**
     * Commas
     */

    if (value === ',') {
      let output = value;

      const brace = braces[braces.length - 1];
      if (brace && stack[stack.length - 1] === 'braces') {
        brace.comma = true;
        output = '|';
      }

      push({ type: 'comma', value, output });
      continue;
    }

    /**
     * Slashes
     */

    if (value === '/') {
      // if the beginning of the glob is "./", advance the start
      // to the current index, and don't add the "./" characters
      // to the state. This greatly simplifies lookbehinds when
      // checking for BOS characters like "!" and "." (not "./")
      if (prev.type === 'dot' && state.index === state.start + 1) {
        state.start = state.index + 1;
        state.consumed = '';
        state.output = '';
        tokens.pop();
        prev = bos; // reset "prev" to the first token
        continue;
      }

      push({ type: 'slash', value, output: SLASH_LITERAL });
      continue;
    }

    /**
     * Dots
     */

    if (value === '.') {
      if (state.braces > 0 && prev.type === 'dot') {
        if (prev.value === '.') prev.output = DOT_LITERAL;
        const brace = braces[braces.length - 1];
        prev.type = 'dots';
        prev.output += value;
        prev.value += value;
        brace.dots = true;
        continue;
      }

      if ((state.braces + state.parens) === 0 && prev.type !== 'bos' && prev.type !== 'slash') {
        push({ type: 'text', value, output: DOT_LITERAL });
        continue;
      }

      push({ type: 'dot', value, output: DOT_LITERAL });
      continue;
    }

    /**
     * Question marks
     */

    if (value === '?') {
      const isGroup = prev && prev.value === '(';
      if (!isGroup && opts.noextglob !== true && peek() === '(' && peek(2) !== '?') {
        extglobOpen('qmark', value);
        continue;
      }

      if (prev && prev.type === 'paren') {
        const next = peek();
        let output = value;

        if ((prev.value === '(' && !/[!=<:]/.test(next)) || (next === '<' && !/<([!=]|\w+>)/.test(remaining()))) {
          output = `\\${value}`;
        }

        push({ type: 'text', value, output });
        continue;
      }

      if (opts.dot !== true && (prev.type === 'slash' || prev.type === 'bos')) {
        push({ type: 'qmark', value, output: QMARK_NO_DOT });
        continue;
      }

      push({ type: 'qmark', value, output: QMARK });
      continue;
    }

    /**
     * Exclamation
     */

    if (value === '!') {
      if (opts.noextglob !== true && peek() === '(') {
        if (peek(2) !== '?' || !/[!=<:]/.test(peek(3))) {
          extglobOpen('negate', value);
          continue;
        }
      }

      if (opts.nonegate !== true && state.index === 0) {
        negate();
        continue;
      }
    }

    /**
     * Plus
     */

    if (value === '+') {
      if (opts.noextglob !== true && peek() === '(' && peek(2) !== '?') {
        extglobOpen('plus', value);
        continue;
      }

      if ((prev && prev.value === '(') || opts.regex === false) {
        push({ type: 'plus', value, output: PLUS_LITERAL });
        continue;
      }

      if ((prev && (prev.type === 'bracket' || prev.type === 'paren' || prev.type === 'brace')) || state.parens > 0) {
        push({ type: 'plus', value });
        continue;
      }

      push({ type: 'plus', value: PLUS_LITERAL });
      continue;
    }

    /**
     * Plain text
     */

    if (value === '@') {
      if (opts.noextglob !== true && peek() === '(' && peek(2) !== '?') {
        push({ type: 'at', extglob: true, value, output: '' });
        continue;
      }

      push({ type: 'text', value });
      continue;
    }

    /**
     * Plain text
     */

    if (value !== '*') {
      if (value === '$' || value === '^') {
        value = `\\${value}`;
      }

      const match = REGEX_NON_SPECIAL_CHARS.exec(remaining());
      if (match) {
        value += match[0];
        state.index += match[0].length;
      }

      push({ type: 'text', value });
      continue;
    }

    /**
     * Stars
     */

    if (prev && (prev.type === 'globstar' || prev.star === true)) {
      prev.type = 'star';
      prev.star = true;
      prev.value += value;
      prev.output = star;
      state.backtrack = true;
      state.globstar = true;
      consume(value);
      continue;
    }

    let rest = remaining();
    if (opts.noextglob !== true && /^\([^?]/.test(rest)) {
      extglobOpen('star', value);
      continue;
    }

    if (prev.type === 'star') {
      if (opts.noglobstar === true) {
        consume(value);
        continue;
      }

      const prior = prev.prev;
      const before = prior.prev;
      const isStart = prior.type === 'slash' || prior.type === 'bos';
      const afterStar = before && (before.type === 'star' || before.type === 'globstar');

      if (opts.bash === true && (!isStart || (rest[0] && rest[0] !== '/'))) {
        push({ type: 'star', value, output: '' });
        continue;
      }

      const isBrace = state.braces > 0 && (prior.type === 'comma' || prior.type === 'brace');
      const isExtglob = extglobs.length && (prior.type === 'pipe' || prior.type === 'paren');
      if (!isStart && prior.type !== 'paren' && !isBrace && !isExtglob) {
        push({ type: 'star', value, output: '' });
        continue;
      }

      // strip consecutive `/**/`
      while (rest.slice(0, 3) === '/**') {
        const after = input[state.index + 4];
        if (after && after !== '/') {
          break;
        }
        rest = rest.slice(3);
        consume('/**', 3);
      }

      // A globstar followed only by balanced closing parens is at the logical end of patterns like
      // `test(/utils/**)` and `test?(/utils/**)`. Treat it as EOS so the trailing `/**` can match its
      // parent path, except in negated extglobs where that would change the exclusion semantics.
      const isEnd = eos() || (
        state.parens > 0
        && rest === ')'.repeat(state.parens)
        && !extglobs.some(extglob => extglob.type === 'negate')
      );

      if (prior.type === 'bos' && eos()) {
        prev.type = 'globstar';
        prev.value += value;
        prev.output = globstar(opts);
        state.output = prev.output;
        state.globstar = true;
        consume(value);
        continue;
      }

      if (prior.type === 'slash' && prior.prev.type !== 'bos' && !afterStar && isEnd) {
        state.output = state.output.slice(0, -(prior.output + prev.output).length);
        prior.output = `(?:${prior.output}`;

        prev.type = 'globstar';
        prev.output = globstar(opts) + (opts.strictSlashes ? ')' : '|$)');
        prev.value += value;
        state.globstar = true;
        state.output += prior.output + prev.output;
        consume(value);
        continue;
      }

      if (prior.type === 'slash' && prior.prev.type !== 'bos' && rest[0] === '/') {
        const end = rest[1] !== void 0 ? '|$' : '';

        state.output = state.output.slice(0, -(prior.output + prev.output).length);
        prior.output = `(?:${prior.output}`;

        prev.type = 'globstar';
        prev.output = `${globstar(opts)}${SLASH_LITERAL}|${SLASH_LITERAL}${end})`;
        prev.value += value;

        state.output += prior.output + prev.output;
        state.globstar = true;

        consume(value + advance());

        push({ type: 'slash', value: '/', output: '' });
        continue;
      }

      if (prior.type === 'bos' && rest[0] === '/') {
        prev.type = 'globstar';
        prev.value += value;
        prev.output = `(?:^|${SLASH_LITERAL}|${globstar(opts)}${SLASH_LITERAL})`;
        state.output = prev.output;
        state.globstar = true;
        consume(value + advance());
        push({ type: 'slash', value: '/', output: '' });
        continue;
      }

      // remove single star from output
      state.output = state.output.slice(0, -prev.output.length);

      // reset previous token to globstar
      prev.type = 'globstar';
      prev.output = globstar(opts);
      prev.value += value;

      // reset output with globstar
      state.output += prev.output;
      state.globstar = true;
      consume(value);
      continue;
    }

    const token = { type: 'star', value, output: star };

    if (opts.bash === true) {
      token.output = '.*?';
      if (prev.type === 'bos' || prev.type === 'slash') {
        token.output = nodot + token.output;
      }
      push(token);
      continue;
    }

    if (prev && (prev.type === 'bracket' || prev.type === 'paren') && opts.regex === true) {
      token.output = value;
      push(token);
      continue;
    }

    if (state.index === state.start || prev.type === 'slash' || prev.type === 'dot') {
      if (prev.type === 'dot') {
        state.output += NO_DOT_SLASH;
        prev.output += NO_DOT_SLASH;

      } else if (opts.dot === true) {
        state.output += NO_DOTS_SLASH;
        prev.output += NO_DOTS_SLASH;

      } else {
        state.output += nodot;
        prev.output += nodot;
      }

      if (peek() !== '*') {
        state.output += ONE_CHAR;
        prev.output += ONE_CHAR;
      }
    }

    push(token);
  }

  while (state.brackets > 0) {
    if (opts.strictBrackets === true) throw new SyntaxError(syntaxError('closing', ']'));
    state.output = utils.escapeLast(state.output, '[');
    decrement('brackets');
  }

  while (state.parens > 0) {
    if (opts.strictBrackets === true) throw new SyntaxError(syntaxError('closing', ')'));
    state.output = utils.escapeLast(state.output, '(');
    decrement('parens');
  }

  while (state.braces > 0) {
    if (opts.strictBrackets === true) throw new SyntaxError(syntaxError('closing', '}'));
    state.output = utils.escapeLast(state.output, '{');
    decrement('braces');
  }

  if (opts.strictSlashes !== true && (prev.type === 'star' || prev.type === 'bracket')) {
    push({ type: 'maybe_slash', value: '', output: `${SLASH_LITERAL}?` });
  }

  // rebuild the output if we had to backtrack at any point
  if (state.backtrack === true) {
    state.output = '';

    for (const token of state.tokens) {
      state.output += token.output != null ? token.output : token.value;

      if (token.suffix) {
        state.output += token.suffix;
      }
    }
  }

  return state;
};

/**
 * Fast paths for creating regular expressions for common glob patterns.
 * This can significantly speed up processing and has very little downside
 * impact when none of the fast paths match.
 */

parse.fastpaths = (input, options) => {
  const opts = { ...options };
  const max = typeof opts.maxLength === 'number' ? Math.min(MAX_LENGTH, opts.maxLength) : MAX_LENGTH;
  const len = input.length;
  if (len > max) {
    throw new SyntaxError(`Input length: ${len}, exceeds maximum allowed length: ${max}`);
  }

  input = REPLACEMENTS[input] || input;

  // create constants based on platform, for windows or posix
  const {
    DOT_LITERAL,
    SLASH_LITERAL,
    ONE_CHAR,
    DOTS_SLASH,
    NO_DOT,
    NO_DOTS,
    NO_DOTS_SLASH,
    STAR,
    START_ANCHOR
  } = constants.globChars(opts.windows);

  const nodot = opts.dot ? NO_DOTS : NO_DOT;
  const slashDot = opts.dot ? NO_DOTS_SLASH : NO_DOT;
  const capture = opts.capture ? '' : '?:';
  const state = { negated: false, prefix: '' };
  let star = opts.bash === true ? '.*?' : STAR;

  if (opts.capture) {
    star = `(${star})`;
  }

  const globstar = opts => {
    if (opts.noglobstar === true) return star;
    return `(${capture}(?:(?!${START_ANCHOR}${opts.dot ? DOTS_SLASH : DOT_LITERAL}).)*?)`;
  };

  const create = str => {
    switch (str) {
      case '*':
        return `${nodot}${ONE_CHAR}${star}`;

      case '.*':
        return `${DOT_LITERAL}${ONE_CHAR}${star}`;

      case '*.*':
        return `${nodot}${star}${DOT_LITERAL}${ONE_CHAR}${star}`;

      case '*/*':
        return `${nodot}${star}${SLASH_LITERAL}${ONE_CHAR}${slashDot}${star}`;

      case '**':
        return nodot + globstar(opts);

      case '**/*':
        return `(?:${nodot}${globstar(opts)}${SLASH_LITERAL})?${slashDot}${ONE_CHAR}${star}`;

      case '**/*.*':
        return `(?:${nodot}${globstar(opts)}${SLASH_LITERAL})?${slashDot}${star}${DOT_LITERAL}${ONE_CHAR}${star}`;

      case '**/.*':
        return `(?:${nodot}${globstar(opts)}${SLASH_LITERAL})?${DOT_LITERAL}${ONE_CHAR}${star}`;

      default: {
        const match = /^(.*?)\.(\w+)$/.exec(str);
        if (!match) return;

        const source = create(match[1]);
        if (!source) return;

        return source + DOT_LITERAL + match[2];
      }
    }
  };

  const output = utils.removePrefix(input, state);
  let source = create(output);

  if (source && opts.strictSlashes !== true) {
    source += `${SLASH_LITERAL}?`;
  }

  return source;
};

module.exports = parse;


/***/ }),

/***/ 8016:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const scan = __nccwpck_require__(1781);
const parse = __nccwpck_require__(8265);
const utils = __nccwpck_require__(4059);
const constants = __nccwpck_require__(5595);
const isObject = val => val && typeof val === 'object' && !Array.isArray(val);

/**
 * Creates a matcher function from one or more glob patterns. The
 * returned function takes a string to match as its first argument,
 * and returns true if the string is a match. The returned matcher
 * function also takes a boolean as the second argument that, when true,
 * returns an object with additional information.
 *
 * ```js
 * const picomatch = require('picomatch');
 * // picomatch(glob[, options]);
 *
 * const isMatch = picomatch('*.!(*a)');
 * console.log(isMatch('a.a')); //=> false
 * console.log(isMatch('a.b')); //=> true
 *
 * // For environments without `node.js`, `picomatch/posix` provides you a dependency-free matcher, without automatic OS detection.
 * const picomatch = require('picomatch/posix');
 * // the same API, defaulting to posix paths
 * const isMatch = picomatch('a/*');
 * console.log(isMatch('a\\b')); //=> false
 * console.log(isMatch('a/b')); //=> true
 *
 * // you can still configure the matcher function to accept windows paths
 * const isMatch = picomatch('a/*', { options: windows });
 * console.log(isMatch('a\\b')); //=> true
 * console.log(isMatch('a/b')); //=> true
 * ```
 * @name picomatch
 * @param {String|Array} `globs` One or more glob patterns.
 * @param {Object=} `options`
 * @return {Function=} Returns a matcher function.
 * @api public
 */

const picomatch = (glob, options, returnState = false) => {
  if (Array.isArray(glob)) {
    const fns = glob.map(input => picomatch(input, options, returnState));
    const arrayMatcher = str => {
      for (const isMatch of fns) {
        const state = isMatch(str);
        if (state) return state;
      }
      return false;
    };
    return arrayMatcher;
  }

  const isState = isObject(glob) && glob.tokens && glob.input;

  if (glob === '' || (typeof glob !== 'string' && !isState)) {
    throw new TypeError('Expected pattern to be a non-empty string');
  }

  const opts = options || {};
  const posix = opts.windows;
  const regex = isState
    ? picomatch.compileRe(glob, options)
    : picomatch.makeRe(glob, options, false, true);

  const state = regex.state;
  delete regex.state;

  let isIgnored = () => false;
  if (opts.ignore) {
    const ignoreOpts = { ...options, ignore: null, onMatch: null, onResult: null };
    isIgnored = picomatch(opts.ignore, ignoreOpts, returnState);
  }

  const matcher = (input, returnObject = false) => {
    const { isMatch, match, output } = picomatch.test(input, regex, options, { glob, posix });
    const result = { glob, state, regex, posix, input, output, match, isMatch };

    if (typeof opts.onResult === 'function') {
      opts.onResult(result);
    }

    if (isMatch === false) {
      result.isMatch = false;
      return returnObject ? result : false;
    }

    if (isIgnored(input)) {
      if (typeof opts.onIgnore === 'function') {
        opts.onIgnore(result);
      }
      result.isMatch = false;
      return returnObject ? result : false;
    }

    if (typeof opts.onMatch === 'function') {
      opts.onMatch(result);
    }
    return returnObject ? result : true;
  };

  if (returnState) {
    matcher.state = state;
  }

  return matcher;
};

/**
 * Test `input` with the given `regex`. This is used by the main
 * `picomatch()` function to test the input string.
 *
 * ```js
 * const picomatch = require('picomatch');
 * // picomatch.test(input, regex[, options]);
 *
 * console.log(picomatch.test('foo/bar', /^(?:([^/]*?)\/([^/]*?))$/));
 * // { isMatch: true, match: [ 'foo/', 'foo', 'bar' ], output: 'foo/bar' }
 * ```
 * @param {String} `input` String to test.
 * @param {RegExp} `regex`
 * @return {Object} Returns an object with matching info.
 * @api public
 */

picomatch.test = (input, regex, options, { glob, posix } = {}) => {
  if (typeof input !== 'string') {
    throw new TypeError('Expected input to be a string');
  }

  if (input === '') {
    return { isMatch: false, output: '' };
  }

  const opts = options || {};
  const format = opts.format || (posix ? utils.toPosixSlashes : null);
  let match = input === glob;
  let output = (match && format) ? format(input) : input;

  if (match === false) {
    output = format ? format(input) : input;
    match = output === glob;
  }

  if (match === false || opts.capture === true) {
    if (opts.matchBase === true || opts.basename === true) {
      match = picomatch.matchBase(input, regex, options, posix);
    } else {
      match = regex.exec(output);
    }
  }

  return { isMatch: Boolean(match), match, output };
};

/**
 * Match the basename of a filepath.
 *
 * ```js
 * const picomatch = require('picomatch');
 * // picomatch.matchBase(input, glob[, options]);
 * console.log(picomatch.matchBase('foo/bar.js', '*.js'); // true
 * ```
 * @param {String} `input` String to test.
 * @param {RegExp|String} `glob` Glob pattern or regex created by [.makeRe](#makeRe).
 * @return {Boolean}
 * @api public
 */

picomatch.matchBase = (input, glob, options, posix = options && options.windows) => {
  const regex = glob instanceof RegExp ? glob : picomatch.makeRe(glob, options);
  return regex.test(utils.basename(input, { windows: posix }));
};

/**
 * Returns true if **any** of the given glob `patterns` match the specified `string`.
 *
 * ```js
 * const picomatch = require('picomatch');
 * // picomatch.isMatch(string, patterns[, options]);
 *
 * console.log(picomatch.isMatch('a.a', ['b.*', '*.a'])); //=> true
 * console.log(picomatch.isMatch('a.a', 'b.*')); //=> false
 * ```
 * @param {String|Array} str The string to test.
 * @param {String|Array} patterns One or more glob patterns to use for matching.
 * @param {Object} [options] See available [options](#options).
 * @return {Boolean} Returns true if any patterns match `str`
 * @api public
 */

picomatch.isMatch = (str, patterns, options) => picomatch(patterns, options)(str);

/**
 * Parse a glob pattern to create the source string for a regular
 * expression.
 *
 * ```js
 * const picomatch = require('picomatch');
 * const result = picomatch.parse(pattern[, options]);
 * ```
 * @param {String} `pattern`
 * @param {Object} `options`
 * @return {Object} Returns an object with useful properties and output to be used as a regex source string.
 * @api public
 */

picomatch.parse = (pattern, options) => {
  if (Array.isArray(pattern)) return pattern.map(p => picomatch.parse(p, options));
  return parse(pattern, { ...options, fastpaths: false });
};

/**
 * Scan a glob pattern to separate the pattern into segments.
 *
 * ```js
 * const picomatch = require('picomatch');
 * // picomatch.scan(input[, options]);
 *
 * const result = picomatch.scan('!./foo/*.js');
 * console.log(result);
 * { prefix: '!./',
 *   input: '!./foo/*.js',
 *   start: 3,
 *   base: 'foo',
 *   glob: '*.js',
 *   isBrace: false,
 *   isBracket: false,
 *   isGlob: true,
 *   isExtglob: false,
 *   isGlobstar: false,
 *   negated: true }
 * ```
 * @param {String} `input` Glob pattern to scan.
 * @param {Object} `options`
 * @return {Object} Returns an object with
 * @api public
 */

picomatch.scan = (input, options) => scan(input, options);

/**
 * Compile a regular expression from the `state` object returned by the
 * [parse()](#parse) method.
 *
 * ```js
 * const picomatch = require('picomatch');
 * const state = picomatch.parse('*.js');
 * // picomatch.compileRe(state[, options]);
 *
 * console.log(picomatch.compileRe(state));
 * //=> /^(?:(?!\.)(?=.)[^/]*?\.js)$/
 * ```
 * @param {Object} `state`
 * @param {Object} `options`
 * @param {Boolean} `returnOutput` Intended for implementors, this argument allows you to return the raw output from the parser.
 * @param {Boolean} `returnState` Adds the state to a `state` property on the returned regex. Useful for implementors and debugging.
 * @return {RegExp}
 * @api public
 */

picomatch.compileRe = (state, options, returnOutput = false, returnState = false) => {
  if (returnOutput === true) {
    return state.output;
  }

  const opts = options || {};
  const prepend = opts.contains ? '' : '^';
  const append = opts.contains ? '' : '$';

  let source = `${prepend}(?:${state.output})${append}`;
  if (state && state.negated === true) {
    source = `^(?!${source}).*$`;
  }

  const regex = picomatch.toRegex(source, options);
  if (returnState === true) {
    regex.state = state;
  }

  return regex;
};

/**
 * Create a regular expression from a parsed glob pattern.
 *
 * ```js
 * const picomatch = require('picomatch');
 * // picomatch.makeRe(state[, options]);
 *
 * const result = picomatch.makeRe('*.js');
 * console.log(result);
 * //=> /^(?:(?!\.)(?=.)[^/]*?\.js)$/
 * ```
 * @param {String} `state` The object returned from the `.parse` method.
 * @param {Object} `options`
 * @param {Boolean} `returnOutput` Implementors may use this argument to return the compiled output, instead of a regular expression. This is not exposed on the options to prevent end-users from mutating the result.
 * @param {Boolean} `returnState` Implementors may use this argument to return the state from the parsed glob with the returned regular expression.
 * @return {RegExp} Returns a regex created from the given pattern.
 * @api public
 */

picomatch.makeRe = (input, options = {}, returnOutput = false, returnState = false) => {
  if (!input || typeof input !== 'string') {
    throw new TypeError('Expected a non-empty string');
  }

  let parsed = { negated: false, fastpaths: true };

  if (options.fastpaths !== false && (input[0] === '.' || input[0] === '*')) {
    parsed.output = parse.fastpaths(input, options);
  }

  if (!parsed.output) {
    parsed = parse(input, options);
  }

  return picomatch.compileRe(parsed, options, returnOutput, returnState);
};

/**
 * Create a regular expression from the given regex source string.
 *
 * ```js
 * const picomatch = require('picomatch');
 * // picomatch.toRegex(source[, options]);
 *
 * const { output } = picomatch.parse('*.js');
 * console.log(picomatch.toRegex(output));
 * //=> /^(?:(?!\.)(?=.)[^/]*?\.js)$/
 * ```
 * @param {String} `source` Regular expression source string.
 * @param {Object} `options`
 * @return {RegExp}
 * @api public
 */

picomatch.toRegex = (source, options) => {
  try {
    const opts = options || {};
    return new RegExp(source, opts.flags || (opts.nocase ? 'i' : ''));
  } catch (err) {
    if (options && options.debug === true) throw err;
    return /$^/;
  }
};

/**
 * Picomatch constants.
 * @return {Object}
 */

picomatch.constants = constants;

/**
 * Expose "picomatch"
 */

module.exports = picomatch;


/***/ }),

/***/ 1781:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const utils = __nccwpck_require__(4059);
const {
  CHAR_ASTERISK,             /* * */
  CHAR_AT,                   /* @ */
  CHAR_BACKWARD_SLASH,       /* \ */
  CHAR_COMMA,                /* , */
  CHAR_DOT,                  /* . */
  CHAR_EXCLAMATION_MARK,     /* ! */
  CHAR_FORWARD_SLASH,        /* / */
  CHAR_LEFT_CURLY_BRACE,     /* { */
  CHAR_LEFT_PARENTHESES,     /* ( */
  CHAR_LEFT_SQUARE_BRACKET,  /* [ */
  CHAR_PLUS,                 /* + */
  CHAR_QUESTION_MARK,        /* ? */
  CHAR_RIGHT_CURLY_BRACE,    /* } */
  CHAR_RIGHT_PARENTHESES,    /* ) */
  CHAR_RIGHT_SQUARE_BRACKET  /* ] */
} = __nccwpck_require__(5595);

const isPathSeparator = code => {
  return code === CHAR_FORWARD_SLASH || code === CHAR_BACKWARD_SLASH;
};

const depth = token => {
  if (token.isPrefix !== true) {
    token.depth = token.isGlobstar ? Infinity : 1;
  }
};

/**
 * Quickly scans a glob pattern and returns an object with a handful of
 * useful properties, like `isGlob`, `path` (the leading non-glob, if it exists),
 * `glob` (the actual pattern), `negated` (true if the path starts with `!` but not
 * with `!(`) and `negatedExtglob` (true if the path starts with `!(`).
 *
 * ```js
 * const pm = require('picomatch');
 * console.log(pm.scan('foo/bar/*.js'));
 * { isGlob: true, input: 'foo/bar/*.js', base: 'foo/bar', glob: '*.js' }
 * ```
 * @param {String} `str`
 * @param {Object} `options`
 * @return {Object} Returns an object with tokens and regex source string.
 * @api public
 */

const scan = (input, options) => {
  const opts = options || {};

  const length = input.length - 1;
  const scanToEnd = opts.parts === true || opts.tokens === true || opts.scanToEnd === true;
  const slashes = [];
  const tokens = [];
  const parts = [];

  let str = input;
  let index = -1;
  let start = 0;
  let lastIndex = 0;
  let isBrace = false;
  let isBracket = false;
  let isGlob = false;
  let isExtglob = false;
  let isGlobstar = false;
  let braceEscaped = false;
  let backslashes = false;
  let negated = false;
  let negatedExtglob = false;
  let finished = false;
  let braces = 0;
  let prev;
  let code;
  let token = { value: '', depth: 0, isGlob: false };

  const eos = () => index >= length;
  const peek = () => str.charCodeAt(index + 1);
  const advance = () => {
    prev = code;
    return str.charCodeAt(++index);
  };

  while (index < length) {
    code = advance();
    let next;

    if (code === CHAR_BACKWARD_SLASH) {
      backslashes = token.backslashes = true;
      code = advance();

      if (code === CHAR_LEFT_CURLY_BRACE) {
        braceEscaped = true;
      }
      continue;
    }

    if (braceEscaped === true || code === CHAR_LEFT_CURLY_BRACE) {
      braces++;

      while (eos() !== true && (code = advance())) {
        if (code === CHAR_BACKWARD_SLASH) {
          backslashes = token.backslashes = true;
          advance();
          continue;
        }

        if (code === CHAR_LEFT_CURLY_BRACE) {
          braces++;
          continue;
        }

        if (braceEscaped !== true && code === CHAR_DOT && (code = advance()) === CHAR_DOT) {
          isBrace = token.isBrace = true;
          isGlob = token.isGlob = true;
          finished = true;

          if (scanToEnd === true) {
            continue;
          }

          break;
        }

        if (braceEscaped !== true && code === CHAR_COMMA) {
          isBrace = token.isBrace = true;
          isGlob = token.isGlob = true;
          finished = true;

          if (scanToEnd === true) {
            continue;
          }

          break;
        }

        if (code === CHAR_RIGHT_CURLY_BRACE) {
          braces--;

          if (braces === 0) {
            braceEscaped = false;
            isBrace = token.isBrace = true;
            finished = true;
            break;
          }
        }
      }

      if (scanToEnd === true) {
        continue;
      }

      break;
    }

    if (code === CHAR_FORWARD_SLASH) {
      slashes.push(index);
      tokens.push(token);
      token = { value: '', depth: 0, isGlob: false };

      if (finished === true) continue;
      if (prev === CHAR_DOT && index === (start + 1)) {
        start += 2;
        continue;
      }

      lastIndex = index + 1;
      continue;
    }

    if (opts.noext !== true) {
      const isExtglobChar = code === CHAR_PLUS
        || code === CHAR_AT
        || code === CHAR_ASTERISK
        || code === CHAR_QUESTION_MARK
        || code === CHAR_EXCLAMATION_MARK;

      if (isExtglobChar === true && peek() === CHAR_LEFT_PARENTHESES) {
        isGlob = token.isGlob = true;
        isExtglob = token.isExtglob = true;
        finished = true;
        if (code === CHAR_EXCLAMATION_MARK && index === start) {
          negatedExtglob = true;
        }

        if (scanToEnd === true) {
          let parens = 0;

          while (eos() !== true && (code = advance())) {
            if (code === CHAR_BACKWARD_SLASH) {
              backslashes = token.backslashes = true;
              advance();
              continue;
            }

            if (code === CHAR_LEFT_PARENTHESES) {
              parens++;
              continue;
            }

            if (code === CHAR_RIGHT_PARENTHESES && --parens === 0) {
              finished = true;
              break;
            }
          }
          continue;
        }
        break;
      }
    }

    if (code === CHAR_ASTERISK) {
      if (prev === CHAR_ASTERISK) isGlobstar = token.isGlobstar = true;
      isGlob = token.isGlob = true;
      finished = true;

      if (scanToEnd === true) {
        continue;
      }
      break;
    }

    if (code === CHAR_QUESTION_MARK) {
      isGlob = token.isGlob = true;
      finished = true;

      if (scanToEnd === true) {
        continue;
      }
      break;
    }

    if (code === CHAR_LEFT_SQUARE_BRACKET) {
      while (eos() !== true && (next = advance())) {
        if (next === CHAR_BACKWARD_SLASH) {
          backslashes = token.backslashes = true;
          advance();
          continue;
        }

        if (next === CHAR_RIGHT_SQUARE_BRACKET) {
          isBracket = token.isBracket = true;
          isGlob = token.isGlob = true;
          finished = true;
          break;
        }
      }

      if (scanToEnd === true) {
        continue;
      }

      break;
    }

    if (opts.nonegate !== true && code === CHAR_EXCLAMATION_MARK && index === start) {
      negated = token.negated = true;
      start++;
      continue;
    }

    if (opts.noparen !== true && code === CHAR_LEFT_PARENTHESES) {
      isGlob = token.isGlob = true;

      if (scanToEnd === true) {
        let parens = 1;

        while (eos() !== true && (code = advance())) {
          if (code === CHAR_BACKWARD_SLASH) {
            backslashes = token.backslashes = true;
            advance();
            continue;
          }

          if (code === CHAR_LEFT_PARENTHESES) {
            parens++;
            continue;
          }

          if (code === CHAR_RIGHT_PARENTHESES && --parens === 0) {
            finished = true;
            break;
          }
        }
        continue;
      }
      break;
    }

    if (isGlob === true) {
      finished = true;

      if (scanToEnd === true) {
        continue;
      }

      break;
    }
  }

  if (opts.noext === true) {
    isExtglob = false;
    isGlob = false;
  }

  let base = str;
  let prefix = '';
  let glob = '';

  if (start > 0) {
    prefix = str.slice(0, start);
    str = str.slice(start);
    lastIndex -= start;
  }

  if (base && isGlob === true && lastIndex > 0) {
    base = str.slice(0, lastIndex);
    glob = str.slice(lastIndex);
  } else if (isGlob === true) {
    base = '';
    glob = str;
  } else {
    base = str;
  }

  if (base && base !== '' && base !== '/' && base !== str) {
    if (isPathSeparator(base.charCodeAt(base.length - 1))) {
      base = base.slice(0, -1);
    }
  }

  if (opts.unescape === true) {
    if (glob) glob = utils.removeBackslashes(glob);

    if (base && backslashes === true) {
      base = utils.removeBackslashes(base);
    }
  }

  const state = {
    prefix,
    input,
    start,
    base,
    glob,
    isBrace,
    isBracket,
    isGlob,
    isExtglob,
    isGlobstar,
    negated,
    negatedExtglob
  };

  if (opts.tokens === true) {
    state.maxDepth = 0;
    if (!isPathSeparator(code)) {
      tokens.push(token);
    }
    state.tokens = tokens;
  }

  if (opts.parts === true || opts.tokens === true) {
    let prevIndex;

    for (let idx = 0; idx < slashes.length; idx++) {
      const n = prevIndex !== undefined ? prevIndex + 1 : start;
      const i = slashes[idx];
      const value = input.slice(n, i);
      if (opts.tokens) {
        if (idx === 0 && start !== 0) {
          tokens[idx].isPrefix = true;
          tokens[idx].value = prefix;
        } else {
          tokens[idx].value = value;
        }
        depth(tokens[idx]);
        state.maxDepth += tokens[idx].depth;
      }
      if (i >= start) {
        parts.push(value);
        prevIndex = i;
      }
    }

    const n = prevIndex !== undefined ? prevIndex + 1 : start;
    const value = input.slice(n);
    parts.push(value);

    if (opts.tokens && prevIndex && prevIndex + 1 < input.length) {
      tokens[tokens.length - 1].value = value;
      depth(tokens[tokens.length - 1]);
      state.maxDepth += tokens[tokens.length - 1].depth;
    }

    state.slashes = slashes;
    state.parts = parts;
  }

  return state;
};

module.exports = scan;


/***/ }),

/***/ 4059:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {

/*global navigator*/


const {
  REGEX_BACKSLASH,
  REGEX_REMOVE_BACKSLASH,
  REGEX_SPECIAL_CHARS,
  REGEX_SPECIAL_CHARS_GLOBAL
} = __nccwpck_require__(5595);

exports.isObject = val => val !== null && typeof val === 'object' && !Array.isArray(val);
exports.hasRegexChars = str => REGEX_SPECIAL_CHARS.test(str);
exports.isRegexChar = str => str.length === 1 && exports.hasRegexChars(str);
exports.escapeRegex = str => str.replace(REGEX_SPECIAL_CHARS_GLOBAL, '\\$1');
exports.toPosixSlashes = str => str.replace(REGEX_BACKSLASH, '/');

exports.isWindows = () => {
  if (typeof navigator !== 'undefined' && navigator.platform) {
    const platform = navigator.platform.toLowerCase();
    return platform === 'win32' || platform === 'windows';
  }

  if (typeof process !== 'undefined' && process.platform) {
    return process.platform === 'win32';
  }

  return false;
};

exports.removeBackslashes = str => {
  return str.replace(REGEX_REMOVE_BACKSLASH, match => {
    return match === '\\' ? '' : match;
  });
};

exports.escapeLast = (input, char, lastIdx) => {
  const idx = input.lastIndexOf(char, lastIdx);
  if (idx === -1) return input;
  if (input[idx - 1] === '\\') return exports.escapeLast(input, char, idx - 1);
  return `${input.slice(0, idx)}\\${input.slice(idx)}`;
};

exports.removePrefix = (input, state = {}) => {
  let output = input;
  if (output.startsWith('./')) {
    output = output.slice(2);
    state.prefix = './';
  }
  return output;
};

exports.wrapOutput = (input, state = {}, options = {}) => {
  const prepend = options.contains ? '' : '^';
  const append = options.contains ? '' : '$';

  let output = `${prepend}(?:${input})${append}`;
  if (state.negated === true) {
    output = `(?:^(?!${output}).*$)`;
  }
  return output;
};

exports.basename = (path, { windows } = {}) => {
  const segs = path.split(windows ? /[\\/]/ : '/');
  const last = segs[segs.length - 1];

  if (last === '') {
    return segs[segs.length - 2];
  }

  return last;
};


/***/ }),

/***/ 181:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("buffer");

/***/ }),

/***/ 932:
/***/ ((module) => {

module.exports = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("process");

/***/ }),

/***/ 4352:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const { normalizeIPv6, removeDotSegments, removeDotSegmentsRelative, recomposeAuthority, normalizePercentEncoding, normalizePathEncoding, serializePathEncoding, normalizeQueryFragmentEncoding, encodeQuery, encodeFragment, reescapeHostDelimiters, isIPv4, nonSimpleDomain } = __nccwpck_require__(5077)
const { SCHEMES, getSchemeHandler } = __nccwpck_require__(5300)

const VALID_SCHEME = /^[A-Za-z][A-Za-z0-9+.-]*$/u
const MALFORMED_SCHEME_ERROR = 'URI scheme is malformed.'
const MALFORMED_HOST_ERROR = 'URI host is malformed.'
// ASCII characters outside the RFC 3986 reg-name set (unreserved, sub-delims
// and "%" for pct-encoded): C0 controls, space, DEL, and "#/:<>?@[\]^`{|}.
const FORBIDDEN_DOMAIN_HOST_CHARACTER = /[\0-\x20"#/:<>?@[\\\]^`{|}\x7F]/u

/**
 * RFC 3986 section 3.1 does not allow percent-encoding in a scheme, so the
 * scheme is validated as-is and never decoded. Decoding would let inert input
 * such as `%6Aavascript:` become a live `javascript:` scheme.
 *
 * @param {string} scheme
 * @returns {string}
 */
function validateScheme (scheme) {
  const stringScheme = String(scheme)
  if (!VALID_SCHEME.test(stringScheme)) {
    throw new TypeError(MALFORMED_SCHEME_ERROR)
  }
  return stringScheme
}

/**
 * @template {import('./types/index').URIComponent|string} T
 * @param {T} uri
 * @param {import('./types/index').Options} [options]
 * @returns {T}
 */
function normalize (uri, options) {
  if (typeof uri === 'string') {
    uri = /** @type {T} */ (normalizeString(uri, options))
  } else if (typeof uri === 'object') {
    uri = /** @type {T} */ (parse(serialize(uri, options), options))
  }
  return uri
}

/**
 * @param {string} baseURI
 * @param {string} relativeURI
 * @param {import('./types/index').Options} [options]
 * @returns {string}
 */
function resolve (baseURI, relativeURI, options) {
  const schemelessOptions = options ? Object.assign({ scheme: 'null' }, options) : { scheme: 'null' }
  const {
    parsed: baseParsed,
    malformedAuthorityOrPort: baseMalformed,
    malformedPercentEncoding: baseMalformedPercentEncoding,
    malformedSchemeSpecific: baseMalformedSchemeSpecific,
    malformedHost: baseMalformedHost,
    malformedScheme: baseMalformedScheme
  } = parseWithStatus(baseURI, schemelessOptions)
  const {
    parsed: relativeParsed,
    malformedAuthorityOrPort: relativeMalformed,
    malformedPercentEncoding: relativeMalformedPercentEncoding,
    malformedSchemeSpecific: relativeMalformedSchemeSpecific,
    malformedHost: relativeMalformedHost,
    malformedScheme: relativeMalformedScheme
  } = parseWithStatus(relativeURI, schemelessOptions)
  if (
    baseMalformed ||
    relativeMalformed ||
    baseMalformedPercentEncoding ||
    relativeMalformedPercentEncoding ||
    baseMalformedSchemeSpecific ||
    relativeMalformedSchemeSpecific ||
    baseMalformedHost ||
    relativeMalformedHost ||
    baseMalformedScheme ||
    relativeMalformedScheme
  ) {
    throw new Error(baseParsed.error || relativeParsed.error || 'URI is malformed.')
  }
  const resolved = resolveComponent(baseParsed, relativeParsed, schemelessOptions, true)
  const resolvedSchemeHandler = getSchemeHandler((options && options.scheme) || resolved.scheme)
  const resolvedHost = resolved.host
  const resolvedHostIsIP = resolvedHost !== undefined && resolvedHost !== '' &&
    (isIPv4(resolvedHost) || normalizeIPv6(resolvedHost).isIPV6)
  // Inputs are parsed scheme-neutrally, so delimiters and controls in a domain
  // host are only detected here, once the final scheme is known. They always
  // fail closed, including in percent-encoded hosts.
  if (hasForbiddenDomainHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP)) {
    throw new Error(MALFORMED_HOST_ERROR)
  }
  canonicalizeHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP)
  // Percent escapes in an ASCII reg-name are encoded data. The WHATWG hostname
  // parser can reject them even though fast-uri preserves them safely as RFC
  // 3986 data. A raw non-ASCII host must still fail closed if conversion fails.
  const encodedASCIIHost = resolvedHost && resolvedHost.indexOf('%') !== -1 &&
    !/\P{ASCII}/u.test(resolvedHost)
  if (resolved.error && !encodedASCIIHost) {
    throw new Error(resolved.error)
  }
  schemelessOptions.skipEscape = true
  return serialize(resolved, schemelessOptions)
}

/**
 * @param {import ('./types/index').URIComponent} base
 * @param {import ('./types/index').URIComponent} relative
 * @param {import('./types/index').Options} [options]
 * @param {boolean} [skipNormalization=false]
 * @returns {import ('./types/index').URIComponent}
 */
function resolveComponent (base, relative, options, skipNormalization) {
  /** @type {import('./types/index').URIComponent} */
  const target = {}
  if (!skipNormalization) {
    base = parse(serialize(base, options), options) // normalize base component
    relative = parse(serialize(relative, options), options) // normalize relative component
  }
  options = options || {}

  if (!options.tolerant && relative.scheme) {
    target.scheme = relative.scheme
    // target.authority = relative.authority;
    target.userinfo = relative.userinfo
    target.host = relative.host
    target.port = relative.port
    target.path = removeDotSegments(relative.path || '')
    target.query = relative.query
  } else {
    if (relative.userinfo !== undefined || relative.host !== undefined || relative.port !== undefined) {
      // target.authority = relative.authority;
      target.userinfo = relative.userinfo
      target.host = relative.host
      target.port = relative.port
      target.path = removeDotSegments(relative.path || '')
      target.query = relative.query
    } else {
      if (!relative.path) {
        target.path = base.path
        if (relative.query !== undefined) {
          target.query = relative.query
        } else {
          target.query = base.query
        }
      } else {
        if (relative.path[0] === '/') {
          target.path = removeDotSegments(relative.path)
        } else {
          const baseHasAuthority = base.userinfo !== undefined || base.host !== undefined || base.port !== undefined
          if (baseHasAuthority && !base.path) {
            target.path = '/' + relative.path
          } else if (!base.path) {
            target.path = relative.path
          } else {
            target.path = base.path.slice(0, base.path.lastIndexOf('/') + 1) + relative.path
          }
          target.path = base.scheme === undefined && !baseHasAuthority && target.path[0] !== '/'
            ? removeDotSegmentsRelative(target.path)
            : removeDotSegments(target.path)
        }
        target.query = relative.query
      }
      // target.authority = base.authority;
      target.userinfo = base.userinfo
      target.host = base.host
      target.port = base.port
    }
    target.scheme = base.scheme
  }

  target.fragment = relative.fragment

  return target
}

/**
 * @param {import ('./types/index').URIComponent|string} uriA
 * @param {import ('./types/index').URIComponent|string} uriB
 * @param {import ('./types/index').Options} options
 * @returns {boolean}
 */
function equal (uriA, uriB, options) {
  const normalizedA = normalizeComparableURI(uriA, options)
  const normalizedB = normalizeComparableURI(uriB, options)

  return normalizedA !== undefined && normalizedB !== undefined && normalizedA === normalizedB
}

/**
 * @param {Readonly<import('./types/index').URIComponent>} cmpts
 * @param {import('./types/index').Options} [opts]
 * @returns {string}
 */
function serialize (cmpts, opts) {
  const component = {
    host: cmpts.host,
    scheme: cmpts.scheme,
    userinfo: cmpts.userinfo,
    port: cmpts.port,
    path: cmpts.path,
    query: cmpts.query,
    nid: cmpts.nid,
    nss: cmpts.nss,
    uuid: cmpts.uuid,
    fragment: cmpts.fragment,
    reference: cmpts.reference,
    resourceName: cmpts.resourceName,
    secure: cmpts.secure,
    error: ''
  }
  const options = Object.assign({}, opts)
  const uriTokens = []

  if (component.scheme) {
    component.scheme = validateScheme(component.scheme)
  }

  // find scheme handler
  const schemeHandler = getSchemeHandler(options.scheme || component.scheme)

  // perform scheme specific serialization
  if (schemeHandler && schemeHandler.serialize) schemeHandler.serialize(component, options)

  const hasAuthority = component.userinfo !== undefined || component.host !== undefined || component.port !== undefined
  // A reference with no emitted scheme is path-noscheme: a bare ':' in its
  // first path segment would reparse as a scheme (RFC 3986 3.3/4.2). Enforced
  // under skipEscape too (resolve()), so the reapply below gates on this flag.
  const schemelessReference = (component.scheme === undefined || options.reference === 'suffix') && !hasAuthority
  const pathNoScheme = !options.skipEscape && schemelessReference

  if (component.path !== undefined) {
    if (!options.skipEscape) {
      component.path = serializePathEncoding(component.path, pathNoScheme)
    } else {
      component.path = normalizePercentEncoding(component.path)
    }
  }

  if (options.reference !== 'suffix' && component.scheme) {
    // Scheme handlers may replace the scheme during serialization.
    component.scheme = validateScheme(component.scheme)
    uriTokens.push(component.scheme, ':')
  }

  const authority = recomposeAuthority(component)
  if (authority !== undefined) {
    if (options.reference !== 'suffix') {
      uriTokens.push('//')
    }

    uriTokens.push(authority)

    if (component.path && component.path[0] !== '/') {
      uriTokens.push('/')
    }
  }
  if (component.path !== undefined) {
    let s = component.path

    if (!options.absolutePath && (!schemeHandler || !schemeHandler.absolutePath)) {
      // A relative-path reference keeps its unresolvable leading ".." segments
      // and must never become root-relative (RFC 3986 section 5.2.4 applies to
      // merged target paths, not to the reference itself).
      s = schemelessReference && s[0] !== '/'
        ? removeDotSegmentsRelative(s)
        : removeDotSegments(s)
    }

    // Dot-segment removal can expose a colon that was not originally in the
    // first segment (for example, "./a:b"). Reapply path-noscheme encoding so
    // the serialized relative reference cannot be reparsed as a URI scheme.
    if (schemelessReference) {
      s = serializePathEncoding(s, true)
    }

    if (
      authority === undefined &&
      s[0] === '/' &&
      s[1] === '/'
    ) {
      // don't allow the path to start with "//"
      s = '/%2F' + s.slice(2)
    }

    uriTokens.push(s)
  }

  if (component.query !== undefined) {
    uriTokens.push('?', encodeQuery(component.query))
  }

  if (component.fragment !== undefined) {
    uriTokens.push('#', encodeFragment(component.fragment))
  }
  return uriTokens.join('')
}

const URI_PARSE = /^(?:([^#/:?]+):)?(?:\/\/((?:([^#/?@]*)@)?(\[[^#/?\]]+\]|[^#/:?]*)(?::(\d*))?))?([^#?]*)(?:\?([^#]*))?(?:#((?:.|[\n\r])*))?/u

// Captures the authority component (between "//" and the next "/", "?" or "#"),
// with or without a scheme prefix, for the literal-backslash rejection below.
const AUTHORITY_PREFIX = /^(?:[^#/:?]+:)?\/\/([^/?#]*)/

// Captures the leading authority-introducer region after an optional scheme: a
// run of forward slashes, backslashes, and the characters the WHATWG URL parser
// removes before parsing (TAB U+0009, LF U+000A, CR U+000D). A valid introducer
// is exactly "//". Node treats "\" as "/" on special schemes and strips those
// characters first, so forms like "\\", "/\", "\/", "/<TAB>/", or a leading
// "<TAB>//" reach an authority in Node while fast-uri's URI_PARSE folds them into
// the path group (host confusion / SSRF / redirect bypass).
const AUTHORITY_INTRODUCER_REGION = /^(?:[^#/:?]+:)?([/\\\t\n\r]*)/

/**
 * @param {import('./types/index').URIComponent} parsed
 * @param {RegExpMatchArray} matches
 * @returns {string|undefined}
 */
function getParseError (parsed, matches) {
  if (matches[2] !== undefined && parsed.path && parsed.path[0] !== '/') {
    return 'URI path must start with "/" when authority is present.'
  }

  if (typeof parsed.port === 'number' && (parsed.port < 0 || parsed.port > 65535)) {
    return 'URI port is malformed.'
  }

  return undefined
}

/**
 * Checks percent syntax without decoding the represented octets. RFC 3986
 * percent-encoding is byte-oriented, so sequences such as `%FF` are valid even
 * though they are not independently valid UTF-8.
 *
 * @param {string|undefined} component
 * @returns {boolean}
 */
function hasMalformedPercentEncoding (component) {
  if (component === undefined) return false

  let percent = component.indexOf('%')
  while (percent !== -1) {
    if (percent + 2 >= component.length || !/^[\da-f]{2}$/iu.test(component.slice(percent + 1, percent + 3))) {
      return true
    }
    percent = component.indexOf('%', percent + 3)
  }

  return false
}

/**
 * Whether the host is a bracketed IP literal (RFC 3986 `IP-literal`).
 * An unterminated `[` is not a literal, so it must still be validated as a
 * reg-name instead of being waved through as an IP.
 *
 * @param {string} host
 * @returns {boolean}
 */
function isIPLiteral (host) {
  return host[0] === '[' && host[host.length - 1] === ']'
}

/**
 * @param {RegExpMatchArray} matches
 * @returns {boolean}
 */
function hasMalformedComponentPercentEncoding (matches) {
  // Bracketed IP literals use a raw "%" as the zone separator for historical
  // compatibility. Their parsing is intentionally left to normalizeIPv6.
  const host = matches[4]
  return hasMalformedPercentEncoding(matches[3]) ||
    (host !== undefined && !isIPLiteral(host) && hasMalformedPercentEncoding(host)) ||
    hasMalformedPercentEncoding(matches[6]) ||
    hasMalformedPercentEncoding(matches[7]) ||
    hasMalformedPercentEncoding(matches[8])
}

/**
 * @param {import('./types/index').URIComponent} parsed
 * @param {import('./types/index').Options} options
 * @param {{ domainHost?: boolean, unicodeSupport?: boolean }|undefined} schemeHandler
 * @param {boolean} isIP
 * @returns {boolean} whether host conversion failed
 */
function canonicalizeHost (parsed, options, schemeHandler, isIP) {
  if (hasForbiddenDomainHost(parsed, options, schemeHandler, isIP)) {
    parsed.error = parsed.error || MALFORMED_HOST_ERROR
    return true
  }

  if (
    !options.unicodeSupport &&
    (!schemeHandler || !schemeHandler.unicodeSupport) &&
    parsed.host &&
    !isIPLiteral(parsed.host) &&
    (options.domainHost || (schemeHandler && schemeHandler.domainHost)) &&
    isIP === false &&
    nonSimpleDomain(parsed.host)
  ) {
    let url
    try {
      url = new URL('http://' + parsed.host)
    } catch (e) {
      parsed.error = parsed.error || "Host's domain name can not be converted to ASCII: " + e
      return true
    }
    // The WHATWG parser must have read the whole input as a host. Anything
    // else means it found a delimiter fast-uri did not, so its hostname would
    // describe a different authority.
    if (!isHostOnlyURL(url)) {
      parsed.error = parsed.error || MALFORMED_HOST_ERROR
      return true
    }
    parsed.host = url.hostname
  }
  return false
}

/**
 * Whether a domain host contains an ASCII character that RFC 3986 does not
 * allow in a reg-name (unreserved, sub-delims, or pct-encoded). Such a host is
 * rejected instead of being handed to the WHATWG URL parser, which would treat
 * "@" as a userinfo delimiter (silently dropping the data before it) and strip
 * TAB, LF, and CR. Non-ASCII characters remain allowed for IDNs.
 *
 * @param {import('./types/index').URIComponent} parsed
 * @param {import('./types/index').Options} options
 * @param {{ domainHost?: boolean }|undefined} schemeHandler
 * @param {boolean} isIP
 * @returns {boolean}
 */
function hasForbiddenDomainHost (parsed, options, schemeHandler, isIP) {
  return Boolean(
    parsed.host &&
    isIP === false &&
    !isIPLiteral(parsed.host) &&
    (options.domainHost || (schemeHandler && schemeHandler.domainHost)) &&
    FORBIDDEN_DOMAIN_HOST_CHARACTER.test(parsed.host)
  )
}

/**
 * @param {URL} url
 * @returns {boolean}
 */
function isHostOnlyURL (url) {
  return url.username === '' &&
    url.password === '' &&
    url.port === '' &&
    url.pathname === '/' &&
    url.search === '' &&
    url.hash === '' &&
    url.hostname !== ''
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {{ parsed: import('./types/index').URIComponent, malformedAuthorityOrPort: boolean, malformedPercentEncoding: boolean, malformedSchemeSpecific: boolean, malformedHost: boolean, malformedScheme: boolean }}
 */
function parseWithStatus (uri, opts) {
  const options = Object.assign({}, opts)
  /** @type {import('./types/index').URIComponent} */
  const parsed = {
    scheme: undefined,
    userinfo: undefined,
    host: '',
    port: undefined,
    path: '',
    query: undefined,
    fragment: undefined
  }

  let malformedAuthorityOrPort = false
  let malformedPercentEncoding = false
  let malformedSchemeSpecific = false
  let malformedHost = false
  let malformedIPLiteral = false
  let malformedScheme = false

  let isIP = false
  if (options.reference === 'suffix') {
    if (options.scheme) {
      uri = options.scheme + ':' + uri
    } else {
      uri = '//' + uri
    }
  }

  // A literal backslash (U+005C) is not a valid RFC 3986 URI character and is
  // not an authority delimiter. Reject it in the authority rather than
  // rewriting it: normalizing "\" -> "/" (WHATWG error recovery) could silently
  // change the resource identified by an otherwise-invalid input, and lets "\"
  // act as a host delimiter here while Node's native URL parses a different
  // host (SSRF / redirect / origin-allowlist bypass). Percent-encoded %5C is
  // untouched and remains valid encoded data.
  const authorityMatch = uri.match(AUTHORITY_PREFIX)
  if (authorityMatch !== null && authorityMatch[1].indexOf('\\') !== -1) {
    parsed.error = 'URI authority must not contain a literal backslash.'
    malformedAuthorityOrPort = true
  }

  // Reject a malformed or whitespace-smuggled authority introducer. fast-uri
  // only recognizes a literal "//"; anything else in the leading separator run
  // (a backslash, or a "//" that appears only after removing the TAB/LF/CR that
  // Node strips) means the authority fast-uri parses differs from the one Node's
  // URL resolves. Reject rather than rewrite, mirroring the literal-backslash
  // guard above. Percent-encoded forms (%5C, %09) are untouched, valid data.
  const introducerMatch = uri.match(AUTHORITY_INTRODUCER_REGION)
  if (introducerMatch !== null) {
    const region = introducerMatch[1]
    const normalizedRegion = region.replace(/[\t\n\r]/g, '')
    // Two or more leading separators introduce an authority.
    if (normalizedRegion.length >= 2) {
      if (normalizedRegion.slice(0, 2) !== '//') {
        parsed.error = parsed.error || 'URI authority must not contain a literal backslash.'
        malformedAuthorityOrPort = true
      } else if (region.length !== normalizedRegion.length) {
        parsed.error = parsed.error || 'URI authority introducer must not contain whitespace.'
        malformedAuthorityOrPort = true
      }
    }
  }

  const matches = uri.match(URI_PARSE)

  if (matches) {
    // store each component
    parsed.scheme = matches[1]
    parsed.userinfo = matches[3]
    parsed.host = matches[4]
    parsed.port = parseInt(matches[5], 10)
    parsed.path = matches[6] || ''
    parsed.query = matches[7]
    parsed.fragment = matches[8]

    if (parsed.scheme !== undefined) {
      if (VALID_SCHEME.test(parsed.scheme)) {
        parsed.scheme = parsed.scheme.toLowerCase()
      } else {
        parsed.error = parsed.error || MALFORMED_SCHEME_ERROR
        malformedScheme = true
      }
    }

    malformedPercentEncoding = hasMalformedComponentPercentEncoding(matches)
    if (malformedPercentEncoding) {
      parsed.error = parsed.error || 'URI contains malformed percent-encoding.'
    }

    // fix port number
    if (isNaN(parsed.port)) {
      parsed.port = matches[5]
    }

    const parseError = getParseError(parsed, matches)
    if (parseError !== undefined) {
      parsed.error = parsed.error || parseError
      malformedAuthorityOrPort = true
    }

    if (parsed.host) {
      const ipv4result = isIPv4(parsed.host)
      if (ipv4result === false) {
        const bracketedIPLiteral = isIPLiteral(parsed.host)
        const hasIPLiteralBracket = parsed.host.indexOf('[') !== -1 || parsed.host.indexOf(']') !== -1
        const ipv6result = normalizeIPv6(parsed.host)
        isIP = ipv6result.isIPV6 || ipv6result.isIPVFuture === true
        malformedIPLiteral = hasIPLiteralBracket && (!bracketedIPLiteral || ipv6result.error === true)
        parsed.host = isIP ? ipv6result.host : ipv6result.host.toLowerCase()

        if (malformedIPLiteral) {
          parsed.error = parsed.error || MALFORMED_HOST_ERROR
          malformedAuthorityOrPort = true
        }
      } else {
        isIP = true
      }
    }
    if (parsed.scheme === undefined && parsed.userinfo === undefined && parsed.host === undefined && parsed.port === undefined && parsed.query === undefined && !parsed.path) {
      parsed.reference = 'same-document'
    } else if (parsed.scheme === undefined) {
      parsed.reference = 'relative'
    } else if (parsed.fragment === undefined) {
      parsed.reference = 'absolute'
    } else {
      parsed.reference = 'uri'
    }

    // check for reference errors
    if (options.reference && options.reference !== 'suffix' && options.reference !== parsed.reference) {
      parsed.error = parsed.error || 'URI is not a ' + options.reference + ' reference.'
    }

    // find scheme handler
    const schemeHandler = getSchemeHandler(options.scheme || parsed.scheme)

    // convert Unicode IDN -> ASCII IDN when the effective scheme uses domain hosts
    if (!malformedIPLiteral) {
      malformedHost = canonicalizeHost(parsed, options, schemeHandler, isIP)
    }

    if (uri.indexOf('%') !== -1 && parsed.host !== undefined && !malformedIPLiteral) {
      let host = isIP ? parsed.host : normalizePercentEncoding(parsed.host, true)
      if (!isIP) {
        // Fold reg-name case after decoding unreserved octets. The second
        // pass only restores uppercase hex in escapes that remain encoded.
        host = normalizePercentEncoding(host.toLowerCase())
      }
      // Resolution parses both inputs with the internal `null` scheme before
      // the effective scheme is known. Keep raw host delimiters for that step
      // so resolve() can reject them for domain-host schemes; the resolved
      // authority is encoded when it is serialized.
      parsed.host = isIP || options.scheme !== 'null' ? reescapeHostDelimiters(host, isIP) : host
    }

    if (!schemeHandler || (schemeHandler && !schemeHandler.skipNormalize)) {
      if (parsed.path) {
        parsed.path = normalizePathEncoding(parsed.path)
      }
      if (parsed.query) {
        parsed.query = normalizeQueryFragmentEncoding(parsed.query)
      }
      if (parsed.fragment) {
        parsed.fragment = normalizeQueryFragmentEncoding(parsed.fragment)
      }
    }

    // perform scheme specific parsing
    if (schemeHandler && schemeHandler.parse) {
      schemeHandler.parse(parsed, options)
      if (schemeHandler === SCHEMES.urn && parsed.nid === undefined) {
        malformedSchemeSpecific = true
      }
    }
  } else {
    parsed.error = parsed.error || 'URI can not be parsed.'
  }
  return { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme }
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns
 */
function parse (uri, opts) {
  return parseWithStatus(uri, opts).parsed
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {string}
 */
function normalizeString (uri, opts) {
  return normalizeStringWithStatus(uri, opts).normalized
}

/**
 * @param {string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {{ normalized: string, malformedAuthorityOrPort: boolean, malformedPercentEncoding: boolean, malformedSchemeSpecific: boolean, malformedHost: boolean, malformedScheme: boolean }}
 */
function normalizeStringWithStatus (uri, opts) {
  const { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = parseWithStatus(uri, opts)
  return {
    normalized: malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? uri : serialize(parsed, opts),
    malformedAuthorityOrPort,
    malformedPercentEncoding,
    malformedSchemeSpecific,
    malformedHost,
    malformedScheme
  }
}

/**
 * @param {import ('./types/index').URIComponent|string} uri
 * @param {import('./types/index').Options} [opts]
 * @returns {string|undefined}
 */
function normalizeComparableURI (uri, opts) {
  if (typeof uri !== 'string' && typeof uri !== 'object') {
    return undefined
  }

  let value
  try {
    value = typeof uri === 'string' ? uri : serialize(uri, opts)
  } catch {
    return undefined
  }
  const { normalized, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = normalizeStringWithStatus(value, opts)
  return malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? undefined : normalized
}

const fastUri = {
  SCHEMES,
  normalize,
  resolve,
  resolveComponent,
  equal,
  serialize,
  parse
}

module.exports = fastUri
module.exports["default"] = fastUri
module.exports.fastUri = fastUri


/***/ }),

/***/ 5300:
/***/ ((module, __unused_webpack_exports, __nccwpck_require__) => {



const { isUUID } = __nccwpck_require__(5077)
const URN_REG = /^([\da-z][\d\-a-z]{0,31}):((?:[\w!$'()*+,\-./:;=@]|%[\da-f]{2})+)$/iu

const supportedSchemeNames = /** @type {const} */ (['http', 'https', 'ws',
  'wss', 'urn', 'urn:uuid'])

/** @typedef {supportedSchemeNames[number]} SchemeName */

/**
 * @param {string} name
 * @returns {name is SchemeName}
 */
function isValidSchemeName (name) {
  return supportedSchemeNames.indexOf(/** @type {*} */ (name)) !== -1
}

/**
 * @callback SchemeFn
 * @param {import('../types/index').URIComponent} component
 * @param {import('../types/index').Options} options
 * @returns {import('../types/index').URIComponent}
 */

/**
 * @typedef {Object} SchemeHandler
 * @property {SchemeName} scheme - The scheme name.
 * @property {boolean} [domainHost] - Indicates if the scheme supports domain hosts.
 * @property {SchemeFn} parse - Function to parse the URI component for this scheme.
 * @property {SchemeFn} serialize - Function to serialize the URI component for this scheme.
 * @property {boolean} [skipNormalize] - Indicates if normalization should be skipped for this scheme.
 * @property {boolean} [absolutePath] - Indicates if the scheme uses absolute paths.
 * @property {boolean} [unicodeSupport] - Indicates if the scheme supports Unicode.
 */

/**
 * @param {import('../types/index').URIComponent} wsComponent
 * @returns {boolean}
 */
function wsIsSecure (wsComponent) {
  if (wsComponent.secure === true) {
    return true
  } else if (wsComponent.secure === false) {
    return false
  } else if (wsComponent.scheme) {
    return (
      wsComponent.scheme.length === 3 &&
      (wsComponent.scheme[0] === 'w' || wsComponent.scheme[0] === 'W') &&
      (wsComponent.scheme[1] === 's' || wsComponent.scheme[1] === 'S') &&
      (wsComponent.scheme[2] === 's' || wsComponent.scheme[2] === 'S')
    )
  } else {
    return false
  }
}

/** @type {SchemeFn} */
function httpParse (component) {
  if (!component.host) {
    component.error = component.error || 'HTTP URIs must have a host.'
  }

  return component
}

/** @type {SchemeFn} */
function httpSerialize (component) {
  const secure = String(component.scheme).toLowerCase() === 'https'

  // normalize the default port
  if (component.port === (secure ? 443 : 80) || component.port === '') {
    component.port = undefined
  }

  // normalize the empty path
  if (!component.path) {
    component.path = '/'
  }

  // NOTE: We do not parse query strings for HTTP URIs
  // as WWW Form Url Encoded query strings are part of the HTML4+ spec,
  // and not the HTTP spec.

  return component
}

/** @type {SchemeFn} */
function wsParse (wsComponent) {
// indicate if the secure flag is set
  wsComponent.secure = wsIsSecure(wsComponent)

  // construct resouce name
  wsComponent.resourceName = (wsComponent.path || '/') + (wsComponent.query ? '?' + wsComponent.query : '')
  wsComponent.path = undefined
  wsComponent.query = undefined

  return wsComponent
}

/** @type {SchemeFn} */
function wsSerialize (wsComponent) {
// normalize the default port
  if (wsComponent.port === (wsIsSecure(wsComponent) ? 443 : 80) || wsComponent.port === '') {
    wsComponent.port = undefined
  }

  // ensure scheme matches secure flag
  if (typeof wsComponent.secure === 'boolean') {
    wsComponent.scheme = (wsComponent.secure ? 'wss' : 'ws')
    wsComponent.secure = undefined
  }

  // reconstruct path from resource name
  if (wsComponent.resourceName) {
    const queryIndex = wsComponent.resourceName.indexOf('?')
    const path = queryIndex === -1
      ? wsComponent.resourceName
      : wsComponent.resourceName.slice(0, queryIndex)
    wsComponent.path = (path && path !== '/' ? path : undefined)
    wsComponent.query = queryIndex === -1
      ? undefined
      : wsComponent.resourceName.slice(queryIndex + 1)
    wsComponent.resourceName = undefined
  }

  // forbid fragment component
  wsComponent.fragment = undefined

  return wsComponent
}

/** @type {SchemeFn} */
function urnParse (urnComponent, options) {
  if (!urnComponent.path) {
    urnComponent.error = 'URN can not be parsed'
    return urnComponent
  }
  const matches = urnComponent.path.match(URN_REG)
  if (matches && matches[0] === urnComponent.path) {
    const scheme = options.scheme || urnComponent.scheme || 'urn'
    urnComponent.nid = matches[1].toLowerCase()
    urnComponent.nss = matches[2]
    const urnScheme = `${scheme}:${options.nid || urnComponent.nid}`
    const schemeHandler = getSchemeHandler(urnScheme)
    urnComponent.path = undefined

    if (schemeHandler) {
      urnComponent = schemeHandler.parse(urnComponent, options)
    }
  } else {
    urnComponent.error = urnComponent.error || 'URN can not be parsed.'
  }

  return urnComponent
}

/** @type {SchemeFn} */
function urnSerialize (urnComponent, options) {
  if (urnComponent.nid === undefined) {
    throw new Error('URN without nid cannot be serialized')
  }
  const scheme = options.scheme || urnComponent.scheme || 'urn'
  const nid = urnComponent.nid.toLowerCase()
  const urnScheme = `${scheme}:${options.nid || nid}`
  const schemeHandler = getSchemeHandler(urnScheme)

  if (schemeHandler) {
    urnComponent = schemeHandler.serialize(urnComponent, options)
  }

  const uriComponent = urnComponent
  const nss = urnComponent.nss
  uriComponent.path = `${nid || options.nid}:${nss}`

  options.skipEscape = true
  return uriComponent
}

/** @type {SchemeFn} */
function urnuuidParse (urnComponent, options) {
  const uuidComponent = urnComponent
  uuidComponent.uuid = uuidComponent.nss
  uuidComponent.nss = undefined

  if (!options.tolerant && (!uuidComponent.uuid || !isUUID(uuidComponent.uuid))) {
    uuidComponent.error = uuidComponent.error || 'UUID is not valid.'
  }

  return uuidComponent
}

/** @type {SchemeFn} */
function urnuuidSerialize (uuidComponent) {
  const urnComponent = uuidComponent
  // normalize UUID
  urnComponent.nss = (uuidComponent.uuid || '').toLowerCase()
  return urnComponent
}

const http = /** @type {SchemeHandler} */ ({
  scheme: 'http',
  domainHost: true,
  parse: httpParse,
  serialize: httpSerialize
})

const https = /** @type {SchemeHandler} */ ({
  scheme: 'https',
  domainHost: http.domainHost,
  parse: httpParse,
  serialize: httpSerialize
})

const ws = /** @type {SchemeHandler} */ ({
  scheme: 'ws',
  domainHost: true,
  parse: wsParse,
  serialize: wsSerialize
})

const wss = /** @type {SchemeHandler} */ ({
  scheme: 'wss',
  domainHost: ws.domainHost,
  parse: ws.parse,
  serialize: ws.serialize
})

const urn = /** @type {SchemeHandler} */ ({
  scheme: 'urn',
  parse: urnParse,
  serialize: urnSerialize,
  skipNormalize: true
})

const urnuuid = /** @type {SchemeHandler} */ ({
  scheme: 'urn:uuid',
  parse: urnuuidParse,
  serialize: urnuuidSerialize,
  skipNormalize: true
})

const SCHEMES = /** @type {Record<SchemeName, SchemeHandler>} */ ({
  http,
  https,
  ws,
  wss,
  urn,
  'urn:uuid': urnuuid
})

Object.setPrototypeOf(SCHEMES, null)

/**
 * @param {string|undefined} scheme
 * @returns {SchemeHandler|undefined}
 */
function getSchemeHandler (scheme) {
  return (
    scheme && (
      SCHEMES[/** @type {SchemeName} */ (scheme)] ||
      SCHEMES[/** @type {SchemeName} */(scheme.toLowerCase())])
  ) ||
    undefined
}

module.exports = {
  wsIsSecure,
  SCHEMES,
  isValidSchemeName,
  getSchemeHandler,
}


/***/ }),

/***/ 5077:
/***/ ((module) => {



/** @type {(value: string) => boolean} */
const isUUID = RegExp.prototype.test.bind(/^[\da-f]{8}-[\da-f]{4}-[\da-f]{4}-[\da-f]{4}-[\da-f]{12}$/iu)

/** @type {(value: string) => boolean} */
const isIPv4 = RegExp.prototype.test.bind(/^(?:(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)\.){3}(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)$/u)

/** @type {(value: string) => boolean} */
const isPort = RegExp.prototype.test.bind(/^\d*$/u)

/** @type {(value: string) => boolean} */
const isHexPair = RegExp.prototype.test.bind(/^[\da-f]{2}$/iu)

/** @type {(value: string) => boolean} */
const isUnreserved = RegExp.prototype.test.bind(/^[\da-z\-._~]$/iu)

/** @type {(value: string) => boolean} */
const isPathCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/]$/u)

/** @type {(value: string) => boolean} */
const isQueryFragmentCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/?]$/u)

/** @type {(value: string) => boolean} */
const isUserinfoCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:]$/u)

const BYTE_HEX = new Array(256)
{
  const HEX_DIGITS = '0123456789ABCDEF'
  for (let i = 0; i < 256; i++) {
    BYTE_HEX[i] = '%' + HEX_DIGITS[i >> 4] + HEX_DIGITS[i & 0xF]
  }
}
function percentEncodeNonAscii (cp) {
  if (cp < 0x800) {
    return BYTE_HEX[0xC0 | (cp >> 6)] +
           BYTE_HEX[0x80 | (cp & 0x3F)]
  }
  if (cp < 0x10000) {
    return BYTE_HEX[0xE0 | (cp >> 12)] +
           BYTE_HEX[0x80 | ((cp >> 6) & 0x3F)] +
           BYTE_HEX[0x80 | (cp & 0x3F)]
  }
  return BYTE_HEX[0xF0 | (cp >> 18)] +
         BYTE_HEX[0x80 | ((cp >> 12) & 0x3F)] +
         BYTE_HEX[0x80 | ((cp >> 6) & 0x3F)] +
         BYTE_HEX[0x80 | (cp & 0x3F)]
}

/**
 * @param {Array<string>} input
 * @returns {string}
 */
function stringArrayToHexStripped (input) {
  let acc = ''
  let code = 0
  let i = 0

  for (i = 0; i < input.length; i++) {
    code = input[i].charCodeAt(0)
    if (code === 48) {
      continue
    }
    if (!((code >= 48 && code <= 57) || (code >= 65 && code <= 70) || (code >= 97 && code <= 102))) {
      return ''
    }
    acc += input[i]
    break
  }

  for (i += 1; i < input.length; i++) {
    code = input[i].charCodeAt(0)
    if (!((code >= 48 && code <= 57) || (code >= 65 && code <= 70) || (code >= 97 && code <= 102))) {
      return ''
    }
    acc += input[i]
  }
  return acc
}

/** @type {(value: string) => boolean} */
const isHextet = RegExp.prototype.test.bind(/^[\dA-Fa-f]{1,4}$/)

/** @type {(value: string) => boolean} */
const isIPvFuture = RegExp.prototype.test.bind(/^[vV][\dA-Fa-f]+\.[A-Za-z\d\-._~!$&'()*+,;=:]+$/)

/** @type {(value: string) => boolean} */
const isZoneCharacter = RegExp.prototype.test.bind(/^[A-Za-z\d\-._~]$/)

/**
 * @param {string} value
 * @returns {boolean}
 */
const nonSimpleDomain = RegExp.prototype.test.bind(/[^!"$&'()*+,\-.;=_`a-z{}~]/u)

/**
 * @param {string} zone
 * @returns {boolean}
 */
function isZoneIdentifier (zone) {
  if (zone.length === 0) return false

  for (let i = 0; i < zone.length; i++) {
    if (isZoneCharacter(zone[i])) continue
    if (zone[i] === '%' && i + 2 < zone.length && isHexPair(zone.slice(i + 1, i + 3))) {
      i += 2
      continue
    }
    return false
  }

  return true
}

/**
 * Compresses the longest run of zero hextets to "::" per RFC 5952. A run of a
 * single zero hextet is left uncompressed. On ties the leftmost run wins.
 *
 * @param {string[]} hextets
 * @returns {string}
 */
function compressIPv6ZeroRun (hextets) {
  let bestStart = -1
  let bestLength = 0
  let runStart = -1
  let runLength = 0
  for (let i = 0; i < hextets.length; i++) {
    if (hextets[i] === '0') {
      if (runStart === -1) runStart = i
      runLength++
      if (runLength > bestLength) {
        bestLength = runLength
        bestStart = runStart
      }
    } else {
      runStart = -1
      runLength = 0
    }
  }

  if (bestLength < 2) return hextets.join(':')

  const head = hextets.slice(0, bestStart).join(':')
  const tail = hextets.slice(bestStart + bestLength).join(':')
  return head + '::' + tail
}

/**
 * Validates an IPv6 address against the alternatives in RFC 3986 section
 * 3.2.2 and returns the same address with leading hextet zeroes removed.
 * An embedded IPv4 address counts as two hextets and is only valid at the end.
 *
 * @param {string} input
 * @returns {string|undefined}
 */
function normalizeIPv6Address (input) {
  const compression = input.indexOf('::')
  if (compression !== -1 && input.indexOf('::', compression + 1) !== -1) return undefined

  const left = compression === -1 ? input.split(':') : input.slice(0, compression).split(':')
  const right = compression === -1 ? [] : input.slice(compression + 2).split(':')
  if (compression !== -1) {
    if (left.length === 1 && left[0] === '') left.length = 0
    if (right.length === 1 && right[0] === '') right.length = 0
  }

  const parts = left.concat(right)
  let hextetCount = 0
  for (let i = 0; i < parts.length; i++) {
    const part = parts[i]
    if (part === '') return undefined

    if (part.indexOf('.') !== -1) {
      if (i !== parts.length - 1 || (compression !== -1 && right.length === 0) || !isIPv4(part)) return undefined
      hextetCount += 2
      continue
    }

    if (!isHextet(part)) return undefined
    parts[i] = parseInt(part, 16).toString(16)
    hextetCount++
  }

  if (compression === -1) {
    if (hextetCount !== 8) return undefined
    return compressIPv6ZeroRun(parts)
  }
  if (hextetCount >= 8) return undefined

  // expand "::" then re-compress the longest run for a canonical result
  const expanded = parts.slice(0, left.length)
  for (let i = hextetCount; i < 8; i++) expanded.push('0')
  for (let i = left.length; i < parts.length; i++) expanded.push(parts[i])
  return compressIPv6ZeroRun(expanded)
}

/**
 * @typedef {Object} NormalizeIPv6Result
 * @property {string} host - The normalized host.
 * @property {string} [escapedHost] - The escaped host.
 * @property {boolean} isIPV6 - Indicates if the host is an IPv6 address.
 * @property {boolean} [isIPVFuture] - Indicates if the host is an IPvFuture literal.
 * @property {boolean} [error] - Indicates if a bracketed IP literal is malformed.
 */

/**
 * Validates and normalizes a bracketed IP literal. Raw zone separators remain
 * accepted for backwards compatibility, while encoded separators and zone
 * contents follow RFC 6874.
 *
 * @param {string} host
 * @returns {NormalizeIPv6Result}
 */
function normalizeIPv6 (host) {
  const bracketed = host[0] === '[' && host[host.length - 1] === ']'
  const hasBracket = host[0] === '[' || host[host.length - 1] === ']'
  if (hasBracket && !bracketed) return { host, isIPV6: false, error: true }

  let input = bracketed ? host.slice(1, -1) : host
  if (bracketed && isIPvFuture(input)) {
    input = input.toLowerCase()
    return { host: `[${input}]`, escapedHost: input, isIPV6: false, isIPVFuture: true }
  }

  if (findToken(input, ':') < 2) {
    return { host, isIPV6: false, error: bracketed }
  }

  let zoneIdentifier = ''
  const zoneSeparator = input.indexOf('%')
  if (zoneSeparator !== -1) {
    const separatorLength = input.slice(zoneSeparator, zoneSeparator + 3).toLowerCase() === '%25' ? 3 : 1
    zoneIdentifier = input.slice(zoneSeparator + separatorLength)
    if (!isZoneIdentifier(zoneIdentifier)) return { host, isIPV6: false, error: true }
    input = input.slice(0, zoneSeparator)
  }

  const address = normalizeIPv6Address(input)
  if (address === undefined) return { host, isIPV6: false, error: true }

  return {
    host: address + (zoneIdentifier ? '%' + zoneIdentifier : ''),
    escapedHost: address + (zoneIdentifier ? '%25' + zoneIdentifier : ''),
    isIPV6: true
  }
}

/**
 * @param {string} str
 * @param {string} token
 * @returns {number}
 */
function findToken (str, token) {
  let ind = 0
  for (let i = 0; i < str.length; i++) {
    if (str[i] === token) ind++
  }
  return ind
}

/**
 * @param {string} path
 * @returns {string}
 *
 * @see https://datatracker.ietf.org/doc/html/rfc3986#section-5.2.4
 */
function removeDotSegments (path) {
  let input = path
  const output = []
  let nextSlash = -1
  let len = 0

  // eslint-disable-next-line no-cond-assign
  while (len = input.length) {
    if (len === 1) {
      if (input === '.') {
        break
      } else if (input === '/') {
        output.push('/')
        break
      } else {
        output.push(input)
        break
      }
    } else if (len === 2) {
      if (input[0] === '.') {
        if (input[1] === '.') {
          break
        } else if (input[1] === '/') {
          input = input.slice(2)
          continue
        }
      } else if (input[0] === '/') {
        if (input[1] === '.' || input[1] === '/') {
          output.push('/')
          break
        }
      }
    } else if (len === 3) {
      if (input === '/..') {
        if (output.length !== 0) {
          output.pop()
        }
        output.push('/')
        break
      }
    }
    if (input[0] === '.') {
      if (input[1] === '.') {
        if (input[2] === '/') {
          input = input.slice(3)
          continue
        }
      } else if (input[1] === '/') {
        input = input.slice(2)
        continue
      }
    } else if (input[0] === '/') {
      if (input[1] === '.') {
        if (input[2] === '/') {
          input = input.slice(2)
          continue
        } else if (input[2] === '.') {
          if (input[3] === '/') {
            input = input.slice(3)
            if (output.length !== 0) {
              output.pop()
            }
            continue
          }
        }
      }
    }

    // Rule 2E: Move normal path segment to output
    if ((nextSlash = input.indexOf('/', 1)) === -1) {
      output.push(input)
      break
    } else {
      output.push(input.slice(0, nextSlash))
      input = input.slice(nextSlash)
    }
  }

  return output.join('')
}

/**
 * Removes dot segments from the path of a relative reference (a path that does
 * not start with "/") without changing what it resolves to against any base.
 * Unlike `removeDotSegments`, leading ".." segments that cannot be collapsed
 * are kept, the result never becomes root-relative, and a result that would be
 * empty or start with an empty segment is prefixed with "." (an empty path
 * means "same document" and a leading "//" would introduce an authority).
 *
 * @param {string} path
 * @returns {string}
 */
function removeDotSegmentsRelative (path) {
  if (path === '' || path[0] === '/') {
    return removeDotSegments(path)
  }

  const segments = path.split('/')
  const last = segments.length - 1
  /** @type {string[]} */
  const output = []
  let trailingDirectory = false

  for (let i = 0; i <= last; i++) {
    const segment = segments[i]
    if (segment === '.' || segment === '..') {
      if (segment === '..') {
        if (output.length !== 0 && output[output.length - 1] !== '..') {
          output.pop()
        } else {
          output.push('..')
        }
      }
      trailingDirectory = i === last
    } else {
      output.push(segment)
    }
  }

  if (trailingDirectory && output[output.length - 1] !== '..') {
    output.push('')
  }
  if (output.length === 0 || output[0] === '' || output[0].includes(':')) {
    // An empty path, a leading empty segment ("//"), or a first segment
    // containing ":" (which would be mistaken for a scheme, RFC 3986 section
    // 4.2) must stay behind a "." segment so the reference keeps its meaning.
    output.unshift('.')
  }

  return output.join('/')
}

/**
 * Re-escape RFC 3986 gen-delims that must not appear literally in the host.
 * After the URI regex parses, these characters cannot be literal in the host
 * field, so any that appear after decoding came from percent-encoding and
 * must be restored to prevent authority structure changes.
 *
 * @param {string} host
 * @param {boolean} isIP - true for IPv4/IPv6 hosts (skip colon re-escaping)
 * @returns {string}
 */
const HOST_DELIMS = { '@': '%40', '/': '%2F', '?': '%3F', '#': '%23', ':': '%3A' }
const HOST_DELIM_RE = /[@/?#:]/g
const HOST_DELIM_NO_COLON_RE = /[@/?#]/g

function reescapeHostDelimiters (host, isIP) {
  const re = isIP ? HOST_DELIM_NO_COLON_RE : HOST_DELIM_RE
  re.lastIndex = 0
  return host.replace(re, (ch) => HOST_DELIMS[ch])
}

/**
 * Normalizes percent escapes and optionally decodes only unreserved ASCII bytes.
 * Reserved delimiters such as `%2F` stay escaped; `%2E` is unreserved.
 *
 * @param {string} input
 * @param {boolean} [decodeUnreserved=false]
 * @returns {string}
 */
function normalizePercentEncoding (input, decodeUnreserved = false) {
  if (input.indexOf('%') === -1) {
    return input
  }

  let output = ''

  for (let i = 0; i < input.length; i++) {
    if (input[i] === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        const normalizedHex = hex.toUpperCase()
        const decoded = String.fromCharCode(parseInt(normalizedHex, 16))

        if (decodeUnreserved && isUnreserved(decoded)) {
          output += decoded
        } else {
          output += '%' + normalizedHex
        }

        i += 2
        continue
      }
    }

    output += input[i]
  }

  return output
}

/**
 * Normalizes path data without turning reserved escapes into live path syntax.
 * Valid escapes are uppercased, raw unsafe characters are escaped, and only
 * unreserved bytes that are not `.` are decoded.
 *
 * @param {string} input
 * @returns {string}
 */
function normalizePathEncoding (input) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        const normalizedHex = hex.toUpperCase()
        const decoded = String.fromCharCode(parseInt(normalizedHex, 16))

        if (decoded !== '.' && isUnreserved(decoded)) {
          output += decoded
        } else {
          output += '%' + normalizedHex
        }

        i += 2
        continue
      }
    }

    if (isPathCharacter(ch)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += isEscapeSafe(code) ? ch : BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Serializes a path without rewriting reserved data. Raw RFC 3986 path
 * characters remain literal, valid escapes are preserved and uppercased, and
 * everything else is UTF-8 percent-encoded. In a path-noscheme, a colon in the
 * first segment must be escaped so the result cannot be parsed as a scheme.
 *
 * @param {string} input
 * @param {boolean} [pathNoScheme=false]
 * @returns {string}
 */
function serializePathEncoding (input, pathNoScheme = false) {
  let output = ''
  let firstSegment = pathNoScheme && input[0] !== '/'

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        output += '%' + hex.toUpperCase()
        i += 2
        continue
      }
    }

    if (ch === '/') {
      firstSegment = false
    }

    if (isPathCharacter(ch) && (ch !== ':' || !firstSegment)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Percent-encodes a URI component using its RFC 3986 literal character set.
 * Existing valid escapes are preserved and normalized to uppercase hex.
 *
 * @param {string} input
 * @param {(value: string) => boolean} isAllowed
 * @returns {string}
 */
function encodeComponent (input, isAllowed) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        output += '%' + hex.toUpperCase()
        i += 2
        continue
      }
    }

    if (isAllowed(ch)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Encodes userinfo while preserving its RFC 3986 §3.2.1 literal characters.
 * In particular, authority delimiters such as `@`, `/`, `?`, and `#` are data.
 *
 * @param {string} input
 * @returns {string}
 */
function encodeUserinfo (input) {
  return encodeComponent(input, isUserinfoCharacter)
}

/**
 * Encodes query data using the RFC 3986 §3.4 grammar. A literal `#` must be
 * escaped because it would otherwise begin the fragment component.
 *
 * @param {string} input
 * @returns {string}
 */
function encodeQuery (input) {
  return encodeComponent(input, isQueryFragmentCharacter)
}

/**
 * Encodes fragment data using the RFC 3986 §3.5 grammar.
 *
 * @param {string} input
 * @returns {string}
 */
function encodeFragment (input) {
  return encodeComponent(input, isQueryFragmentCharacter)
}

function isEscapeSafe (cp) {
  return (
    (cp >= 0x30 && cp <= 0x39) ||
    (cp >= 0x41 && cp <= 0x5A) ||
    (cp >= 0x61 && cp <= 0x7A) ||
    cp === 0x2A || cp === 0x2B || cp === 0x2D || cp === 0x2E ||
    cp === 0x2F || cp === 0x40 || cp === 0x5F
  )
}

/**
 * Normalizes the percent-encoding of a query or fragment component.
 *
 * Like `normalizePathEncoding`, but uses the query/fragment character set
 * (which additionally allows `?`) and decodes `.` since it has no dot-segment
 * meaning outside of a path.
 *
 * @param {string} input
 * @returns {string}
 */
function normalizeQueryFragmentEncoding (input) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    const ch = input[i]
    if (ch === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        const normalizedHex = hex.toUpperCase()
        const decoded = String.fromCharCode(parseInt(normalizedHex, 16))

        if (isUnreserved(decoded)) {
          output += decoded
        } else {
          output += '%' + normalizedHex
        }

        i += 2
        continue
      }
    }

    if (isQueryFragmentCharacter(ch)) {
      output += ch
    } else {
      const code = input.charCodeAt(i)
      if (code < 0x80) {
        output += isEscapeSafe(code) ? ch : BYTE_HEX[code]
      } else if (code < 0xD800 || code > 0xDFFF) {
        output += percentEncodeNonAscii(code)
      } else if (code <= 0xDBFF && i + 1 < input.length) {
        const low = input.charCodeAt(i + 1)
        if (low >= 0xDC00 && low <= 0xDFFF) {
          output += percentEncodeNonAscii(0x10000 + ((code - 0xD800) << 10) + (low - 0xDC00))
          i++
        } else {
          output += percentEncodeNonAscii(0xFFFD)
        }
      } else {
        output += percentEncodeNonAscii(0xFFFD)
      }
    }
  }

  return output
}

/**
 * Escapes a component while preserving existing valid percent escapes.
 *
 * @param {string} input
 * @returns {string}
 */
function escapePreservingEscapes (input) {
  let output = ''

  for (let i = 0; i < input.length; i++) {
    if (input[i] === '%' && i + 2 < input.length) {
      const hex = input.slice(i + 1, i + 3)
      if (isHexPair(hex)) {
        output += '%' + hex.toUpperCase()
        i += 2
        continue
      }
    }

    output += escape(input[i])
  }

  return output
}

/**
 * @param {import('../types/index').URIComponent} component
 * @returns {string|undefined}
 */
function recomposeAuthority (component) {
  const uriTokens = []

  if (component.userinfo !== undefined) {
    uriTokens.push(encodeUserinfo(component.userinfo))
    uriTokens.push('@')
  }

  if (component.host !== undefined) {
    let host = component.host
    if (!isIPv4(host)) {
      let ipV6res = normalizeIPv6(host)
      if (ipV6res.isIPV6 !== true && ipV6res.isIPVFuture !== true) {
        // Decode only unreserved bytes, once. In particular, keep %25 encoded
        // so it cannot introduce a second escape during recomposition.
        host = normalizePercentEncoding(host, true)
        ipV6res = normalizeIPv6(host)
      }
      if (ipV6res.isIPV6 === true || ipV6res.isIPVFuture === true) {
        host = `[${ipV6res.escapedHost}]`
      } else {
        host = reescapeHostDelimiters(host, false)
      }
    }
    uriTokens.push(host)
  }

  if (typeof component.port === 'number' || typeof component.port === 'string') {
    const port = String(component.port)
    if (!isPort(port)) {
      throw new TypeError('URI port is malformed.')
    }
    uriTokens.push(':')
    uriTokens.push(port)
  }

  return uriTokens.length ? uriTokens.join('') : undefined
};

module.exports = {
  nonSimpleDomain,
  recomposeAuthority,
  reescapeHostDelimiters,
  normalizePercentEncoding,
  normalizePathEncoding,
  serializePathEncoding,
  normalizeQueryFragmentEncoding,
  encodeUserinfo,
  encodeQuery,
  encodeFragment,
  escapePreservingEscapes,
  removeDotSegments,
  removeDotSegmentsRelative,
  isIPv4,
  isUUID,
  normalizeIPv6,
  stringArrayToHexStripped
}


/***/ }),

/***/ 7349:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var resolveBlockMap = __nccwpck_require__(7103);
var resolveBlockSeq = __nccwpck_require__(334);
var resolveFlowCollection = __nccwpck_require__(3142);

function resolveCollection(CN, ctx, token, onError, tagName, tag) {
    const coll = token.type === 'block-map'
        ? resolveBlockMap.resolveBlockMap(CN, ctx, token, onError, tag)
        : token.type === 'block-seq'
            ? resolveBlockSeq.resolveBlockSeq(CN, ctx, token, onError, tag)
            : resolveFlowCollection.resolveFlowCollection(CN, ctx, token, onError, tag);
    const Coll = coll.constructor;
    // If we got a tagName matching the class, or the tag name is '!',
    // then use the tagName from the node class used to create it.
    if (tagName === '!' || tagName === Coll.tagName) {
        coll.tag = Coll.tagName;
        return coll;
    }
    if (tagName)
        coll.tag = tagName;
    return coll;
}
function composeCollection(CN, ctx, token, props, onError) {
    const tagToken = props.tag;
    const tagName = !tagToken
        ? null
        : ctx.directives.tagName(tagToken.source, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg));
    if (token.type === 'block-seq') {
        const { anchor, newlineAfterProp: nl } = props;
        const lastProp = anchor && tagToken
            ? anchor.offset > tagToken.offset
                ? anchor
                : tagToken
            : (anchor ?? tagToken);
        if (lastProp && (!nl || nl.offset < lastProp.offset)) {
            const message = 'Missing newline after block sequence props';
            onError(lastProp, 'MISSING_CHAR', message);
        }
    }
    const expType = token.type === 'block-map'
        ? 'map'
        : token.type === 'block-seq'
            ? 'seq'
            : token.start.source === '{'
                ? 'map'
                : 'seq';
    // shortcut: check if it's a generic YAMLMap or YAMLSeq
    // before jumping into the custom tag logic.
    if (!tagToken ||
        !tagName ||
        tagName === '!' ||
        (tagName === YAMLMap.YAMLMap.tagName && expType === 'map') ||
        (tagName === YAMLSeq.YAMLSeq.tagName && expType === 'seq')) {
        return resolveCollection(CN, ctx, token, onError, tagName);
    }
    let tag = ctx.schema.tags.find(t => t.tag === tagName && t.collection === expType);
    if (!tag) {
        const kt = ctx.schema.knownTags[tagName];
        if (kt?.collection === expType) {
            ctx.schema.tags.push(Object.assign({}, kt, { default: false }));
            tag = kt;
        }
        else {
            if (kt) {
                onError(tagToken, 'BAD_COLLECTION_TYPE', `${kt.tag} used for ${expType} collection, but expects ${kt.collection ?? 'scalar'}`, true);
            }
            else {
                onError(tagToken, 'TAG_RESOLVE_FAILED', `Unresolved tag: ${tagName}`, true);
            }
            return resolveCollection(CN, ctx, token, onError, tagName);
        }
    }
    const coll = resolveCollection(CN, ctx, token, onError, tagName, tag);
    const res = tag.resolve?.(coll, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg), ctx.options) ?? coll;
    const node = identity.isNode(res)
        ? res
        : new Scalar.Scalar(res);
    node.range = coll.range;
    node.tag = tagName;
    if (tag?.format)
        node.format = tag.format;
    return node;
}

exports.composeCollection = composeCollection;


/***/ }),

/***/ 3683:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Document = __nccwpck_require__(5402);
var composeNode = __nccwpck_require__(5937);
var resolveEnd = __nccwpck_require__(5407);
var resolveProps = __nccwpck_require__(4631);

function composeDoc(options, directives, { offset, start, value, end }, onError) {
    const opts = Object.assign({ _directives: directives }, options);
    const doc = new Document.Document(undefined, opts);
    const ctx = {
        atKey: false,
        atRoot: true,
        directives: doc.directives,
        options: doc.options,
        schema: doc.schema
    };
    const props = resolveProps.resolveProps(start, {
        indicator: 'doc-start',
        next: value ?? end?.[0],
        offset,
        onError,
        parentIndent: 0,
        startOnNewline: true
    });
    if (props.found) {
        doc.directives.docStart = true;
        if (value &&
            (value.type === 'block-map' || value.type === 'block-seq') &&
            !props.hasNewline)
            onError(props.end, 'MISSING_CHAR', 'Block collection cannot start on same line with directives-end marker');
    }
    // @ts-expect-error If Contents is set, let's trust the user
    doc.contents = value
        ? composeNode.composeNode(ctx, value, props, onError)
        : composeNode.composeEmptyNode(ctx, props.end, start, null, props, onError);
    const contentEnd = doc.contents.range[2];
    const re = resolveEnd.resolveEnd(end, contentEnd, false, onError);
    if (re.comment)
        doc.comment = re.comment;
    doc.range = [offset, contentEnd, re.offset];
    return doc;
}

exports.composeDoc = composeDoc;


/***/ }),

/***/ 5937:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var composeCollection = __nccwpck_require__(7349);
var composeScalar = __nccwpck_require__(5413);
var resolveEnd = __nccwpck_require__(5407);
var utilEmptyScalarPosition = __nccwpck_require__(2599);

const CN = { composeNode, composeEmptyNode };
function composeNode(ctx, token, props, onError) {
    const atKey = ctx.atKey;
    const { spaceBefore, comment, anchor, tag } = props;
    let node;
    let isSrcToken = true;
    switch (token.type) {
        case 'alias':
            node = composeAlias(ctx, token, onError);
            if (anchor || tag)
                onError(token, 'ALIAS_PROPS', 'An alias node must not specify any properties');
            break;
        case 'scalar':
        case 'single-quoted-scalar':
        case 'double-quoted-scalar':
        case 'block-scalar':
            node = composeScalar.composeScalar(ctx, token, tag, onError);
            if (anchor)
                node.anchor = anchor.source.substring(1);
            break;
        case 'block-map':
        case 'block-seq':
        case 'flow-collection':
            try {
                node = composeCollection.composeCollection(CN, ctx, token, props, onError);
                if (anchor)
                    node.anchor = anchor.source.substring(1);
            }
            catch (error) {
                // Almost certainly here due to a stack overflow
                const message = error instanceof Error ? error.message : String(error);
                onError(token, 'RESOURCE_EXHAUSTION', message);
            }
            break;
        default: {
            const message = token.type === 'error'
                ? token.message
                : `Unsupported token (type: ${token.type})`;
            onError(token, 'UNEXPECTED_TOKEN', message);
            isSrcToken = false;
        }
    }
    node ?? (node = composeEmptyNode(ctx, token.offset, undefined, null, props, onError));
    if (anchor && node.anchor === '')
        onError(anchor, 'BAD_ALIAS', 'Anchor cannot be an empty string');
    if (atKey &&
        ctx.options.stringKeys &&
        (!identity.isScalar(node) ||
            typeof node.value !== 'string' ||
            (node.tag && node.tag !== 'tag:yaml.org,2002:str'))) {
        const msg = 'With stringKeys, all keys must be strings';
        onError(tag ?? token, 'NON_STRING_KEY', msg);
    }
    if (spaceBefore)
        node.spaceBefore = true;
    if (comment) {
        if (token.type === 'scalar' && token.source === '')
            node.comment = comment;
        else
            node.commentBefore = comment;
    }
    // @ts-expect-error Type checking misses meaning of isSrcToken
    if (ctx.options.keepSourceTokens && isSrcToken)
        node.srcToken = token;
    return node;
}
function composeEmptyNode(ctx, offset, before, pos, { spaceBefore, comment, anchor, tag, end }, onError) {
    const token = {
        type: 'scalar',
        offset: utilEmptyScalarPosition.emptyScalarPosition(offset, before, pos),
        indent: -1,
        source: ''
    };
    const node = composeScalar.composeScalar(ctx, token, tag, onError);
    if (anchor) {
        node.anchor = anchor.source.substring(1);
        if (node.anchor === '')
            onError(anchor, 'BAD_ALIAS', 'Anchor cannot be an empty string');
    }
    if (spaceBefore)
        node.spaceBefore = true;
    if (comment) {
        node.comment = comment;
        node.range[2] = end;
    }
    return node;
}
function composeAlias({ options }, { offset, source, end }, onError) {
    const alias = new Alias.Alias(source.substring(1));
    if (alias.source === '')
        onError(offset, 'BAD_ALIAS', 'Alias cannot be an empty string');
    if (alias.source.endsWith(':'))
        onError(offset + source.length - 1, 'BAD_ALIAS', 'Alias ending in : is ambiguous', true);
    const valueEnd = offset + source.length;
    const re = resolveEnd.resolveEnd(end, valueEnd, options.strict, onError);
    alias.range = [offset, valueEnd, re.offset];
    if (re.comment)
        alias.comment = re.comment;
    return alias;
}

exports.composeEmptyNode = composeEmptyNode;
exports.composeNode = composeNode;


/***/ }),

/***/ 5413:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var resolveBlockScalar = __nccwpck_require__(8913);
var resolveFlowScalar = __nccwpck_require__(6842);

function composeScalar(ctx, token, tagToken, onError) {
    const { value, type, comment, range } = token.type === 'block-scalar'
        ? resolveBlockScalar.resolveBlockScalar(ctx, token, onError)
        : resolveFlowScalar.resolveFlowScalar(token, ctx.options.strict, onError);
    const tagName = tagToken
        ? ctx.directives.tagName(tagToken.source, msg => onError(tagToken, 'TAG_RESOLVE_FAILED', msg))
        : null;
    let tag;
    if (ctx.options.stringKeys && ctx.atKey) {
        tag = ctx.schema[identity.SCALAR];
    }
    else if (tagName)
        tag = findScalarTagByName(ctx.schema, value, tagName, tagToken, onError);
    else if (token.type === 'scalar')
        tag = findScalarTagByTest(ctx, value, token, onError);
    else
        tag = ctx.schema[identity.SCALAR];
    let scalar;
    try {
        const res = tag.resolve(value, msg => onError(tagToken ?? token, 'TAG_RESOLVE_FAILED', msg), ctx.options);
        scalar = identity.isScalar(res) ? res : new Scalar.Scalar(res);
    }
    catch (error) {
        const msg = error instanceof Error ? error.message : String(error);
        onError(tagToken ?? token, 'TAG_RESOLVE_FAILED', msg);
        scalar = new Scalar.Scalar(value);
    }
    scalar.range = range;
    scalar.source = value;
    if (type)
        scalar.type = type;
    if (tagName)
        scalar.tag = tagName;
    if (tag.format)
        scalar.format = tag.format;
    if (comment)
        scalar.comment = comment;
    return scalar;
}
function findScalarTagByName(schema, value, tagName, tagToken, onError) {
    if (tagName === '!')
        return schema[identity.SCALAR]; // non-specific tag
    const matchWithTest = [];
    for (const tag of schema.tags) {
        if (!tag.collection && tag.tag === tagName) {
            if (tag.default && tag.test)
                matchWithTest.push(tag);
            else
                return tag;
        }
    }
    for (const tag of matchWithTest)
        if (tag.test?.test(value))
            return tag;
    const kt = schema.knownTags[tagName];
    if (kt && !kt.collection) {
        // Ensure that the known tag is available for stringifying,
        // but does not get used by default.
        schema.tags.push(Object.assign({}, kt, { default: false, test: undefined }));
        return kt;
    }
    onError(tagToken, 'TAG_RESOLVE_FAILED', `Unresolved tag: ${tagName}`, tagName !== 'tag:yaml.org,2002:str');
    return schema[identity.SCALAR];
}
function findScalarTagByTest({ atKey, directives, schema }, value, token, onError) {
    const tag = schema.tags.find(tag => (tag.default === true || (atKey && tag.default === 'key')) &&
        tag.test?.test(value)) || schema[identity.SCALAR];
    if (schema.compat) {
        const compat = schema.compat.find(tag => tag.default && tag.test?.test(value)) ??
            schema[identity.SCALAR];
        if (tag.tag !== compat.tag) {
            const ts = directives.tagString(tag.tag);
            const cs = directives.tagString(compat.tag);
            const msg = `Value may be parsed as either ${ts} or ${cs}`;
            onError(token, 'TAG_RESOLVE_FAILED', msg, true);
        }
    }
    return tag;
}

exports.composeScalar = composeScalar;


/***/ }),

/***/ 9984:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);
var directives = __nccwpck_require__(1342);
var Document = __nccwpck_require__(5402);
var errors = __nccwpck_require__(1464);
var identity = __nccwpck_require__(1127);
var composeDoc = __nccwpck_require__(3683);
var resolveEnd = __nccwpck_require__(5407);

function getErrorPos(src) {
    if (typeof src === 'number')
        return [src, src + 1];
    if (Array.isArray(src))
        return src.length === 2 ? src : [src[0], src[1]];
    const { offset, source } = src;
    return [offset, offset + (typeof source === 'string' ? source.length : 1)];
}
function parsePrelude(prelude) {
    let comment = '';
    let atComment = false;
    let afterEmptyLine = false;
    for (let i = 0; i < prelude.length; ++i) {
        const source = prelude[i];
        switch (source[0]) {
            case '#':
                comment +=
                    (comment === '' ? '' : afterEmptyLine ? '\n\n' : '\n') +
                        (source.substring(1) || ' ');
                atComment = true;
                afterEmptyLine = false;
                break;
            case '%':
                if (prelude[i + 1]?.[0] !== '#')
                    i += 1;
                atComment = false;
                break;
            default:
                // This may be wrong after doc-end, but in that case it doesn't matter
                if (!atComment)
                    afterEmptyLine = true;
                atComment = false;
        }
    }
    return { comment, afterEmptyLine };
}
/**
 * Compose a stream of CST nodes into a stream of YAML Documents.
 *
 * ```ts
 * import { Composer, Parser } from 'yaml'
 *
 * const src: string = ...
 * const tokens = new Parser().parse(src)
 * const docs = new Composer().compose(tokens)
 * ```
 */
class Composer {
    constructor(options = {}) {
        this.doc = null;
        this.atDirectives = false;
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
        this.onError = (source, code, message, warning) => {
            const pos = getErrorPos(source);
            if (warning)
                this.warnings.push(new errors.YAMLWarning(pos, code, message));
            else
                this.errors.push(new errors.YAMLParseError(pos, code, message));
        };
        // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
        this.directives = new directives.Directives({ version: options.version || '1.2' });
        this.options = options;
    }
    decorate(doc, afterDoc) {
        const { comment, afterEmptyLine } = parsePrelude(this.prelude);
        //console.log({ dc: doc.comment, prelude, comment })
        if (comment) {
            const dc = doc.contents;
            if (afterDoc) {
                doc.comment = doc.comment ? `${doc.comment}\n${comment}` : comment;
            }
            else if (afterEmptyLine || doc.directives.docStart || !dc) {
                doc.commentBefore = comment;
            }
            else if (identity.isCollection(dc) && !dc.flow && dc.items.length > 0) {
                let it = dc.items[0];
                if (identity.isPair(it))
                    it = it.key;
                const cb = it.commentBefore;
                it.commentBefore = cb ? `${comment}\n${cb}` : comment;
            }
            else {
                const cb = dc.commentBefore;
                dc.commentBefore = cb ? `${comment}\n${cb}` : comment;
            }
        }
        if (afterDoc) {
            for (let i = 0; i < this.errors.length; ++i)
                doc.errors.push(this.errors[i]);
            for (let i = 0; i < this.warnings.length; ++i)
                doc.warnings.push(this.warnings[i]);
        }
        else {
            doc.errors = this.errors;
            doc.warnings = this.warnings;
        }
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
    }
    /**
     * Current stream status information.
     *
     * Mostly useful at the end of input for an empty stream.
     */
    streamInfo() {
        return {
            comment: parsePrelude(this.prelude).comment,
            directives: this.directives,
            errors: this.errors,
            warnings: this.warnings
        };
    }
    /**
     * Compose tokens into documents.
     *
     * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
     * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
     */
    *compose(tokens, forceDoc = false, endOffset = -1) {
        for (const token of tokens)
            yield* this.next(token);
        yield* this.end(forceDoc, endOffset);
    }
    /** Advance the composer by one CST token. */
    *next(token) {
        if (node_process.env.LOG_STREAM)
            console.dir(token, { depth: null });
        switch (token.type) {
            case 'directive':
                this.directives.add(token.source, (offset, message, warning) => {
                    const pos = getErrorPos(token);
                    pos[0] += offset;
                    this.onError(pos, 'BAD_DIRECTIVE', message, warning);
                });
                this.prelude.push(token.source);
                this.atDirectives = true;
                break;
            case 'document': {
                const doc = composeDoc.composeDoc(this.options, this.directives, token, this.onError);
                if (this.atDirectives && !doc.directives.docStart)
                    this.onError(token, 'MISSING_CHAR', 'Missing directives-end/doc-start indicator line');
                this.decorate(doc, false);
                if (this.doc)
                    yield this.doc;
                this.doc = doc;
                this.atDirectives = false;
                break;
            }
            case 'byte-order-mark':
            case 'space':
                break;
            case 'comment':
            case 'newline':
                this.prelude.push(token.source);
                break;
            case 'error': {
                const msg = token.source
                    ? `${token.message}: ${JSON.stringify(token.source)}`
                    : token.message;
                const error = new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', msg);
                if (this.atDirectives || !this.doc)
                    this.errors.push(error);
                else
                    this.doc.errors.push(error);
                break;
            }
            case 'doc-end': {
                if (!this.doc) {
                    const msg = 'Unexpected doc-end without preceding document';
                    this.errors.push(new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', msg));
                    break;
                }
                this.doc.directives.docEnd = true;
                const end = resolveEnd.resolveEnd(token.end, token.offset + token.source.length, this.doc.options.strict, this.onError);
                this.decorate(this.doc, true);
                if (end.comment) {
                    const dc = this.doc.comment;
                    this.doc.comment = dc ? `${dc}\n${end.comment}` : end.comment;
                }
                this.doc.range[2] = end.offset;
                break;
            }
            default:
                this.errors.push(new errors.YAMLParseError(getErrorPos(token), 'UNEXPECTED_TOKEN', `Unsupported token ${token.type}`));
        }
    }
    /**
     * Call at end of input to yield any remaining document.
     *
     * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
     * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
     */
    *end(forceDoc = false, endOffset = -1) {
        if (this.doc) {
            this.decorate(this.doc, true);
            yield this.doc;
            this.doc = null;
        }
        else if (forceDoc) {
            const opts = Object.assign({ _directives: this.directives }, this.options);
            const doc = new Document.Document(undefined, opts);
            if (this.atDirectives)
                this.onError(endOffset, 'MISSING_CHAR', 'Missing directives-end indicator line');
            doc.range = [0, endOffset, endOffset];
            this.decorate(doc, false);
            yield doc;
        }
    }
}

exports.Composer = Composer;


/***/ }),

/***/ 7103:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);
var resolveProps = __nccwpck_require__(4631);
var utilContainsNewline = __nccwpck_require__(9499);
var utilFlowIndentCheck = __nccwpck_require__(4051);
var utilMapIncludes = __nccwpck_require__(1187);

const startColMsg = 'All mapping items must start at the same column';
function resolveBlockMap({ composeNode, composeEmptyNode }, ctx, bm, onError, tag) {
    const NodeClass = tag?.nodeClass ?? YAMLMap.YAMLMap;
    const map = new NodeClass(ctx.schema);
    if (ctx.atRoot)
        ctx.atRoot = false;
    let offset = bm.offset;
    let commentEnd = null;
    for (const collItem of bm.items) {
        const { start, key, sep, value } = collItem;
        // key properties
        const keyProps = resolveProps.resolveProps(start, {
            indicator: 'explicit-key-ind',
            next: key ?? sep?.[0],
            offset,
            onError,
            parentIndent: bm.indent,
            startOnNewline: true
        });
        const implicitKey = !keyProps.found;
        if (implicitKey) {
            if (key) {
                if (key.type === 'block-seq')
                    onError(offset, 'BLOCK_AS_IMPLICIT_KEY', 'A block sequence may not be used as an implicit map key');
                else if ('indent' in key && key.indent !== bm.indent)
                    onError(offset, 'BAD_INDENT', startColMsg);
            }
            if (!keyProps.anchor && !keyProps.tag && !sep) {
                commentEnd = keyProps.end;
                if (keyProps.comment) {
                    if (map.comment)
                        map.comment += '\n' + keyProps.comment;
                    else
                        map.comment = keyProps.comment;
                }
                continue;
            }
            if (keyProps.newlineAfterProp || utilContainsNewline.containsNewline(key)) {
                onError(key ?? start[start.length - 1], 'MULTILINE_IMPLICIT_KEY', 'Implicit keys need to be on a single line');
            }
        }
        else if (keyProps.found?.indent !== bm.indent) {
            onError(offset, 'BAD_INDENT', startColMsg);
        }
        // key value
        ctx.atKey = true;
        const keyStart = keyProps.end;
        const keyNode = key
            ? composeNode(ctx, key, keyProps, onError)
            : composeEmptyNode(ctx, keyStart, start, null, keyProps, onError);
        if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bm.indent, key, onError);
        ctx.atKey = false;
        if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
            onError(keyStart, 'DUPLICATE_KEY', 'Map keys must be unique');
        // value properties
        const valueProps = resolveProps.resolveProps(sep ?? [], {
            indicator: 'map-value-ind',
            next: value,
            offset: keyNode.range[2],
            onError,
            parentIndent: bm.indent,
            startOnNewline: !key || key.type === 'block-scalar'
        });
        offset = valueProps.end;
        if (valueProps.found) {
            if (implicitKey) {
                if (value?.type === 'block-map' && !valueProps.hasNewline)
                    onError(offset, 'BLOCK_AS_IMPLICIT_KEY', 'Nested mappings are not allowed in compact mappings');
                if (ctx.options.strict &&
                    keyProps.start < valueProps.found.offset - 1024)
                    onError(keyNode.range, 'KEY_OVER_1024_CHARS', 'The : indicator must be at most 1024 chars after the start of an implicit block mapping key');
            }
            // value value
            const valueNode = value
                ? composeNode(ctx, value, valueProps, onError)
                : composeEmptyNode(ctx, offset, sep, null, valueProps, onError);
            if (ctx.schema.compat)
                utilFlowIndentCheck.flowIndentCheck(bm.indent, value, onError);
            offset = valueNode.range[2];
            const pair = new Pair.Pair(keyNode, valueNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            map.items.push(pair);
        }
        else {
            // key with no value
            if (implicitKey)
                onError(keyNode.range, 'MISSING_CHAR', 'Implicit map keys need to be followed by map values');
            if (valueProps.comment) {
                if (keyNode.comment)
                    keyNode.comment += '\n' + valueProps.comment;
                else
                    keyNode.comment = valueProps.comment;
            }
            const pair = new Pair.Pair(keyNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            map.items.push(pair);
        }
    }
    if (commentEnd && commentEnd < offset)
        onError(commentEnd, 'IMPOSSIBLE', 'Map comment with trailing content');
    map.range = [bm.offset, offset, commentEnd ?? offset];
    return map;
}

exports.resolveBlockMap = resolveBlockMap;


/***/ }),

/***/ 8913:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

function resolveBlockScalar(ctx, scalar, onError) {
    const start = scalar.offset;
    const header = parseBlockScalarHeader(scalar, ctx.options.strict, onError);
    if (!header)
        return { value: '', type: null, comment: '', range: [start, start, start] };
    const type = header.mode === '>' ? Scalar.Scalar.BLOCK_FOLDED : Scalar.Scalar.BLOCK_LITERAL;
    const lines = scalar.source ? splitLines(scalar.source) : [];
    // determine the end of content & start of chomping
    let chompStart = lines.length;
    for (let i = lines.length - 1; i >= 0; --i) {
        const content = lines[i][1];
        if (content === '' || content === '\r')
            chompStart = i;
        else
            break;
    }
    // shortcut for empty contents
    if (chompStart === 0) {
        const value = header.chomp === '+' && lines.length > 0
            ? '\n'.repeat(Math.max(1, lines.length - 1))
            : '';
        let end = start + header.length;
        if (scalar.source)
            end += scalar.source.length;
        return { value, type, comment: header.comment, range: [start, end, end] };
    }
    // find the indentation level to trim from start
    let trimIndent = scalar.indent + header.indent;
    let offset = scalar.offset + header.length;
    let contentStart = 0;
    for (let i = 0; i < chompStart; ++i) {
        const [indent, content] = lines[i];
        if (content === '' || content === '\r') {
            if (header.indent === 0 && indent.length > trimIndent)
                trimIndent = indent.length;
        }
        else {
            if (indent.length < trimIndent) {
                const message = 'Block scalars with more-indented leading empty lines must use an explicit indentation indicator';
                onError(offset + indent.length, 'MISSING_CHAR', message);
            }
            if (header.indent === 0)
                trimIndent = indent.length;
            contentStart = i;
            if (trimIndent === 0 && !ctx.atRoot) {
                const message = 'Block scalar values in collections must be indented';
                onError(offset, 'BAD_INDENT', message);
            }
            break;
        }
        offset += indent.length + content.length + 1;
    }
    // include trailing more-indented empty lines in content
    for (let i = lines.length - 1; i >= chompStart; --i) {
        if (lines[i][0].length > trimIndent)
            chompStart = i + 1;
    }
    let value = '';
    let sep = '';
    let prevMoreIndented = false;
    // leading whitespace is kept intact
    for (let i = 0; i < contentStart; ++i)
        value += lines[i][0].slice(trimIndent) + '\n';
    for (let i = contentStart; i < chompStart; ++i) {
        let [indent, content] = lines[i];
        offset += indent.length + content.length + 1;
        const crlf = content[content.length - 1] === '\r';
        if (crlf)
            content = content.slice(0, -1);
        /* istanbul ignore if already caught in lexer */
        if (content && indent.length < trimIndent) {
            const src = header.indent
                ? 'explicit indentation indicator'
                : 'first line';
            const message = `Block scalar lines must not be less indented than their ${src}`;
            onError(offset - content.length - (crlf ? 2 : 1), 'BAD_INDENT', message);
            indent = '';
        }
        if (type === Scalar.Scalar.BLOCK_LITERAL) {
            value += sep + indent.slice(trimIndent) + content;
            sep = '\n';
        }
        else if (indent.length > trimIndent || content[0] === '\t') {
            // more-indented content within a folded block
            if (sep === ' ')
                sep = '\n';
            else if (!prevMoreIndented && sep === '\n')
                sep = '\n\n';
            value += sep + indent.slice(trimIndent) + content;
            sep = '\n';
            prevMoreIndented = true;
        }
        else if (content === '') {
            // empty line
            if (sep === '\n')
                value += '\n';
            else
                sep = '\n';
        }
        else {
            value += sep + content;
            sep = ' ';
            prevMoreIndented = false;
        }
    }
    switch (header.chomp) {
        case '-':
            break;
        case '+':
            for (let i = chompStart; i < lines.length; ++i)
                value += '\n' + lines[i][0].slice(trimIndent);
            if (value[value.length - 1] !== '\n')
                value += '\n';
            break;
        default:
            value += '\n';
    }
    const end = start + header.length + scalar.source.length;
    return { value, type, comment: header.comment, range: [start, end, end] };
}
function parseBlockScalarHeader({ offset, props }, strict, onError) {
    /* istanbul ignore if should not happen */
    if (props[0].type !== 'block-scalar-header') {
        onError(props[0], 'IMPOSSIBLE', 'Block scalar header not found');
        return null;
    }
    const { source } = props[0];
    const mode = source[0];
    let indent = 0;
    let chomp = '';
    let error = -1;
    for (let i = 1; i < source.length; ++i) {
        const ch = source[i];
        if (!chomp && (ch === '-' || ch === '+'))
            chomp = ch;
        else {
            const n = Number(ch);
            if (!indent && n)
                indent = n;
            else if (error === -1)
                error = offset + i;
        }
    }
    if (error !== -1)
        onError(error, 'UNEXPECTED_TOKEN', `Block scalar header includes extra characters: ${source}`);
    let hasSpace = false;
    let comment = '';
    let length = source.length;
    for (let i = 1; i < props.length; ++i) {
        const token = props[i];
        switch (token.type) {
            case 'space':
                hasSpace = true;
            // fallthrough
            case 'newline':
                length += token.source.length;
                break;
            case 'comment':
                if (strict && !hasSpace) {
                    const message = 'Comments must be separated from other tokens by white space characters';
                    onError(token, 'MISSING_CHAR', message);
                }
                length += token.source.length;
                comment = token.source.substring(1);
                break;
            case 'error':
                onError(token, 'UNEXPECTED_TOKEN', token.message);
                length += token.source.length;
                break;
            /* istanbul ignore next should not happen */
            default: {
                const message = `Unexpected token in block scalar header: ${token.type}`;
                onError(token, 'UNEXPECTED_TOKEN', message);
                const ts = token.source;
                if (ts && typeof ts === 'string')
                    length += ts.length;
            }
        }
    }
    return { mode, indent, chomp, comment, length };
}
/** @returns Array of lines split up as `[indent, content]` */
function splitLines(source) {
    const split = source.split(/\n( *)/);
    const first = split[0];
    const m = first.match(/^( *)/);
    const line0 = m?.[1]
        ? [m[1], first.slice(m[1].length)]
        : ['', first];
    const lines = [line0];
    for (let i = 1; i < split.length; i += 2)
        lines.push([split[i], split[i + 1]]);
    return lines;
}

exports.resolveBlockScalar = resolveBlockScalar;


/***/ }),

/***/ 334:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var YAMLSeq = __nccwpck_require__(2223);
var resolveProps = __nccwpck_require__(4631);
var utilFlowIndentCheck = __nccwpck_require__(4051);

function resolveBlockSeq({ composeNode, composeEmptyNode }, ctx, bs, onError, tag) {
    const NodeClass = tag?.nodeClass ?? YAMLSeq.YAMLSeq;
    const seq = new NodeClass(ctx.schema);
    if (ctx.atRoot)
        ctx.atRoot = false;
    if (ctx.atKey)
        ctx.atKey = false;
    let offset = bs.offset;
    let commentEnd = null;
    for (const { start, value } of bs.items) {
        const props = resolveProps.resolveProps(start, {
            indicator: 'seq-item-ind',
            next: value,
            offset,
            onError,
            parentIndent: bs.indent,
            startOnNewline: true
        });
        if (!props.found) {
            if (props.anchor || props.tag || value) {
                if (value?.type === 'block-seq')
                    onError(props.end, 'BAD_INDENT', 'All sequence items must start at the same column');
                else
                    onError(offset, 'MISSING_CHAR', 'Sequence item without - indicator');
            }
            else {
                commentEnd = props.end;
                if (props.comment)
                    seq.comment = props.comment;
                continue;
            }
        }
        const node = value
            ? composeNode(ctx, value, props, onError)
            : composeEmptyNode(ctx, props.end, start, null, props, onError);
        if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bs.indent, value, onError);
        offset = node.range[2];
        seq.items.push(node);
    }
    seq.range = [bs.offset, offset, commentEnd ?? offset];
    return seq;
}

exports.resolveBlockSeq = resolveBlockSeq;


/***/ }),

/***/ 5407:
/***/ ((__unused_webpack_module, exports) => {



function resolveEnd(end, offset, reqSpace, onError) {
    let comment = '';
    if (end) {
        let hasSpace = false;
        let sep = '';
        for (const token of end) {
            const { source, type } = token;
            switch (type) {
                case 'space':
                    hasSpace = true;
                    break;
                case 'comment': {
                    if (reqSpace && !hasSpace)
                        onError(token, 'MISSING_CHAR', 'Comments must be separated from other tokens by white space characters');
                    const cb = source.substring(1) || ' ';
                    if (!comment)
                        comment = cb;
                    else
                        comment += sep + cb;
                    sep = '';
                    break;
                }
                case 'newline':
                    if (comment)
                        sep += source;
                    hasSpace = true;
                    break;
                default:
                    onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${type} at node end`);
            }
            offset += source.length;
        }
    }
    return { comment, offset };
}

exports.resolveEnd = resolveEnd;


/***/ }),

/***/ 3142:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var resolveEnd = __nccwpck_require__(5407);
var resolveProps = __nccwpck_require__(4631);
var utilContainsNewline = __nccwpck_require__(9499);
var utilMapIncludes = __nccwpck_require__(1187);

const blockMsg = 'Block collections are not allowed within flow collections';
const isBlock = (token) => token && (token.type === 'block-map' || token.type === 'block-seq');
function resolveFlowCollection({ composeNode, composeEmptyNode }, ctx, fc, onError, tag) {
    const isMap = fc.start.source === '{';
    const fcName = isMap ? 'flow map' : 'flow sequence';
    const NodeClass = (tag?.nodeClass ?? (isMap ? YAMLMap.YAMLMap : YAMLSeq.YAMLSeq));
    const coll = new NodeClass(ctx.schema);
    coll.flow = true;
    const atRoot = ctx.atRoot;
    if (atRoot)
        ctx.atRoot = false;
    if (ctx.atKey)
        ctx.atKey = false;
    let offset = fc.offset + fc.start.source.length;
    for (let i = 0; i < fc.items.length; ++i) {
        const collItem = fc.items[i];
        const { start, key, sep, value } = collItem;
        const props = resolveProps.resolveProps(start, {
            flow: fcName,
            indicator: 'explicit-key-ind',
            next: key ?? sep?.[0],
            offset,
            onError,
            parentIndent: fc.indent,
            startOnNewline: false
        });
        if (!props.found) {
            if (!props.anchor && !props.tag && !sep && !value) {
                if (i === 0 && props.comma)
                    onError(props.comma, 'UNEXPECTED_TOKEN', `Unexpected , in ${fcName}`);
                else if (i < fc.items.length - 1)
                    onError(props.start, 'UNEXPECTED_TOKEN', `Unexpected empty item in ${fcName}`);
                if (props.comment) {
                    if (coll.comment)
                        coll.comment += '\n' + props.comment;
                    else
                        coll.comment = props.comment;
                }
                offset = props.end;
                continue;
            }
            if (!isMap && ctx.options.strict && utilContainsNewline.containsNewline(key))
                onError(key, // checked by containsNewline()
                'MULTILINE_IMPLICIT_KEY', 'Implicit keys of flow sequence pairs need to be on a single line');
        }
        if (i === 0) {
            if (props.comma)
                onError(props.comma, 'UNEXPECTED_TOKEN', `Unexpected , in ${fcName}`);
        }
        else {
            if (!props.comma)
                onError(props.start, 'MISSING_CHAR', `Missing , between ${fcName} items`);
            if (props.comment) {
                let prevItemComment = '';
                loop: for (const st of start) {
                    switch (st.type) {
                        case 'comma':
                        case 'space':
                            break;
                        case 'comment':
                            prevItemComment = st.source.substring(1);
                            break loop;
                        default:
                            break loop;
                    }
                }
                if (prevItemComment) {
                    let prev = coll.items[coll.items.length - 1];
                    if (identity.isPair(prev))
                        prev = prev.value ?? prev.key;
                    if (prev.comment)
                        prev.comment += '\n' + prevItemComment;
                    else
                        prev.comment = prevItemComment;
                    props.comment = props.comment.substring(prevItemComment.length + 1);
                }
            }
        }
        if (!isMap && !sep && !props.found) {
            // item is a value in a seq
            // → key & sep are empty, start does not include ? or :
            const valueNode = value
                ? composeNode(ctx, value, props, onError)
                : composeEmptyNode(ctx, props.end, sep, null, props, onError);
            coll.items.push(valueNode);
            offset = valueNode.range[2];
            if (isBlock(value))
                onError(valueNode.range, 'BLOCK_IN_FLOW', blockMsg);
        }
        else {
            // item is a key+value pair
            // key value
            ctx.atKey = true;
            const keyStart = props.end;
            const keyNode = key
                ? composeNode(ctx, key, props, onError)
                : composeEmptyNode(ctx, keyStart, start, null, props, onError);
            if (isBlock(key))
                onError(keyNode.range, 'BLOCK_IN_FLOW', blockMsg);
            ctx.atKey = false;
            // value properties
            const valueProps = resolveProps.resolveProps(sep ?? [], {
                flow: fcName,
                indicator: 'map-value-ind',
                next: value,
                offset: keyNode.range[2],
                onError,
                parentIndent: fc.indent,
                startOnNewline: false
            });
            if (valueProps.found) {
                if (!isMap && !props.found && ctx.options.strict) {
                    if (sep)
                        for (const st of sep) {
                            if (st === valueProps.found)
                                break;
                            if (st.type === 'newline') {
                                onError(st, 'MULTILINE_IMPLICIT_KEY', 'Implicit keys of flow sequence pairs need to be on a single line');
                                break;
                            }
                        }
                    if (props.start < valueProps.found.offset - 1024)
                        onError(valueProps.found, 'KEY_OVER_1024_CHARS', 'The : indicator must be at most 1024 chars after the start of an implicit flow sequence key');
                }
            }
            else if (value) {
                if ('source' in value && value.source?.[0] === ':')
                    onError(value, 'MISSING_CHAR', `Missing space after : in ${fcName}`);
                else
                    onError(valueProps.start, 'MISSING_CHAR', `Missing , or : between ${fcName} items`);
            }
            // value value
            const valueNode = value
                ? composeNode(ctx, value, valueProps, onError)
                : valueProps.found
                    ? composeEmptyNode(ctx, valueProps.end, sep, null, valueProps, onError)
                    : null;
            if (valueNode) {
                if (isBlock(value))
                    onError(valueNode.range, 'BLOCK_IN_FLOW', blockMsg);
            }
            else if (valueProps.comment) {
                if (keyNode.comment)
                    keyNode.comment += '\n' + valueProps.comment;
                else
                    keyNode.comment = valueProps.comment;
            }
            const pair = new Pair.Pair(keyNode, valueNode);
            if (ctx.options.keepSourceTokens)
                pair.srcToken = collItem;
            if (isMap) {
                const map = coll;
                if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
                    onError(keyStart, 'DUPLICATE_KEY', 'Map keys must be unique');
                map.items.push(pair);
            }
            else {
                const map = new YAMLMap.YAMLMap(ctx.schema);
                map.flow = true;
                map.items.push(pair);
                const endRange = (valueNode ?? keyNode).range;
                map.range = [keyNode.range[0], endRange[1], endRange[2]];
                coll.items.push(map);
            }
            offset = valueNode ? valueNode.range[2] : valueProps.end;
        }
    }
    const expectedEnd = isMap ? '}' : ']';
    const [ce, ...ee] = fc.end;
    let cePos = offset;
    if (ce?.source === expectedEnd)
        cePos = ce.offset + ce.source.length;
    else {
        const name = fcName[0].toUpperCase() + fcName.substring(1);
        const msg = atRoot
            ? `${name} must end with a ${expectedEnd}`
            : `${name} in block collection must be sufficiently indented and end with a ${expectedEnd}`;
        onError(offset, atRoot ? 'MISSING_CHAR' : 'BAD_INDENT', msg);
        if (ce && ce.source.length !== 1)
            ee.unshift(ce);
    }
    if (ee.length > 0) {
        const end = resolveEnd.resolveEnd(ee, cePos, ctx.options.strict, onError);
        if (end.comment) {
            if (coll.comment)
                coll.comment += '\n' + end.comment;
            else
                coll.comment = end.comment;
        }
        coll.range = [fc.offset, cePos, end.offset];
    }
    else {
        coll.range = [fc.offset, cePos, cePos];
    }
    return coll;
}

exports.resolveFlowCollection = resolveFlowCollection;


/***/ }),

/***/ 6842:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var resolveEnd = __nccwpck_require__(5407);

function resolveFlowScalar(scalar, strict, onError) {
    const { offset, type, source, end } = scalar;
    let _type;
    let value;
    const _onError = (rel, code, msg) => onError(offset + rel, code, msg);
    switch (type) {
        case 'scalar':
            _type = Scalar.Scalar.PLAIN;
            value = plainValue(source, _onError);
            break;
        case 'single-quoted-scalar':
            _type = Scalar.Scalar.QUOTE_SINGLE;
            value = singleQuotedValue(source, _onError);
            break;
        case 'double-quoted-scalar':
            _type = Scalar.Scalar.QUOTE_DOUBLE;
            value = doubleQuotedValue(source, _onError);
            break;
        /* istanbul ignore next should not happen */
        default:
            onError(scalar, 'UNEXPECTED_TOKEN', `Expected a flow scalar value, but found: ${type}`);
            return {
                value: '',
                type: null,
                comment: '',
                range: [offset, offset + source.length, offset + source.length]
            };
    }
    const valueEnd = offset + source.length;
    const re = resolveEnd.resolveEnd(end, valueEnd, strict, onError);
    return {
        value,
        type: _type,
        comment: re.comment,
        range: [offset, valueEnd, re.offset]
    };
}
function plainValue(source, onError) {
    let badChar = '';
    switch (source[0]) {
        /* istanbul ignore next should not happen */
        case '\t':
            badChar = 'a tab character';
            break;
        case ',':
            badChar = 'flow indicator character ,';
            break;
        case '%':
            badChar = 'directive indicator character %';
            break;
        case '|':
        case '>': {
            badChar = `block scalar indicator ${source[0]}`;
            break;
        }
        case '@':
        case '`': {
            badChar = `reserved character ${source[0]}`;
            break;
        }
    }
    if (badChar)
        onError(0, 'BAD_SCALAR_START', `Plain value cannot start with ${badChar}`);
    return unfoldLines(source);
}
function singleQuotedValue(source, onError) {
    if (source[source.length - 1] !== "'" || source.length === 1)
        onError(source.length, 'MISSING_CHAR', "Missing closing 'quote");
    return unfoldLines(source.slice(1, -1)).replace(/''/g, "'");
}
function unfoldLines(source) {
    const line = /(.*?)\r?\n/sy;
    let match = line.exec(source);
    if (!match)
        return source;
    /**
     * The negative lookbehinds in these RegExps are to
     * prevent causing a polynomial search time in certain cases.
     *
     * The try-catch is for Safari < 16.4 and other old browsers:
     * https://caniuse.com/js-regexp-lookbehind
     */
    let trimEnd, trimBoth;
    try {
        trimEnd = new RegExp('(?<![ \t])[ \t]+$');
        trimBoth = new RegExp('^[ \t]+|(?<![ \t])[ \t]+$', 'g');
    }
    catch {
        trimEnd = /[ \t]+$/;
        trimBoth = /^[ \t]+|[ \t]+$/g;
    }
    let res = match[1].replace(trimEnd, '');
    let sep = ' ';
    let pos = line.lastIndex;
    while ((match = line.exec(source))) {
        const lm = match[1].replace(trimBoth, '');
        if (lm === '') {
            if (sep === '\n')
                res += sep;
            else
                sep = '\n';
        }
        else {
            res += sep + lm;
            sep = ' ';
        }
        pos = line.lastIndex;
    }
    const last = /[ \t]*(.*)/sy;
    last.lastIndex = pos;
    match = last.exec(source);
    return res + sep + (match?.[1] ?? '');
}
function doubleQuotedValue(source, onError) {
    let res = '';
    for (let i = 1; i < source.length - 1; ++i) {
        const ch = source[i];
        if (ch === '\r' && source[i + 1] === '\n')
            continue;
        if (ch === '\n') {
            const { fold, offset } = foldNewline(source, i);
            res += fold;
            i = offset;
        }
        else if (ch === '\\') {
            let next = source[++i];
            const cc = escapeCodes[next];
            if (cc)
                res += cc;
            else if (next === '\n') {
                // skip escaped newlines, but still trim the following line
                next = source[i + 1];
                while (next === ' ' || next === '\t')
                    next = source[++i + 1];
            }
            else if (next === '\r' && source[i + 1] === '\n') {
                // skip escaped CRLF newlines, but still trim the following line
                next = source[++i + 1];
                while (next === ' ' || next === '\t')
                    next = source[++i + 1];
            }
            else if (next === 'x' || next === 'u' || next === 'U') {
                const length = next === 'x' ? 2 : next === 'u' ? 4 : 8;
                res += parseCharCode(source, i + 1, length, onError);
                i += length;
            }
            else {
                const raw = source.substr(i - 1, 2);
                onError(i - 1, 'BAD_DQ_ESCAPE', `Invalid escape sequence ${raw}`);
                res += raw;
            }
        }
        else if (ch === ' ' || ch === '\t') {
            // trim trailing whitespace
            const wsStart = i;
            let next = source[i + 1];
            while (next === ' ' || next === '\t')
                next = source[++i + 1];
            if (next !== '\n' && !(next === '\r' && source[i + 2] === '\n'))
                res += i > wsStart ? source.slice(wsStart, i + 1) : ch;
        }
        else {
            res += ch;
        }
    }
    if (source[source.length - 1] !== '"' || source.length === 1)
        onError(source.length, 'MISSING_CHAR', 'Missing closing "quote');
    return res;
}
/**
 * Fold a single newline into a space, multiple newlines to N - 1 newlines.
 * Presumes `source[offset] === '\n'`
 */
function foldNewline(source, offset) {
    let fold = '';
    let ch = source[offset + 1];
    while (ch === ' ' || ch === '\t' || ch === '\n' || ch === '\r') {
        if (ch === '\r' && source[offset + 2] !== '\n')
            break;
        if (ch === '\n')
            fold += '\n';
        offset += 1;
        ch = source[offset + 1];
    }
    if (!fold)
        fold = ' ';
    return { fold, offset };
}
const escapeCodes = {
    '0': '\0', // null character
    a: '\x07', // bell character
    b: '\b', // backspace
    e: '\x1b', // escape character
    f: '\f', // form feed
    n: '\n', // line feed
    r: '\r', // carriage return
    t: '\t', // horizontal tab
    v: '\v', // vertical tab
    N: '\u0085', // Unicode next line
    _: '\u00a0', // Unicode non-breaking space
    L: '\u2028', // Unicode line separator
    P: '\u2029', // Unicode paragraph separator
    ' ': ' ',
    '"': '"',
    '/': '/',
    '\\': '\\',
    '\t': '\t'
};
function parseCharCode(source, offset, length, onError) {
    const cc = source.substr(offset, length);
    const ok = cc.length === length && /^[0-9a-fA-F]+$/.test(cc);
    const code = ok ? parseInt(cc, 16) : NaN;
    try {
        return String.fromCodePoint(code);
    }
    catch {
        const raw = source.substr(offset - 2, length + 2);
        onError(offset - 2, 'BAD_DQ_ESCAPE', `Invalid escape sequence ${raw}`);
        return raw;
    }
}

exports.resolveFlowScalar = resolveFlowScalar;


/***/ }),

/***/ 4631:
/***/ ((__unused_webpack_module, exports) => {



function resolveProps(tokens, { flow, indicator, next, offset, onError, parentIndent, startOnNewline }) {
    let spaceBefore = false;
    let atNewline = startOnNewline;
    let hasSpace = startOnNewline;
    let comment = '';
    let commentSep = '';
    let hasNewline = false;
    let reqSpace = false;
    let tab = null;
    let anchor = null;
    let tag = null;
    let newlineAfterProp = null;
    let comma = null;
    let found = null;
    let start = null;
    for (const token of tokens) {
        if (reqSpace) {
            if (token.type !== 'space' &&
                token.type !== 'newline' &&
                token.type !== 'comma')
                onError(token.offset, 'MISSING_CHAR', 'Tags and anchors must be separated from the next token by white space');
            reqSpace = false;
        }
        if (tab) {
            if (atNewline && token.type !== 'comment' && token.type !== 'newline') {
                onError(tab, 'TAB_AS_INDENT', 'Tabs are not allowed as indentation');
            }
            tab = null;
        }
        switch (token.type) {
            case 'space':
                // At the doc level, tabs at line start may be parsed
                // as leading white space rather than indentation.
                // In a flow collection, only the parser handles indent.
                if (!flow &&
                    (indicator !== 'doc-start' || next?.type !== 'flow-collection') &&
                    token.source.includes('\t')) {
                    tab = token;
                }
                hasSpace = true;
                break;
            case 'comment': {
                if (!hasSpace)
                    onError(token, 'MISSING_CHAR', 'Comments must be separated from other tokens by white space characters');
                const cb = token.source.substring(1) || ' ';
                if (!comment)
                    comment = cb;
                else
                    comment += commentSep + cb;
                commentSep = '';
                atNewline = false;
                break;
            }
            case 'newline':
                if (atNewline) {
                    if (comment)
                        comment += token.source;
                    else if (!found || indicator !== 'seq-item-ind')
                        spaceBefore = true;
                }
                else
                    commentSep += token.source;
                atNewline = true;
                hasNewline = true;
                if (anchor || tag)
                    newlineAfterProp = token;
                hasSpace = true;
                break;
            case 'anchor':
                if (anchor)
                    onError(token, 'MULTIPLE_ANCHORS', 'A node can have at most one anchor');
                if (token.source.endsWith(':'))
                    onError(token.offset + token.source.length - 1, 'BAD_ALIAS', 'Anchor ending in : is ambiguous', true);
                anchor = token;
                start ?? (start = token.offset);
                atNewline = false;
                hasSpace = false;
                reqSpace = true;
                break;
            case 'tag': {
                if (tag)
                    onError(token, 'MULTIPLE_TAGS', 'A node can have at most one tag');
                tag = token;
                start ?? (start = token.offset);
                atNewline = false;
                hasSpace = false;
                reqSpace = true;
                break;
            }
            case indicator:
                // Could here handle preceding comments differently
                if (anchor || tag)
                    onError(token, 'BAD_PROP_ORDER', `Anchors and tags must be after the ${token.source} indicator`);
                if (found)
                    onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${token.source} in ${flow ?? 'collection'}`);
                found = token;
                atNewline =
                    indicator === 'seq-item-ind' || indicator === 'explicit-key-ind';
                hasSpace = false;
                break;
            case 'comma':
                if (flow) {
                    if (comma)
                        onError(token, 'UNEXPECTED_TOKEN', `Unexpected , in ${flow}`);
                    comma = token;
                    atNewline = false;
                    hasSpace = false;
                    break;
                }
            // else fallthrough
            default:
                onError(token, 'UNEXPECTED_TOKEN', `Unexpected ${token.type} token`);
                atNewline = false;
                hasSpace = false;
        }
    }
    const last = tokens[tokens.length - 1];
    const end = last ? last.offset + last.source.length : offset;
    if (reqSpace &&
        next &&
        next.type !== 'space' &&
        next.type !== 'newline' &&
        next.type !== 'comma' &&
        (next.type !== 'scalar' || next.source !== '')) {
        onError(next.offset, 'MISSING_CHAR', 'Tags and anchors must be separated from the next token by white space');
    }
    if (tab &&
        ((atNewline && tab.indent <= parentIndent) ||
            next?.type === 'block-map' ||
            next?.type === 'block-seq'))
        onError(tab, 'TAB_AS_INDENT', 'Tabs are not allowed as indentation');
    return {
        comma,
        found,
        spaceBefore,
        comment,
        hasNewline,
        anchor,
        tag,
        newlineAfterProp,
        end,
        start: start ?? end
    };
}

exports.resolveProps = resolveProps;


/***/ }),

/***/ 9499:
/***/ ((__unused_webpack_module, exports) => {



function containsNewline(key) {
    if (!key)
        return null;
    switch (key.type) {
        case 'alias':
        case 'scalar':
        case 'double-quoted-scalar':
        case 'single-quoted-scalar':
            if (key.source.includes('\n'))
                return true;
            if (key.end)
                for (const st of key.end)
                    if (st.type === 'newline')
                        return true;
            return false;
        case 'flow-collection':
            for (const it of key.items) {
                for (const st of it.start)
                    if (st.type === 'newline')
                        return true;
                if (it.sep)
                    for (const st of it.sep)
                        if (st.type === 'newline')
                            return true;
                if (containsNewline(it.key) || containsNewline(it.value))
                    return true;
            }
            return false;
        default:
            return true;
    }
}

exports.containsNewline = containsNewline;


/***/ }),

/***/ 2599:
/***/ ((__unused_webpack_module, exports) => {



function emptyScalarPosition(offset, before, pos) {
    if (before) {
        pos ?? (pos = before.length);
        for (let i = pos - 1; i >= 0; --i) {
            let st = before[i];
            switch (st.type) {
                case 'space':
                case 'comment':
                case 'newline':
                    offset -= st.source.length;
                    continue;
            }
            // Technically, an empty scalar is immediately after the last non-empty
            // node, but it's more useful to place it after any whitespace.
            st = before[++i];
            while (st?.type === 'space') {
                offset += st.source.length;
                st = before[++i];
            }
            break;
        }
    }
    return offset;
}

exports.emptyScalarPosition = emptyScalarPosition;


/***/ }),

/***/ 4051:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var utilContainsNewline = __nccwpck_require__(9499);

function flowIndentCheck(indent, fc, onError) {
    if (fc?.type === 'flow-collection') {
        const end = fc.end[0];
        if (end.indent === indent &&
            (end.source === ']' || end.source === '}') &&
            utilContainsNewline.containsNewline(fc)) {
            const msg = 'Flow end indicator should be more indented than parent';
            onError(end, 'BAD_INDENT', msg, true);
        }
    }
}

exports.flowIndentCheck = flowIndentCheck;


/***/ }),

/***/ 1187:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

function mapIncludes(ctx, items, search) {
    const { uniqueKeys } = ctx.options;
    if (uniqueKeys === false)
        return false;
    const isEqual = typeof uniqueKeys === 'function'
        ? uniqueKeys
        : (a, b) => a === b || (identity.isScalar(a) && identity.isScalar(b) && a.value === b.value);
    return items.some(pair => isEqual(pair.key, search));
}

exports.mapIncludes = mapIncludes;


/***/ }),

/***/ 5402:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var toJS = __nccwpck_require__(4043);
var Schema = __nccwpck_require__(5840);
var stringifyDocument = __nccwpck_require__(9210);
var anchors = __nccwpck_require__(1596);
var applyReviver = __nccwpck_require__(3661);
var createNode = __nccwpck_require__(2404);
var directives = __nccwpck_require__(1342);

class Document {
    constructor(value, replacer, options) {
        /** A comment before this Document */
        this.commentBefore = null;
        /** A comment immediately after this Document */
        this.comment = null;
        /** Errors encountered during parsing. */
        this.errors = [];
        /** Warnings encountered during parsing. */
        this.warnings = [];
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.DOC });
        let _replacer = null;
        if (typeof replacer === 'function' || Array.isArray(replacer)) {
            _replacer = replacer;
        }
        else if (options === undefined && replacer) {
            options = replacer;
            replacer = undefined;
        }
        const opt = Object.assign({
            intAsBigInt: false,
            keepSourceTokens: false,
            logLevel: 'warn',
            prettyErrors: true,
            strict: true,
            stringKeys: false,
            uniqueKeys: true,
            version: '1.2'
        }, options);
        this.options = opt;
        let { version } = opt;
        if (options?._directives) {
            this.directives = options._directives.atDocument();
            if (this.directives.yaml.explicit)
                version = this.directives.yaml.version;
        }
        else
            this.directives = new directives.Directives({ version });
        this.setSchema(version, options);
        // @ts-expect-error We can't really know that this matches Contents.
        this.contents =
            value === undefined ? null : this.createNode(value, _replacer, options);
    }
    /**
     * Create a deep copy of this Document and its contents.
     *
     * Custom Node values that inherit from `Object` still refer to their original instances.
     */
    clone() {
        const copy = Object.create(Document.prototype, {
            [identity.NODE_TYPE]: { value: identity.DOC }
        });
        copy.commentBefore = this.commentBefore;
        copy.comment = this.comment;
        copy.errors = this.errors.slice();
        copy.warnings = this.warnings.slice();
        copy.options = Object.assign({}, this.options);
        if (this.directives)
            copy.directives = this.directives.clone();
        copy.schema = this.schema.clone();
        // @ts-expect-error We can't really know that this matches Contents.
        copy.contents = identity.isNode(this.contents)
            ? this.contents.clone(copy.schema)
            : this.contents;
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /** Adds a value to the document. */
    add(value) {
        if (assertCollection(this.contents))
            this.contents.add(value);
    }
    /** Adds a value to the document. */
    addIn(path, value) {
        if (assertCollection(this.contents))
            this.contents.addIn(path, value);
    }
    /**
     * Create a new `Alias` node, ensuring that the target `node` has the required anchor.
     *
     * If `node` already has an anchor, `name` is ignored.
     * Otherwise, the `node.anchor` value will be set to `name`,
     * or if an anchor with that name is already present in the document,
     * `name` will be used as a prefix for a new unique anchor.
     * If `name` is undefined, the generated anchor will use 'a' as a prefix.
     */
    createAlias(node, name) {
        if (!node.anchor) {
            const prev = anchors.anchorNames(this);
            node.anchor =
                // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
                !name || prev.has(name) ? anchors.findNewAnchor(name || 'a', prev) : name;
        }
        return new Alias.Alias(node.anchor);
    }
    createNode(value, replacer, options) {
        let _replacer = undefined;
        if (typeof replacer === 'function') {
            value = replacer.call({ '': value }, '', value);
            _replacer = replacer;
        }
        else if (Array.isArray(replacer)) {
            const keyToStr = (v) => typeof v === 'number' || v instanceof String || v instanceof Number;
            const asStr = replacer.filter(keyToStr).map(String);
            if (asStr.length > 0)
                replacer = replacer.concat(asStr);
            _replacer = replacer;
        }
        else if (options === undefined && replacer) {
            options = replacer;
            replacer = undefined;
        }
        const { aliasDuplicateObjects, anchorPrefix, flow, keepUndefined, onTagObj, tag } = options ?? {};
        const { onAnchor, setAnchors, sourceObjects } = anchors.createNodeAnchors(this, 
        // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
        anchorPrefix || 'a');
        const ctx = {
            aliasDuplicateObjects: aliasDuplicateObjects ?? true,
            keepUndefined: keepUndefined ?? false,
            onAnchor,
            onTagObj,
            replacer: _replacer,
            schema: this.schema,
            sourceObjects
        };
        const node = createNode.createNode(value, tag, ctx);
        if (flow && identity.isCollection(node))
            node.flow = true;
        setAnchors();
        return node;
    }
    /**
     * Convert a key and a value into a `Pair` using the current schema,
     * recursively wrapping all values as `Scalar` or `Collection` nodes.
     */
    createPair(key, value, options = {}) {
        const k = this.createNode(key, null, options);
        const v = this.createNode(value, null, options);
        return new Pair.Pair(k, v);
    }
    /**
     * Removes a value from the document.
     * @returns `true` if the item was found and removed.
     */
    delete(key) {
        return assertCollection(this.contents) ? this.contents.delete(key) : false;
    }
    /**
     * Removes a value from the document.
     * @returns `true` if the item was found and removed.
     */
    deleteIn(path) {
        if (Collection.isEmptyPath(path)) {
            if (this.contents == null)
                return false;
            // @ts-expect-error Presumed impossible if Strict extends false
            this.contents = null;
            return true;
        }
        return assertCollection(this.contents)
            ? this.contents.deleteIn(path)
            : false;
    }
    /**
     * Returns item at `key`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    get(key, keepScalar) {
        return identity.isCollection(this.contents)
            ? this.contents.get(key, keepScalar)
            : undefined;
    }
    /**
     * Returns item at `path`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    getIn(path, keepScalar) {
        if (Collection.isEmptyPath(path))
            return !keepScalar && identity.isScalar(this.contents)
                ? this.contents.value
                : this.contents;
        return identity.isCollection(this.contents)
            ? this.contents.getIn(path, keepScalar)
            : undefined;
    }
    /**
     * Checks if the document includes a value with the key `key`.
     */
    has(key) {
        return identity.isCollection(this.contents) ? this.contents.has(key) : false;
    }
    /**
     * Checks if the document includes a value at `path`.
     */
    hasIn(path) {
        if (Collection.isEmptyPath(path))
            return this.contents !== undefined;
        return identity.isCollection(this.contents) ? this.contents.hasIn(path) : false;
    }
    /**
     * Sets a value in this document. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    set(key, value) {
        if (this.contents == null) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = Collection.collectionFromPath(this.schema, [key], value);
        }
        else if (assertCollection(this.contents)) {
            this.contents.set(key, value);
        }
    }
    /**
     * Sets a value in this document. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    setIn(path, value) {
        if (Collection.isEmptyPath(path)) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = value;
        }
        else if (this.contents == null) {
            // @ts-expect-error We can't really know that this matches Contents.
            this.contents = Collection.collectionFromPath(this.schema, Array.from(path), value);
        }
        else if (assertCollection(this.contents)) {
            this.contents.setIn(path, value);
        }
    }
    /**
     * Change the YAML version and schema used by the document.
     * A `null` version disables support for directives, explicit tags, anchors, and aliases.
     * It also requires the `schema` option to be given as a `Schema` instance value.
     *
     * Overrides all previously set schema options.
     */
    setSchema(version, options = {}) {
        if (typeof version === 'number')
            version = String(version);
        let opt;
        switch (version) {
            case '1.1':
                if (this.directives)
                    this.directives.yaml.version = '1.1';
                else
                    this.directives = new directives.Directives({ version: '1.1' });
                opt = { resolveKnownTags: false, schema: 'yaml-1.1' };
                break;
            case '1.2':
            case 'next':
                if (this.directives)
                    this.directives.yaml.version = version;
                else
                    this.directives = new directives.Directives({ version });
                opt = { resolveKnownTags: true, schema: 'core' };
                break;
            case null:
                if (this.directives)
                    delete this.directives;
                opt = null;
                break;
            default: {
                const sv = JSON.stringify(version);
                throw new Error(`Expected '1.1', '1.2' or null as first argument, but found: ${sv}`);
            }
        }
        // Not using `instanceof Schema` to allow for duck typing
        if (options.schema instanceof Object)
            this.schema = options.schema;
        else if (opt)
            this.schema = new Schema.Schema(Object.assign(opt, options));
        else
            throw new Error(`With a null YAML version, the { schema: Schema } option is required`);
    }
    // json & jsonArg are only used from toJSON()
    toJS({ json, jsonArg, mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        const ctx = {
            anchors: new Map(),
            doc: this,
            keep: !json,
            mapAsMap: mapAsMap === true,
            mapKeyWarned: false,
            maxAliasCount: typeof maxAliasCount === 'number' ? maxAliasCount : 100
        };
        const res = toJS.toJS(this.contents, jsonArg ?? '', ctx);
        if (typeof onAnchor === 'function')
            for (const { count, res } of ctx.anchors.values())
                onAnchor(res, count);
        return typeof reviver === 'function'
            ? applyReviver.applyReviver(reviver, { '': res }, '', res)
            : res;
    }
    /**
     * A JSON representation of the document `contents`.
     *
     * @param jsonArg Used by `JSON.stringify` to indicate the array index or
     *   property name.
     */
    toJSON(jsonArg, onAnchor) {
        return this.toJS({ json: true, jsonArg, mapAsMap: false, onAnchor });
    }
    /** A YAML representation of the document. */
    toString(options = {}) {
        if (this.errors.length > 0)
            throw new Error('Document with errors cannot be stringified');
        if ('indent' in options &&
            (!Number.isInteger(options.indent) || Number(options.indent) <= 0)) {
            const s = JSON.stringify(options.indent);
            throw new Error(`"indent" option must be a positive integer, not ${s}`);
        }
        return stringifyDocument.stringifyDocument(this, options);
    }
}
function assertCollection(contents) {
    if (identity.isCollection(contents))
        return true;
    throw new Error('Expected a YAML collection as document contents');
}

exports.Document = Document;


/***/ }),

/***/ 1596:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var visit = __nccwpck_require__(204);

/**
 * Verify that the input string is a valid anchor.
 *
 * Will throw on errors.
 */
function anchorIsValid(anchor) {
    if (/[\x00-\x19\s,[\]{}]/.test(anchor)) {
        const sa = JSON.stringify(anchor);
        const msg = `Anchor must not contain whitespace or control characters: ${sa}`;
        throw new Error(msg);
    }
    return true;
}
function anchorNames(root) {
    const anchors = new Set();
    visit.visit(root, {
        Value(_key, node) {
            if (node.anchor)
                anchors.add(node.anchor);
        }
    });
    return anchors;
}
/** Find a new anchor name with the given `prefix` and a one-indexed suffix. */
function findNewAnchor(prefix, exclude) {
    for (let i = 1; true; ++i) {
        const name = `${prefix}${i}`;
        if (!exclude.has(name))
            return name;
    }
}
function createNodeAnchors(doc, prefix) {
    const aliasObjects = [];
    const sourceObjects = new Map();
    let prevAnchors = null;
    return {
        onAnchor: (source) => {
            aliasObjects.push(source);
            prevAnchors ?? (prevAnchors = anchorNames(doc));
            const anchor = findNewAnchor(prefix, prevAnchors);
            prevAnchors.add(anchor);
            return anchor;
        },
        /**
         * With circular references, the source node is only resolved after all
         * of its child nodes are. This is why anchors are set only after all of
         * the nodes have been created.
         */
        setAnchors: () => {
            for (const source of aliasObjects) {
                const ref = sourceObjects.get(source);
                if (typeof ref === 'object' &&
                    ref.anchor &&
                    (identity.isScalar(ref.node) || identity.isCollection(ref.node))) {
                    ref.node.anchor = ref.anchor;
                }
                else {
                    const error = new Error('Failed to resolve repeated object (this should not happen)');
                    error.source = source;
                    throw error;
                }
            }
        },
        sourceObjects
    };
}

exports.anchorIsValid = anchorIsValid;
exports.anchorNames = anchorNames;
exports.createNodeAnchors = createNodeAnchors;
exports.findNewAnchor = findNewAnchor;


/***/ }),

/***/ 3661:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Applies the JSON.parse reviver algorithm as defined in the ECMA-262 spec,
 * in section 24.5.1.1 "Runtime Semantics: InternalizeJSONProperty" of the
 * 2021 edition: https://tc39.es/ecma262/#sec-json.parse
 *
 * Includes extensions for handling Map and Set objects.
 */
function applyReviver(reviver, obj, key, val) {
    if (val && typeof val === 'object') {
        if (Array.isArray(val)) {
            for (let i = 0, len = val.length; i < len; ++i) {
                const v0 = val[i];
                const v1 = applyReviver(reviver, val, String(i), v0);
                // eslint-disable-next-line @typescript-eslint/no-array-delete
                if (v1 === undefined)
                    delete val[i];
                else if (v1 !== v0)
                    val[i] = v1;
            }
        }
        else if (val instanceof Map) {
            for (const k of Array.from(val.keys())) {
                const v0 = val.get(k);
                const v1 = applyReviver(reviver, val, k, v0);
                if (v1 === undefined)
                    val.delete(k);
                else if (v1 !== v0)
                    val.set(k, v1);
            }
        }
        else if (val instanceof Set) {
            for (const v0 of Array.from(val)) {
                const v1 = applyReviver(reviver, val, v0, v0);
                if (v1 === undefined)
                    val.delete(v0);
                else if (v1 !== v0) {
                    val.delete(v0);
                    val.add(v1);
                }
            }
        }
        else {
            for (const [k, v0] of Object.entries(val)) {
                const v1 = applyReviver(reviver, val, k, v0);
                if (v1 === undefined)
                    delete val[k];
                else if (v1 !== v0)
                    val[k] = v1;
            }
        }
    }
    return reviver.call(obj, key, val);
}

exports.applyReviver = applyReviver;


/***/ }),

/***/ 2404:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);

const defaultTagPrefix = 'tag:yaml.org,2002:';
function findTagObject(value, tagName, tags) {
    if (tagName) {
        const match = tags.filter(t => t.tag === tagName);
        const tagObj = match.find(t => !t.format) ?? match[0];
        if (!tagObj)
            throw new Error(`Tag ${tagName} not found`);
        return tagObj;
    }
    return tags.find(t => t.identify?.(value) && !t.format);
}
function createNode(value, tagName, ctx) {
    if (identity.isDocument(value))
        value = value.contents;
    if (identity.isNode(value))
        return value;
    if (identity.isPair(value)) {
        const map = ctx.schema[identity.MAP].createNode?.(ctx.schema, null, ctx);
        map.items.push(value);
        return map;
    }
    if (value instanceof String ||
        value instanceof Number ||
        value instanceof Boolean ||
        (typeof BigInt !== 'undefined' && value instanceof BigInt) // not supported everywhere
    ) {
        // https://tc39.es/ecma262/#sec-serializejsonproperty
        value = value.valueOf();
    }
    const { aliasDuplicateObjects, onAnchor, onTagObj, schema, sourceObjects } = ctx;
    // Detect duplicate references to the same object & use Alias nodes for all
    // after first. The `ref` wrapper allows for circular references to resolve.
    let ref = undefined;
    if (aliasDuplicateObjects && value && typeof value === 'object') {
        ref = sourceObjects.get(value);
        if (ref) {
            ref.anchor ?? (ref.anchor = onAnchor(value));
            return new Alias.Alias(ref.anchor);
        }
        else {
            ref = { anchor: null, node: null };
            sourceObjects.set(value, ref);
        }
    }
    if (tagName?.startsWith('!!'))
        tagName = defaultTagPrefix + tagName.slice(2);
    let tagObj = findTagObject(value, tagName, schema.tags);
    if (!tagObj) {
        if (value && typeof value.toJSON === 'function') {
            // eslint-disable-next-line @typescript-eslint/no-unsafe-call
            value = value.toJSON();
        }
        if (!value || typeof value !== 'object') {
            const node = new Scalar.Scalar(value);
            if (ref)
                ref.node = node;
            return node;
        }
        tagObj =
            value instanceof Map
                ? schema[identity.MAP]
                : Symbol.iterator in Object(value)
                    ? schema[identity.SEQ]
                    : schema[identity.MAP];
    }
    if (onTagObj) {
        onTagObj(tagObj);
        delete ctx.onTagObj;
    }
    const node = tagObj?.createNode
        ? tagObj.createNode(ctx.schema, value, ctx)
        : typeof tagObj?.nodeClass?.from === 'function'
            ? tagObj.nodeClass.from(ctx.schema, value, ctx)
            : new Scalar.Scalar(value);
    if (tagName)
        node.tag = tagName;
    else if (!tagObj.default)
        node.tag = tagObj.tag;
    if (ref)
        ref.node = node;
    return node;
}

exports.createNode = createNode;


/***/ }),

/***/ 1342:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var visit = __nccwpck_require__(204);

const escapeChars = {
    '!': '%21',
    ',': '%2C',
    '[': '%5B',
    ']': '%5D',
    '{': '%7B',
    '}': '%7D'
};
const escapeTagName = (tn) => tn.replace(/[!,[\]{}]/g, ch => escapeChars[ch]);
class Directives {
    constructor(yaml, tags) {
        /**
         * The directives-end/doc-start marker `---`. If `null`, a marker may still be
         * included in the document's stringified representation.
         */
        this.docStart = null;
        /** The doc-end marker `...`.  */
        this.docEnd = false;
        this.yaml = Object.assign({}, Directives.defaultYaml, yaml);
        this.tags = Object.assign({}, Directives.defaultTags, tags);
    }
    clone() {
        const copy = new Directives(this.yaml, this.tags);
        copy.docStart = this.docStart;
        return copy;
    }
    /**
     * During parsing, get a Directives instance for the current document and
     * update the stream state according to the current version's spec.
     */
    atDocument() {
        const res = new Directives(this.yaml, this.tags);
        switch (this.yaml.version) {
            case '1.1':
                this.atNextDocument = true;
                break;
            case '1.2':
                this.atNextDocument = false;
                this.yaml = {
                    explicit: Directives.defaultYaml.explicit,
                    version: '1.2'
                };
                this.tags = Object.assign({}, Directives.defaultTags);
                break;
        }
        return res;
    }
    /**
     * @param onError - May be called even if the action was successful
     * @returns `true` on success
     */
    add(line, onError) {
        if (this.atNextDocument) {
            this.yaml = { explicit: Directives.defaultYaml.explicit, version: '1.1' };
            this.tags = Object.assign({}, Directives.defaultTags);
            this.atNextDocument = false;
        }
        const parts = line.trim().split(/[ \t]+/);
        const name = parts.shift();
        switch (name) {
            case '%TAG': {
                if (parts.length !== 2) {
                    onError(0, '%TAG directive should contain exactly two parts');
                    if (parts.length < 2)
                        return false;
                }
                const [handle, prefix] = parts;
                this.tags[handle] = prefix;
                return true;
            }
            case '%YAML': {
                this.yaml.explicit = true;
                if (parts.length !== 1) {
                    onError(0, '%YAML directive should contain exactly one part');
                    return false;
                }
                const [version] = parts;
                if (version === '1.1' || version === '1.2') {
                    this.yaml.version = version;
                    return true;
                }
                else {
                    const isValid = /^\d+\.\d+$/.test(version);
                    onError(6, `Unsupported YAML version ${version}`, isValid);
                    return false;
                }
            }
            default:
                onError(0, `Unknown directive ${name}`, true);
                return false;
        }
    }
    /**
     * Resolves a tag, matching handles to those defined in %TAG directives.
     *
     * @returns Resolved tag, which may also be the non-specific tag `'!'` or a
     *   `'!local'` tag, or `null` if unresolvable.
     */
    tagName(source, onError) {
        if (source === '!')
            return '!'; // non-specific tag
        if (source[0] !== '!') {
            onError(`Not a valid tag: ${source}`);
            return null;
        }
        if (source[1] === '<') {
            const verbatim = source.slice(2, -1);
            if (verbatim === '!' || verbatim === '!!') {
                onError(`Verbatim tags aren't resolved, so ${source} is invalid.`);
                return null;
            }
            if (source[source.length - 1] !== '>')
                onError('Verbatim tags must end with a >');
            return verbatim;
        }
        const [, handle, suffix] = source.match(/^(.*!)([^!]*)$/s);
        if (!suffix)
            onError(`The ${source} tag has no suffix`);
        const prefix = this.tags[handle];
        if (prefix) {
            try {
                return prefix + decodeURIComponent(suffix);
            }
            catch (error) {
                onError(String(error));
                return null;
            }
        }
        if (handle === '!')
            return source; // local tag
        onError(`Could not resolve tag: ${source}`);
        return null;
    }
    /**
     * Given a fully resolved tag, returns its printable string form,
     * taking into account current tag prefixes and defaults.
     */
    tagString(tag) {
        for (const [handle, prefix] of Object.entries(this.tags)) {
            if (tag.startsWith(prefix))
                return handle + escapeTagName(tag.substring(prefix.length));
        }
        return tag[0] === '!' ? tag : `!<${tag}>`;
    }
    toString(doc) {
        const lines = this.yaml.explicit
            ? [`%YAML ${this.yaml.version || '1.2'}`]
            : [];
        const tagEntries = Object.entries(this.tags);
        let tagNames;
        if (doc && tagEntries.length > 0 && identity.isNode(doc.contents)) {
            const tags = {};
            visit.visit(doc.contents, (_key, node) => {
                if (identity.isNode(node) && node.tag)
                    tags[node.tag] = true;
            });
            tagNames = Object.keys(tags);
        }
        else
            tagNames = [];
        for (const [handle, prefix] of tagEntries) {
            if (handle === '!!' && prefix === 'tag:yaml.org,2002:')
                continue;
            if (!doc || tagNames.some(tn => tn.startsWith(prefix)))
                lines.push(`%TAG ${handle} ${prefix}`);
        }
        return lines.join('\n');
    }
}
Directives.defaultYaml = { explicit: false, version: '1.2' };
Directives.defaultTags = { '!!': 'tag:yaml.org,2002:' };

exports.Directives = Directives;


/***/ }),

/***/ 1464:
/***/ ((__unused_webpack_module, exports) => {



class YAMLError extends Error {
    constructor(name, pos, code, message) {
        super();
        this.name = name;
        this.code = code;
        this.message = message;
        this.pos = pos;
    }
}
class YAMLParseError extends YAMLError {
    constructor(pos, code, message) {
        super('YAMLParseError', pos, code, message);
    }
}
class YAMLWarning extends YAMLError {
    constructor(pos, code, message) {
        super('YAMLWarning', pos, code, message);
    }
}
const prettifyError = (src, lc) => (error) => {
    if (error.pos[0] === -1)
        return;
    error.linePos = error.pos.map(pos => lc.linePos(pos));
    const { line, col } = error.linePos[0];
    error.message += ` at line ${line}, column ${col}`;
    let ci = col - 1;
    let lineStr = src
        .substring(lc.lineStarts[line - 1], lc.lineStarts[line])
        .replace(/[\n\r]+$/, '');
    // Trim to max 80 chars, keeping col position near the middle
    if (ci >= 60 && lineStr.length > 80) {
        const trimStart = Math.min(ci - 39, lineStr.length - 79);
        lineStr = '…' + lineStr.substring(trimStart);
        ci -= trimStart - 1;
    }
    if (lineStr.length > 80)
        lineStr = lineStr.substring(0, 79) + '…';
    // Include previous line in context if pointing at line start
    if (line > 1 && /^ *$/.test(lineStr.substring(0, ci))) {
        // Regexp won't match if start is trimmed
        let prev = src.substring(lc.lineStarts[line - 2], lc.lineStarts[line - 1]);
        if (prev.length > 80)
            prev = prev.substring(0, 79) + '…\n';
        lineStr = prev + lineStr;
    }
    if (/[^ ]/.test(lineStr)) {
        let count = 1;
        const end = error.linePos[1];
        if (end?.line === line && end.col > col) {
            count = Math.max(1, Math.min(end.col - col, 80 - ci));
        }
        const pointer = ' '.repeat(ci) + '^'.repeat(count);
        error.message += `:\n\n${lineStr}\n${pointer}\n`;
    }
};

exports.YAMLError = YAMLError;
exports.YAMLParseError = YAMLParseError;
exports.YAMLWarning = YAMLWarning;
exports.prettifyError = prettifyError;


/***/ }),

/***/ 8815:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {

var __webpack_unused_export__;


var composer = __nccwpck_require__(9984);
var Document = __nccwpck_require__(5402);
var Schema = __nccwpck_require__(5840);
var errors = __nccwpck_require__(1464);
var Alias = __nccwpck_require__(4065);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var cst = __nccwpck_require__(3461);
var lexer = __nccwpck_require__(361);
var lineCounter = __nccwpck_require__(6628);
var parser = __nccwpck_require__(3456);
var publicApi = __nccwpck_require__(4047);
var visit = __nccwpck_require__(204);



exports.Dk = composer.Composer;
__webpack_unused_export__ = Document.Document;
__webpack_unused_export__ = Schema.Schema;
__webpack_unused_export__ = errors.YAMLError;
__webpack_unused_export__ = errors.YAMLParseError;
__webpack_unused_export__ = errors.YAMLWarning;
__webpack_unused_export__ = Alias.Alias;
exports.Vj = identity.isAlias;
__webpack_unused_export__ = identity.isCollection;
__webpack_unused_export__ = identity.isDocument;
exports.jh = identity.isMap;
__webpack_unused_export__ = identity.isNode;
__webpack_unused_export__ = identity.isPair;
exports.jn = identity.isScalar;
exports.oP = identity.isSeq;
__webpack_unused_export__ = Pair.Pair;
__webpack_unused_export__ = Scalar.Scalar;
__webpack_unused_export__ = YAMLMap.YAMLMap;
__webpack_unused_export__ = YAMLSeq.YAMLSeq;
__webpack_unused_export__ = cst;
__webpack_unused_export__ = lexer.Lexer;
exports.HN = lineCounter.LineCounter;
exports.iX = parser.Parser;
__webpack_unused_export__ = publicApi.parse;
__webpack_unused_export__ = publicApi.parseAllDocuments;
exports.Tp = publicApi.parseDocument;
__webpack_unused_export__ = publicApi.stringify;
__webpack_unused_export__ = visit.visit;
__webpack_unused_export__ = visit.visitAsync;


/***/ }),

/***/ 7249:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);

function debug(logLevel, ...messages) {
    if (logLevel === 'debug')
        console.log(...messages);
}
function warn(logLevel, warning) {
    if (logLevel === 'debug' || logLevel === 'warn') {
        if (typeof node_process.emitWarning === 'function')
            node_process.emitWarning(warning);
        else
            console.warn(warning);
    }
}

exports.debug = debug;
exports.warn = warn;


/***/ }),

/***/ 4065:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var anchors = __nccwpck_require__(1596);
var visit = __nccwpck_require__(204);
var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);
var toJS = __nccwpck_require__(4043);

class Alias extends Node.NodeBase {
    constructor(source) {
        super(identity.ALIAS);
        this.source = source;
        Object.defineProperty(this, 'tag', {
            set() {
                throw new Error('Alias nodes cannot have tags');
            }
        });
    }
    /**
     * Resolve the value of this alias within `doc`, finding the last
     * instance of the `source` anchor before this node.
     */
    resolve(doc, ctx) {
        if (ctx?.maxAliasCount === 0)
            throw new ReferenceError('Alias resolution is disabled');
        let nodes;
        if (ctx?.aliasResolveCache) {
            nodes = ctx.aliasResolveCache;
        }
        else {
            nodes = [];
            visit.visit(doc, {
                Node: (_key, node) => {
                    if (identity.isAlias(node) || identity.hasAnchor(node))
                        nodes.push(node);
                }
            });
            if (ctx)
                ctx.aliasResolveCache = nodes;
        }
        let found = undefined;
        for (const node of nodes) {
            if (node === this)
                break;
            if (node.anchor === this.source)
                found = node;
        }
        if (found && ctx) {
            const { anchors, doc, maxAliasCount } = ctx;
            let data = anchors.get(found);
            if (!data) {
                // Resolve anchors for Node.prototype.toJS()
                toJS.toJS(found, null, ctx);
                data = anchors.get(found);
            }
            /* istanbul ignore if */
            if (data?.res === undefined) {
                const msg = 'This should not happen: Alias anchor was not resolved?';
                throw new ReferenceError(msg);
            }
            if (maxAliasCount >= 0) {
                data.count += 1;
                if (data.aliasCount === 0)
                    data.aliasCount = getAliasCount(doc, found, anchors);
                if (data.count * data.aliasCount > maxAliasCount) {
                    const msg = 'Excessive alias count indicates a resource exhaustion attack';
                    throw new ReferenceError(msg);
                }
            }
        }
        return found;
    }
    toJSON(_arg, ctx) {
        if (!ctx)
            return { source: this.source };
        const source = this.resolve(ctx.doc, ctx);
        if (!source) {
            const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
            throw new ReferenceError(msg);
        }
        return ctx.anchors.get(source).res;
    }
    toString(ctx, _onComment, _onChompKeep) {
        const src = `*${this.source}`;
        if (ctx) {
            anchors.anchorIsValid(this.source);
            if (ctx.options.verifyAliasOrder && !ctx.anchors.has(this.source)) {
                const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
                throw new Error(msg);
            }
            if (ctx.implicitKey)
                return `${src} `;
        }
        return src;
    }
}
function getAliasCount(doc, node, anchors) {
    if (identity.isAlias(node)) {
        const source = node.resolve(doc);
        const anchor = anchors && source && anchors.get(source);
        return anchor ? anchor.count * anchor.aliasCount : 0;
    }
    else if (identity.isCollection(node)) {
        let count = 0;
        for (const item of node.items) {
            const c = getAliasCount(doc, item, anchors);
            if (c > count)
                count = c;
        }
        return count;
    }
    else if (identity.isPair(node)) {
        const kc = getAliasCount(doc, node.key, anchors);
        const vc = getAliasCount(doc, node.value, anchors);
        return Math.max(kc, vc);
    }
    return 1;
}

exports.Alias = Alias;


/***/ }),

/***/ 101:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);

function collectionFromPath(schema, path, value) {
    let v = value;
    for (let i = path.length - 1; i >= 0; --i) {
        const k = path[i];
        if (typeof k === 'number' && Number.isInteger(k) && k >= 0) {
            const a = [];
            a[k] = v;
            v = a;
        }
        else {
            v = new Map([[k, v]]);
        }
    }
    return createNode.createNode(v, undefined, {
        aliasDuplicateObjects: false,
        keepUndefined: false,
        onAnchor: () => {
            throw new Error('This should not happen, please report a bug.');
        },
        schema,
        sourceObjects: new Map()
    });
}
// Type guard is intentionally a little wrong so as to be more useful,
// as it does not cover untypable empty non-string iterables (e.g. []).
const isEmptyPath = (path) => path == null ||
    (typeof path === 'object' && !!path[Symbol.iterator]().next().done);
class Collection extends Node.NodeBase {
    constructor(type, schema) {
        super(type);
        Object.defineProperty(this, 'schema', {
            value: schema,
            configurable: true,
            enumerable: false,
            writable: true
        });
    }
    /**
     * Create a copy of this collection.
     *
     * @param schema - If defined, overwrites the original's schema
     */
    clone(schema) {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (schema)
            copy.schema = schema;
        copy.items = copy.items.map(it => identity.isNode(it) || identity.isPair(it) ? it.clone(schema) : it);
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /**
     * Adds a value to the collection. For `!!map` and `!!omap` the value must
     * be a Pair instance or a `{ key, value }` object, which may not have a key
     * that already exists in the map.
     */
    addIn(path, value) {
        if (isEmptyPath(path))
            this.add(value);
        else {
            const [key, ...rest] = path;
            const node = this.get(key, true);
            if (identity.isCollection(node))
                node.addIn(rest, value);
            else if (node === undefined && this.schema)
                this.set(key, collectionFromPath(this.schema, rest, value));
            else
                throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
    }
    /**
     * Removes a value from the collection.
     * @returns `true` if the item was found and removed.
     */
    deleteIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
            return this.delete(key);
        const node = this.get(key, true);
        if (identity.isCollection(node))
            return node.deleteIn(rest);
        else
            throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
    }
    /**
     * Returns item at `key`, or `undefined` if not found. By default unwraps
     * scalar values from their surrounding node; to disable set `keepScalar` to
     * `true` (collections are always returned intact).
     */
    getIn(path, keepScalar) {
        const [key, ...rest] = path;
        const node = this.get(key, true);
        if (rest.length === 0)
            return !keepScalar && identity.isScalar(node) ? node.value : node;
        else
            return identity.isCollection(node) ? node.getIn(rest, keepScalar) : undefined;
    }
    hasAllNullValues(allowScalar) {
        return this.items.every(node => {
            if (!identity.isPair(node))
                return false;
            const n = node.value;
            return (n == null ||
                (allowScalar &&
                    identity.isScalar(n) &&
                    n.value == null &&
                    !n.commentBefore &&
                    !n.comment &&
                    !n.tag));
        });
    }
    /**
     * Checks if the collection includes a value with the key `key`.
     */
    hasIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
            return this.has(key);
        const node = this.get(key, true);
        return identity.isCollection(node) ? node.hasIn(rest) : false;
    }
    /**
     * Sets a value in this collection. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     */
    setIn(path, value) {
        const [key, ...rest] = path;
        if (rest.length === 0) {
            this.set(key, value);
        }
        else {
            const node = this.get(key, true);
            if (identity.isCollection(node))
                node.setIn(rest, value);
            else if (node === undefined && this.schema)
                this.set(key, collectionFromPath(this.schema, rest, value));
            else
                throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
    }
}

exports.Collection = Collection;
exports.collectionFromPath = collectionFromPath;
exports.isEmptyPath = isEmptyPath;


/***/ }),

/***/ 6673:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var applyReviver = __nccwpck_require__(3661);
var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);

class NodeBase {
    constructor(type) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: type });
    }
    /** Create a copy of this node.  */
    clone() {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (this.range)
            copy.range = this.range.slice();
        return copy;
    }
    /** A plain JavaScript representation of this node. */
    toJS(doc, { mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        if (!identity.isDocument(doc))
            throw new TypeError('A document argument is required');
        const ctx = {
            anchors: new Map(),
            doc,
            keep: true,
            mapAsMap: mapAsMap === true,
            mapKeyWarned: false,
            maxAliasCount: typeof maxAliasCount === 'number' ? maxAliasCount : 100
        };
        const res = toJS.toJS(this, '', ctx);
        if (typeof onAnchor === 'function')
            for (const { count, res } of ctx.anchors.values())
                onAnchor(res, count);
        return typeof reviver === 'function'
            ? applyReviver.applyReviver(reviver, { '': res }, '', res)
            : res;
    }
}

exports.NodeBase = NodeBase;


/***/ }),

/***/ 7165:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var stringifyPair = __nccwpck_require__(9748);
var addPairToJSMap = __nccwpck_require__(7104);
var identity = __nccwpck_require__(1127);

function createPair(key, value, ctx) {
    const k = createNode.createNode(key, undefined, ctx);
    const v = createNode.createNode(value, undefined, ctx);
    return new Pair(k, v);
}
class Pair {
    constructor(key, value = null) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.PAIR });
        this.key = key;
        this.value = value;
    }
    clone(schema) {
        let { key, value } = this;
        if (identity.isNode(key))
            key = key.clone(schema);
        if (identity.isNode(value))
            value = value.clone(schema);
        return new Pair(key, value);
    }
    toJSON(_, ctx) {
        const pair = ctx?.mapAsMap ? new Map() : {};
        return addPairToJSMap.addPairToJSMap(ctx, pair, this);
    }
    toString(ctx, onComment, onChompKeep) {
        return ctx?.doc
            ? stringifyPair.stringifyPair(this, ctx, onComment, onChompKeep)
            : JSON.stringify(this);
    }
}

exports.Pair = Pair;
exports.createPair = createPair;


/***/ }),

/***/ 3301:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Node = __nccwpck_require__(6673);
var toJS = __nccwpck_require__(4043);

const isScalarValue = (value) => !value || (typeof value !== 'function' && typeof value !== 'object');
class Scalar extends Node.NodeBase {
    constructor(value) {
        super(identity.SCALAR);
        this.value = value;
    }
    toJSON(arg, ctx) {
        return ctx?.keep ? this.value : toJS.toJS(this.value, arg, ctx);
    }
    toString() {
        return String(this.value);
    }
}
Scalar.BLOCK_FOLDED = 'BLOCK_FOLDED';
Scalar.BLOCK_LITERAL = 'BLOCK_LITERAL';
Scalar.PLAIN = 'PLAIN';
Scalar.QUOTE_DOUBLE = 'QUOTE_DOUBLE';
Scalar.QUOTE_SINGLE = 'QUOTE_SINGLE';

exports.Scalar = Scalar;
exports.isScalarValue = isScalarValue;


/***/ }),

/***/ 4454:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyCollection = __nccwpck_require__(1212);
var addPairToJSMap = __nccwpck_require__(7104);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);

function findPair(items, key) {
    const k = identity.isScalar(key) ? key.value : key;
    for (const it of items) {
        if (identity.isPair(it)) {
            if (it.key === key || it.key === k)
                return it;
            if (identity.isScalar(it.key) && it.key.value === k)
                return it;
        }
    }
    return undefined;
}
class YAMLMap extends Collection.Collection {
    static get tagName() {
        return 'tag:yaml.org,2002:map';
    }
    constructor(schema) {
        super(identity.MAP, schema);
        this.items = [];
    }
    /**
     * A generic collection parsing method that can be extended
     * to other node classes that inherit from YAMLMap
     */
    static from(schema, obj, ctx) {
        const { keepUndefined, replacer } = ctx;
        const map = new this(schema);
        const add = (key, value) => {
            if (typeof replacer === 'function')
                value = replacer.call(obj, key, value);
            else if (Array.isArray(replacer) && !replacer.includes(key))
                return;
            if (value !== undefined || keepUndefined)
                map.items.push(Pair.createPair(key, value, ctx));
        };
        if (obj instanceof Map) {
            for (const [key, value] of obj)
                add(key, value);
        }
        else if (obj && typeof obj === 'object') {
            for (const key of Object.keys(obj))
                add(key, obj[key]);
        }
        if (typeof schema.sortMapEntries === 'function') {
            map.items.sort(schema.sortMapEntries);
        }
        return map;
    }
    /**
     * Adds a value to the collection.
     *
     * @param overwrite - If not set `true`, using a key that is already in the
     *   collection will throw. Otherwise, overwrites the previous value.
     */
    add(pair, overwrite) {
        let _pair;
        if (identity.isPair(pair))
            _pair = pair;
        else if (!pair || typeof pair !== 'object' || !('key' in pair)) {
            // In TypeScript, this never happens.
            _pair = new Pair.Pair(pair, pair?.value);
        }
        else
            _pair = new Pair.Pair(pair.key, pair.value);
        const prev = findPair(this.items, _pair.key);
        const sortEntries = this.schema?.sortMapEntries;
        if (prev) {
            if (!overwrite)
                throw new Error(`Key ${_pair.key} already set`);
            // For scalars, keep the old node & its comments and anchors
            if (identity.isScalar(prev.value) && Scalar.isScalarValue(_pair.value))
                prev.value.value = _pair.value;
            else
                prev.value = _pair.value;
        }
        else if (sortEntries) {
            const i = this.items.findIndex(item => sortEntries(_pair, item) < 0);
            if (i === -1)
                this.items.push(_pair);
            else
                this.items.splice(i, 0, _pair);
        }
        else {
            this.items.push(_pair);
        }
    }
    delete(key) {
        const it = findPair(this.items, key);
        if (!it)
            return false;
        const del = this.items.splice(this.items.indexOf(it), 1);
        return del.length > 0;
    }
    get(key, keepScalar) {
        const it = findPair(this.items, key);
        const node = it?.value;
        return (!keepScalar && identity.isScalar(node) ? node.value : node) ?? undefined;
    }
    has(key) {
        return !!findPair(this.items, key);
    }
    set(key, value) {
        this.add(new Pair.Pair(key, value), true);
    }
    /**
     * @param ctx - Conversion context, originally set in Document#toJS()
     * @param {Class} Type - If set, forces the returned collection type
     * @returns Instance of Type, Map, or Object
     */
    toJSON(_, ctx, Type) {
        const map = Type ? new Type() : ctx?.mapAsMap ? new Map() : {};
        if (ctx?.onCreate)
            ctx.onCreate(map);
        for (const item of this.items)
            addPairToJSMap.addPairToJSMap(ctx, map, item);
        return map;
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        for (const item of this.items) {
            if (!identity.isPair(item))
                throw new Error(`Map items must all be pairs; found ${JSON.stringify(item)} instead`);
        }
        if (!ctx.allNullValues && this.hasAllNullValues(false))
            ctx = Object.assign({}, ctx, { allNullValues: true });
        return stringifyCollection.stringifyCollection(this, ctx, {
            blockItemPrefix: '',
            flowChars: { start: '{', end: '}' },
            itemIndent: ctx.indent || '',
            onChompKeep,
            onComment
        });
    }
}

exports.YAMLMap = YAMLMap;
exports.findPair = findPair;


/***/ }),

/***/ 2223:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var createNode = __nccwpck_require__(2404);
var stringifyCollection = __nccwpck_require__(1212);
var Collection = __nccwpck_require__(101);
var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var toJS = __nccwpck_require__(4043);

class YAMLSeq extends Collection.Collection {
    static get tagName() {
        return 'tag:yaml.org,2002:seq';
    }
    constructor(schema) {
        super(identity.SEQ, schema);
        this.items = [];
    }
    add(value) {
        this.items.push(value);
    }
    /**
     * Removes a value from the collection.
     *
     * `key` must contain a representation of an integer for this to succeed.
     * It may be wrapped in a `Scalar`.
     *
     * @returns `true` if the item was found and removed.
     */
    delete(key) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            return false;
        const del = this.items.splice(idx, 1);
        return del.length > 0;
    }
    get(key, keepScalar) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            return undefined;
        const it = this.items[idx];
        return !keepScalar && identity.isScalar(it) ? it.value : it;
    }
    /**
     * Checks if the collection includes a value with the key `key`.
     *
     * `key` must contain a representation of an integer for this to succeed.
     * It may be wrapped in a `Scalar`.
     */
    has(key) {
        const idx = asItemIndex(key);
        return typeof idx === 'number' && idx < this.items.length;
    }
    /**
     * Sets a value in this collection. For `!!set`, `value` needs to be a
     * boolean to add/remove the item from the set.
     *
     * If `key` does not contain a representation of an integer, this will throw.
     * It may be wrapped in a `Scalar`.
     */
    set(key, value) {
        const idx = asItemIndex(key);
        if (typeof idx !== 'number')
            throw new Error(`Expected a valid index, not ${key}.`);
        const prev = this.items[idx];
        if (identity.isScalar(prev) && Scalar.isScalarValue(value))
            prev.value = value;
        else
            this.items[idx] = value;
    }
    toJSON(_, ctx) {
        const seq = [];
        if (ctx?.onCreate)
            ctx.onCreate(seq);
        let i = 0;
        for (const item of this.items)
            seq.push(toJS.toJS(item, String(i++), ctx));
        return seq;
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        return stringifyCollection.stringifyCollection(this, ctx, {
            blockItemPrefix: '- ',
            flowChars: { start: '[', end: ']' },
            itemIndent: (ctx.indent || '') + '  ',
            onChompKeep,
            onComment
        });
    }
    static from(schema, obj, ctx) {
        const { replacer } = ctx;
        const seq = new this(schema);
        if (obj && Symbol.iterator in Object(obj)) {
            let i = 0;
            for (let it of obj) {
                if (typeof replacer === 'function') {
                    const key = obj instanceof Set ? it : String(i++);
                    it = replacer.call(obj, key, it);
                }
                seq.items.push(createNode.createNode(it, undefined, ctx));
            }
        }
        return seq;
    }
}
function asItemIndex(key) {
    let idx = identity.isScalar(key) ? key.value : key;
    if (idx && typeof idx === 'string')
        idx = Number(idx);
    return typeof idx === 'number' && Number.isInteger(idx) && idx >= 0
        ? idx
        : null;
}

exports.YAMLSeq = YAMLSeq;


/***/ }),

/***/ 7104:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var log = __nccwpck_require__(7249);
var merge = __nccwpck_require__(452);
var stringify = __nccwpck_require__(2148);
var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);

function addPairToJSMap(ctx, map, { key, value }) {
    if (identity.isNode(key) && key.addToJSMap)
        key.addToJSMap(ctx, map, value);
    // TODO: Should drop this special case for bare << handling
    else if (merge.isMergeKey(ctx, key))
        merge.addMergeToJSMap(ctx, map, value);
    else {
        const jsKey = toJS.toJS(key, '', ctx);
        if (map instanceof Map) {
            map.set(jsKey, toJS.toJS(value, jsKey, ctx));
        }
        else if (map instanceof Set) {
            map.add(jsKey);
        }
        else {
            const stringKey = stringifyKey(key, jsKey, ctx);
            const jsValue = toJS.toJS(value, stringKey, ctx);
            if (stringKey in map)
                Object.defineProperty(map, stringKey, {
                    value: jsValue,
                    writable: true,
                    enumerable: true,
                    configurable: true
                });
            else
                map[stringKey] = jsValue;
        }
    }
    return map;
}
function stringifyKey(key, jsKey, ctx) {
    if (jsKey === null)
        return '';
    // eslint-disable-next-line @typescript-eslint/no-base-to-string
    if (typeof jsKey !== 'object')
        return String(jsKey);
    if (identity.isNode(key) && ctx?.doc) {
        const strCtx = stringify.createStringifyContext(ctx.doc, {});
        strCtx.anchors = new Set();
        for (const node of ctx.anchors.keys())
            strCtx.anchors.add(node.anchor);
        strCtx.inFlow = true;
        strCtx.inStringifyKey = true;
        const strKey = key.toString(strCtx);
        if (!ctx.mapKeyWarned) {
            let jsonStr = JSON.stringify(strKey);
            if (jsonStr.length > 40)
                jsonStr = jsonStr.substring(0, 36) + '..."';
            log.warn(ctx.doc.options.logLevel, `Keys with collection values will be stringified due to JS Object restrictions: ${jsonStr}. Set mapAsMap: true to use object keys.`);
            ctx.mapKeyWarned = true;
        }
        return strKey;
    }
    return JSON.stringify(jsKey);
}

exports.addPairToJSMap = addPairToJSMap;


/***/ }),

/***/ 1127:
/***/ ((__unused_webpack_module, exports) => {



const ALIAS = Symbol.for('yaml.alias');
const DOC = Symbol.for('yaml.document');
const MAP = Symbol.for('yaml.map');
const PAIR = Symbol.for('yaml.pair');
const SCALAR = Symbol.for('yaml.scalar');
const SEQ = Symbol.for('yaml.seq');
const NODE_TYPE = Symbol.for('yaml.node.type');
const isAlias = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === ALIAS;
const isDocument = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === DOC;
const isMap = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === MAP;
const isPair = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === PAIR;
const isScalar = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === SCALAR;
const isSeq = (node) => !!node && typeof node === 'object' && node[NODE_TYPE] === SEQ;
function isCollection(node) {
    if (node && typeof node === 'object')
        switch (node[NODE_TYPE]) {
            case MAP:
            case SEQ:
                return true;
        }
    return false;
}
function isNode(node) {
    if (node && typeof node === 'object')
        switch (node[NODE_TYPE]) {
            case ALIAS:
            case MAP:
            case SCALAR:
            case SEQ:
                return true;
        }
    return false;
}
const hasAnchor = (node) => (isScalar(node) || isCollection(node)) && !!node.anchor;

exports.ALIAS = ALIAS;
exports.DOC = DOC;
exports.MAP = MAP;
exports.NODE_TYPE = NODE_TYPE;
exports.PAIR = PAIR;
exports.SCALAR = SCALAR;
exports.SEQ = SEQ;
exports.hasAnchor = hasAnchor;
exports.isAlias = isAlias;
exports.isCollection = isCollection;
exports.isDocument = isDocument;
exports.isMap = isMap;
exports.isNode = isNode;
exports.isPair = isPair;
exports.isScalar = isScalar;
exports.isSeq = isSeq;


/***/ }),

/***/ 4043:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

/**
 * Recursively convert any node or its contents to native JavaScript
 *
 * @param value - The input value
 * @param arg - If `value` defines a `toJSON()` method, use this
 *   as its first argument
 * @param ctx - Conversion context, originally set in Document#toJS(). If
 *   `{ keep: true }` is not set, output should be suitable for JSON
 *   stringification.
 */
function toJS(value, arg, ctx) {
    // eslint-disable-next-line @typescript-eslint/no-unsafe-return
    if (Array.isArray(value))
        return value.map((v, i) => toJS(v, String(i), ctx));
    if (value && typeof value.toJSON === 'function') {
        // eslint-disable-next-line @typescript-eslint/no-unsafe-call
        if (!ctx || !identity.hasAnchor(value))
            return value.toJSON(arg, ctx);
        const data = { aliasCount: 0, count: 1, res: undefined };
        ctx.anchors.set(value, data);
        ctx.onCreate = res => {
            data.res = res;
            delete ctx.onCreate;
        };
        const res = value.toJSON(arg, ctx);
        if (ctx.onCreate)
            ctx.onCreate(res);
        return res;
    }
    if (typeof value === 'bigint' && !ctx?.keep)
        return Number(value);
    return value;
}

exports.toJS = toJS;


/***/ }),

/***/ 110:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var resolveBlockScalar = __nccwpck_require__(8913);
var resolveFlowScalar = __nccwpck_require__(6842);
var errors = __nccwpck_require__(1464);
var stringifyString = __nccwpck_require__(3069);

function resolveAsScalar(token, strict = true, onError) {
    if (token) {
        const _onError = (pos, code, message) => {
            const offset = typeof pos === 'number' ? pos : Array.isArray(pos) ? pos[0] : pos.offset;
            if (onError)
                onError(offset, code, message);
            else
                throw new errors.YAMLParseError([offset, offset + 1], code, message);
        };
        switch (token.type) {
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return resolveFlowScalar.resolveFlowScalar(token, strict, _onError);
            case 'block-scalar':
                return resolveBlockScalar.resolveBlockScalar({ options: { strict } }, token, _onError);
        }
    }
    return null;
}
/**
 * Create a new scalar token with `value`
 *
 * Values that represent an actual string but may be parsed as a different type should use a `type` other than `'PLAIN'`,
 * as this function does not support any schema operations and won't check for such conflicts.
 *
 * @param value The string representation of the value, which will have its content properly indented.
 * @param context.end Comments and whitespace after the end of the value, or after the block scalar header. If undefined, a newline will be added.
 * @param context.implicitKey Being within an implicit key may affect the resolved type of the token's value.
 * @param context.indent The indent level of the token.
 * @param context.inFlow Is this scalar within a flow collection? This may affect the resolved type of the token's value.
 * @param context.offset The offset position of the token.
 * @param context.type The preferred type of the scalar token. If undefined, the previous type of the `token` will be used, defaulting to `'PLAIN'`.
 */
function createScalarToken(value, context) {
    const { implicitKey = false, indent, inFlow = false, offset = -1, type = 'PLAIN' } = context;
    const source = stringifyString.stringifyString({ type, value }, {
        implicitKey,
        indent: indent > 0 ? ' '.repeat(indent) : '',
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
    });
    const end = context.end ?? [
        { type: 'newline', offset: -1, indent, source: '\n' }
    ];
    switch (source[0]) {
        case '|':
        case '>': {
            const he = source.indexOf('\n');
            const head = source.substring(0, he);
            const body = source.substring(he + 1) + '\n';
            const props = [
                { type: 'block-scalar-header', offset, indent, source: head }
            ];
            if (!addEndtoBlockProps(props, end))
                props.push({ type: 'newline', offset: -1, indent, source: '\n' });
            return { type: 'block-scalar', offset, indent, props, source: body };
        }
        case '"':
            return { type: 'double-quoted-scalar', offset, indent, source, end };
        case "'":
            return { type: 'single-quoted-scalar', offset, indent, source, end };
        default:
            return { type: 'scalar', offset, indent, source, end };
    }
}
/**
 * Set the value of `token` to the given string `value`, overwriting any previous contents and type that it may have.
 *
 * Best efforts are made to retain any comments previously associated with the `token`,
 * though all contents within a collection's `items` will be overwritten.
 *
 * Values that represent an actual string but may be parsed as a different type should use a `type` other than `'PLAIN'`,
 * as this function does not support any schema operations and won't check for such conflicts.
 *
 * @param token Any token. If it does not include an `indent` value, the value will be stringified as if it were an implicit key.
 * @param value The string representation of the value, which will have its content properly indented.
 * @param context.afterKey In most cases, values after a key should have an additional level of indentation.
 * @param context.implicitKey Being within an implicit key may affect the resolved type of the token's value.
 * @param context.inFlow Being within a flow collection may affect the resolved type of the token's value.
 * @param context.type The preferred type of the scalar token. If undefined, the previous type of the `token` will be used, defaulting to `'PLAIN'`.
 */
function setScalarValue(token, value, context = {}) {
    let { afterKey = false, implicitKey = false, inFlow = false, type } = context;
    let indent = 'indent' in token ? token.indent : null;
    if (afterKey && typeof indent === 'number')
        indent += 2;
    if (!type)
        switch (token.type) {
            case 'single-quoted-scalar':
                type = 'QUOTE_SINGLE';
                break;
            case 'double-quoted-scalar':
                type = 'QUOTE_DOUBLE';
                break;
            case 'block-scalar': {
                const header = token.props[0];
                if (header.type !== 'block-scalar-header')
                    throw new Error('Invalid block scalar header');
                type = header.source[0] === '>' ? 'BLOCK_FOLDED' : 'BLOCK_LITERAL';
                break;
            }
            default:
                type = 'PLAIN';
        }
    const source = stringifyString.stringifyString({ type, value }, {
        implicitKey: implicitKey || indent === null,
        indent: indent !== null && indent > 0 ? ' '.repeat(indent) : '',
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
    });
    switch (source[0]) {
        case '|':
        case '>':
            setBlockScalarValue(token, source);
            break;
        case '"':
            setFlowScalarValue(token, source, 'double-quoted-scalar');
            break;
        case "'":
            setFlowScalarValue(token, source, 'single-quoted-scalar');
            break;
        default:
            setFlowScalarValue(token, source, 'scalar');
    }
}
function setBlockScalarValue(token, source) {
    const he = source.indexOf('\n');
    const head = source.substring(0, he);
    const body = source.substring(he + 1) + '\n';
    if (token.type === 'block-scalar') {
        const header = token.props[0];
        if (header.type !== 'block-scalar-header')
            throw new Error('Invalid block scalar header');
        header.source = head;
        token.source = body;
    }
    else {
        const { offset } = token;
        const indent = 'indent' in token ? token.indent : -1;
        const props = [
            { type: 'block-scalar-header', offset, indent, source: head }
        ];
        if (!addEndtoBlockProps(props, 'end' in token ? token.end : undefined))
            props.push({ type: 'newline', offset: -1, indent, source: '\n' });
        for (const key of Object.keys(token))
            if (key !== 'type' && key !== 'offset')
                delete token[key];
        Object.assign(token, { type: 'block-scalar', indent, props, source: body });
    }
}
/** @returns `true` if last token is a newline */
function addEndtoBlockProps(props, end) {
    if (end)
        for (const st of end)
            switch (st.type) {
                case 'space':
                case 'comment':
                    props.push(st);
                    break;
                case 'newline':
                    props.push(st);
                    return true;
            }
    return false;
}
function setFlowScalarValue(token, source, type) {
    switch (token.type) {
        case 'scalar':
        case 'double-quoted-scalar':
        case 'single-quoted-scalar':
            token.type = type;
            token.source = source;
            break;
        case 'block-scalar': {
            const end = token.props.slice(1);
            let oa = source.length;
            if (token.props[0].type === 'block-scalar-header')
                oa -= token.props[0].source.length;
            for (const tok of end)
                tok.offset += oa;
            delete token.props;
            Object.assign(token, { type, source, end });
            break;
        }
        case 'block-map':
        case 'block-seq': {
            const offset = token.offset + source.length;
            const nl = { type: 'newline', offset, indent: token.indent, source: '\n' };
            delete token.items;
            Object.assign(token, { type, source, end: [nl] });
            break;
        }
        default: {
            const indent = 'indent' in token ? token.indent : -1;
            const end = 'end' in token && Array.isArray(token.end)
                ? token.end.filter(st => st.type === 'space' ||
                    st.type === 'comment' ||
                    st.type === 'newline')
                : [];
            for (const key of Object.keys(token))
                if (key !== 'type' && key !== 'offset')
                    delete token[key];
            Object.assign(token, { type, indent, source, end });
        }
    }
}

exports.createScalarToken = createScalarToken;
exports.resolveAsScalar = resolveAsScalar;
exports.setScalarValue = setScalarValue;


/***/ }),

/***/ 1733:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Stringify a CST document, token, or collection item
 *
 * Fair warning: This applies no validation whatsoever, and
 * simply concatenates the sources in their logical order.
 */
const stringify = (cst) => 'type' in cst ? stringifyToken(cst) : stringifyItem(cst);
function stringifyToken(token) {
    switch (token.type) {
        case 'block-scalar': {
            let res = '';
            for (const tok of token.props)
                res += stringifyToken(tok);
            return res + token.source;
        }
        case 'block-map':
        case 'block-seq': {
            let res = '';
            for (const item of token.items)
                res += stringifyItem(item);
            return res;
        }
        case 'flow-collection': {
            let res = token.start.source;
            for (const item of token.items)
                res += stringifyItem(item);
            for (const st of token.end)
                res += st.source;
            return res;
        }
        case 'document': {
            let res = stringifyItem(token);
            if (token.end)
                for (const st of token.end)
                    res += st.source;
            return res;
        }
        default: {
            let res = token.source;
            if ('end' in token && token.end)
                for (const st of token.end)
                    res += st.source;
            return res;
        }
    }
}
function stringifyItem({ start, key, sep, value }) {
    let res = '';
    for (const st of start)
        res += st.source;
    if (key)
        res += stringifyToken(key);
    if (sep)
        for (const st of sep)
            res += st.source;
    if (value)
        res += stringifyToken(value);
    return res;
}

exports.stringify = stringify;


/***/ }),

/***/ 7715:
/***/ ((__unused_webpack_module, exports) => {



const BREAK = Symbol('break visit');
const SKIP = Symbol('skip children');
const REMOVE = Symbol('remove item');
/**
 * Apply a visitor to a CST document or item.
 *
 * Walks through the tree (depth-first) starting from the root, calling a
 * `visitor` function with two arguments when entering each item:
 *   - `item`: The current item, which included the following members:
 *     - `start: SourceToken[]` – Source tokens before the key or value,
 *       possibly including its anchor or tag.
 *     - `key?: Token | null` – Set for pair values. May then be `null`, if
 *       the key before the `:` separator is empty.
 *     - `sep?: SourceToken[]` – Source tokens between the key and the value,
 *       which should include the `:` map value indicator if `value` is set.
 *     - `value?: Token` – The value of a sequence item, or of a map pair.
 *   - `path`: The steps from the root to the current node, as an array of
 *     `['key' | 'value', number]` tuples.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this token, continue with
 *      next sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current item, then continue with the next one
 *   - `number`: Set the index of the next step. This is useful especially if
 *     the index of the current token has changed.
 *   - `function`: Define the next visitor for this item. After the original
 *     visitor is called on item entry, next visitors are called after handling
 *     a non-empty `key` and when exiting the item.
 */
function visit(cst, visitor) {
    if ('type' in cst && cst.type === 'document')
        cst = { start: cst.start, value: cst.value };
    _visit(Object.freeze([]), cst, visitor);
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visit.BREAK = BREAK;
/** Do not visit the children of the current item */
visit.SKIP = SKIP;
/** Remove the current item */
visit.REMOVE = REMOVE;
/** Find the item at `path` from `cst` as the root */
visit.itemAtPath = (cst, path) => {
    let item = cst;
    for (const [field, index] of path) {
        const tok = item?.[field];
        if (tok && 'items' in tok) {
            item = tok.items[index];
        }
        else
            return undefined;
    }
    return item;
};
/**
 * Get the immediate parent collection of the item at `path` from `cst` as the root.
 *
 * Throws an error if the collection is not found, which should never happen if the item itself exists.
 */
visit.parentCollection = (cst, path) => {
    const parent = visit.itemAtPath(cst, path.slice(0, -1));
    const field = path[path.length - 1][0];
    const coll = parent?.[field];
    if (coll && 'items' in coll)
        return coll;
    throw new Error('Parent collection not found');
};
function _visit(path, item, visitor) {
    let ctrl = visitor(item, path);
    if (typeof ctrl === 'symbol')
        return ctrl;
    for (const field of ['key', 'value']) {
        const token = item[field];
        if (token && 'items' in token) {
            for (let i = 0; i < token.items.length; ++i) {
                const ci = _visit(Object.freeze(path.concat([[field, i]])), token.items[i], visitor);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    token.items.splice(i, 1);
                    i -= 1;
                }
            }
            if (typeof ctrl === 'function' && field === 'key')
                ctrl = ctrl(item, path);
        }
    }
    return typeof ctrl === 'function' ? ctrl(item, path) : ctrl;
}

exports.visit = visit;


/***/ }),

/***/ 3461:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var cstScalar = __nccwpck_require__(110);
var cstStringify = __nccwpck_require__(1733);
var cstVisit = __nccwpck_require__(7715);

/** The byte order mark */
const BOM = '\u{FEFF}';
/** Start of doc-mode */
const DOCUMENT = '\x02'; // C0: Start of Text
/** Unexpected end of flow-mode */
const FLOW_END = '\x18'; // C0: Cancel
/** Next token is a scalar value */
const SCALAR = '\x1f'; // C0: Unit Separator
/** @returns `true` if `token` is a flow or block collection */
const isCollection = (token) => !!token && 'items' in token;
/** @returns `true` if `token` is a flow or block scalar; not an alias */
const isScalar = (token) => !!token &&
    (token.type === 'scalar' ||
        token.type === 'single-quoted-scalar' ||
        token.type === 'double-quoted-scalar' ||
        token.type === 'block-scalar');
/* istanbul ignore next */
/** Get a printable representation of a lexer token */
function prettyToken(token) {
    switch (token) {
        case BOM:
            return '<BOM>';
        case DOCUMENT:
            return '<DOC>';
        case FLOW_END:
            return '<FLOW_END>';
        case SCALAR:
            return '<SCALAR>';
        default:
            return JSON.stringify(token);
    }
}
/** Identify the type of a lexer token. May return `null` for unknown tokens. */
function tokenType(source) {
    switch (source) {
        case BOM:
            return 'byte-order-mark';
        case DOCUMENT:
            return 'doc-mode';
        case FLOW_END:
            return 'flow-error-end';
        case SCALAR:
            return 'scalar';
        case '---':
            return 'doc-start';
        case '...':
            return 'doc-end';
        case '':
        case '\n':
        case '\r\n':
            return 'newline';
        case '-':
            return 'seq-item-ind';
        case '?':
            return 'explicit-key-ind';
        case ':':
            return 'map-value-ind';
        case '{':
            return 'flow-map-start';
        case '}':
            return 'flow-map-end';
        case '[':
            return 'flow-seq-start';
        case ']':
            return 'flow-seq-end';
        case ',':
            return 'comma';
    }
    switch (source[0]) {
        case ' ':
        case '\t':
            return 'space';
        case '#':
            return 'comment';
        case '%':
            return 'directive-line';
        case '*':
            return 'alias';
        case '&':
            return 'anchor';
        case '!':
            return 'tag';
        case "'":
            return 'single-quoted-scalar';
        case '"':
            return 'double-quoted-scalar';
        case '|':
        case '>':
            return 'block-scalar-header';
    }
    return null;
}

exports.createScalarToken = cstScalar.createScalarToken;
exports.resolveAsScalar = cstScalar.resolveAsScalar;
exports.setScalarValue = cstScalar.setScalarValue;
exports.stringify = cstStringify.stringify;
exports.visit = cstVisit.visit;
exports.BOM = BOM;
exports.DOCUMENT = DOCUMENT;
exports.FLOW_END = FLOW_END;
exports.SCALAR = SCALAR;
exports.isCollection = isCollection;
exports.isScalar = isScalar;
exports.prettyToken = prettyToken;
exports.tokenType = tokenType;


/***/ }),

/***/ 361:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var cst = __nccwpck_require__(3461);

/*
START -> stream

stream
  directive -> line-end -> stream
  indent + line-end -> stream
  [else] -> line-start

line-end
  comment -> line-end
  newline -> .
  input-end -> END

line-start
  doc-start -> doc
  doc-end -> stream
  [else] -> indent -> block-start

block-start
  seq-item-start -> block-start
  explicit-key-start -> block-start
  map-value-start -> block-start
  [else] -> doc

doc
  line-end -> line-start
  spaces -> doc
  anchor -> doc
  tag -> doc
  flow-start -> flow -> doc
  flow-end -> error -> doc
  seq-item-start -> error -> doc
  explicit-key-start -> error -> doc
  map-value-start -> doc
  alias -> doc
  quote-start -> quoted-scalar -> doc
  block-scalar-header -> line-end -> block-scalar(min) -> line-start
  [else] -> plain-scalar(false, min) -> doc

flow
  line-end -> flow
  spaces -> flow
  anchor -> flow
  tag -> flow
  flow-start -> flow -> flow
  flow-end -> .
  seq-item-start -> error -> flow
  explicit-key-start -> flow
  map-value-start -> flow
  alias -> flow
  quote-start -> quoted-scalar -> flow
  comma -> flow
  [else] -> plain-scalar(true, 0) -> flow

quoted-scalar
  quote-end -> .
  [else] -> quoted-scalar

block-scalar(min)
  newline + peek(indent < min) -> .
  [else] -> block-scalar(min)

plain-scalar(is-flow, min)
  scalar-end(is-flow) -> .
  peek(newline + (indent < min)) -> .
  [else] -> plain-scalar(min)
*/
function isEmpty(ch) {
    switch (ch) {
        case undefined:
        case ' ':
        case '\n':
        case '\r':
        case '\t':
            return true;
        default:
            return false;
    }
}
const hexDigits = new Set('0123456789ABCDEFabcdef');
const tagChars = new Set("0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz-#;/?:@&=+$_.!~*'()");
const flowIndicatorChars = new Set(',[]{}');
const invalidAnchorChars = new Set(' ,[]{}\n\r\t');
const isNotAnchorChar = (ch) => !ch || invalidAnchorChars.has(ch);
/**
 * Splits an input string into lexical tokens, i.e. smaller strings that are
 * easily identifiable by `tokens.tokenType()`.
 *
 * Lexing starts always in a "stream" context. Incomplete input may be buffered
 * until a complete token can be emitted.
 *
 * In addition to slices of the original input, the following control characters
 * may also be emitted:
 *
 * - `\x02` (Start of Text): A document starts with the next token
 * - `\x18` (Cancel): Unexpected end of flow-mode (indicates an error)
 * - `\x1f` (Unit Separator): Next token is a scalar value
 * - `\u{FEFF}` (Byte order mark): Emitted separately outside documents
 */
class Lexer {
    constructor() {
        /**
         * Flag indicating whether the end of the current buffer marks the end of
         * all input
         */
        this.atEnd = false;
        /**
         * Explicit indent set in block scalar header, as an offset from the current
         * minimum indent, so e.g. set to 1 from a header `|2+`. Set to -1 if not
         * explicitly set.
         */
        this.blockScalarIndent = -1;
        /**
         * Block scalars that include a + (keep) chomping indicator in their header
         * include trailing empty lines, which are otherwise excluded from the
         * scalar's contents.
         */
        this.blockScalarKeep = false;
        /** Current input */
        this.buffer = '';
        /**
         * Flag noting whether the map value indicator : can immediately follow this
         * node within a flow context.
         */
        this.flowKey = false;
        /** Count of surrounding flow collection levels. */
        this.flowLevel = 0;
        /**
         * Minimum level of indentation required for next lines to be parsed as a
         * part of the current scalar value.
         */
        this.indentNext = 0;
        /** Indentation level of the current line. */
        this.indentValue = 0;
        /** Position of the next \n character. */
        this.lineEndPos = null;
        /** Stores the state of the lexer if reaching the end of incpomplete input */
        this.next = null;
        /** A pointer to `buffer`; the current position of the lexer. */
        this.pos = 0;
    }
    /**
     * Generate YAML tokens from the `source` string. If `incomplete`,
     * a part of the last line may be left as a buffer for the next call.
     *
     * @returns A generator of lexical tokens
     */
    *lex(source, incomplete = false) {
        if (source) {
            if (typeof source !== 'string')
                throw TypeError('source is not a string');
            this.buffer = this.buffer ? this.buffer + source : source;
            this.lineEndPos = null;
        }
        this.atEnd = !incomplete;
        let next = this.next ?? 'stream';
        while (next && (incomplete || this.hasChars(1)))
            next = yield* this.parseNext(next);
    }
    atLineEnd() {
        let i = this.pos;
        let ch = this.buffer[i];
        while (ch === ' ' || ch === '\t')
            ch = this.buffer[++i];
        if (!ch || ch === '#' || ch === '\n')
            return true;
        if (ch === '\r')
            return this.buffer[i + 1] === '\n';
        return false;
    }
    charAt(n) {
        return this.buffer[this.pos + n];
    }
    continueScalar(offset) {
        let ch = this.buffer[offset];
        if (this.indentNext > 0) {
            let indent = 0;
            while (ch === ' ')
                ch = this.buffer[++indent + offset];
            if (ch === '\r') {
                const next = this.buffer[indent + offset + 1];
                if (next === '\n' || (!next && !this.atEnd))
                    return offset + indent + 1;
            }
            return ch === '\n' || indent >= this.indentNext || (!ch && !this.atEnd)
                ? offset + indent
                : -1;
        }
        if (ch === '-' || ch === '.') {
            const dt = this.buffer.substr(offset, 3);
            if ((dt === '---' || dt === '...') && isEmpty(this.buffer[offset + 3]))
                return -1;
        }
        return offset;
    }
    getLine() {
        let end = this.lineEndPos;
        if (typeof end !== 'number' || (end !== -1 && end < this.pos)) {
            end = this.buffer.indexOf('\n', this.pos);
            this.lineEndPos = end;
        }
        if (end === -1)
            return this.atEnd ? this.buffer.substring(this.pos) : null;
        if (this.buffer[end - 1] === '\r')
            end -= 1;
        return this.buffer.substring(this.pos, end);
    }
    hasChars(n) {
        return this.pos + n <= this.buffer.length;
    }
    setNext(state) {
        this.buffer = this.buffer.substring(this.pos);
        this.pos = 0;
        this.lineEndPos = null;
        this.next = state;
        return null;
    }
    peek(n) {
        return this.buffer.substr(this.pos, n);
    }
    *parseNext(next) {
        switch (next) {
            case 'stream':
                return yield* this.parseStream();
            case 'line-start':
                return yield* this.parseLineStart();
            case 'block-start':
                return yield* this.parseBlockStart();
            case 'doc':
                return yield* this.parseDocument();
            case 'flow':
                return yield* this.parseFlowCollection();
            case 'quoted-scalar':
                return yield* this.parseQuotedScalar();
            case 'block-scalar':
                return yield* this.parseBlockScalar();
            case 'plain-scalar':
                return yield* this.parsePlainScalar();
        }
    }
    *parseStream() {
        let line = this.getLine();
        if (line === null)
            return this.setNext('stream');
        if (line[0] === cst.BOM) {
            yield* this.pushCount(1);
            line = line.substring(1);
        }
        if (line[0] === '%') {
            let dirEnd = line.length;
            let cs = line.indexOf('#');
            while (cs !== -1) {
                const ch = line[cs - 1];
                if (ch === ' ' || ch === '\t') {
                    dirEnd = cs - 1;
                    break;
                }
                else {
                    cs = line.indexOf('#', cs + 1);
                }
            }
            while (true) {
                const ch = line[dirEnd - 1];
                if (ch === ' ' || ch === '\t')
                    dirEnd -= 1;
                else
                    break;
            }
            const n = (yield* this.pushCount(dirEnd)) + (yield* this.pushSpaces(true));
            yield* this.pushCount(line.length - n); // possible comment
            this.pushNewline();
            return 'stream';
        }
        if (this.atLineEnd()) {
            const sp = yield* this.pushSpaces(true);
            yield* this.pushCount(line.length - sp);
            yield* this.pushNewline();
            return 'stream';
        }
        yield cst.DOCUMENT;
        return yield* this.parseLineStart();
    }
    *parseLineStart() {
        const ch = this.charAt(0);
        if (!ch && !this.atEnd)
            return this.setNext('line-start');
        if (ch === '-' || ch === '.') {
            if (!this.atEnd && !this.hasChars(4))
                return this.setNext('line-start');
            const s = this.peek(3);
            if ((s === '---' || s === '...') && isEmpty(this.charAt(3))) {
                yield* this.pushCount(3);
                this.indentValue = 0;
                this.indentNext = 0;
                return s === '---' ? 'doc' : 'stream';
            }
        }
        this.indentValue = yield* this.pushSpaces(false);
        if (this.indentNext > this.indentValue && !isEmpty(this.charAt(1)))
            this.indentNext = this.indentValue;
        return yield* this.parseBlockStart();
    }
    *parseBlockStart() {
        const [ch0, ch1] = this.peek(2);
        if (!ch1 && !this.atEnd)
            return this.setNext('block-start');
        if ((ch0 === '-' || ch0 === '?' || ch0 === ':') && isEmpty(ch1)) {
            const n = (yield* this.pushCount(1)) + (yield* this.pushSpaces(true));
            this.indentNext = this.indentValue + 1;
            this.indentValue += n;
            return 'block-start';
        }
        return 'doc';
    }
    *parseDocument() {
        yield* this.pushSpaces(true);
        const line = this.getLine();
        if (line === null)
            return this.setNext('doc');
        let n = yield* this.pushIndicators();
        switch (line[n]) {
            case '#':
                yield* this.pushCount(line.length - n);
            // fallthrough
            case undefined:
                yield* this.pushNewline();
                return yield* this.parseLineStart();
            case '{':
            case '[':
                yield* this.pushCount(1);
                this.flowKey = false;
                this.flowLevel = 1;
                return 'flow';
            case '}':
            case ']':
                // this is an error
                yield* this.pushCount(1);
                return 'doc';
            case '*':
                yield* this.pushUntil(isNotAnchorChar);
                return 'doc';
            case '"':
            case "'":
                return yield* this.parseQuotedScalar();
            case '|':
            case '>':
                n += yield* this.parseBlockScalarHeader();
                n += yield* this.pushSpaces(true);
                yield* this.pushCount(line.length - n);
                yield* this.pushNewline();
                return yield* this.parseBlockScalar();
            default:
                return yield* this.parsePlainScalar();
        }
    }
    *parseFlowCollection() {
        let nl, sp;
        let indent = -1;
        do {
            nl = yield* this.pushNewline();
            if (nl > 0) {
                sp = yield* this.pushSpaces(false);
                this.indentValue = indent = sp;
            }
            else {
                sp = 0;
            }
            sp += yield* this.pushSpaces(true);
        } while (nl + sp > 0);
        const line = this.getLine();
        if (line === null)
            return this.setNext('flow');
        if ((indent !== -1 && indent < this.indentNext && line[0] !== '#') ||
            (indent === 0 &&
                (line.startsWith('---') || line.startsWith('...')) &&
                isEmpty(line[3]))) {
            // Allowing for the terminal ] or } at the same (rather than greater)
            // indent level as the initial [ or { is technically invalid, but
            // failing here would be surprising to users.
            const atFlowEndMarker = indent === this.indentNext - 1 &&
                this.flowLevel === 1 &&
                (line[0] === ']' || line[0] === '}');
            if (!atFlowEndMarker) {
                // this is an error
                this.flowLevel = 0;
                yield cst.FLOW_END;
                return yield* this.parseLineStart();
            }
        }
        let n = 0;
        while (line[n] === ',') {
            n += yield* this.pushCount(1);
            n += yield* this.pushSpaces(true);
            this.flowKey = false;
        }
        n += yield* this.pushIndicators();
        switch (line[n]) {
            case undefined:
                return 'flow';
            case '#':
                yield* this.pushCount(line.length - n);
                return 'flow';
            case '{':
            case '[':
                yield* this.pushCount(1);
                this.flowKey = false;
                this.flowLevel += 1;
                return 'flow';
            case '}':
            case ']':
                yield* this.pushCount(1);
                this.flowKey = true;
                this.flowLevel -= 1;
                return this.flowLevel ? 'flow' : 'doc';
            case '*':
                yield* this.pushUntil(isNotAnchorChar);
                return 'flow';
            case '"':
            case "'":
                this.flowKey = true;
                return yield* this.parseQuotedScalar();
            case ':': {
                const next = this.charAt(1);
                if (this.flowKey || isEmpty(next) || next === ',') {
                    this.flowKey = false;
                    yield* this.pushCount(1);
                    yield* this.pushSpaces(true);
                    return 'flow';
                }
            }
            // fallthrough
            default:
                this.flowKey = false;
                return yield* this.parsePlainScalar();
        }
    }
    *parseQuotedScalar() {
        const quote = this.charAt(0);
        let end = this.buffer.indexOf(quote, this.pos + 1);
        if (quote === "'") {
            while (end !== -1 && this.buffer[end + 1] === "'")
                end = this.buffer.indexOf("'", end + 2);
        }
        else {
            // double-quote
            while (end !== -1) {
                let n = 0;
                while (this.buffer[end - 1 - n] === '\\')
                    n += 1;
                if (n % 2 === 0)
                    break;
                end = this.buffer.indexOf('"', end + 1);
            }
        }
        // Only looking for newlines within the quotes
        const qb = this.buffer.substring(0, end);
        let nl = qb.indexOf('\n', this.pos);
        if (nl !== -1) {
            while (nl !== -1) {
                const cs = this.continueScalar(nl + 1);
                if (cs === -1)
                    break;
                nl = qb.indexOf('\n', cs);
            }
            if (nl !== -1) {
                // this is an error caused by an unexpected unindent
                end = nl - (qb[nl - 1] === '\r' ? 2 : 1);
            }
        }
        if (end === -1) {
            if (!this.atEnd)
                return this.setNext('quoted-scalar');
            end = this.buffer.length;
        }
        yield* this.pushToIndex(end + 1, false);
        return this.flowLevel ? 'flow' : 'doc';
    }
    *parseBlockScalarHeader() {
        this.blockScalarIndent = -1;
        this.blockScalarKeep = false;
        let i = this.pos;
        while (true) {
            const ch = this.buffer[++i];
            if (ch === '+')
                this.blockScalarKeep = true;
            else if (ch > '0' && ch <= '9')
                this.blockScalarIndent = Number(ch) - 1;
            else if (ch !== '-')
                break;
        }
        return yield* this.pushUntil(ch => isEmpty(ch) || ch === '#');
    }
    *parseBlockScalar() {
        let nl = this.pos - 1; // may be -1 if this.pos === 0
        let indent = 0;
        let ch;
        loop: for (let i = this.pos; (ch = this.buffer[i]); ++i) {
            switch (ch) {
                case ' ':
                    indent += 1;
                    break;
                case '\n':
                    nl = i;
                    indent = 0;
                    break;
                case '\r': {
                    const next = this.buffer[i + 1];
                    if (!next && !this.atEnd)
                        return this.setNext('block-scalar');
                    if (next === '\n')
                        break;
                } // fallthrough
                default:
                    break loop;
            }
        }
        if (!ch && !this.atEnd)
            return this.setNext('block-scalar');
        if (indent >= this.indentNext) {
            if (this.blockScalarIndent === -1)
                this.indentNext = indent;
            else {
                this.indentNext =
                    this.blockScalarIndent + (this.indentNext === 0 ? 1 : this.indentNext);
            }
            do {
                const cs = this.continueScalar(nl + 1);
                if (cs === -1)
                    break;
                nl = this.buffer.indexOf('\n', cs);
            } while (nl !== -1);
            if (nl === -1) {
                if (!this.atEnd)
                    return this.setNext('block-scalar');
                nl = this.buffer.length;
            }
        }
        // Trailing insufficiently indented tabs are invalid.
        // To catch that during parsing, we include them in the block scalar value.
        let i = nl + 1;
        ch = this.buffer[i];
        while (ch === ' ')
            ch = this.buffer[++i];
        if (ch === '\t') {
            while (ch === '\t' || ch === ' ' || ch === '\r' || ch === '\n')
                ch = this.buffer[++i];
            nl = i - 1;
        }
        else if (!this.blockScalarKeep) {
            do {
                let i = nl - 1;
                let ch = this.buffer[i];
                if (ch === '\r')
                    ch = this.buffer[--i];
                const lastChar = i; // Drop the line if last char not more indented
                while (ch === ' ')
                    ch = this.buffer[--i];
                if (ch === '\n' && i >= this.pos && i + 1 + indent > lastChar)
                    nl = i;
                else
                    break;
            } while (true);
        }
        yield cst.SCALAR;
        yield* this.pushToIndex(nl + 1, true);
        return yield* this.parseLineStart();
    }
    *parsePlainScalar() {
        const inFlow = this.flowLevel > 0;
        let end = this.pos - 1;
        let i = this.pos - 1;
        let ch;
        while ((ch = this.buffer[++i])) {
            if (ch === ':') {
                const next = this.buffer[i + 1];
                if (isEmpty(next) || (inFlow && flowIndicatorChars.has(next)))
                    break;
                end = i;
            }
            else if (isEmpty(ch)) {
                let next = this.buffer[i + 1];
                if (ch === '\r') {
                    if (next === '\n') {
                        i += 1;
                        ch = '\n';
                        next = this.buffer[i + 1];
                    }
                    else
                        end = i;
                }
                if (next === '#' || (inFlow && flowIndicatorChars.has(next)))
                    break;
                if (ch === '\n') {
                    const cs = this.continueScalar(i + 1);
                    if (cs === -1)
                        break;
                    i = Math.max(i, cs - 2); // to advance, but still account for ' #'
                }
            }
            else {
                if (inFlow && flowIndicatorChars.has(ch))
                    break;
                end = i;
            }
        }
        if (!ch && !this.atEnd)
            return this.setNext('plain-scalar');
        yield cst.SCALAR;
        yield* this.pushToIndex(end + 1, true);
        return inFlow ? 'flow' : 'doc';
    }
    *pushCount(n) {
        if (n > 0) {
            yield this.buffer.substr(this.pos, n);
            this.pos += n;
            return n;
        }
        return 0;
    }
    *pushToIndex(i, allowEmpty) {
        const s = this.buffer.slice(this.pos, i);
        if (s) {
            yield s;
            this.pos += s.length;
            return s.length;
        }
        else if (allowEmpty)
            yield '';
        return 0;
    }
    *pushIndicators() {
        let n = 0;
        loop: while (true) {
            switch (this.charAt(0)) {
                case '!':
                    n += yield* this.pushTag();
                    n += yield* this.pushSpaces(true);
                    continue loop;
                case '&':
                    n += yield* this.pushUntil(isNotAnchorChar);
                    n += yield* this.pushSpaces(true);
                    continue loop;
                case '-': // this is an error
                case '?': // this is an error outside flow collections
                case ':': {
                    const inFlow = this.flowLevel > 0;
                    const ch1 = this.charAt(1);
                    if (isEmpty(ch1) || (inFlow && flowIndicatorChars.has(ch1))) {
                        if (!inFlow)
                            this.indentNext = this.indentValue + 1;
                        else if (this.flowKey)
                            this.flowKey = false;
                        n += yield* this.pushCount(1);
                        n += yield* this.pushSpaces(true);
                        continue loop;
                    }
                }
            }
            break loop;
        }
        return n;
    }
    *pushTag() {
        if (this.charAt(1) === '<') {
            let i = this.pos + 2;
            let ch = this.buffer[i];
            while (!isEmpty(ch) && ch !== '>')
                ch = this.buffer[++i];
            return yield* this.pushToIndex(ch === '>' ? i + 1 : i, false);
        }
        else {
            let i = this.pos + 1;
            let ch = this.buffer[i];
            while (ch) {
                if (tagChars.has(ch))
                    ch = this.buffer[++i];
                else if (ch === '%' &&
                    hexDigits.has(this.buffer[i + 1]) &&
                    hexDigits.has(this.buffer[i + 2])) {
                    ch = this.buffer[(i += 3)];
                }
                else
                    break;
            }
            return yield* this.pushToIndex(i, false);
        }
    }
    *pushNewline() {
        const ch = this.buffer[this.pos];
        if (ch === '\n')
            return yield* this.pushCount(1);
        else if (ch === '\r' && this.charAt(1) === '\n')
            return yield* this.pushCount(2);
        else
            return 0;
    }
    *pushSpaces(allowTabs) {
        let i = this.pos - 1;
        let ch;
        do {
            ch = this.buffer[++i];
        } while (ch === ' ' || (allowTabs && ch === '\t'));
        const n = i - this.pos;
        if (n > 0) {
            yield this.buffer.substr(this.pos, n);
            this.pos = i;
        }
        return n;
    }
    *pushUntil(test) {
        let i = this.pos;
        let ch = this.buffer[i];
        while (!test(ch))
            ch = this.buffer[++i];
        return yield* this.pushToIndex(i, false);
    }
}

exports.Lexer = Lexer;


/***/ }),

/***/ 6628:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Tracks newlines during parsing in order to provide an efficient API for
 * determining the one-indexed `{ line, col }` position for any offset
 * within the input.
 */
class LineCounter {
    constructor() {
        this.lineStarts = [];
        /**
         * Should be called in ascending order. Otherwise, call
         * `lineCounter.lineStarts.sort()` before calling `linePos()`.
         */
        this.addNewLine = (offset) => this.lineStarts.push(offset);
        /**
         * Performs a binary search and returns the 1-indexed { line, col }
         * position of `offset`. If `line === 0`, `addNewLine` has never been
         * called or `offset` is before the first known newline.
         */
        this.linePos = (offset) => {
            let low = 0;
            let high = this.lineStarts.length;
            while (low < high) {
                const mid = (low + high) >> 1; // Math.floor((low + high) / 2)
                if (this.lineStarts[mid] < offset)
                    low = mid + 1;
                else
                    high = mid;
            }
            if (this.lineStarts[low] === offset)
                return { line: low + 1, col: 1 };
            if (low === 0)
                return { line: 0, col: offset };
            const start = this.lineStarts[low - 1];
            return { line: low, col: offset - start + 1 };
        };
    }
}

exports.LineCounter = LineCounter;


/***/ }),

/***/ 3456:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_process = __nccwpck_require__(932);
var cst = __nccwpck_require__(3461);
var lexer = __nccwpck_require__(361);

function includesToken(list, type) {
    for (let i = 0; i < list.length; ++i)
        if (list[i].type === type)
            return true;
    return false;
}
function findNonEmptyIndex(list) {
    for (let i = 0; i < list.length; ++i) {
        switch (list[i].type) {
            case 'space':
            case 'comment':
            case 'newline':
                break;
            default:
                return i;
        }
    }
    return -1;
}
function isFlowToken(token) {
    switch (token?.type) {
        case 'alias':
        case 'scalar':
        case 'single-quoted-scalar':
        case 'double-quoted-scalar':
        case 'flow-collection':
            return true;
        default:
            return false;
    }
}
function getPrevProps(parent) {
    switch (parent.type) {
        case 'document':
            return parent.start;
        case 'block-map': {
            const it = parent.items[parent.items.length - 1];
            return it.sep ?? it.start;
        }
        case 'block-seq':
            return parent.items[parent.items.length - 1].start;
        /* istanbul ignore next should not happen */
        default:
            return [];
    }
}
/** Note: May modify input array */
function getFirstKeyStartProps(prev) {
    if (prev.length === 0)
        return [];
    let i = prev.length;
    loop: while (--i >= 0) {
        switch (prev[i].type) {
            case 'doc-start':
            case 'explicit-key-ind':
            case 'map-value-ind':
            case 'seq-item-ind':
            case 'newline':
                break loop;
        }
    }
    while (prev[++i]?.type === 'space') {
        /* loop */
    }
    return prev.splice(i, prev.length);
}
function arrayPushArray(target, source) {
    // May exhaust call stack with large `source` array
    if (source.length < 1e5)
        Array.prototype.push.apply(target, source);
    else
        for (let i = 0; i < source.length; ++i)
            target.push(source[i]);
}
function fixFlowSeqItems(fc) {
    if (fc.start.type === 'flow-seq-start') {
        for (const it of fc.items) {
            if (it.sep &&
                !it.value &&
                !includesToken(it.start, 'explicit-key-ind') &&
                !includesToken(it.sep, 'map-value-ind')) {
                if (it.key)
                    it.value = it.key;
                delete it.key;
                if (isFlowToken(it.value)) {
                    if (it.value.end)
                        arrayPushArray(it.value.end, it.sep);
                    else
                        it.value.end = it.sep;
                }
                else
                    arrayPushArray(it.start, it.sep);
                delete it.sep;
            }
        }
    }
}
/**
 * A YAML concrete syntax tree (CST) parser
 *
 * ```ts
 * const src: string = ...
 * for (const token of new Parser().parse(src)) {
 *   // token: Token
 * }
 * ```
 *
 * To use the parser with a user-provided lexer:
 *
 * ```ts
 * function* parse(source: string, lexer: Lexer) {
 *   const parser = new Parser()
 *   for (const lexeme of lexer.lex(source))
 *     yield* parser.next(lexeme)
 *   yield* parser.end()
 * }
 *
 * const src: string = ...
 * const lexer = new Lexer()
 * for (const token of parse(src, lexer)) {
 *   // token: Token
 * }
 * ```
 */
class Parser {
    /**
     * @param onNewLine - If defined, called separately with the start position of
     *   each new line (in `parse()`, including the start of input).
     */
    constructor(onNewLine) {
        /** If true, space and sequence indicators count as indentation */
        this.atNewLine = true;
        /** If true, next token is a scalar value */
        this.atScalar = false;
        /** Current indentation level */
        this.indent = 0;
        /** Current offset since the start of parsing */
        this.offset = 0;
        /** On the same line with a block map key */
        this.onKeyLine = false;
        /** Top indicates the node that's currently being built */
        this.stack = [];
        /** The source of the current token, set in parse() */
        this.source = '';
        /** The type of the current token, set in parse() */
        this.type = '';
        // Must be defined after `next()`
        this.lexer = new lexer.Lexer();
        this.onNewLine = onNewLine;
    }
    /**
     * Parse `source` as a YAML stream.
     * If `incomplete`, a part of the last line may be left as a buffer for the next call.
     *
     * Errors are not thrown, but yielded as `{ type: 'error', message }` tokens.
     *
     * @returns A generator of tokens representing each directive, document, and other structure.
     */
    *parse(source, incomplete = false) {
        if (this.onNewLine && this.offset === 0)
            this.onNewLine(0);
        for (const lexeme of this.lexer.lex(source, incomplete))
            yield* this.next(lexeme);
        if (!incomplete)
            yield* this.end();
    }
    /**
     * Advance the parser by the `source` of one lexical token.
     */
    *next(source) {
        this.source = source;
        if (node_process.env.LOG_TOKENS)
            console.log('|', cst.prettyToken(source));
        if (this.atScalar) {
            this.atScalar = false;
            yield* this.step();
            this.offset += source.length;
            return;
        }
        const type = cst.tokenType(source);
        if (!type) {
            const message = `Not a YAML token: ${source}`;
            yield* this.pop({ type: 'error', offset: this.offset, message, source });
            this.offset += source.length;
        }
        else if (type === 'scalar') {
            this.atNewLine = false;
            this.atScalar = true;
            this.type = 'scalar';
        }
        else {
            this.type = type;
            yield* this.step();
            switch (type) {
                case 'newline':
                    this.atNewLine = true;
                    this.indent = 0;
                    if (this.onNewLine)
                        this.onNewLine(this.offset + source.length);
                    break;
                case 'space':
                    if (this.atNewLine && source[0] === ' ')
                        this.indent += source.length;
                    break;
                case 'explicit-key-ind':
                case 'map-value-ind':
                case 'seq-item-ind':
                    if (this.atNewLine)
                        this.indent += source.length;
                    break;
                case 'doc-mode':
                case 'flow-error-end':
                    return;
                default:
                    this.atNewLine = false;
            }
            this.offset += source.length;
        }
    }
    /** Call at end of input to push out any remaining constructions */
    *end() {
        while (this.stack.length > 0)
            yield* this.pop();
    }
    get sourceToken() {
        const st = {
            type: this.type,
            offset: this.offset,
            indent: this.indent,
            source: this.source
        };
        return st;
    }
    *step() {
        const top = this.peek(1);
        if (this.type === 'doc-end' && top?.type !== 'doc-end') {
            while (this.stack.length > 0)
                yield* this.pop();
            this.stack.push({
                type: 'doc-end',
                offset: this.offset,
                source: this.source
            });
            return;
        }
        if (!top)
            return yield* this.stream();
        switch (top.type) {
            case 'document':
                return yield* this.document(top);
            case 'alias':
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return yield* this.scalar(top);
            case 'block-scalar':
                return yield* this.blockScalar(top);
            case 'block-map':
                return yield* this.blockMap(top);
            case 'block-seq':
                return yield* this.blockSequence(top);
            case 'flow-collection':
                return yield* this.flowCollection(top);
            case 'doc-end':
                return yield* this.documentEnd(top);
        }
        /* istanbul ignore next should not happen */
        yield* this.pop();
    }
    peek(n) {
        return this.stack[this.stack.length - n];
    }
    *pop(error) {
        const token = error ?? this.stack.pop();
        /* istanbul ignore if should not happen */
        if (!token) {
            const message = 'Tried to pop an empty stack';
            yield { type: 'error', offset: this.offset, source: '', message };
        }
        else if (this.stack.length === 0) {
            yield token;
        }
        else {
            const top = this.peek(1);
            if (token.type === 'block-scalar') {
                // Block scalars use their parent rather than header indent
                token.indent = 'indent' in top ? top.indent : 0;
            }
            else if (token.type === 'flow-collection' && top.type === 'document') {
                // Ignore all indent for top-level flow collections
                token.indent = 0;
            }
            if (token.type === 'flow-collection')
                fixFlowSeqItems(token);
            switch (top.type) {
                case 'document':
                    top.value = token;
                    break;
                case 'block-scalar':
                    top.props.push(token); // error
                    break;
                case 'block-map': {
                    const it = top.items[top.items.length - 1];
                    if (it.value) {
                        top.items.push({ start: [], key: token, sep: [] });
                        this.onKeyLine = true;
                        return;
                    }
                    else if (it.sep) {
                        it.value = token;
                    }
                    else {
                        Object.assign(it, { key: token, sep: [] });
                        this.onKeyLine = !it.explicitKey;
                        return;
                    }
                    break;
                }
                case 'block-seq': {
                    const it = top.items[top.items.length - 1];
                    if (it.value)
                        top.items.push({ start: [], value: token });
                    else
                        it.value = token;
                    break;
                }
                case 'flow-collection': {
                    const it = top.items[top.items.length - 1];
                    if (!it || it.value)
                        top.items.push({ start: [], key: token, sep: [] });
                    else if (it.sep)
                        it.value = token;
                    else
                        Object.assign(it, { key: token, sep: [] });
                    return;
                }
                /* istanbul ignore next should not happen */
                default:
                    yield* this.pop();
                    yield* this.pop(token);
            }
            if ((top.type === 'document' ||
                top.type === 'block-map' ||
                top.type === 'block-seq') &&
                (token.type === 'block-map' || token.type === 'block-seq')) {
                const last = token.items[token.items.length - 1];
                if (last &&
                    !last.sep &&
                    !last.value &&
                    last.start.length > 0 &&
                    findNonEmptyIndex(last.start) === -1 &&
                    (token.indent === 0 ||
                        last.start.every(st => st.type !== 'comment' || st.indent < token.indent))) {
                    if (top.type === 'document')
                        top.end = last.start;
                    else
                        top.items.push({ start: last.start });
                    token.items.splice(-1, 1);
                }
            }
        }
    }
    *stream() {
        switch (this.type) {
            case 'directive-line':
                yield { type: 'directive', offset: this.offset, source: this.source };
                return;
            case 'byte-order-mark':
            case 'space':
            case 'comment':
            case 'newline':
                yield this.sourceToken;
                return;
            case 'doc-mode':
            case 'doc-start': {
                const doc = {
                    type: 'document',
                    offset: this.offset,
                    start: []
                };
                if (this.type === 'doc-start')
                    doc.start.push(this.sourceToken);
                this.stack.push(doc);
                return;
            }
        }
        yield {
            type: 'error',
            offset: this.offset,
            message: `Unexpected ${this.type} token in YAML stream`,
            source: this.source
        };
    }
    *document(doc) {
        if (doc.value)
            return yield* this.lineEnd(doc);
        switch (this.type) {
            case 'doc-start': {
                if (findNonEmptyIndex(doc.start) !== -1) {
                    yield* this.pop();
                    yield* this.step();
                }
                else
                    doc.start.push(this.sourceToken);
                return;
            }
            case 'anchor':
            case 'tag':
            case 'space':
            case 'comment':
            case 'newline':
                doc.start.push(this.sourceToken);
                return;
        }
        const bv = this.startBlockValue(doc);
        if (bv)
            this.stack.push(bv);
        else {
            yield {
                type: 'error',
                offset: this.offset,
                message: `Unexpected ${this.type} token in YAML document`,
                source: this.source
            };
        }
    }
    *scalar(scalar) {
        if (this.type === 'map-value-ind') {
            const prev = getPrevProps(this.peek(2));
            const start = getFirstKeyStartProps(prev);
            let sep;
            if (scalar.end) {
                sep = scalar.end;
                sep.push(this.sourceToken);
                delete scalar.end;
            }
            else
                sep = [this.sourceToken];
            const map = {
                type: 'block-map',
                offset: scalar.offset,
                indent: scalar.indent,
                items: [{ start, key: scalar, sep }]
            };
            this.onKeyLine = true;
            this.stack[this.stack.length - 1] = map;
        }
        else
            yield* this.lineEnd(scalar);
    }
    *blockScalar(scalar) {
        switch (this.type) {
            case 'space':
            case 'comment':
            case 'newline':
                scalar.props.push(this.sourceToken);
                return;
            case 'scalar':
                scalar.source = this.source;
                // block-scalar source includes trailing newline
                this.atNewLine = true;
                this.indent = 0;
                if (this.onNewLine) {
                    let nl = this.source.indexOf('\n') + 1;
                    while (nl !== 0) {
                        this.onNewLine(this.offset + nl);
                        nl = this.source.indexOf('\n', nl) + 1;
                    }
                }
                yield* this.pop();
                break;
            /* istanbul ignore next should not happen */
            default:
                yield* this.pop();
                yield* this.step();
        }
    }
    *blockMap(map) {
        const it = map.items[map.items.length - 1];
        // it.sep is true-ish if pair already has key or : separator
        switch (this.type) {
            case 'newline':
                this.onKeyLine = false;
                if (it.value) {
                    const end = 'end' in it.value ? it.value.end : undefined;
                    const last = Array.isArray(end) ? end[end.length - 1] : undefined;
                    if (last?.type === 'comment')
                        end?.push(this.sourceToken);
                    else
                        map.items.push({ start: [this.sourceToken] });
                }
                else if (it.sep) {
                    it.sep.push(this.sourceToken);
                }
                else {
                    it.start.push(this.sourceToken);
                }
                return;
            case 'space':
            case 'comment':
                if (it.value) {
                    map.items.push({ start: [this.sourceToken] });
                }
                else if (it.sep) {
                    it.sep.push(this.sourceToken);
                }
                else {
                    if (this.atIndentedComment(it.start, map.indent)) {
                        const prev = map.items[map.items.length - 2];
                        const end = prev?.value?.end;
                        if (Array.isArray(end)) {
                            arrayPushArray(end, it.start);
                            end.push(this.sourceToken);
                            map.items.pop();
                            return;
                        }
                    }
                    it.start.push(this.sourceToken);
                }
                return;
        }
        if (this.indent >= map.indent) {
            const atMapIndent = !this.onKeyLine && this.indent === map.indent;
            const atNextItem = atMapIndent &&
                (it.sep || it.explicitKey) &&
                this.type !== 'seq-item-ind';
            // For empty nodes, assign newline-separated not indented empty tokens to following node
            let start = [];
            if (atNextItem && it.sep && !it.value) {
                const nl = [];
                for (let i = 0; i < it.sep.length; ++i) {
                    const st = it.sep[i];
                    switch (st.type) {
                        case 'newline':
                            nl.push(i);
                            break;
                        case 'space':
                            break;
                        case 'comment':
                            if (st.indent > map.indent)
                                nl.length = 0;
                            break;
                        default:
                            nl.length = 0;
                    }
                }
                if (nl.length >= 2)
                    start = it.sep.splice(nl[1]);
            }
            switch (this.type) {
                case 'anchor':
                case 'tag':
                    if (atNextItem || it.value) {
                        start.push(this.sourceToken);
                        map.items.push({ start });
                        this.onKeyLine = true;
                    }
                    else if (it.sep) {
                        it.sep.push(this.sourceToken);
                    }
                    else {
                        it.start.push(this.sourceToken);
                    }
                    return;
                case 'explicit-key-ind':
                    if (!it.sep && !it.explicitKey) {
                        it.start.push(this.sourceToken);
                        it.explicitKey = true;
                    }
                    else if (atNextItem || it.value) {
                        start.push(this.sourceToken);
                        map.items.push({ start, explicitKey: true });
                    }
                    else {
                        this.stack.push({
                            type: 'block-map',
                            offset: this.offset,
                            indent: this.indent,
                            items: [{ start: [this.sourceToken], explicitKey: true }]
                        });
                    }
                    this.onKeyLine = true;
                    return;
                case 'map-value-ind':
                    if (it.explicitKey) {
                        if (!it.sep) {
                            if (includesToken(it.start, 'newline')) {
                                Object.assign(it, { key: null, sep: [this.sourceToken] });
                            }
                            else {
                                const start = getFirstKeyStartProps(it.start);
                                this.stack.push({
                                    type: 'block-map',
                                    offset: this.offset,
                                    indent: this.indent,
                                    items: [{ start, key: null, sep: [this.sourceToken] }]
                                });
                            }
                        }
                        else if (it.value) {
                            map.items.push({ start: [], key: null, sep: [this.sourceToken] });
                        }
                        else if (includesToken(it.sep, 'map-value-ind')) {
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start, key: null, sep: [this.sourceToken] }]
                            });
                        }
                        else if (isFlowToken(it.key) &&
                            !includesToken(it.sep, 'newline')) {
                            const start = getFirstKeyStartProps(it.start);
                            const key = it.key;
                            const sep = it.sep;
                            sep.push(this.sourceToken);
                            // @ts-expect-error type guard is wrong here
                            delete it.key;
                            // @ts-expect-error type guard is wrong here
                            delete it.sep;
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start, key, sep }]
                            });
                        }
                        else if (start.length > 0) {
                            // Not actually at next item
                            it.sep = it.sep.concat(start, this.sourceToken);
                        }
                        else {
                            it.sep.push(this.sourceToken);
                        }
                    }
                    else {
                        if (!it.sep) {
                            Object.assign(it, { key: null, sep: [this.sourceToken] });
                        }
                        else if (it.value || atNextItem) {
                            map.items.push({ start, key: null, sep: [this.sourceToken] });
                        }
                        else if (includesToken(it.sep, 'map-value-ind')) {
                            this.stack.push({
                                type: 'block-map',
                                offset: this.offset,
                                indent: this.indent,
                                items: [{ start: [], key: null, sep: [this.sourceToken] }]
                            });
                        }
                        else {
                            it.sep.push(this.sourceToken);
                        }
                    }
                    this.onKeyLine = true;
                    return;
                case 'alias':
                case 'scalar':
                case 'single-quoted-scalar':
                case 'double-quoted-scalar': {
                    const fs = this.flowScalar(this.type);
                    if (atNextItem || it.value) {
                        map.items.push({ start, key: fs, sep: [] });
                        this.onKeyLine = true;
                    }
                    else if (it.sep) {
                        this.stack.push(fs);
                    }
                    else {
                        Object.assign(it, { key: fs, sep: [] });
                        this.onKeyLine = true;
                    }
                    return;
                }
                default: {
                    const bv = this.startBlockValue(map);
                    if (bv) {
                        if (bv.type === 'block-seq') {
                            if (!it.explicitKey &&
                                it.sep &&
                                !includesToken(it.sep, 'newline')) {
                                yield* this.pop({
                                    type: 'error',
                                    offset: this.offset,
                                    message: 'Unexpected block-seq-ind on same line with key',
                                    source: this.source
                                });
                                return;
                            }
                        }
                        else if (atMapIndent) {
                            map.items.push({ start });
                        }
                        this.stack.push(bv);
                        return;
                    }
                }
            }
        }
        yield* this.pop();
        yield* this.step();
    }
    *blockSequence(seq) {
        const it = seq.items[seq.items.length - 1];
        switch (this.type) {
            case 'newline':
                if (it.value) {
                    const end = 'end' in it.value ? it.value.end : undefined;
                    const last = Array.isArray(end) ? end[end.length - 1] : undefined;
                    if (last?.type === 'comment')
                        end?.push(this.sourceToken);
                    else
                        seq.items.push({ start: [this.sourceToken] });
                }
                else
                    it.start.push(this.sourceToken);
                return;
            case 'space':
            case 'comment':
                if (it.value)
                    seq.items.push({ start: [this.sourceToken] });
                else {
                    if (this.atIndentedComment(it.start, seq.indent)) {
                        const prev = seq.items[seq.items.length - 2];
                        const end = prev?.value?.end;
                        if (Array.isArray(end)) {
                            arrayPushArray(end, it.start);
                            end.push(this.sourceToken);
                            seq.items.pop();
                            return;
                        }
                    }
                    it.start.push(this.sourceToken);
                }
                return;
            case 'anchor':
            case 'tag':
                if (it.value || this.indent <= seq.indent)
                    break;
                it.start.push(this.sourceToken);
                return;
            case 'seq-item-ind':
                if (this.indent !== seq.indent)
                    break;
                if (it.value || includesToken(it.start, 'seq-item-ind'))
                    seq.items.push({ start: [this.sourceToken] });
                else
                    it.start.push(this.sourceToken);
                return;
        }
        if (this.indent > seq.indent) {
            const bv = this.startBlockValue(seq);
            if (bv) {
                this.stack.push(bv);
                return;
            }
        }
        yield* this.pop();
        yield* this.step();
    }
    *flowCollection(fc) {
        const it = fc.items[fc.items.length - 1];
        if (this.type === 'flow-error-end') {
            let top;
            do {
                yield* this.pop();
                top = this.peek(1);
            } while (top?.type === 'flow-collection');
        }
        else if (fc.end.length === 0) {
            switch (this.type) {
                case 'comma':
                case 'explicit-key-ind':
                    if (!it || it.sep)
                        fc.items.push({ start: [this.sourceToken] });
                    else
                        it.start.push(this.sourceToken);
                    return;
                case 'map-value-ind':
                    if (!it || it.value)
                        fc.items.push({ start: [], key: null, sep: [this.sourceToken] });
                    else if (it.sep)
                        it.sep.push(this.sourceToken);
                    else
                        Object.assign(it, { key: null, sep: [this.sourceToken] });
                    return;
                case 'space':
                case 'comment':
                case 'newline':
                case 'anchor':
                case 'tag':
                    if (!it || it.value)
                        fc.items.push({ start: [this.sourceToken] });
                    else if (it.sep)
                        it.sep.push(this.sourceToken);
                    else
                        it.start.push(this.sourceToken);
                    return;
                case 'alias':
                case 'scalar':
                case 'single-quoted-scalar':
                case 'double-quoted-scalar': {
                    const fs = this.flowScalar(this.type);
                    if (!it || it.value)
                        fc.items.push({ start: [], key: fs, sep: [] });
                    else if (it.sep)
                        this.stack.push(fs);
                    else
                        Object.assign(it, { key: fs, sep: [] });
                    return;
                }
                case 'flow-map-end':
                case 'flow-seq-end':
                    fc.end.push(this.sourceToken);
                    return;
            }
            const bv = this.startBlockValue(fc);
            /* istanbul ignore else should not happen */
            if (bv)
                this.stack.push(bv);
            else {
                yield* this.pop();
                yield* this.step();
            }
        }
        else {
            const parent = this.peek(2);
            if (parent.type === 'block-map' &&
                ((this.type === 'map-value-ind' && parent.indent === fc.indent) ||
                    (this.type === 'newline' &&
                        !parent.items[parent.items.length - 1].sep))) {
                yield* this.pop();
                yield* this.step();
            }
            else if (this.type === 'map-value-ind' &&
                parent.type !== 'flow-collection') {
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                fixFlowSeqItems(fc);
                const sep = fc.end.splice(1, fc.end.length);
                sep.push(this.sourceToken);
                const map = {
                    type: 'block-map',
                    offset: fc.offset,
                    indent: fc.indent,
                    items: [{ start, key: fc, sep }]
                };
                this.onKeyLine = true;
                this.stack[this.stack.length - 1] = map;
            }
            else {
                yield* this.lineEnd(fc);
            }
        }
    }
    flowScalar(type) {
        if (this.onNewLine) {
            let nl = this.source.indexOf('\n') + 1;
            while (nl !== 0) {
                this.onNewLine(this.offset + nl);
                nl = this.source.indexOf('\n', nl) + 1;
            }
        }
        return {
            type,
            offset: this.offset,
            indent: this.indent,
            source: this.source
        };
    }
    startBlockValue(parent) {
        switch (this.type) {
            case 'alias':
            case 'scalar':
            case 'single-quoted-scalar':
            case 'double-quoted-scalar':
                return this.flowScalar(this.type);
            case 'block-scalar-header':
                return {
                    type: 'block-scalar',
                    offset: this.offset,
                    indent: this.indent,
                    props: [this.sourceToken],
                    source: ''
                };
            case 'flow-map-start':
            case 'flow-seq-start':
                return {
                    type: 'flow-collection',
                    offset: this.offset,
                    indent: this.indent,
                    start: this.sourceToken,
                    items: [],
                    end: []
                };
            case 'seq-item-ind':
                return {
                    type: 'block-seq',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start: [this.sourceToken] }]
                };
            case 'explicit-key-ind': {
                this.onKeyLine = true;
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                start.push(this.sourceToken);
                return {
                    type: 'block-map',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, explicitKey: true }]
                };
            }
            case 'map-value-ind': {
                this.onKeyLine = true;
                const prev = getPrevProps(parent);
                const start = getFirstKeyStartProps(prev);
                return {
                    type: 'block-map',
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, key: null, sep: [this.sourceToken] }]
                };
            }
        }
        return null;
    }
    atIndentedComment(start, indent) {
        if (this.type !== 'comment')
            return false;
        if (this.indent <= indent)
            return false;
        return start.every(st => st.type === 'newline' || st.type === 'space');
    }
    *documentEnd(docEnd) {
        if (this.type !== 'doc-mode') {
            if (docEnd.end)
                docEnd.end.push(this.sourceToken);
            else
                docEnd.end = [this.sourceToken];
            if (this.type === 'newline')
                yield* this.pop();
        }
    }
    *lineEnd(token) {
        switch (this.type) {
            case 'comma':
            case 'doc-start':
            case 'doc-end':
            case 'flow-seq-end':
            case 'flow-map-end':
            case 'map-value-ind':
                yield* this.pop();
                yield* this.step();
                break;
            case 'newline':
                this.onKeyLine = false;
            // fallthrough
            case 'space':
            case 'comment':
            default:
                // all other values are errors
                if (token.end)
                    token.end.push(this.sourceToken);
                else
                    token.end = [this.sourceToken];
                if (this.type === 'newline')
                    yield* this.pop();
        }
    }
}

exports.Parser = Parser;


/***/ }),

/***/ 4047:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var composer = __nccwpck_require__(9984);
var Document = __nccwpck_require__(5402);
var errors = __nccwpck_require__(1464);
var log = __nccwpck_require__(7249);
var identity = __nccwpck_require__(1127);
var lineCounter = __nccwpck_require__(6628);
var parser = __nccwpck_require__(3456);

function parseOptions(options) {
    const prettyErrors = options.prettyErrors !== false;
    const lineCounter$1 = options.lineCounter || (prettyErrors && new lineCounter.LineCounter()) || null;
    return { lineCounter: lineCounter$1, prettyErrors };
}
/**
 * Parse the input as a stream of YAML documents.
 *
 * Documents should be separated from each other by `...` or `---` marker lines.
 *
 * @returns If an empty `docs` array is returned, it will be of type
 *   EmptyStream and contain additional stream information. In
 *   TypeScript, you should use `'empty' in docs` as a type guard for it.
 */
function parseAllDocuments(source, options = {}) {
    const { lineCounter, prettyErrors } = parseOptions(options);
    const parser$1 = new parser.Parser(lineCounter?.addNewLine);
    const composer$1 = new composer.Composer(options);
    const docs = Array.from(composer$1.compose(parser$1.parse(source)));
    if (prettyErrors && lineCounter)
        for (const doc of docs) {
            doc.errors.forEach(errors.prettifyError(source, lineCounter));
            doc.warnings.forEach(errors.prettifyError(source, lineCounter));
        }
    if (docs.length > 0)
        return docs;
    return Object.assign([], { empty: true }, composer$1.streamInfo());
}
/** Parse an input string into a single YAML.Document */
function parseDocument(source, options = {}) {
    const { lineCounter, prettyErrors } = parseOptions(options);
    const parser$1 = new parser.Parser(lineCounter?.addNewLine);
    const composer$1 = new composer.Composer(options);
    // `doc` is always set by compose.end(true) at the very latest
    let doc = null;
    for (const _doc of composer$1.compose(parser$1.parse(source), true, source.length)) {
        if (!doc)
            doc = _doc;
        else if (doc.options.logLevel !== 'silent') {
            doc.errors.push(new errors.YAMLParseError(_doc.range.slice(0, 2), 'MULTIPLE_DOCS', 'Source contains multiple documents; please use YAML.parseAllDocuments()'));
            break;
        }
    }
    if (prettyErrors && lineCounter) {
        doc.errors.forEach(errors.prettifyError(source, lineCounter));
        doc.warnings.forEach(errors.prettifyError(source, lineCounter));
    }
    return doc;
}
function parse(src, reviver, options) {
    let _reviver = undefined;
    if (typeof reviver === 'function') {
        _reviver = reviver;
    }
    else if (options === undefined && reviver && typeof reviver === 'object') {
        options = reviver;
    }
    const doc = parseDocument(src, options);
    if (!doc)
        return null;
    doc.warnings.forEach(warning => log.warn(doc.options.logLevel, warning));
    if (doc.errors.length > 0) {
        if (doc.options.logLevel !== 'silent')
            throw doc.errors[0];
        else
            doc.errors = [];
    }
    return doc.toJS(Object.assign({ reviver: _reviver }, options));
}
function stringify(value, replacer, options) {
    let _replacer = null;
    if (typeof replacer === 'function' || Array.isArray(replacer)) {
        _replacer = replacer;
    }
    else if (options === undefined && replacer) {
        options = replacer;
    }
    if (typeof options === 'string')
        options = options.length;
    if (typeof options === 'number') {
        const indent = Math.round(options);
        options = indent < 1 ? undefined : indent > 8 ? { indent: 8 } : { indent };
    }
    if (value === undefined) {
        const { keepUndefined } = options ?? replacer ?? {};
        if (!keepUndefined)
            return undefined;
    }
    if (identity.isDocument(value) && !_replacer)
        return value.toString(options);
    return new Document.Document(value, _replacer, options).toString(options);
}

exports.parse = parse;
exports.parseAllDocuments = parseAllDocuments;
exports.parseDocument = parseDocument;
exports.stringify = stringify;


/***/ }),

/***/ 5840:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var map = __nccwpck_require__(7451);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var tags = __nccwpck_require__(18);

const sortMapEntriesByKey = (a, b) => a.key < b.key ? -1 : a.key > b.key ? 1 : 0;
class Schema {
    constructor({ compat, customTags, merge, resolveKnownTags, schema, sortMapEntries, toStringDefaults }) {
        this.compat = Array.isArray(compat)
            ? tags.getTags(compat, 'compat')
            : compat
                ? tags.getTags(null, compat)
                : null;
        this.name = (typeof schema === 'string' && schema) || 'core';
        this.knownTags = resolveKnownTags ? tags.coreKnownTags : {};
        this.tags = tags.getTags(customTags, this.name, merge);
        this.toStringOptions = toStringDefaults ?? null;
        Object.defineProperty(this, identity.MAP, { value: map.map });
        Object.defineProperty(this, identity.SCALAR, { value: string.string });
        Object.defineProperty(this, identity.SEQ, { value: seq.seq });
        // Used by createMap()
        this.sortMapEntries =
            typeof sortMapEntries === 'function'
                ? sortMapEntries
                : sortMapEntries === true
                    ? sortMapEntriesByKey
                    : null;
    }
    clone() {
        const copy = Object.create(Schema.prototype, Object.getOwnPropertyDescriptors(this));
        copy.tags = this.tags.slice();
        return copy;
    }
}

exports.Schema = Schema;


/***/ }),

/***/ 7451:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var YAMLMap = __nccwpck_require__(4454);

const map = {
    collection: 'map',
    default: true,
    nodeClass: YAMLMap.YAMLMap,
    tag: 'tag:yaml.org,2002:map',
    resolve(map, onError) {
        if (!identity.isMap(map))
            onError('Expected a mapping for this tag');
        return map;
    },
    createNode: (schema, obj, ctx) => YAMLMap.YAMLMap.from(schema, obj, ctx)
};

exports.map = map;


/***/ }),

/***/ 3632:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

const nullTag = {
    identify: value => value == null,
    createNode: () => new Scalar.Scalar(null),
    default: true,
    tag: 'tag:yaml.org,2002:null',
    test: /^(?:~|[Nn]ull|NULL)?$/,
    resolve: () => new Scalar.Scalar(null),
    stringify: ({ source }, ctx) => typeof source === 'string' && nullTag.test.test(source)
        ? source
        : ctx.options.nullStr
};

exports.nullTag = nullTag;


/***/ }),

/***/ 1706:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var YAMLSeq = __nccwpck_require__(2223);

const seq = {
    collection: 'seq',
    default: true,
    nodeClass: YAMLSeq.YAMLSeq,
    tag: 'tag:yaml.org,2002:seq',
    resolve(seq, onError) {
        if (!identity.isSeq(seq))
            onError('Expected a sequence for this tag');
        return seq;
    },
    createNode: (schema, obj, ctx) => YAMLSeq.YAMLSeq.from(schema, obj, ctx)
};

exports.seq = seq;


/***/ }),

/***/ 6464:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyString = __nccwpck_require__(3069);

const string = {
    identify: value => typeof value === 'string',
    default: true,
    tag: 'tag:yaml.org,2002:str',
    resolve: str => str,
    stringify(item, ctx, onComment, onChompKeep) {
        ctx = Object.assign({ actualString: true }, ctx);
        return stringifyString.stringifyString(item, ctx, onComment, onChompKeep);
    }
};

exports.string = string;


/***/ }),

/***/ 3959:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

const boolTag = {
    identify: value => typeof value === 'boolean',
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/,
    resolve: str => new Scalar.Scalar(str[0] === 't' || str[0] === 'T'),
    stringify({ source, value }, ctx) {
        if (source && boolTag.test.test(source)) {
            const sv = source[0] === 't' || source[0] === 'T';
            if (value === sv)
                return source;
        }
        return value ? ctx.options.trueStr : ctx.options.falseStr;
    }
};

exports.boolTag = boolTag;


/***/ }),

/***/ 8405:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var stringifyNumber = __nccwpck_require__(8689);

const floatNaN = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
    resolve: str => str.slice(-3).toLowerCase() === 'nan'
        ? NaN
        : str[0] === '-'
            ? Number.NEGATIVE_INFINITY
            : Number.POSITIVE_INFINITY,
    stringify: stringifyNumber.stringifyNumber
};
const floatExp = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'EXP',
    test: /^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/,
    resolve: str => parseFloat(str),
    stringify(node) {
        const num = Number(node.value);
        return isFinite(num) ? num.toExponential() : stringifyNumber.stringifyNumber(node);
    }
};
const float = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/,
    resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str));
        const dot = str.indexOf('.');
        if (dot !== -1 && str[str.length - 1] === '0')
            node.minFractionDigits = str.length - dot - 1;
        return node;
    },
    stringify: stringifyNumber.stringifyNumber
};

exports.float = float;
exports.floatExp = floatExp;
exports.floatNaN = floatNaN;


/***/ }),

/***/ 9874:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

const intIdentify = (value) => typeof value === 'bigint' || Number.isInteger(value);
const intResolve = (str, offset, radix, { intAsBigInt }) => (intAsBigInt ? BigInt(str) : parseInt(str.substring(offset), radix));
function intStringify(node, radix, prefix) {
    const { value } = node;
    if (intIdentify(value) && value >= 0)
        return prefix + value.toString(radix);
    return stringifyNumber.stringifyNumber(node);
}
const intOct = {
    identify: value => intIdentify(value) && value >= 0,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'OCT',
    test: /^0o[0-7]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 8, opt),
    stringify: node => intStringify(node, 8, '0o')
};
const int = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    test: /^[-+]?[0-9]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
    stringify: stringifyNumber.stringifyNumber
};
const intHex = {
    identify: value => intIdentify(value) && value >= 0,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'HEX',
    test: /^0x[0-9a-fA-F]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
    stringify: node => intStringify(node, 16, '0x')
};

exports.int = int;
exports.intHex = intHex;
exports.intOct = intOct;


/***/ }),

/***/ 896:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var bool = __nccwpck_require__(3959);
var float = __nccwpck_require__(8405);
var int = __nccwpck_require__(9874);

const schema = [
    map.map,
    seq.seq,
    string.string,
    _null.nullTag,
    bool.boolTag,
    int.intOct,
    int.int,
    int.intHex,
    float.floatNaN,
    float.floatExp,
    float.float
];

exports.schema = schema;


/***/ }),

/***/ 3559:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var map = __nccwpck_require__(7451);
var seq = __nccwpck_require__(1706);

function intIdentify(value) {
    return typeof value === 'bigint' || Number.isInteger(value);
}
const stringifyJSON = ({ value }) => JSON.stringify(value);
const jsonScalars = [
    {
        identify: value => typeof value === 'string',
        default: true,
        tag: 'tag:yaml.org,2002:str',
        resolve: str => str,
        stringify: stringifyJSON
    },
    {
        identify: value => value == null,
        createNode: () => new Scalar.Scalar(null),
        default: true,
        tag: 'tag:yaml.org,2002:null',
        test: /^null$/,
        resolve: () => null,
        stringify: stringifyJSON
    },
    {
        identify: value => typeof value === 'boolean',
        default: true,
        tag: 'tag:yaml.org,2002:bool',
        test: /^true$|^false$/,
        resolve: str => str === 'true',
        stringify: stringifyJSON
    },
    {
        identify: intIdentify,
        default: true,
        tag: 'tag:yaml.org,2002:int',
        test: /^-?(?:0|[1-9][0-9]*)$/,
        resolve: (str, _onError, { intAsBigInt }) => intAsBigInt ? BigInt(str) : parseInt(str, 10),
        stringify: ({ value }) => intIdentify(value) ? value.toString() : JSON.stringify(value)
    },
    {
        identify: value => typeof value === 'number',
        default: true,
        tag: 'tag:yaml.org,2002:float',
        test: /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]*)?(?:[eE][-+]?[0-9]+)?$/,
        resolve: str => parseFloat(str),
        stringify: stringifyJSON
    }
];
const jsonError = {
    default: true,
    tag: '',
    test: /^/,
    resolve(str, onError) {
        onError(`Unresolved plain scalar ${JSON.stringify(str)}`);
        return str;
    }
};
const schema = [map.map, seq.seq].concat(jsonScalars, jsonError);

exports.schema = schema;


/***/ }),

/***/ 18:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var bool = __nccwpck_require__(3959);
var float = __nccwpck_require__(8405);
var int = __nccwpck_require__(9874);
var schema = __nccwpck_require__(896);
var schema$1 = __nccwpck_require__(3559);
var binary = __nccwpck_require__(6083);
var merge = __nccwpck_require__(452);
var omap = __nccwpck_require__(303);
var pairs = __nccwpck_require__(8385);
var schema$2 = __nccwpck_require__(5913);
var set = __nccwpck_require__(1528);
var timestamp = __nccwpck_require__(6752);

const schemas = new Map([
    ['core', schema.schema],
    ['failsafe', [map.map, seq.seq, string.string]],
    ['json', schema$1.schema],
    ['yaml11', schema$2.schema],
    ['yaml-1.1', schema$2.schema]
]);
const tagsByName = {
    binary: binary.binary,
    bool: bool.boolTag,
    float: float.float,
    floatExp: float.floatExp,
    floatNaN: float.floatNaN,
    floatTime: timestamp.floatTime,
    int: int.int,
    intHex: int.intHex,
    intOct: int.intOct,
    intTime: timestamp.intTime,
    map: map.map,
    merge: merge.merge,
    null: _null.nullTag,
    omap: omap.omap,
    pairs: pairs.pairs,
    seq: seq.seq,
    set: set.set,
    timestamp: timestamp.timestamp
};
const coreKnownTags = {
    'tag:yaml.org,2002:binary': binary.binary,
    'tag:yaml.org,2002:merge': merge.merge,
    'tag:yaml.org,2002:omap': omap.omap,
    'tag:yaml.org,2002:pairs': pairs.pairs,
    'tag:yaml.org,2002:set': set.set,
    'tag:yaml.org,2002:timestamp': timestamp.timestamp
};
function getTags(customTags, schemaName, addMergeTag) {
    const schemaTags = schemas.get(schemaName);
    if (schemaTags && !customTags) {
        return addMergeTag && !schemaTags.includes(merge.merge)
            ? schemaTags.concat(merge.merge)
            : schemaTags.slice();
    }
    let tags = schemaTags;
    if (!tags) {
        if (Array.isArray(customTags))
            tags = [];
        else {
            const keys = Array.from(schemas.keys())
                .filter(key => key !== 'yaml11')
                .map(key => JSON.stringify(key))
                .join(', ');
            throw new Error(`Unknown schema "${schemaName}"; use one of ${keys} or define customTags array`);
        }
    }
    if (Array.isArray(customTags)) {
        for (const tag of customTags)
            tags = tags.concat(tag);
    }
    else if (typeof customTags === 'function') {
        tags = customTags(tags.slice());
    }
    if (addMergeTag)
        tags = tags.concat(merge.merge);
    return tags.reduce((tags, tag) => {
        const tagObj = typeof tag === 'string' ? tagsByName[tag] : tag;
        if (!tagObj) {
            const tagName = JSON.stringify(tag);
            const keys = Object.keys(tagsByName)
                .map(key => JSON.stringify(key))
                .join(', ');
            throw new Error(`Unknown custom tag ${tagName}; use one of ${keys}`);
        }
        if (!tags.includes(tagObj))
            tags.push(tagObj);
        return tags;
    }, []);
}

exports.coreKnownTags = coreKnownTags;
exports.getTags = getTags;


/***/ }),

/***/ 6083:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var node_buffer = __nccwpck_require__(181);
var Scalar = __nccwpck_require__(3301);
var stringifyString = __nccwpck_require__(3069);

const binary = {
    identify: value => value instanceof Uint8Array, // Buffer inherits from Uint8Array
    default: false,
    tag: 'tag:yaml.org,2002:binary',
    /**
     * Returns a Buffer in node and an Uint8Array in browsers
     *
     * To use the resulting buffer as an image, you'll want to do something like:
     *
     *   const blob = new Blob([buffer], { type: 'image/jpeg' })
     *   document.querySelector('#photo').src = URL.createObjectURL(blob)
     */
    resolve(src, onError) {
        if (typeof node_buffer.Buffer === 'function') {
            return node_buffer.Buffer.from(src, 'base64');
        }
        else if (typeof atob === 'function') {
            // On IE 11, atob() can't handle newlines
            const str = atob(src.replace(/[\n\r]/g, ''));
            const buffer = new Uint8Array(str.length);
            for (let i = 0; i < str.length; ++i)
                buffer[i] = str.charCodeAt(i);
            return buffer;
        }
        else {
            onError('This environment does not support reading binary tags; either Buffer or atob is required');
            return src;
        }
    },
    stringify({ comment, type, value }, ctx, onComment, onChompKeep) {
        if (!value)
            return '';
        const buf = value; // checked earlier by binary.identify()
        let str;
        if (typeof node_buffer.Buffer === 'function') {
            str =
                buf instanceof node_buffer.Buffer
                    ? buf.toString('base64')
                    : node_buffer.Buffer.from(buf.buffer).toString('base64');
        }
        else if (typeof btoa === 'function') {
            let s = '';
            for (let i = 0; i < buf.length; ++i)
                s += String.fromCharCode(buf[i]);
            str = btoa(s);
        }
        else {
            throw new Error('This environment does not support writing binary tags; either Buffer or btoa is required');
        }
        type ?? (type = Scalar.Scalar.BLOCK_LITERAL);
        if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
            const lineWidth = Math.max(ctx.options.lineWidth - ctx.indent.length, ctx.options.minContentWidth);
            const n = Math.ceil(str.length / lineWidth);
            const lines = new Array(n);
            for (let i = 0, o = 0; i < n; ++i, o += lineWidth) {
                lines[i] = str.substr(o, lineWidth);
            }
            str = lines.join(type === Scalar.Scalar.BLOCK_LITERAL ? '\n' : ' ');
        }
        return stringifyString.stringifyString({ comment, type, value: str }, ctx, onComment, onChompKeep);
    }
};

exports.binary = binary;


/***/ }),

/***/ 8398:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);

function boolStringify({ value, source }, ctx) {
    const boolObj = value ? trueTag : falseTag;
    if (source && boolObj.test.test(source))
        return source;
    return value ? ctx.options.trueStr : ctx.options.falseStr;
}
const trueTag = {
    identify: value => value === true,
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:Y|y|[Yy]es|YES|[Tt]rue|TRUE|[Oo]n|ON)$/,
    resolve: () => new Scalar.Scalar(true),
    stringify: boolStringify
};
const falseTag = {
    identify: value => value === false,
    default: true,
    tag: 'tag:yaml.org,2002:bool',
    test: /^(?:N|n|[Nn]o|NO|[Ff]alse|FALSE|[Oo]ff|OFF)$/,
    resolve: () => new Scalar.Scalar(false),
    stringify: boolStringify
};

exports.falseTag = falseTag;
exports.trueTag = trueTag;


/***/ }),

/***/ 5782:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var stringifyNumber = __nccwpck_require__(8689);

const floatNaN = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
    resolve: (str) => str.slice(-3).toLowerCase() === 'nan'
        ? NaN
        : str[0] === '-'
            ? Number.NEGATIVE_INFINITY
            : Number.POSITIVE_INFINITY,
    stringify: stringifyNumber.stringifyNumber
};
const floatExp = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'EXP',
    test: /^[-+]?(?:[0-9][0-9_]*)?(?:\.[0-9_]*)?[eE][-+]?[0-9]+$/,
    resolve: (str) => parseFloat(str.replace(/_/g, '')),
    stringify(node) {
        const num = Number(node.value);
        return isFinite(num) ? num.toExponential() : stringifyNumber.stringifyNumber(node);
    }
};
const float = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    test: /^[-+]?(?:[0-9][0-9_]*)?\.[0-9_]*$/,
    resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str.replace(/_/g, '')));
        const dot = str.indexOf('.');
        if (dot !== -1) {
            const f = str.substring(dot + 1).replace(/_/g, '');
            if (f[f.length - 1] === '0')
                node.minFractionDigits = f.length;
        }
        return node;
    },
    stringify: stringifyNumber.stringifyNumber
};

exports.float = float;
exports.floatExp = floatExp;
exports.floatNaN = floatNaN;


/***/ }),

/***/ 873:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

const intIdentify = (value) => typeof value === 'bigint' || Number.isInteger(value);
function intResolve(str, offset, radix, { intAsBigInt }) {
    const sign = str[0];
    if (sign === '-' || sign === '+')
        offset += 1;
    str = str.substring(offset).replace(/_/g, '');
    if (intAsBigInt) {
        switch (radix) {
            case 2:
                str = `0b${str}`;
                break;
            case 8:
                str = `0o${str}`;
                break;
            case 16:
                str = `0x${str}`;
                break;
        }
        const n = BigInt(str);
        return sign === '-' ? BigInt(-1) * n : n;
    }
    const n = parseInt(str, radix);
    return sign === '-' ? -1 * n : n;
}
function intStringify(node, radix, prefix) {
    const { value } = node;
    if (intIdentify(value)) {
        const str = value.toString(radix);
        return value < 0 ? '-' + prefix + str.substr(1) : prefix + str;
    }
    return stringifyNumber.stringifyNumber(node);
}
const intBin = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'BIN',
    test: /^[-+]?0b[0-1_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 2, opt),
    stringify: node => intStringify(node, 2, '0b')
};
const intOct = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'OCT',
    test: /^[-+]?0[0-7_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 1, 8, opt),
    stringify: node => intStringify(node, 8, '0')
};
const int = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    test: /^[-+]?[0-9][0-9_]*$/,
    resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
    stringify: stringifyNumber.stringifyNumber
};
const intHex = {
    identify: intIdentify,
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'HEX',
    test: /^[-+]?0x[0-9a-fA-F_]+$/,
    resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
    stringify: node => intStringify(node, 16, '0x')
};

exports.int = int;
exports.intBin = intBin;
exports.intHex = intHex;
exports.intOct = intOct;


/***/ }),

/***/ 452:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);

// If the value associated with a merge key is a single mapping node, each of
// its key/value pairs is inserted into the current mapping, unless the key
// already exists in it. If the value associated with the merge key is a
// sequence, then this sequence is expected to contain mapping nodes and each
// of these nodes is merged in turn according to its order in the sequence.
// Keys in mapping nodes earlier in the sequence override keys specified in
// later mapping nodes. -- http://yaml.org/type/merge.html
const MERGE_KEY = '<<';
const merge = {
    identify: value => value === MERGE_KEY ||
        (typeof value === 'symbol' && value.description === MERGE_KEY),
    default: 'key',
    tag: 'tag:yaml.org,2002:merge',
    test: /^<<$/,
    resolve: () => Object.assign(new Scalar.Scalar(Symbol(MERGE_KEY)), {
        addToJSMap: addMergeToJSMap
    }),
    stringify: () => MERGE_KEY
};
const isMergeKey = (ctx, key) => (merge.identify(key) ||
    (identity.isScalar(key) &&
        (!key.type || key.type === Scalar.Scalar.PLAIN) &&
        merge.identify(key.value))) &&
    ctx?.doc.schema.tags.some(tag => tag.tag === merge.tag && tag.default);
function addMergeToJSMap(ctx, map, value) {
    const source = resolveAliasValue(ctx, value);
    if (identity.isSeq(source))
        for (const it of source.items)
            mergeValue(ctx, map, it);
    else if (Array.isArray(source))
        for (const it of source)
            mergeValue(ctx, map, it);
    else
        mergeValue(ctx, map, source);
}
function mergeValue(ctx, map, value) {
    const source = resolveAliasValue(ctx, value);
    if (!identity.isMap(source))
        throw new Error('Merge sources must be maps or map aliases');
    const srcMap = source.toJSON(null, ctx, Map);
    for (const [key, value] of srcMap) {
        if (map instanceof Map) {
            if (!map.has(key))
                map.set(key, value);
        }
        else if (map instanceof Set) {
            map.add(key);
        }
        else if (!Object.prototype.hasOwnProperty.call(map, key)) {
            Object.defineProperty(map, key, {
                value,
                writable: true,
                enumerable: true,
                configurable: true
            });
        }
    }
    return map;
}
function resolveAliasValue(ctx, value) {
    return ctx && identity.isAlias(value) ? value.resolve(ctx.doc, ctx) : value;
}

exports.addMergeToJSMap = addMergeToJSMap;
exports.isMergeKey = isMergeKey;
exports.merge = merge;


/***/ }),

/***/ 303:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var toJS = __nccwpck_require__(4043);
var YAMLMap = __nccwpck_require__(4454);
var YAMLSeq = __nccwpck_require__(2223);
var pairs = __nccwpck_require__(8385);

class YAMLOMap extends YAMLSeq.YAMLSeq {
    constructor() {
        super();
        this.add = YAMLMap.YAMLMap.prototype.add.bind(this);
        this.delete = YAMLMap.YAMLMap.prototype.delete.bind(this);
        this.get = YAMLMap.YAMLMap.prototype.get.bind(this);
        this.has = YAMLMap.YAMLMap.prototype.has.bind(this);
        this.set = YAMLMap.YAMLMap.prototype.set.bind(this);
        this.tag = YAMLOMap.tag;
    }
    /**
     * If `ctx` is given, the return type is actually `Map<unknown, unknown>`,
     * but TypeScript won't allow widening the signature of a child method.
     */
    toJSON(_, ctx) {
        if (!ctx)
            return super.toJSON(_);
        const map = new Map();
        if (ctx?.onCreate)
            ctx.onCreate(map);
        for (const pair of this.items) {
            let key, value;
            if (identity.isPair(pair)) {
                key = toJS.toJS(pair.key, '', ctx);
                value = toJS.toJS(pair.value, key, ctx);
            }
            else {
                key = toJS.toJS(pair, '', ctx);
            }
            if (map.has(key))
                throw new Error('Ordered maps must not include duplicate keys');
            map.set(key, value);
        }
        return map;
    }
    static from(schema, iterable, ctx) {
        const pairs$1 = pairs.createPairs(schema, iterable, ctx);
        const omap = new this();
        omap.items = pairs$1.items;
        return omap;
    }
}
YAMLOMap.tag = 'tag:yaml.org,2002:omap';
const omap = {
    collection: 'seq',
    identify: value => value instanceof Map,
    nodeClass: YAMLOMap,
    default: false,
    tag: 'tag:yaml.org,2002:omap',
    resolve(seq, onError) {
        const pairs$1 = pairs.resolvePairs(seq, onError);
        const seenKeys = [];
        for (const { key } of pairs$1.items) {
            if (identity.isScalar(key)) {
                if (seenKeys.includes(key.value)) {
                    onError(`Ordered maps must not include duplicate keys: ${key.value}`);
                }
                else {
                    seenKeys.push(key.value);
                }
            }
        }
        return Object.assign(new YAMLOMap(), pairs$1);
    },
    createNode: (schema, iterable, ctx) => YAMLOMap.from(schema, iterable, ctx)
};

exports.YAMLOMap = YAMLOMap;
exports.omap = omap;


/***/ }),

/***/ 8385:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var Scalar = __nccwpck_require__(3301);
var YAMLSeq = __nccwpck_require__(2223);

function resolvePairs(seq, onError) {
    if (identity.isSeq(seq)) {
        for (let i = 0; i < seq.items.length; ++i) {
            let item = seq.items[i];
            if (identity.isPair(item))
                continue;
            else if (identity.isMap(item)) {
                if (item.items.length > 1)
                    onError('Each pair must have its own sequence indicator');
                const pair = item.items[0] || new Pair.Pair(new Scalar.Scalar(null));
                if (item.commentBefore)
                    pair.key.commentBefore = pair.key.commentBefore
                        ? `${item.commentBefore}\n${pair.key.commentBefore}`
                        : item.commentBefore;
                if (item.comment) {
                    const cn = pair.value ?? pair.key;
                    cn.comment = cn.comment
                        ? `${item.comment}\n${cn.comment}`
                        : item.comment;
                }
                item = pair;
            }
            seq.items[i] = identity.isPair(item) ? item : new Pair.Pair(item);
        }
    }
    else
        onError('Expected a sequence for this tag');
    return seq;
}
function createPairs(schema, iterable, ctx) {
    const { replacer } = ctx;
    const pairs = new YAMLSeq.YAMLSeq(schema);
    pairs.tag = 'tag:yaml.org,2002:pairs';
    let i = 0;
    if (iterable && Symbol.iterator in Object(iterable))
        for (let it of iterable) {
            if (typeof replacer === 'function')
                it = replacer.call(iterable, String(i++), it);
            let key, value;
            if (Array.isArray(it)) {
                if (it.length === 2) {
                    key = it[0];
                    value = it[1];
                }
                else
                    throw new TypeError(`Expected [key, value] tuple: ${it}`);
            }
            else if (it && it instanceof Object) {
                const keys = Object.keys(it);
                if (keys.length === 1) {
                    key = keys[0];
                    value = it[key];
                }
                else {
                    throw new TypeError(`Expected tuple with one key, not ${keys.length} keys`);
                }
            }
            else {
                key = it;
            }
            pairs.items.push(Pair.createPair(key, value, ctx));
        }
    return pairs;
}
const pairs = {
    collection: 'seq',
    default: false,
    tag: 'tag:yaml.org,2002:pairs',
    resolve: resolvePairs,
    createNode: createPairs
};

exports.createPairs = createPairs;
exports.pairs = pairs;
exports.resolvePairs = resolvePairs;


/***/ }),

/***/ 5913:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var map = __nccwpck_require__(7451);
var _null = __nccwpck_require__(3632);
var seq = __nccwpck_require__(1706);
var string = __nccwpck_require__(6464);
var binary = __nccwpck_require__(6083);
var bool = __nccwpck_require__(8398);
var float = __nccwpck_require__(5782);
var int = __nccwpck_require__(873);
var merge = __nccwpck_require__(452);
var omap = __nccwpck_require__(303);
var pairs = __nccwpck_require__(8385);
var set = __nccwpck_require__(1528);
var timestamp = __nccwpck_require__(6752);

const schema = [
    map.map,
    seq.seq,
    string.string,
    _null.nullTag,
    bool.trueTag,
    bool.falseTag,
    int.intBin,
    int.intOct,
    int.int,
    int.intHex,
    float.floatNaN,
    float.floatExp,
    float.float,
    binary.binary,
    merge.merge,
    omap.omap,
    pairs.pairs,
    set.set,
    timestamp.intTime,
    timestamp.floatTime,
    timestamp.timestamp
];

exports.schema = schema;


/***/ }),

/***/ 1528:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Pair = __nccwpck_require__(7165);
var YAMLMap = __nccwpck_require__(4454);

class YAMLSet extends YAMLMap.YAMLMap {
    constructor(schema) {
        super(schema);
        this.tag = YAMLSet.tag;
    }
    add(key) {
        let pair;
        if (identity.isPair(key))
            pair = key;
        else if (key &&
            typeof key === 'object' &&
            'key' in key &&
            'value' in key &&
            key.value === null)
            pair = new Pair.Pair(key.key, null);
        else
            pair = new Pair.Pair(key, null);
        const prev = YAMLMap.findPair(this.items, pair.key);
        if (!prev)
            this.items.push(pair);
    }
    /**
     * If `keepPair` is `true`, returns the Pair matching `key`.
     * Otherwise, returns the value of that Pair's key.
     */
    get(key, keepPair) {
        const pair = YAMLMap.findPair(this.items, key);
        return !keepPair && identity.isPair(pair)
            ? identity.isScalar(pair.key)
                ? pair.key.value
                : pair.key
            : pair;
    }
    set(key, value) {
        if (typeof value !== 'boolean')
            throw new Error(`Expected boolean value for set(key, value) in a YAML set, not ${typeof value}`);
        const prev = YAMLMap.findPair(this.items, key);
        if (prev && !value) {
            this.items.splice(this.items.indexOf(prev), 1);
        }
        else if (!prev && value) {
            this.items.push(new Pair.Pair(key));
        }
    }
    toJSON(_, ctx) {
        return super.toJSON(_, ctx, Set);
    }
    toString(ctx, onComment, onChompKeep) {
        if (!ctx)
            return JSON.stringify(this);
        if (this.hasAllNullValues(true))
            return super.toString(Object.assign({}, ctx, { allNullValues: true }), onComment, onChompKeep);
        else
            throw new Error('Set items must all have null values');
    }
    static from(schema, iterable, ctx) {
        const { replacer } = ctx;
        const set = new this(schema);
        if (iterable && Symbol.iterator in Object(iterable))
            for (let value of iterable) {
                if (typeof replacer === 'function')
                    value = replacer.call(iterable, value, value);
                set.items.push(Pair.createPair(value, null, ctx));
            }
        return set;
    }
}
YAMLSet.tag = 'tag:yaml.org,2002:set';
const set = {
    collection: 'map',
    identify: value => value instanceof Set,
    nodeClass: YAMLSet,
    default: false,
    tag: 'tag:yaml.org,2002:set',
    createNode: (schema, iterable, ctx) => YAMLSet.from(schema, iterable, ctx),
    resolve(map, onError) {
        if (identity.isMap(map)) {
            if (map.hasAllNullValues(true))
                return Object.assign(new YAMLSet(), map);
            else
                onError('Set items must all have null values');
        }
        else
            onError('Expected a mapping for this tag');
        return map;
    }
};

exports.YAMLSet = YAMLSet;
exports.set = set;


/***/ }),

/***/ 6752:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var stringifyNumber = __nccwpck_require__(8689);

/** Internal types handle bigint as number, because TS can't figure it out. */
function parseSexagesimal(str, asBigInt) {
    const sign = str[0];
    const parts = sign === '-' || sign === '+' ? str.substring(1) : str;
    const num = (n) => asBigInt ? BigInt(n) : Number(n);
    const res = parts
        .replace(/_/g, '')
        .split(':')
        .reduce((res, p) => res * num(60) + num(p), num(0));
    return (sign === '-' ? num(-1) * res : res);
}
/**
 * hhhh:mm:ss.sss
 *
 * Internal types handle bigint as number, because TS can't figure it out.
 */
function stringifySexagesimal(node) {
    let { value } = node;
    let num = (n) => n;
    if (typeof value === 'bigint')
        num = n => BigInt(n);
    else if (isNaN(value) || !isFinite(value))
        return stringifyNumber.stringifyNumber(node);
    let sign = '';
    if (value < 0) {
        sign = '-';
        value *= num(-1);
    }
    const _60 = num(60);
    const parts = [value % _60]; // seconds, including ms
    if (value < 60) {
        parts.unshift(0); // at least one : is required
    }
    else {
        value = (value - parts[0]) / _60;
        parts.unshift(value % _60); // minutes
        if (value >= 60) {
            value = (value - parts[0]) / _60;
            parts.unshift(value); // hours
        }
    }
    return (sign +
        parts
            .map(n => String(n).padStart(2, '0'))
            .join(':')
            .replace(/000000\d*$/, '') // % 60 may introduce error
    );
}
const intTime = {
    identify: value => typeof value === 'bigint' || Number.isInteger(value),
    default: true,
    tag: 'tag:yaml.org,2002:int',
    format: 'TIME',
    test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+$/,
    resolve: (str, _onError, { intAsBigInt }) => parseSexagesimal(str, intAsBigInt),
    stringify: stringifySexagesimal
};
const floatTime = {
    identify: value => typeof value === 'number',
    default: true,
    tag: 'tag:yaml.org,2002:float',
    format: 'TIME',
    test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+\.[0-9_]*$/,
    resolve: str => parseSexagesimal(str, false),
    stringify: stringifySexagesimal
};
const timestamp = {
    identify: value => value instanceof Date,
    default: true,
    tag: 'tag:yaml.org,2002:timestamp',
    // If the time zone is omitted, the timestamp is assumed to be specified in UTC. The time part
    // may be omitted altogether, resulting in a date format. In such a case, the time part is
    // assumed to be 00:00:00Z (start of day, UTC).
    test: RegExp('^([0-9]{4})-([0-9]{1,2})-([0-9]{1,2})' + // YYYY-Mm-Dd
        '(?:' + // time is optional
        '(?:t|T|[ \\t]+)' + // t | T | whitespace
        '([0-9]{1,2}):([0-9]{1,2}):([0-9]{1,2}(\\.[0-9]+)?)' + // Hh:Mm:Ss(.ss)?
        '(?:[ \\t]*(Z|[-+][012]?[0-9](?::[0-9]{2})?))?' + // Z | +5 | -03:30
        ')?$'),
    resolve(str) {
        const match = str.match(timestamp.test);
        if (!match)
            throw new Error('!!timestamp expects a date, starting with yyyy-mm-dd');
        const [, year, month, day, hour, minute, second] = match.map(Number);
        const millisec = match[7] ? Number((match[7] + '00').substr(1, 3)) : 0;
        let date = Date.UTC(year, month - 1, day, hour || 0, minute || 0, second || 0, millisec);
        const tz = match[8];
        if (tz && tz !== 'Z') {
            let d = parseSexagesimal(tz, false);
            if (Math.abs(d) < 30)
                d *= 60;
            date -= 60000 * d;
        }
        return new Date(date);
    },
    stringify: ({ value }) => value?.toISOString().replace(/(T00:00:00)?\.000Z$/, '') ?? ''
};

exports.floatTime = floatTime;
exports.intTime = intTime;
exports.timestamp = timestamp;


/***/ }),

/***/ 4475:
/***/ ((__unused_webpack_module, exports) => {



const FOLD_FLOW = 'flow';
const FOLD_BLOCK = 'block';
const FOLD_QUOTED = 'quoted';
/**
 * Tries to keep input at up to `lineWidth` characters, splitting only on spaces
 * not followed by newlines or spaces unless `mode` is `'quoted'`. Lines are
 * terminated with `\n` and started with `indent`.
 */
function foldFlowLines(text, indent, mode = 'flow', { indentAtStart, lineWidth = 80, minContentWidth = 20, onFold, onOverflow } = {}) {
    if (!lineWidth || lineWidth < 0)
        return text;
    if (lineWidth < minContentWidth)
        minContentWidth = 0;
    const endStep = Math.max(1 + minContentWidth, 1 + lineWidth - indent.length);
    if (text.length <= endStep)
        return text;
    const folds = [];
    const escapedFolds = {};
    let end = lineWidth - indent.length;
    if (typeof indentAtStart === 'number') {
        if (indentAtStart > lineWidth - Math.max(2, minContentWidth))
            folds.push(0);
        else
            end = lineWidth - indentAtStart;
    }
    let split = undefined;
    let prev = undefined;
    let overflow = false;
    let i = -1;
    let escStart = -1;
    let escEnd = -1;
    if (mode === FOLD_BLOCK) {
        i = consumeMoreIndentedLines(text, i, indent.length);
        if (i !== -1)
            end = i + endStep;
    }
    for (let ch; (ch = text[(i += 1)]);) {
        if (mode === FOLD_QUOTED && ch === '\\') {
            escStart = i;
            switch (text[i + 1]) {
                case 'x':
                    i += 3;
                    break;
                case 'u':
                    i += 5;
                    break;
                case 'U':
                    i += 9;
                    break;
                default:
                    i += 1;
            }
            escEnd = i;
        }
        if (ch === '\n') {
            if (mode === FOLD_BLOCK)
                i = consumeMoreIndentedLines(text, i, indent.length);
            end = i + indent.length + endStep;
            split = undefined;
        }
        else {
            if (ch === ' ' &&
                prev &&
                prev !== ' ' &&
                prev !== '\n' &&
                prev !== '\t') {
                // space surrounded by non-space can be replaced with newline + indent
                const next = text[i + 1];
                if (next && next !== ' ' && next !== '\n' && next !== '\t')
                    split = i;
            }
            if (i >= end) {
                if (split) {
                    folds.push(split);
                    end = split + endStep;
                    split = undefined;
                }
                else if (mode === FOLD_QUOTED) {
                    // white-space collected at end may stretch past lineWidth
                    while (prev === ' ' || prev === '\t') {
                        prev = ch;
                        ch = text[(i += 1)];
                        overflow = true;
                    }
                    // Account for newline escape, but don't break preceding escape
                    const j = i > escEnd + 1 ? i - 2 : escStart - 1;
                    // Bail out if lineWidth & minContentWidth are shorter than an escape string
                    if (escapedFolds[j])
                        return text;
                    folds.push(j);
                    escapedFolds[j] = true;
                    end = j + endStep;
                    split = undefined;
                }
                else {
                    overflow = true;
                }
            }
        }
        prev = ch;
    }
    if (overflow && onOverflow)
        onOverflow();
    if (folds.length === 0)
        return text;
    if (onFold)
        onFold();
    let res = text.slice(0, folds[0]);
    for (let i = 0; i < folds.length; ++i) {
        const fold = folds[i];
        const end = folds[i + 1] || text.length;
        if (fold === 0)
            res = `\n${indent}${text.slice(0, end)}`;
        else {
            if (mode === FOLD_QUOTED && escapedFolds[fold])
                res += `${text[fold]}\\`;
            res += `\n${indent}${text.slice(fold + 1, end)}`;
        }
    }
    return res;
}
/**
 * Presumes `i + 1` is at the start of a line
 * @returns index of last newline in more-indented block
 */
function consumeMoreIndentedLines(text, i, indent) {
    let end = i;
    let start = i + 1;
    let ch = text[start];
    while (ch === ' ' || ch === '\t') {
        if (i < start + indent) {
            ch = text[++i];
        }
        else {
            do {
                ch = text[++i];
            } while (ch && ch !== '\n');
            end = i;
            start = i + 1;
            ch = text[start];
        }
    }
    return end;
}

exports.FOLD_BLOCK = FOLD_BLOCK;
exports.FOLD_FLOW = FOLD_FLOW;
exports.FOLD_QUOTED = FOLD_QUOTED;
exports.foldFlowLines = foldFlowLines;


/***/ }),

/***/ 2148:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var anchors = __nccwpck_require__(1596);
var identity = __nccwpck_require__(1127);
var stringifyComment = __nccwpck_require__(9799);
var stringifyString = __nccwpck_require__(3069);

function createStringifyContext(doc, options) {
    const opt = Object.assign({
        blockQuote: true,
        commentString: stringifyComment.stringifyComment,
        defaultKeyType: null,
        defaultStringType: 'PLAIN',
        directives: null,
        doubleQuotedAsJSON: false,
        doubleQuotedMinMultiLineLength: 40,
        falseStr: 'false',
        flowCollectionPadding: true,
        indentSeq: true,
        lineWidth: 80,
        minContentWidth: 20,
        nullStr: 'null',
        simpleKeys: false,
        singleQuote: null,
        trailingComma: false,
        trueStr: 'true',
        verifyAliasOrder: true
    }, doc.schema.toStringOptions, options);
    let inFlow;
    switch (opt.collectionStyle) {
        case 'block':
            inFlow = false;
            break;
        case 'flow':
            inFlow = true;
            break;
        default:
            inFlow = null;
    }
    return {
        anchors: new Set(),
        doc,
        flowCollectionPadding: opt.flowCollectionPadding ? ' ' : '',
        indent: '',
        indentStep: typeof opt.indent === 'number' ? ' '.repeat(opt.indent) : '  ',
        inFlow,
        options: opt
    };
}
function getTagObject(tags, item) {
    if (item.tag) {
        const match = tags.filter(t => t.tag === item.tag);
        if (match.length > 0)
            return match.find(t => t.format === item.format) ?? match[0];
    }
    let tagObj = undefined;
    let obj;
    if (identity.isScalar(item)) {
        obj = item.value;
        let match = tags.filter(t => t.identify?.(obj));
        if (match.length > 1) {
            const testMatch = match.filter(t => t.test);
            if (testMatch.length > 0)
                match = testMatch;
        }
        tagObj =
            match.find(t => t.format === item.format) ?? match.find(t => !t.format);
    }
    else {
        obj = item;
        tagObj = tags.find(t => t.nodeClass && obj instanceof t.nodeClass);
    }
    if (!tagObj) {
        const name = obj?.constructor?.name ?? (obj === null ? 'null' : typeof obj);
        throw new Error(`Tag not resolved for ${name} value`);
    }
    return tagObj;
}
// needs to be called before value stringifier to allow for circular anchor refs
function stringifyProps(node, tagObj, { anchors: anchors$1, doc }) {
    if (!doc.directives)
        return '';
    const props = [];
    const anchor = (identity.isScalar(node) || identity.isCollection(node)) && node.anchor;
    if (anchor && anchors.anchorIsValid(anchor)) {
        anchors$1.add(anchor);
        props.push(`&${anchor}`);
    }
    const tag = node.tag ?? (tagObj.default ? null : tagObj.tag);
    if (tag)
        props.push(doc.directives.tagString(tag));
    return props.join(' ');
}
function stringify(item, ctx, onComment, onChompKeep) {
    if (identity.isPair(item))
        return item.toString(ctx, onComment, onChompKeep);
    if (identity.isAlias(item)) {
        if (ctx.doc.directives)
            return item.toString(ctx);
        if (ctx.resolvedAliases?.has(item)) {
            throw new TypeError(`Cannot stringify circular structure without alias nodes`);
        }
        else {
            if (ctx.resolvedAliases)
                ctx.resolvedAliases.add(item);
            else
                ctx.resolvedAliases = new Set([item]);
            item = item.resolve(ctx.doc);
        }
    }
    let tagObj = undefined;
    const node = identity.isNode(item)
        ? item
        : ctx.doc.createNode(item, { onTagObj: o => (tagObj = o) });
    tagObj ?? (tagObj = getTagObject(ctx.doc.schema.tags, node));
    const props = stringifyProps(node, tagObj, ctx);
    if (props.length > 0)
        ctx.indentAtStart = (ctx.indentAtStart ?? 0) + props.length + 1;
    const str = typeof tagObj.stringify === 'function'
        ? tagObj.stringify(node, ctx, onComment, onChompKeep)
        : identity.isScalar(node)
            ? stringifyString.stringifyString(node, ctx, onComment, onChompKeep)
            : node.toString(ctx, onComment, onChompKeep);
    if (!props)
        return str;
    return identity.isScalar(node) || str[0] === '{' || str[0] === '['
        ? `${props} ${str}`
        : `${props}\n${ctx.indent}${str}`;
}

exports.createStringifyContext = createStringifyContext;
exports.stringify = stringify;


/***/ }),

/***/ 1212:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyCollection(collection, ctx, options) {
    const flow = ctx.inFlow ?? collection.flow;
    const stringify = flow ? stringifyFlowCollection : stringifyBlockCollection;
    return stringify(collection, ctx, options);
}
function stringifyBlockCollection({ comment, items }, ctx, { blockItemPrefix, flowChars, itemIndent, onChompKeep, onComment }) {
    const { indent, options: { commentString } } = ctx;
    const itemCtx = Object.assign({}, ctx, { indent: itemIndent, type: null });
    let chompKeep = false; // flag for the preceding node's status
    const lines = [];
    for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
            if (!chompKeep && item.spaceBefore)
                lines.push('');
            addCommentBefore(ctx, lines, item.commentBefore, chompKeep);
            if (item.comment)
                comment = item.comment;
        }
        else if (identity.isPair(item)) {
            const ik = identity.isNode(item.key) ? item.key : null;
            if (ik) {
                if (!chompKeep && ik.spaceBefore)
                    lines.push('');
                addCommentBefore(ctx, lines, ik.commentBefore, chompKeep);
            }
        }
        chompKeep = false;
        let str = stringify.stringify(item, itemCtx, () => (comment = null), () => (chompKeep = true));
        if (comment)
            str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        if (chompKeep && comment)
            chompKeep = false;
        lines.push(blockItemPrefix + str);
    }
    let str;
    if (lines.length === 0) {
        str = flowChars.start + flowChars.end;
    }
    else {
        str = lines[0];
        for (let i = 1; i < lines.length; ++i) {
            const line = lines[i];
            str += line ? `\n${indent}${line}` : '\n';
        }
    }
    if (comment) {
        str += '\n' + stringifyComment.indentComment(commentString(comment), indent);
        if (onComment)
            onComment();
    }
    else if (chompKeep && onChompKeep)
        onChompKeep();
    return str;
}
function stringifyFlowCollection({ items }, ctx, { flowChars, itemIndent }) {
    const { indent, indentStep, flowCollectionPadding: fcPadding, options: { commentString } } = ctx;
    itemIndent += indentStep;
    const itemCtx = Object.assign({}, ctx, {
        indent: itemIndent,
        inFlow: true,
        type: null
    });
    let reqNewline = false;
    let linesAtValue = 0;
    const lines = [];
    for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
            if (item.spaceBefore)
                lines.push('');
            addCommentBefore(ctx, lines, item.commentBefore, false);
            if (item.comment)
                comment = item.comment;
        }
        else if (identity.isPair(item)) {
            const ik = identity.isNode(item.key) ? item.key : null;
            if (ik) {
                if (ik.spaceBefore)
                    lines.push('');
                addCommentBefore(ctx, lines, ik.commentBefore, false);
                if (ik.comment)
                    reqNewline = true;
            }
            const iv = identity.isNode(item.value) ? item.value : null;
            if (iv) {
                if (iv.comment)
                    comment = iv.comment;
                if (iv.commentBefore)
                    reqNewline = true;
            }
            else if (item.value == null && ik?.comment) {
                comment = ik.comment;
            }
        }
        if (comment)
            reqNewline = true;
        let str = stringify.stringify(item, itemCtx, () => (comment = null));
        reqNewline || (reqNewline = lines.length > linesAtValue || str.includes('\n'));
        if (i < items.length - 1) {
            str += ',';
        }
        else if (ctx.options.trailingComma) {
            if (ctx.options.lineWidth > 0) {
                reqNewline || (reqNewline = lines.reduce((sum, line) => sum + line.length + 2, 2) +
                    (str.length + 2) >
                    ctx.options.lineWidth);
            }
            if (reqNewline) {
                str += ',';
            }
        }
        if (comment)
            str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        lines.push(str);
        linesAtValue = lines.length;
    }
    const { start, end } = flowChars;
    if (lines.length === 0) {
        return start + end;
    }
    else {
        if (!reqNewline) {
            const len = lines.reduce((sum, line) => sum + line.length + 2, 2);
            reqNewline = ctx.options.lineWidth > 0 && len > ctx.options.lineWidth;
        }
        if (reqNewline) {
            let str = start;
            for (const line of lines)
                str += line ? `\n${indentStep}${indent}${line}` : '\n';
            return `${str}\n${indent}${end}`;
        }
        else {
            return `${start}${fcPadding}${lines.join(' ')}${fcPadding}${end}`;
        }
    }
}
function addCommentBefore({ indent, options: { commentString } }, lines, comment, chompKeep) {
    if (comment && chompKeep)
        comment = comment.replace(/^\n+/, '');
    if (comment) {
        const ic = stringifyComment.indentComment(commentString(comment), indent);
        lines.push(ic.trimStart()); // Avoid double indent on first line
    }
}

exports.stringifyCollection = stringifyCollection;


/***/ }),

/***/ 9799:
/***/ ((__unused_webpack_module, exports) => {



/**
 * Stringifies a comment.
 *
 * Empty comment lines are left empty,
 * lines consisting of a single space are replaced by `#`,
 * and all other lines are prefixed with a `#`.
 */
const stringifyComment = (str) => str.replace(/^(?!$)(?: $)?/gm, '#');
function indentComment(comment, indent) {
    if (/^\n+$/.test(comment))
        return comment.substring(1);
    return indent ? comment.replace(/^(?! *$)/gm, indent) : comment;
}
const lineComment = (str, indent, comment) => str.endsWith('\n')
    ? indentComment(comment, indent)
    : comment.includes('\n')
        ? '\n' + indentComment(comment, indent)
        : (str.endsWith(' ') ? '' : ' ') + comment;

exports.indentComment = indentComment;
exports.lineComment = lineComment;
exports.stringifyComment = stringifyComment;


/***/ }),

/***/ 9210:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyDocument(doc, options) {
    const lines = [];
    let hasDirectives = options.directives === true;
    if (options.directives !== false && doc.directives) {
        const dir = doc.directives.toString(doc);
        if (dir) {
            lines.push(dir);
            hasDirectives = true;
        }
        else if (doc.directives.docStart)
            hasDirectives = true;
    }
    if (hasDirectives)
        lines.push('---');
    const ctx = stringify.createStringifyContext(doc, options);
    const { commentString } = ctx.options;
    if (doc.commentBefore) {
        if (lines.length !== 1)
            lines.unshift('');
        const cs = commentString(doc.commentBefore);
        lines.unshift(stringifyComment.indentComment(cs, ''));
    }
    let chompKeep = false;
    let contentComment = null;
    if (doc.contents) {
        if (identity.isNode(doc.contents)) {
            if (doc.contents.spaceBefore && hasDirectives)
                lines.push('');
            if (doc.contents.commentBefore) {
                const cs = commentString(doc.contents.commentBefore);
                lines.push(stringifyComment.indentComment(cs, ''));
            }
            // top-level block scalars need to be indented if followed by a comment
            ctx.forceBlockIndent = !!doc.comment;
            contentComment = doc.contents.comment;
        }
        const onChompKeep = contentComment ? undefined : () => (chompKeep = true);
        let body = stringify.stringify(doc.contents, ctx, () => (contentComment = null), onChompKeep);
        if (contentComment)
            body += stringifyComment.lineComment(body, '', commentString(contentComment));
        if ((body[0] === '|' || body[0] === '>') &&
            lines[lines.length - 1] === '---') {
            // Top-level block scalars with a preceding doc marker ought to use the
            // same line for their header.
            lines[lines.length - 1] = `--- ${body}`;
        }
        else
            lines.push(body);
    }
    else {
        lines.push(stringify.stringify(doc.contents, ctx));
    }
    if (doc.directives?.docEnd) {
        if (doc.comment) {
            const cs = commentString(doc.comment);
            if (cs.includes('\n')) {
                lines.push('...');
                lines.push(stringifyComment.indentComment(cs, ''));
            }
            else {
                lines.push(`... ${cs}`);
            }
        }
        else {
            lines.push('...');
        }
    }
    else {
        let dc = doc.comment;
        if (dc && chompKeep)
            dc = dc.replace(/^\n+/, '');
        if (dc) {
            if ((!chompKeep || contentComment) && lines[lines.length - 1] !== '')
                lines.push('');
            lines.push(stringifyComment.indentComment(commentString(dc), ''));
        }
    }
    return lines.join('\n') + '\n';
}

exports.stringifyDocument = stringifyDocument;


/***/ }),

/***/ 8689:
/***/ ((__unused_webpack_module, exports) => {



function stringifyNumber({ format, minFractionDigits, tag, value }) {
    if (typeof value === 'bigint')
        return String(value);
    const num = typeof value === 'number' ? value : Number(value);
    if (!isFinite(num))
        return isNaN(num) ? '.nan' : num < 0 ? '-.inf' : '.inf';
    let n = Object.is(value, -0) ? '-0' : JSON.stringify(value);
    if (!format &&
        minFractionDigits &&
        (!tag || tag === 'tag:yaml.org,2002:float') &&
        /^-?\d/.test(n) &&
        !n.includes('e')) {
        let i = n.indexOf('.');
        if (i < 0) {
            i = n.length;
            n += '.';
        }
        let d = minFractionDigits - (n.length - i - 1);
        while (d-- > 0)
            n += '0';
    }
    return n;
}

exports.stringifyNumber = stringifyNumber;


/***/ }),

/***/ 9748:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);
var Scalar = __nccwpck_require__(3301);
var stringify = __nccwpck_require__(2148);
var stringifyComment = __nccwpck_require__(9799);

function stringifyPair({ key, value }, ctx, onComment, onChompKeep) {
    const { allNullValues, doc, indent, indentStep, options: { commentString, indentSeq, simpleKeys } } = ctx;
    let keyComment = (identity.isNode(key) && key.comment) || null;
    if (simpleKeys) {
        if (keyComment) {
            throw new Error('With simple keys, key nodes cannot have comments');
        }
        if (identity.isCollection(key) || (!identity.isNode(key) && typeof key === 'object')) {
            const msg = 'With simple keys, collection cannot be used as a key value';
            throw new Error(msg);
        }
    }
    let explicitKey = !simpleKeys &&
        (!key ||
            (keyComment && value == null && !ctx.inFlow) ||
            identity.isCollection(key) ||
            (identity.isScalar(key)
                ? key.type === Scalar.Scalar.BLOCK_FOLDED || key.type === Scalar.Scalar.BLOCK_LITERAL
                : typeof key === 'object'));
    ctx = Object.assign({}, ctx, {
        allNullValues: false,
        implicitKey: !explicitKey && (simpleKeys || !allNullValues),
        indent: indent + indentStep
    });
    let keyCommentDone = false;
    let chompKeep = false;
    let str = stringify.stringify(key, ctx, () => (keyCommentDone = true), () => (chompKeep = true));
    if (!explicitKey && !ctx.inFlow && str.length > 1024) {
        if (simpleKeys)
            throw new Error('With simple keys, single line scalar must not span more than 1024 characters');
        explicitKey = true;
    }
    if (ctx.inFlow) {
        if (allNullValues || value == null) {
            if (keyCommentDone && onComment)
                onComment();
            return str === '' ? '?' : explicitKey ? `? ${str}` : str;
        }
    }
    else if ((allNullValues && !simpleKeys) || (value == null && explicitKey)) {
        str = `? ${str}`;
        if (keyComment && !keyCommentDone) {
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        }
        else if (chompKeep && onChompKeep)
            onChompKeep();
        return str;
    }
    if (keyCommentDone)
        keyComment = null;
    if (explicitKey) {
        if (keyComment)
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        str = `? ${str}\n${indent}:`;
    }
    else {
        str = `${str}:`;
        if (keyComment)
            str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
    }
    let vsb, vcb, valueComment;
    if (identity.isNode(value)) {
        vsb = !!value.spaceBefore;
        vcb = value.commentBefore;
        valueComment = value.comment;
    }
    else {
        vsb = false;
        vcb = null;
        valueComment = null;
        if (value && typeof value === 'object')
            value = doc.createNode(value);
    }
    ctx.implicitKey = false;
    if (!explicitKey && !keyComment && identity.isScalar(value))
        ctx.indentAtStart = str.length + 1;
    chompKeep = false;
    if (!indentSeq &&
        indentStep.length >= 2 &&
        !ctx.inFlow &&
        !explicitKey &&
        identity.isSeq(value) &&
        !value.flow &&
        !value.tag &&
        !value.anchor) {
        // If indentSeq === false, consider '- ' as part of indentation where possible
        ctx.indent = ctx.indent.substring(2);
    }
    let valueCommentDone = false;
    const valueStr = stringify.stringify(value, ctx, () => (valueCommentDone = true), () => (chompKeep = true));
    let ws = ' ';
    if (keyComment || vsb || vcb) {
        ws = vsb ? '\n' : '';
        if (vcb) {
            const cs = commentString(vcb);
            ws += `\n${stringifyComment.indentComment(cs, ctx.indent)}`;
        }
        if (valueStr === '' && !ctx.inFlow) {
            if (ws === '\n' && valueComment)
                ws = '\n\n';
        }
        else {
            ws += `\n${ctx.indent}`;
        }
    }
    else if (!explicitKey && identity.isCollection(value)) {
        const vs0 = valueStr[0];
        const nl0 = valueStr.indexOf('\n');
        const hasNewline = nl0 !== -1;
        const flow = ctx.inFlow ?? value.flow ?? value.items.length === 0;
        if (hasNewline || !flow) {
            let hasPropsLine = false;
            if (hasNewline && (vs0 === '&' || vs0 === '!')) {
                let sp0 = valueStr.indexOf(' ');
                if (vs0 === '&' &&
                    sp0 !== -1 &&
                    sp0 < nl0 &&
                    valueStr[sp0 + 1] === '!') {
                    sp0 = valueStr.indexOf(' ', sp0 + 1);
                }
                if (sp0 === -1 || nl0 < sp0)
                    hasPropsLine = true;
            }
            if (!hasPropsLine)
                ws = `\n${ctx.indent}`;
        }
    }
    else if (valueStr === '' || valueStr[0] === '\n') {
        ws = '';
    }
    str += ws + valueStr;
    if (ctx.inFlow) {
        if (valueCommentDone && onComment)
            onComment();
    }
    else if (valueComment && !valueCommentDone) {
        str += stringifyComment.lineComment(str, ctx.indent, commentString(valueComment));
    }
    else if (chompKeep && onChompKeep) {
        onChompKeep();
    }
    return str;
}

exports.stringifyPair = stringifyPair;


/***/ }),

/***/ 3069:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var Scalar = __nccwpck_require__(3301);
var foldFlowLines = __nccwpck_require__(4475);

const getFoldOptions = (ctx, isBlock) => ({
    indentAtStart: isBlock ? ctx.indent.length : ctx.indentAtStart,
    lineWidth: ctx.options.lineWidth,
    minContentWidth: ctx.options.minContentWidth
});
// Also checks for lines starting with %, as parsing the output as YAML 1.1 will
// presume that's starting a new document.
const containsDocumentMarker = (str) => /^(%|---|\.\.\.)/m.test(str);
function lineLengthOverLimit(str, lineWidth, indentLength) {
    if (!lineWidth || lineWidth < 0)
        return false;
    const limit = lineWidth - indentLength;
    const strLen = str.length;
    if (strLen <= limit)
        return false;
    for (let i = 0, start = 0; i < strLen; ++i) {
        if (str[i] === '\n') {
            if (i - start > limit)
                return true;
            start = i + 1;
            if (strLen - start <= limit)
                return false;
        }
    }
    return true;
}
function doubleQuotedString(value, ctx) {
    const json = JSON.stringify(value);
    if (ctx.options.doubleQuotedAsJSON)
        return json;
    const { implicitKey } = ctx;
    const minMultiLineLength = ctx.options.doubleQuotedMinMultiLineLength;
    const indent = ctx.indent || (containsDocumentMarker(value) ? '  ' : '');
    let str = '';
    let start = 0;
    for (let i = 0, ch = json[i]; ch; ch = json[++i]) {
        if (ch === ' ' && json[i + 1] === '\\' && json[i + 2] === 'n') {
            // space before newline needs to be escaped to not be folded
            str += json.slice(start, i) + '\\ ';
            i += 1;
            start = i;
            ch = '\\';
        }
        if (ch === '\\')
            switch (json[i + 1]) {
                case 'u':
                    {
                        str += json.slice(start, i);
                        const code = json.substr(i + 2, 4);
                        switch (code) {
                            case '0000':
                                str += '\\0';
                                break;
                            case '0007':
                                str += '\\a';
                                break;
                            case '000b':
                                str += '\\v';
                                break;
                            case '001b':
                                str += '\\e';
                                break;
                            case '0085':
                                str += '\\N';
                                break;
                            case '00a0':
                                str += '\\_';
                                break;
                            case '2028':
                                str += '\\L';
                                break;
                            case '2029':
                                str += '\\P';
                                break;
                            default:
                                if (code.substr(0, 2) === '00')
                                    str += '\\x' + code.substr(2);
                                else
                                    str += json.substr(i, 6);
                        }
                        i += 5;
                        start = i + 1;
                    }
                    break;
                case 'n':
                    if (implicitKey ||
                        json[i + 2] === '"' ||
                        json.length < minMultiLineLength) {
                        i += 1;
                    }
                    else {
                        // folding will eat first newline
                        str += json.slice(start, i) + '\n\n';
                        while (json[i + 2] === '\\' &&
                            json[i + 3] === 'n' &&
                            json[i + 4] !== '"') {
                            str += '\n';
                            i += 2;
                        }
                        str += indent;
                        // space after newline needs to be escaped to not be folded
                        if (json[i + 2] === ' ')
                            str += '\\';
                        i += 1;
                        start = i + 1;
                    }
                    break;
                default:
                    i += 1;
            }
    }
    str = start ? str + json.slice(start) : json;
    return implicitKey
        ? str
        : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_QUOTED, getFoldOptions(ctx, false));
}
function singleQuotedString(value, ctx) {
    if (ctx.options.singleQuote === false ||
        (ctx.implicitKey && value.includes('\n')) ||
        /[ \t]\n|\n[ \t]/.test(value) // single quoted string can't have leading or trailing whitespace around newline
    )
        return doubleQuotedString(value, ctx);
    const indent = ctx.indent || (containsDocumentMarker(value) ? '  ' : '');
    const res = "'" + value.replace(/'/g, "''").replace(/\n+/g, `$&\n${indent}`) + "'";
    return ctx.implicitKey
        ? res
        : foldFlowLines.foldFlowLines(res, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
}
function quotedString(value, ctx) {
    const { singleQuote } = ctx.options;
    let qs;
    if (singleQuote === false)
        qs = doubleQuotedString;
    else {
        const hasDouble = value.includes('"');
        const hasSingle = value.includes("'");
        if (hasDouble && !hasSingle)
            qs = singleQuotedString;
        else if (hasSingle && !hasDouble)
            qs = doubleQuotedString;
        else
            qs = singleQuote ? singleQuotedString : doubleQuotedString;
    }
    return qs(value, ctx);
}
// The negative lookbehind avoids a polynomial search,
// but isn't supported yet on Safari: https://caniuse.com/js-regexp-lookbehind
let blockEndNewlines;
try {
    blockEndNewlines = new RegExp('(^|(?<!\n))\n+(?!\n|$)', 'g');
}
catch {
    blockEndNewlines = /\n+(?!\n|$)/g;
}
function blockString({ comment, type, value }, ctx, onComment, onChompKeep) {
    const { blockQuote, commentString, lineWidth } = ctx.options;
    // 1. Block can't end in whitespace unless the last line is non-empty.
    // 2. Strings consisting of only whitespace are best rendered explicitly.
    if (!blockQuote || /\n[\t ]+$/.test(value)) {
        return quotedString(value, ctx);
    }
    const indent = ctx.indent ||
        (ctx.forceBlockIndent || containsDocumentMarker(value) ? '  ' : '');
    const literal = blockQuote === 'literal'
        ? true
        : blockQuote === 'folded' || type === Scalar.Scalar.BLOCK_FOLDED
            ? false
            : type === Scalar.Scalar.BLOCK_LITERAL
                ? true
                : !lineLengthOverLimit(value, lineWidth, indent.length);
    if (!value)
        return literal ? '|\n' : '>\n';
    // determine chomping from whitespace at value end
    let chomp;
    let endStart;
    for (endStart = value.length; endStart > 0; --endStart) {
        const ch = value[endStart - 1];
        if (ch !== '\n' && ch !== '\t' && ch !== ' ')
            break;
    }
    let end = value.substring(endStart);
    const endNlPos = end.indexOf('\n');
    if (endNlPos === -1) {
        chomp = '-'; // strip
    }
    else if (value === end || endNlPos !== end.length - 1) {
        chomp = '+'; // keep
        if (onChompKeep)
            onChompKeep();
    }
    else {
        chomp = ''; // clip
    }
    if (end) {
        value = value.slice(0, -end.length);
        if (end[end.length - 1] === '\n')
            end = end.slice(0, -1);
        end = end.replace(blockEndNewlines, `$&${indent}`);
    }
    // determine indent indicator from whitespace at value start
    let startWithSpace = false;
    let startEnd;
    let startNlPos = -1;
    for (startEnd = 0; startEnd < value.length; ++startEnd) {
        const ch = value[startEnd];
        if (ch === ' ')
            startWithSpace = true;
        else if (ch === '\n')
            startNlPos = startEnd;
        else
            break;
    }
    let start = value.substring(0, startNlPos < startEnd ? startNlPos + 1 : startEnd);
    if (start) {
        value = value.substring(start.length);
        start = start.replace(/\n+/g, `$&${indent}`);
    }
    const indentSize = indent ? '2' : '1'; // root is at -1
    // Leading | or > is added later
    let header = (startWithSpace ? indentSize : '') + chomp;
    if (comment) {
        header += ' ' + commentString(comment.replace(/ ?[\r\n]+/g, ' '));
        if (onComment)
            onComment();
    }
    if (!literal) {
        const foldedValue = value
            .replace(/\n+/g, '\n$&')
            .replace(/(?:^|\n)([\t ].*)(?:([\n\t ]*)\n(?![\n\t ]))?/g, '$1$2') // more-indented lines aren't folded
            //                ^ more-ind. ^ empty     ^ capture next empty lines only at end of indent
            .replace(/\n+/g, `$&${indent}`);
        let literalFallback = false;
        const foldOptions = getFoldOptions(ctx, true);
        if (blockQuote !== 'folded' && type !== Scalar.Scalar.BLOCK_FOLDED) {
            foldOptions.onOverflow = () => {
                literalFallback = true;
            };
        }
        const body = foldFlowLines.foldFlowLines(`${start}${foldedValue}${end}`, indent, foldFlowLines.FOLD_BLOCK, foldOptions);
        if (!literalFallback)
            return `>${header}\n${indent}${body}`;
    }
    value = value.replace(/\n+/g, `$&${indent}`);
    return `|${header}\n${indent}${start}${value}${end}`;
}
function plainString(item, ctx, onComment, onChompKeep) {
    const { type, value } = item;
    const { actualString, implicitKey, indent, indentStep, inFlow } = ctx;
    if ((implicitKey && value.includes('\n')) ||
        (inFlow && /[[\]{},]/.test(value))) {
        return quotedString(value, ctx);
    }
    if (/^[\n\t ,[\]{}#&*!|>'"%@`]|^[?-]$|^[?-][ \t]|[\n:][ \t]|[ \t]\n|[\n\t ]#|[\n\t :]$/.test(value)) {
        // not allowed:
        // - '-' or '?'
        // - start with an indicator character (except [?:-]) or /[?-] /
        // - '\n ', ': ' or ' \n' anywhere
        // - '#' not preceded by a non-space char
        // - end with ' ' or ':'
        return implicitKey || inFlow || !value.includes('\n')
            ? quotedString(value, ctx)
            : blockString(item, ctx, onComment, onChompKeep);
    }
    if (!implicitKey &&
        !inFlow &&
        type !== Scalar.Scalar.PLAIN &&
        value.includes('\n')) {
        // Where allowed & type not set explicitly, prefer block style for multiline strings
        return blockString(item, ctx, onComment, onChompKeep);
    }
    if (containsDocumentMarker(value)) {
        if (indent === '') {
            ctx.forceBlockIndent = true;
            return blockString(item, ctx, onComment, onChompKeep);
        }
        else if (implicitKey && indent === indentStep) {
            return quotedString(value, ctx);
        }
    }
    const str = value.replace(/\n+/g, `$&\n${indent}`);
    // Verify that output will be parsed as a string, as e.g. plain numbers and
    // booleans get parsed with those types in v1.2 (e.g. '42', 'true' & '0.9e-3'),
    // and others in v1.1.
    if (actualString) {
        const test = (tag) => tag.default && tag.tag !== 'tag:yaml.org,2002:str' && tag.test?.test(str);
        const { compat, tags } = ctx.doc.schema;
        if (tags.some(test) || compat?.some(test))
            return quotedString(value, ctx);
    }
    return implicitKey
        ? str
        : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
}
function stringifyString(item, ctx, onComment, onChompKeep) {
    const { implicitKey, inFlow } = ctx;
    const ss = typeof item.value === 'string'
        ? item
        : Object.assign({}, item, { value: String(item.value) });
    let { type } = item;
    if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
        // force double quotes on control characters & unpaired surrogates
        if (/[\x00-\x08\x0b-\x1f\x7f-\x9f\u{D800}-\u{DFFF}]/u.test(ss.value))
            type = Scalar.Scalar.QUOTE_DOUBLE;
    }
    const _stringify = (_type) => {
        switch (_type) {
            case Scalar.Scalar.BLOCK_FOLDED:
            case Scalar.Scalar.BLOCK_LITERAL:
                return implicitKey || inFlow
                    ? quotedString(ss.value, ctx) // blocks are not valid inside flow containers
                    : blockString(ss, ctx, onComment, onChompKeep);
            case Scalar.Scalar.QUOTE_DOUBLE:
                return doubleQuotedString(ss.value, ctx);
            case Scalar.Scalar.QUOTE_SINGLE:
                return singleQuotedString(ss.value, ctx);
            case Scalar.Scalar.PLAIN:
                return plainString(ss, ctx, onComment, onChompKeep);
            default:
                return null;
        }
    };
    let res = _stringify(type);
    if (res === null) {
        const { defaultKeyType, defaultStringType } = ctx.options;
        const t = (implicitKey && defaultKeyType) || defaultStringType;
        res = _stringify(t);
        if (res === null)
            throw new Error(`Unsupported default string type ${t}`);
    }
    return res;
}

exports.stringifyString = stringifyString;


/***/ }),

/***/ 204:
/***/ ((__unused_webpack_module, exports, __nccwpck_require__) => {



var identity = __nccwpck_require__(1127);

const BREAK = Symbol('break visit');
const SKIP = Symbol('skip children');
const REMOVE = Symbol('remove node');
/**
 * Apply a visitor to an AST node or document.
 *
 * Walks through the tree (depth-first) starting from `node`, calling a
 * `visitor` function with three arguments:
 *   - `key`: For sequence values and map `Pair`, the node's index in the
 *     collection. Within a `Pair`, `'key'` or `'value'`, correspondingly.
 *     `null` for the root node.
 *   - `node`: The current node.
 *   - `path`: The ancestry of the current node.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this node, continue with next
 *     sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current node, then continue with the next one
 *   - `Node`: Replace the current node, then continue by visiting it
 *   - `number`: While iterating the items of a sequence or map, set the index
 *     of the next step. This is useful especially if the index of the current
 *     node has changed.
 *
 * If `visitor` is a single function, it will be called with all values
 * encountered in the tree, including e.g. `null` values. Alternatively,
 * separate visitor functions may be defined for each `Map`, `Pair`, `Seq`,
 * `Alias` and `Scalar` node. To define the same visitor function for more than
 * one node type, use the `Collection` (map and seq), `Value` (map, seq & scalar)
 * and `Node` (alias, map, seq & scalar) targets. Of all these, only the most
 * specific defined one will be used for each node.
 */
function visit(node, visitor) {
    const visitor_ = initVisitor(visitor);
    if (identity.isDocument(node)) {
        const cd = visit_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
            node.contents = null;
    }
    else
        visit_(null, node, visitor_, Object.freeze([]));
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visit.BREAK = BREAK;
/** Do not visit the children of the current node */
visit.SKIP = SKIP;
/** Remove the current node */
visit.REMOVE = REMOVE;
function visit_(key, node, visitor, path) {
    const ctrl = callVisitor(key, node, visitor, path);
    if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visit_(key, ctrl, visitor, path);
    }
    if (typeof ctrl !== 'symbol') {
        if (identity.isCollection(node)) {
            path = Object.freeze(path.concat(node));
            for (let i = 0; i < node.items.length; ++i) {
                const ci = visit_(i, node.items[i], visitor, path);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    node.items.splice(i, 1);
                    i -= 1;
                }
            }
        }
        else if (identity.isPair(node)) {
            path = Object.freeze(path.concat(node));
            const ck = visit_('key', node.key, visitor, path);
            if (ck === BREAK)
                return BREAK;
            else if (ck === REMOVE)
                node.key = null;
            const cv = visit_('value', node.value, visitor, path);
            if (cv === BREAK)
                return BREAK;
            else if (cv === REMOVE)
                node.value = null;
        }
    }
    return ctrl;
}
/**
 * Apply an async visitor to an AST node or document.
 *
 * Walks through the tree (depth-first) starting from `node`, calling a
 * `visitor` function with three arguments:
 *   - `key`: For sequence values and map `Pair`, the node's index in the
 *     collection. Within a `Pair`, `'key'` or `'value'`, correspondingly.
 *     `null` for the root node.
 *   - `node`: The current node.
 *   - `path`: The ancestry of the current node.
 *
 * The return value of the visitor may be used to control the traversal:
 *   - `Promise`: Must resolve to one of the following values
 *   - `undefined` (default): Do nothing and continue
 *   - `visit.SKIP`: Do not visit the children of this node, continue with next
 *     sibling
 *   - `visit.BREAK`: Terminate traversal completely
 *   - `visit.REMOVE`: Remove the current node, then continue with the next one
 *   - `Node`: Replace the current node, then continue by visiting it
 *   - `number`: While iterating the items of a sequence or map, set the index
 *     of the next step. This is useful especially if the index of the current
 *     node has changed.
 *
 * If `visitor` is a single function, it will be called with all values
 * encountered in the tree, including e.g. `null` values. Alternatively,
 * separate visitor functions may be defined for each `Map`, `Pair`, `Seq`,
 * `Alias` and `Scalar` node. To define the same visitor function for more than
 * one node type, use the `Collection` (map and seq), `Value` (map, seq & scalar)
 * and `Node` (alias, map, seq & scalar) targets. Of all these, only the most
 * specific defined one will be used for each node.
 */
async function visitAsync(node, visitor) {
    const visitor_ = initVisitor(visitor);
    if (identity.isDocument(node)) {
        const cd = await visitAsync_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
            node.contents = null;
    }
    else
        await visitAsync_(null, node, visitor_, Object.freeze([]));
}
// Without the `as symbol` casts, TS declares these in the `visit`
// namespace using `var`, but then complains about that because
// `unique symbol` must be `const`.
/** Terminate visit traversal completely */
visitAsync.BREAK = BREAK;
/** Do not visit the children of the current node */
visitAsync.SKIP = SKIP;
/** Remove the current node */
visitAsync.REMOVE = REMOVE;
async function visitAsync_(key, node, visitor, path) {
    const ctrl = await callVisitor(key, node, visitor, path);
    if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visitAsync_(key, ctrl, visitor, path);
    }
    if (typeof ctrl !== 'symbol') {
        if (identity.isCollection(node)) {
            path = Object.freeze(path.concat(node));
            for (let i = 0; i < node.items.length; ++i) {
                const ci = await visitAsync_(i, node.items[i], visitor, path);
                if (typeof ci === 'number')
                    i = ci - 1;
                else if (ci === BREAK)
                    return BREAK;
                else if (ci === REMOVE) {
                    node.items.splice(i, 1);
                    i -= 1;
                }
            }
        }
        else if (identity.isPair(node)) {
            path = Object.freeze(path.concat(node));
            const ck = await visitAsync_('key', node.key, visitor, path);
            if (ck === BREAK)
                return BREAK;
            else if (ck === REMOVE)
                node.key = null;
            const cv = await visitAsync_('value', node.value, visitor, path);
            if (cv === BREAK)
                return BREAK;
            else if (cv === REMOVE)
                node.value = null;
        }
    }
    return ctrl;
}
function initVisitor(visitor) {
    if (typeof visitor === 'object' &&
        (visitor.Collection || visitor.Node || visitor.Value)) {
        return Object.assign({
            Alias: visitor.Node,
            Map: visitor.Node,
            Scalar: visitor.Node,
            Seq: visitor.Node
        }, visitor.Value && {
            Map: visitor.Value,
            Scalar: visitor.Value,
            Seq: visitor.Value
        }, visitor.Collection && {
            Map: visitor.Collection,
            Seq: visitor.Collection
        }, visitor);
    }
    return visitor;
}
function callVisitor(key, node, visitor, path) {
    if (typeof visitor === 'function')
        return visitor(key, node, path);
    if (identity.isMap(node))
        return visitor.Map?.(key, node, path);
    if (identity.isSeq(node))
        return visitor.Seq?.(key, node, path);
    if (identity.isPair(node))
        return visitor.Pair?.(key, node, path);
    if (identity.isScalar(node))
        return visitor.Scalar?.(key, node, path);
    if (identity.isAlias(node))
        return visitor.Alias?.(key, node, path);
    return undefined;
}
function replaceNode(key, path, node) {
    const parent = path[path.length - 1];
    if (identity.isCollection(parent)) {
        parent.items[key] = node;
    }
    else if (identity.isPair(parent)) {
        if (key === 'key')
            parent.key = node;
        else
            parent.value = node;
    }
    else if (identity.isDocument(parent)) {
        parent.contents = node;
    }
    else {
        const pt = identity.isAlias(parent) ? 'alias' : 'scalar';
        throw new Error(`Cannot replace node with ${pt} parent`);
    }
}

exports.visit = visit;
exports.visitAsync = visitAsync;


/***/ }),

/***/ 3837:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$id":"https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#","description":"Meta-schema for $data reference (JSON AnySchema extension proposal)","type":"object","required":["$data"],"properties":{"$data":{"type":"string","anyOf":[{"format":"relative-json-pointer"},{"format":"json-pointer"}]}},"additionalProperties":false}');

/***/ }),

/***/ 2079:
/***/ ((module) => {

module.exports = /*#__PURE__*/JSON.parse('{"$schema":"http://json-schema.org/draft-07/schema#","$id":"http://json-schema.org/draft-07/schema#","title":"Core schema meta-schema","definitions":{"schemaArray":{"type":"array","minItems":1,"items":{"$ref":"#"}},"nonNegativeInteger":{"type":"integer","minimum":0},"nonNegativeIntegerDefault0":{"allOf":[{"$ref":"#/definitions/nonNegativeInteger"},{"default":0}]},"simpleTypes":{"enum":["array","boolean","integer","null","number","object","string"]},"stringArray":{"type":"array","items":{"type":"string"},"uniqueItems":true,"default":[]}},"type":["object","boolean"],"properties":{"$id":{"type":"string","format":"uri-reference"},"$schema":{"type":"string","format":"uri"},"$ref":{"type":"string","format":"uri-reference"},"$comment":{"type":"string"},"title":{"type":"string"},"description":{"type":"string"},"default":true,"readOnly":{"type":"boolean","default":false},"examples":{"type":"array","items":true},"multipleOf":{"type":"number","exclusiveMinimum":0},"maximum":{"type":"number"},"exclusiveMaximum":{"type":"number"},"minimum":{"type":"number"},"exclusiveMinimum":{"type":"number"},"maxLength":{"$ref":"#/definitions/nonNegativeInteger"},"minLength":{"$ref":"#/definitions/nonNegativeIntegerDefault0"},"pattern":{"type":"string","format":"regex"},"additionalItems":{"$ref":"#"},"items":{"anyOf":[{"$ref":"#"},{"$ref":"#/definitions/schemaArray"}],"default":true},"maxItems":{"$ref":"#/definitions/nonNegativeInteger"},"minItems":{"$ref":"#/definitions/nonNegativeIntegerDefault0"},"uniqueItems":{"type":"boolean","default":false},"contains":{"$ref":"#"},"maxProperties":{"$ref":"#/definitions/nonNegativeInteger"},"minProperties":{"$ref":"#/definitions/nonNegativeIntegerDefault0"},"required":{"$ref":"#/definitions/stringArray"},"additionalProperties":{"$ref":"#"},"definitions":{"type":"object","additionalProperties":{"$ref":"#"},"default":{}},"properties":{"type":"object","additionalProperties":{"$ref":"#"},"default":{}},"patternProperties":{"type":"object","additionalProperties":{"$ref":"#"},"propertyNames":{"format":"regex"},"default":{}},"dependencies":{"type":"object","additionalProperties":{"anyOf":[{"$ref":"#"},{"$ref":"#/definitions/stringArray"}]}},"propertyNames":{"$ref":"#"},"const":true,"enum":{"type":"array","items":true,"minItems":1,"uniqueItems":true},"type":{"anyOf":[{"$ref":"#/definitions/simpleTypes"},{"type":"array","items":{"$ref":"#/definitions/simpleTypes"},"minItems":1,"uniqueItems":true}]},"format":{"type":"string"},"contentMediaType":{"type":"string"},"contentEncoding":{"type":"string"},"if":{"$ref":"#"},"then":{"$ref":"#"},"else":{"$ref":"#"},"allOf":{"$ref":"#/definitions/schemaArray"},"anyOf":{"$ref":"#/definitions/schemaArray"},"oneOf":{"$ref":"#/definitions/schemaArray"},"not":{"$ref":"#"}},"default":true}');

/***/ })

/******/ });
/************************************************************************/
/******/ // The module cache
/******/ var __webpack_module_cache__ = {};
/******/ 
/******/ // The require function
/******/ function __nccwpck_require__(moduleId) {
/******/ 	// Check if module is in cache
/******/ 	var cachedModule = __webpack_module_cache__[moduleId];
/******/ 	if (cachedModule !== undefined) {
/******/ 		return cachedModule.exports;
/******/ 	}
/******/ 	// Create a new module (and put it into the cache)
/******/ 	var module = __webpack_module_cache__[moduleId] = {
/******/ 		// no module.id needed
/******/ 		// no module.loaded needed
/******/ 		exports: {}
/******/ 	};
/******/ 
/******/ 	// Execute the module function
/******/ 	var threw = true;
/******/ 	try {
/******/ 		__webpack_modules__[moduleId](module, module.exports, __nccwpck_require__);
/******/ 		threw = false;
/******/ 	} finally {
/******/ 		if(threw) delete __webpack_module_cache__[moduleId];
/******/ 	}
/******/ 
/******/ 	// Return the exports of the module
/******/ 	return module.exports;
/******/ }
/******/ 
/************************************************************************/
/******/ /* webpack/runtime/asset-relocator-loader */
/******/ if (typeof __nccwpck_require__ !== 'undefined') __nccwpck_require__.ab = decodeURIComponent(new URL('.', import.meta.url).pathname).slice(import.meta.url.match(/^file:\/\/\/\w:/) ? 1 : 0, -1) + "/";
/******/ 
/******/ /* webpack/runtime/compat get default export */
/******/ (() => {
/******/ 	// getDefaultExport function for compatibility with non-harmony modules
/******/ 	__nccwpck_require__.n = (module) => {
/******/ 		var getter = module && module.__esModule ?
/******/ 			() => (module['default']) :
/******/ 			() => (module);
/******/ 		__nccwpck_require__.d(getter, { a: getter });
/******/ 		return getter;
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/define property getters */
/******/ (() => {
/******/ 	// define getter functions for harmony exports
/******/ 	__nccwpck_require__.d = (exports, definition) => {
/******/ 		for(var key in definition) {
/******/ 			if(__nccwpck_require__.o(definition, key) && !__nccwpck_require__.o(exports, key)) {
/******/ 				Object.defineProperty(exports, key, { enumerable: true, get: definition[key] });
/******/ 			}
/******/ 		}
/******/ 	};
/******/ })();
/******/ 
/******/ /* webpack/runtime/hasOwnProperty shorthand */
/******/ (() => {
/******/ 	__nccwpck_require__.o = (obj, prop) => (Object.prototype.hasOwnProperty.call(obj, prop))
/******/ })();
/******/ 
/************************************************************************/
var __webpack_exports__ = {};

;// CONCATENATED MODULE: external "node:fs/promises"
const promises_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:fs/promises");
;// CONCATENATED MODULE: ./src/cli/files.ts

/** Largest model config read (4 MiB): real configs are a few KiB; anything larger is refused unread. */
const MAX_FILE_BYTES = 4 * 1024 * 1024;
/** Reads a local file the user named, refusing directories and anything over the size limit unread. */
function createFileSource(maxBytes = MAX_FILE_BYTES) {
    return {
        async read(path) {
            const info = await (0,promises_namespaceObject.stat)(path).catch((error) => {
                throw new Error(error.code === 'ENOENT' ? `${path}: no such file` : `${path}: cannot be read (${error.code ?? error.message})`);
            });
            if (info.isDirectory())
                throw new Error(`${path}: is a directory, expected a model config file`);
            if (info.size > maxBytes) {
                throw new Error(`${path}: ${info.size} bytes is over the ${maxBytes}-byte limit for a model config; it was not read`);
            }
            const handle = await (0,promises_namespaceObject.open)(path, 'r');
            try {
                const buffer = new Uint8Array(Math.min(info.size, maxBytes) + 1);
                const { bytesRead } = await handle.read(buffer, 0, buffer.length, 0);
                if (bytesRead > maxBytes)
                    throw new Error(`${path}: over the ${maxBytes}-byte limit for a model config`);
                return buffer.subarray(0, bytesRead);
            }
            finally {
                await handle.close();
            }
        },
    };
}

;// CONCATENATED MODULE: ./src/cli/console.ts
function createConsole() {
    return {
        out: (text) => process.stdout.write(text),
        error: (text) => process.stderr.write(text.endsWith('\n') ? text : `${text}\n`),
        stdout: process.stdout,
        env: process.env,
        cwd: process.cwd(),
    };
}

;// CONCATENATED MODULE: external "node:util"
const external_node_util_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:util");
;// CONCATENATED MODULE: ./src/core/metrics/sizes.ts
/**
 * Guards for the sizes a spec states. Sizes may be zero, negative, fractional, NaN or beyond
 * exact integers; every metric that depends on one returns null then.
 */
/** count: `x` when it is a whole number in [1, 2^53 - 1], else null. */
function positiveCount(x) {
    return typeof x === 'number' && Number.isSafeInteger(x) && x > 0 ? x : null;
}
/** count: `x` when it is a whole number in [0, 2^53 - 1], else null. */
function nonNegativeCount(x) {
    return typeof x === 'number' && Number.isSafeInteger(x) && x >= 0 ? x : null;
}
/** value: `x` when it is finite and above zero, else null. */
function positiveFinite(x) {
    return typeof x === 'number' && Number.isFinite(x) && x > 0 ? x : null;
}
/** value: `x` when it is finite, else null (`null` and `undefined` stay null). */
function finiteOrNull(x) {
    return typeof x === 'number' && Number.isFinite(x) ? x : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/alibi-slopes.ts
/**
 * ALiBi head slopes and the distance at which they fade a key out (Press et al. 2022, ALiBi, §3).
 */

/** heads: most heads a slope list is built for; more is degenerate input (null). */
const MAX_ALIBI_HEADS = 65536;
/** per token: `m_j = 2^(-8j/n)`, `j = 1..n` for n a power of two (Press et al. 2022, §3). */
function powerOfTwoSlopes(n) {
    const slopes = [];
    for (let j = 1; j <= n; j++)
        slopes.push(2 ** ((-8 * j) / n));
    return slopes;
}
/**
 * per token: `alibiSlopes` for n heads: `2^(-8j/n)` for n a power of two (Press et al. 2022,
 * §3); otherwise the authors' published code (`get_slopes`, SOURCES.md §7): the slopes for the
 * largest power of two `n0 < n`, then every other slope of the `2 n0` sequence from the first,
 * until n slopes. Null for n not a whole number in [1, MAX_ALIBI_HEADS].
 */
function alibiSlopes(heads) {
    const n = positiveCount(heads);
    if (n === null || n > MAX_ALIBI_HEADS)
        return null;
    const n0 = 2 ** Math.floor(Math.log2(n));
    if (n0 === n)
        return powerOfTwoSlopes(n);
    const extra = powerOfTwoSlopes(2 * n0).filter((_, j) => j % 2 === 0);
    return powerOfTwoSlopes(n0).concat(extra.slice(0, n - n0));
}
/**
 * tokens: `alibiHorizon = ceil(ln(10^4) / min_j m_j)`, the distance at which even the slowest head
 * scales a key's weight down by 10^4 (METRICS.md; the bias `-m·distance` of Press et al. 2022, §3).
 */
function alibiHorizon(slopes) {
    if (slopes === null || slopes.length === 0)
        return null;
    let slowest = Infinity;
    for (const m of slopes)
        if (m < slowest)
            slowest = m;
    return slowest > 0 && Number.isFinite(slowest) ? Math.ceil(Math.log(1e4) / slowest) : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/frequencies.ts

/**
 * count: most frequency pairs any scan accepts; wider codes are degenerate input and give null
 * frequency metrics rather than exhausting memory (no published code comes near: heads are a
 * few hundred wide at most).
 */
const MAX_PAIRS = 65536;
/** Sinusoidal base `10000` (Vaswani et al. 2017, §3.5). */
const SINUSOIDAL_BASE = 10000;
/**
 * dimensions: rotated width `r = 2 floor(headDim * fraction / 2)` (Su et al. 2021, RoFormer,
 * §3.2.2, with the partial-rotation fraction of common practice); null for degenerate input.
 */
function rotaryWidth(headDim, fraction) {
    const width = positiveCount(headDim);
    if (width === null || !(fraction > 0 && fraction <= 1))
        return null;
    const r = 2 * Math.floor((width * fraction) / 2);
    return r >= 2 && r / 2 <= MAX_PAIRS ? r : null;
}
/**
 * per token: `θ_i = base^(-2i/d)`, `i = 0..P-1`, `P = d/2` (Vaswani et al. 2017 §3.5 with
 * base 10000 and `d = d_model`; Su et al. 2021, RoFormer, eq. 15 with `d = r`).
 */
function geometricFrequencies(base, d) {
    if (positiveFinite(base) === null || positiveCount(d) === null || d % 2 !== 0 || d / 2 > MAX_PAIRS)
        return null;
    const pairs = d / 2;
    const theta = new Float64Array(pairs);
    for (let i = 0; i < pairs; i++)
        theta[i] = Math.pow(base, (-2 * i) / d);
    return allPositiveFinite(theta) ? theta : null;
}
/**
 * per token: the unscaled frequencies `θ_i` of the spec's code: sinusoidal over `hidden`
 * (odd widths are degenerate), rotary over `r`; null for learned, ALiBi and position-free codes.
 */
function baseFrequencies(spec) {
    const code = spec.position;
    if (code?.kind === 'sinusoidal')
        return geometricFrequencies(SINUSOIDAL_BASE, spec.hidden);
    if (code?.kind === 'rotary') {
        const r = rotaryWidth(spec.headDim, code.fraction);
        return r === null ? null : geometricFrequencies(code.base, r);
    }
    return null;
}
/** True when every entry is finite and above zero (a frequency of zero never turns). */
function allPositiveFinite(values) {
    for (let i = 0; i < values.length; i++) {
        const v = values[i];
        if (!(v > 0 && v < Infinity))
            return false;
    }
    return values.length > 0;
}

;// CONCATENATED MODULE: ./src/core/metrics/context-scaling.ts


/** yarn ramp start `α` for the Llama family (Peng et al. 2023, YaRN, §3.2). */
const YARN_ALPHA = 1;
/** yarn ramp end `β` for the Llama family (Peng et al. 2023, YaRN, §3.2). */
const YARN_BETA = 32;
/**
 * base: NTK-aware base `b' = b s^(r/(r-2))` (Peng et al. 2023, YaRN, §3.1, Eq. 16); null when
 * `r <= 2` or the result is not finite.
 */
function ntkBase(base, factor, r) {
    if (positiveFinite(base) === null || positiveFinite(factor) === null || !(r > 2))
        return null;
    return positiveFinite(base * Math.pow(factor, r / (r - 2)));
}
/**
 * ratio: yarn ramp `γ = clamp((ρ - α)/(β - α), 0, 1)` of `ρ = L0/λ` (Peng et al. 2023, YaRN,
 * Eq. 18; METRICS.md takes `λ` from the unscaled frequencies); null when `α = β`.
 */
function yarnRamp(rho, alpha, beta) {
    if (!Number.isFinite(alpha) || !Number.isFinite(beta) || alpha === beta || Number.isNaN(rho))
        return null;
    const g = (rho - alpha) / (beta - alpha);
    return g < 0 ? 0 : g > 1 ? 1 : g;
}
/**
 * ratio: softmax temperature factor `0.1 ln(s) + 1` (Peng et al. 2023, YaRN, Eq. 22); null for a
 * factor that is not a positive finite number.
 */
function yarnAttentionScale(factor) {
    return positiveFinite(factor) === null ? null : 0.1 * Math.log(factor) + 1;
}
/**
 * factor: effective scaling factor `s`: the configured factor; `max(1, T/L0)` for dynamic
 * scaling (Peng et al. 2023, YaRN, §3.3).
 */
function effectiveFactor(scaling, span, trained) {
    if (scaling.kind === 'dynamic') {
        if (span === null || trained === null)
            return null;
        return Math.max(1, span / trained);
    }
    return positiveFinite(scaling.factor);
}
/**
 * per token: scaled frequencies `θ'_i` (METRICS.md): linear `θ/s` (Chen et al. 2023, eq. 4);
 * ntk and dynamic `b'^(-2i/r)` (Peng et al. 2023, Eq. 16 and §3.3); yarn `(1-γ)θ/s + γθ`
 * (Peng et al. 2023, Eqs. 17–20); banded: common practice. No scaling: `θ` itself.
 * `span` is `T`, `trained` is `L0`; null for degenerate input.
 */
function scaleFrequencies(theta, base, r, scaling, span, trained) {
    if (scaling === null)
        return theta;
    const s = effectiveFactor(scaling, span, trained);
    if (s === null)
        return null;
    const out = new Float64Array(theta.length);
    switch (scaling.kind) {
        case 'linear':
            for (let i = 0; i < theta.length; i++)
                out[i] = theta[i] / s;
            break;
        case 'ntk':
        case 'dynamic': {
            const b = ntkBase(base, s, r);
            if (b === null)
                return null;
            for (let i = 0; i < theta.length; i++)
                out[i] = Math.pow(b, (-2 * i) / r);
            break;
        }
        case 'yarn': {
            if (trained === null)
                return null;
            for (let i = 0; i < theta.length; i++) {
                const rho = trained / ((2 * Math.PI) / theta[i]);
                const g = yarnRamp(rho, scaling.alpha, scaling.beta);
                if (g === null)
                    return null;
                out[i] = ((1 - g) * theta[i]) / s + g * theta[i];
            }
            break;
        }
        case 'banded': {
            const { low, high } = scaling;
            if (trained === null || !(Number.isFinite(low) && Number.isFinite(high) && low >= 0 && high > low))
                return null;
            for (let i = 0; i < theta.length; i++) {
                const lambda = (2 * Math.PI) / theta[i];
                if (lambda < trained / high)
                    out[i] = theta[i];
                else if (lambda > trained / low)
                    out[i] = theta[i] / s;
                else {
                    const g = (trained / lambda - low) / (high - low);
                    out[i] = ((1 - g) * theta[i]) / s + g * theta[i];
                }
            }
            break;
        }
        default:
            return null;
    }
    return allPositiveFinite(out) ? out : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/flops.ts
/**
 * Forward-pass compute per token (Kaplan et al. 2020, Table 1: `C_forward = 2N + 2 n_layer n_ctx d_attn`).
 */
/**
 * FLOP: `flopsPerToken = 2·nonEmbeddingParams + 2·layers·T·heads·headDim` (Kaplan et al. 2020,
 * Table 1, with `d_attn = heads·headDim`, `n_ctx = T`); null for degenerate input.
 */
function flopsPerToken(nonEmbeddingParams, layers, span, heads, headDim) {
    if (nonEmbeddingParams === null || layers === null || span === null || heads === null || headDim === null)
        return null;
    const f = 2 * nonEmbeddingParams + 2 * layers * span * heads * headDim;
    return Number.isFinite(f) ? f : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/storage-bytes.ts
const BYTES = { fp32: 4, bf16: 2, fp16: 2, fp8: 1, int8: 1, int4: 0.5 };
/** Weight storage when the spec states none (default: `bf16`). */
const DEFAULT_WEIGHT_DTYPE = 'bf16';
/** bytes: size of one element of `dtype`; null for an unknown name. */
function bytesPerElement(dtype) {
    return dtype !== null && dtype !== undefined && Object.hasOwn(BYTES, dtype) ? BYTES[dtype] : null;
}
/** The weight dtype in force (default: `bf16`). */
function weightDType(spec) {
    return spec.dtypes?.weights ?? DEFAULT_WEIGHT_DTYPE;
}
/** The cache dtype in force (default: the weight dtype). */
function cacheDType(spec) {
    return spec.dtypes?.cache ?? weightDType(spec);
}

;// CONCATENATED MODULE: ./src/core/metrics/kv-cache.ts


/** Concurrent sequences when the serving block states none (default: `1`). */
const DEFAULT_SEQUENCES = 1;
/** bytes: one layer's keys and values for one token, `2·kvHeads·headDim·bytes`; null if degenerate. */
function layerTokenBytes(spec) {
    const kv = positiveCount(spec.kvHeads);
    const headDim = positiveCount(spec.headDim);
    const bytes = bytesPerElement(cacheDType(spec));
    return kv === null || headDim === null || bytes === null ? null : 2 * kv * headDim * bytes;
}
/**
 * count: decoder layers with a sliding window, 0 without a window; null when the window or the
 * count is degenerate or the count exceeds the layers (default: every layer when a window is set).
 */
function windowedLayers(spec) {
    const layers = positiveCount(spec.layers);
    if (layers === null)
        return null;
    if (spec.slidingWindow === null || spec.slidingWindow === undefined)
        return 0;
    if (positiveCount(spec.slidingWindow) === null)
        return null;
    if (spec.windowLayers === null || spec.windowLayers === undefined)
        return layers;
    const n = nonNegativeCount(spec.windowLayers);
    return n === null || n > layers ? null : n;
}
/** bytes: `cachePerTokenBytes = Σ_decoder layers 2·kvHeads·headDim·bytes(cache dtype)` (common practice). */
function cachePerTokenBytes(spec) {
    const layers = positiveCount(spec.layers);
    const perLayer = layerTokenBytes(spec);
    return layers === null || perLayer === null ? null : finite(layers * perLayer);
}
/** count: sequences held in the cache; null when stated but not a positive whole number (default: `1`). */
function servedSequences(spec) {
    const s = spec.serving?.sequences;
    return s === null || s === undefined ? DEFAULT_SEQUENCES : positiveCount(s);
}
/**
 * bytes: `cacheBytesAtSpan = sequences · Σ_layers 2·kvHeads·headDim·bytes·min(T, window of that
 * layer)` (METRICS.md); windowed layers hold `min(T, w)` tokens, the others T.
 */
function cacheBytesAtSpan(spec, span) {
    const layers = positiveCount(spec.layers);
    const perLayer = layerTokenBytes(spec);
    const windowed = windowedLayers(spec);
    const sequences = servedSequences(spec);
    if (span === null || layers === null || perLayer === null || windowed === null || sequences === null)
        return null;
    const w = windowed > 0 ? Math.min(span, spec.slidingWindow) : span;
    return finite(sequences * perLayer * ((layers - windowed) * span + windowed * w));
}
function finite(x) {
    return Number.isFinite(x) ? x : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/memory-fit.ts


/** Fraction of device memory kept free when the serving block states none (default: `0.1`). */
const DEFAULT_RESERVE = 0.1;
/** bytes: `weightBytes = params · bytes(weight dtype)` (weight dtype default: `bf16`). */
function weightBytes(spec, params) {
    const bytes = bytesPerElement(weightDType(spec));
    if (params === null || bytes === null)
        return null;
    const w = params * bytes;
    return Number.isFinite(w) ? w : null;
}
/** bytes: `memoryBytes = weightBytes + cacheBytesAtSpan`. */
function memoryBytes(weights, cache) {
    if (weights === null || cache === null)
        return null;
    const m = weights + cache;
    return Number.isFinite(m) ? m : null;
}
/**
 * count: `fitSequences = floor((deviceBytes (1 - reserve) - weightBytes) / (cacheBytesAtSpan /
 * sequences))` with `deviceBytes = deviceGiB · 2^30` (METRICS.md); negative when the weights alone
 * do not fit. Null without a device budget, with a reserve outside [0, 1), or an empty cache.
 */
function fitSequences(spec, weights, cache, sequences) {
    const device = positiveFinite(spec.serving?.deviceGiB);
    const reserveStated = spec.serving?.reserve;
    const reserve = reserveStated === null || reserveStated === undefined ? DEFAULT_RESERVE : reserveStated;
    if (device === null || weights === null || cache === null || sequences === null)
        return null;
    if (!(Number.isFinite(reserve) && reserve >= 0 && reserve < 1) || !(cache > 0))
        return null;
    const n = Math.floor((device * 2 ** 30 * (1 - reserve) - weights) / (cache / sequences));
    return Number.isFinite(n) ? n : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/float-format.ts
const SHAPES = {
    fp32: { bits: 24, minExponent: -126, maxExponent: 127 },
    fp16: { bits: 11, minExponent: -14, maxExponent: 15 },
    bf16: { bits: 8, minExponent: -126, maxExponent: 127 },
};
const MAX_FINITE = {
    fp32: (2 - 2 ** -23) * 2 ** 127,
    fp16: (2 - 2 ** -10) * 2 ** 15,
    bf16: (2 - 2 ** -7) * 2 ** 127,
};
/** count: significant bits `p` of the format (IEEE 754-2008 Table 3.5; bfloat16: 8). */
function significantBits(format) {
    return SHAPES[format].bits;
}
/** exponent: smallest normal exponent `emin` (binary32 and bfloat16 -126, binary16 -14). */
function minNormalExponent(format) {
    return SHAPES[format].minExponent;
}
/** tokens: `2^p`, the largest n with every integer in [0, n] exact (IEEE 754-2008: 2^24, 2^11; bfloat16 2^8). */
function positionExactLimit(format) {
    return 2 ** SHAPES[format].bits;
}
/** value: largest finite number `(2 - 2^(1-p)) 2^emax` (binary16 65504, bfloat16 ≈ 3.3895e38). */
function maxFinite(format) {
    return MAX_FINITE[format];
}
/**
 * value: smallest magnitude that rounds to infinity under round to nearest, ties to even,
 * `(2 - 2^-p) 2^emax`: halfway past the largest finite number, whose last bit is odd, so the
 * tie goes up (IEEE 754-2008 §7.4; binary16 65520).
 */
function overflowThreshold(format) {
    const { bits, maxExponent } = SHAPES[format];
    return (2 - 2 ** -bits) * 2 ** maxExponent;
}
// Scratch view of one binary64 for reading its exponent field; endianness is detected once.
const scratch = new Float64Array(1);
const words = new Uint32Array(scratch.buffer);
const HIGH = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;
/** exponent: `floor(log2 |x|)` exactly, for finite non-zero binary64 `x` (subnormals included). */
function binaryExponent(x) {
    scratch[0] = x;
    const biased = (words[HIGH] >>> 20) & 0x7ff;
    if (biased !== 0)
        return biased - 1023;
    // binary64 subnormal: scale into the normal range (exact) and read again
    scratch[0] = x * 2 ** 64;
    return ((words[HIGH] >>> 20) & 0x7ff) - 1023 - 64;
}
/**
 * value: distance between neighbouring numbers of the format around `x`, `2^(max(e, emin) - p + 1)`
 * with `e = floor(log2 |x|)` (IEEE 754-2008 §3.3); the subnormal spacing below `2^emin`.
 */
function spacingAt(x, format) {
    const { bits, minExponent } = SHAPES[format];
    const e = x === 0 ? minExponent : binaryExponent(x);
    return 2 ** (Math.max(e, minExponent) - bits + 1);
}
/**
 * value: `fl_D(x)`, `x` rounded once to the nearest number of format D, ties to even, with
 * subnormals and overflow to ±Infinity (IEEE 754-2008 §4.3.1, §7.4). Rounds straight from the
 * binary64 value: rounding through binary32 first would be double rounding.
 */
function roundToFormat(x, format) {
    // Math.fround is binary64 → binary32 round to nearest, ties to even (ECMA-262 §21.3.2.17).
    if (format === 'fp32')
        return Math.fround(x);
    if (x === 0 || !Number.isFinite(x))
        return x;
    const { bits, minExponent } = SHAPES[format];
    const a = Math.abs(x);
    const q = Math.max(binaryExponent(a), minExponent) - bits + 1;
    // a / 2^q has at most `bits` integer bits; scaling by a power of two is exact here
    const scaled = a * 2 ** -q;
    let r = Math.floor(scaled);
    const rest = scaled - r;
    if (rest > 0.5 || (rest === 0.5 && r % 2 === 1))
        r += 1;
    let y = r * 2 ** q;
    if (y > MAX_FINITE[format])
        y = Infinity;
    return x < 0 ? -y : y;
}

;// CONCATENATED MODULE: ./src/core/metrics/position-rounding.ts

/** token: first position `p` with `fl_D(p)` infinite, `ceil((2 - 2^-p) 2^emax)` (binary16: 65520). */
function positionOverflowStart(format) {
    return Math.ceil(overflowThreshold(format));
}
/**
 * count: integers in [0, x] that format D holds exactly: all up to `2^p`, then in each binade
 * `[2^e, 2^(e+1))` one in every `2^(e-p+1)` (IEEE 754-2008 §3.3). `x` a whole number below the
 * overflow threshold.
 */
function representableIntegersUpTo(x, format) {
    const m = significantBits(format);
    const exact = 2 ** m;
    if (x <= exact)
        return x + 1;
    let total = exact + 1;
    for (let e = m; 2 ** e < x; e++) {
        const spacing = 2 ** (e - m + 1);
        const top = Math.min(x, 2 ** (e + 1));
        total += Math.floor((top - 2 ** e) / spacing);
    }
    return total;
}
/**
 * count: `collidingPositions`, positions p in [1, T) with `fl_D(p) == fl_D(p-1)`, overflowing
 * positions counted as colliding (METRICS.md). Below the overflow start N positions take
 * `representableIntegersUpTo(N-1)` distinct values, one more when `fl_D(N-1)` rounds up past
 * `N-1`; every other position repeats its predecessor's value. Null for `T` not a positive
 * whole number.
 */
function collidingPositions(format, span) {
    if (!Number.isSafeInteger(span) || span < 1)
        return null;
    const start = positionOverflowStart(format);
    const n = Math.min(span, start);
    const distinct = representableIntegersUpTo(n - 1, format) + (roundToFormat(n - 1, format) > n - 1 ? 1 : 0);
    return n - distinct + (span > start ? span - start : 0);
}

;// CONCATENATED MODULE: ./src/core/metrics/angle-rounding.ts


const CHUNK = 1024;
const SLACK = 2 ** -50;
/** True when `fl_D(fl_D(p) t)` is not finite (overflow, or `0 · ∞`). */
function angleOverflows(p, t, format) {
    return !Number.isFinite(roundToFormat(roundToFormat(p, format) * t, format));
}
/**
 * token: `overflowPosition`, first p in [0, T) whose `fl_D(p)` or any angle is not finite;
 * null when none is (METRICS.md). Angles are monotone in p, so each pair is a binary search.
 */
function overflowPosition(format, theta, span) {
    const start = positionOverflowStart(format);
    let first = start < span ? start : span;
    for (let i = 0; i < theta.length; i++) {
        const t = roundToFormat(theta[i], format);
        if (!Number.isFinite(t))
            return 0;
        if (first === 0 || !angleOverflows(first - 1, t, format))
            continue;
        let lo = 0;
        let hi = first - 1; // angleOverflows(hi) holds
        while (lo < hi) {
            const mid = Math.floor((lo + hi) / 2);
            if (angleOverflows(mid, t, format))
                hi = mid;
            else
                lo = mid + 1;
        }
        first = lo;
    }
    return first < span ? first : null;
}
/** bits: width of the odd significand of a positive finite `t` (1 for powers of two). */
function significandWidth(t) {
    let m = t / 2 ** binaryExponent(t);
    let width = 1;
    while (m !== Math.floor(m)) {
        m *= 2;
        width++;
    }
    return width;
}
/**
 * True when every product `p t`, `p <= top`, fits in `bits` significant bits: a power of two
 * adds no bits to p, any other odd significand M adds at most its width.
 */
function productsExact(t, top, bits) {
    if (t === 0)
        return true;
    const width = significandWidth(t);
    return bitLength(top) + (width === 1 ? 0 : width) <= bits;
}
/** bits: `ceil(log2(n + 1))`, the width of a whole number n. */
function bitLength(n) {
    return n < 1 ? 0 : binaryExponent(n) + 1;
}
/**
 * radians: `angleErrorMax`, `max |fl_D(fl_D(p) fl_D(θ'_i)) - p θ'_i|` over p in [0, T) and all
 * pairs (METRICS.md). The caller checks `overflowPosition` first: with any overflow the metric is
 * null. Pairs are independent, so a caller may split `theta` and take the larger result.
 */
function angleErrorMax(format, theta, span) {
    let best = 0;
    for (let i = 0; i < theta.length; i++)
        best = pairAngleError(format, theta[i], span, best);
    return best;
}
function pairAngleError(format, th, span, best) {
    const m = significantBits(format);
    const exactLimit = 2 ** m;
    const t = roundToFormat(th, format);
    const d = Math.abs(t - th);
    // Above 2^m: runs of positions sharing one rounded value v, visited downwards.
    let p = span - 1;
    while (p >= exactLimit) {
        const v = roundToFormat(p, format);
        const above = spacingAt(v, format);
        const below = v === 2 ** binaryExponent(v) ? above / 2 : above;
        const even = (v / above) % 2 === 0;
        const lo = below / 2 < 1 ? v : v - below / 2 + (even ? 0 : 1);
        const hi = Math.min(p, above / 2 < 1 ? v : v + above / 2 - (even ? 0 : 1));
        const bound = (spacingAt(v * t, format) / 2 + v * d + (above / 2) * th) * (1 + SLACK) + SLACK * (v + above) * th;
        if (bound < best)
            return best;
        const c = roundToFormat(v * t, format);
        const e1 = Math.abs(c - lo * th);
        const e2 = Math.abs(c - hi * th);
        if (e1 > best)
            best = e1;
        if (e2 > best)
            best = e2;
        p = lo - 1;
    }
    // Below 2^m every position is exact: fl_D(p) = p.
    const top = Math.min(p, span - 1);
    if (top < 1)
        return best;
    // All products p t exact in D: no rounding term in the bound (and no error at all when t = θ).
    const exactProducts = productsExact(t, top, m);
    if (exactProducts && t === th)
        return best;
    p = top;
    while (p >= 1) {
        const roundingTerm = exactProducts ? 0 : spacingAt(p * t, format) / 2;
        const bound = (roundingTerm + p * d) * (1 + SLACK) + SLACK * (p * th + 2 * roundingTerm);
        if (bound < best)
            break;
        const lo = Math.max(1, p - CHUNK + 1);
        let local = best;
        if (format === 'fp32') {
            for (let q = p; q >= lo; q--) {
                const e = Math.abs(Math.fround(q * t) - q * th);
                if (e > local)
                    local = e;
            }
        }
        else {
            for (let q = p; q >= lo; q--) {
                const e = Math.abs(roundToFormat(q * t, format) - q * th);
                if (e > local)
                    local = e;
            }
        }
        best = local;
        p = lo - 1;
    }
    return best;
}
/**
 * count: `blurredPairs`, pairs i for which some p in [1, T) has
 * `fl_D(fl_D(p) t_i) == fl_D(fl_D(p-1) t_i)` with `t_i = fl_D(θ'_i)` (METRICS.md). Once T passes
 * `2^m + 1` (m significant bits) two positions share a rounded value and every pair is blurred.
 */
function blurredPairs(format, theta, span) {
    if (span < 2)
        return 0;
    if (span - 1 >= 2 ** significantBits(format) + 1)
        return theta.length;
    let n = 0;
    for (let i = 0; i < theta.length; i++)
        if (pairBlurred(format, theta[i], span))
            n++;
    return n;
}
/** Positions [0, span) all exact here (span <= 2^m + 1). */
function pairBlurred(format, th, span) {
    const t = roundToFormat(th, format);
    if (t === 0)
        return span >= 2;
    if (!Number.isFinite(t))
        return span >= 3; // 0·∞ is NaN at p = 0; Infinity repeats from p = 1
    let top = span - 1;
    if (!Number.isFinite(roundToFormat(top * t, format))) {
        let lo = 1;
        let hi = top;
        while (lo < hi) {
            const mid = Math.floor((lo + hi) / 2);
            if (Number.isFinite(roundToFormat(mid * t, format)))
                lo = mid + 1;
            else
                hi = mid;
        }
        if (lo + 1 <= top)
            return true; // two neighbouring angles are both Infinity
        top = lo - 1;
    }
    if (top < 2)
        return false; // fl(t) = t differs from fl(0) = 0
    const m = significantBits(format);
    if (productsExact(t, top, m))
        return false; // every product exact, all distinct
    const emin = minNormalExponent(format);
    const eTop = binaryExponent(top * t);
    for (let e = binaryExponent(t); e <= eTop; e++) {
        const u = 2 ** (Math.max(e, emin) - m + 1);
        if (t > u)
            continue;
        const floorEdge = 2 ** e;
        const ceilEdge = 2 ** (e + 1);
        let qLo = Math.max(2, Math.ceil(floorEdge / t));
        while (qLo > 2 && (qLo - 1) * t >= floorEdge)
            qLo--;
        while (qLo * t < floorEdge)
            qLo++;
        let qHi = Math.min(top, Math.ceil(ceilEdge / t) - 1);
        while (qHi * t >= ceilEdge)
            qHi--;
        while (qHi + 1 <= top && (qHi + 1) * t < ceilEdge)
            qHi++;
        if (qLo > qHi)
            continue;
        if (t < u / 2 && (qHi - qLo) * t >= 2 * u)
            return true;
        let prev = roundToFormat((qLo - 1) * t, format);
        for (let q = qLo; q <= qHi; q++) {
            const cur = roundToFormat(q * t, format);
            if (cur === prev)
                return true;
            prev = cur;
        }
    }
    return false;
}

;// CONCATENATED MODULE: ./src/core/metrics/scan-limits.ts
/**
 * Bounds on the positional scans, so degenerate or absurd input gives null instead of hanging.
 */
/**
 * tokens: longest span `T` any O(T) scan runs over (`2^31`, eight times the longest context
 * published so far); past it the similarity metrics and `angleErrorMax` are null.
 */
const MAX_SCAN_SPAN = 2 ** 31;
/**
 * elements: most (position, pair) elements one scan touches (`2^37`: 64 pairs over `2^31`
 * positions, about three minutes on one core); past it the scan gives null.
 */
const MAX_SCAN_ELEMENTS = 2 ** 37;
/** True when a scan of `pairs` frequency pairs over `span` positions stays inside the bounds. */
function scanAllowed(pairs, span) {
    return span <= MAX_SCAN_SPAN && pairs * span <= MAX_SCAN_ELEMENTS;
}

;// CONCATENATED MODULE: ./src/core/metrics/number-format.ts




/** The block with every metric null (learned, ALiBi and position-free codes, METRICS.md). */
const NULL_PRECISION = Object.freeze({
    positionExactLimit: null,
    collidingPositions: null,
    angleErrorMax: null,
    overflowPosition: null,
    blurredPairs: null,
});
/**
 * `precision.<D>` for scaled frequencies `θ'` over span `T`: all null without frequencies; only
 * `positionExactLimit` without a valid span; `angleErrorMax` null when anything overflows or the
 * span is past the scan bounds (`MAX_SCAN_SPAN`).
 */
function numberFormatMetrics(format, theta, span) {
    if (theta === null)
        return { ...NULL_PRECISION };
    const limit = positionExactLimit(format);
    if (span === null || !Number.isSafeInteger(span) || span < 1) {
        return { ...NULL_PRECISION, positionExactLimit: limit };
    }
    const overflow = overflowPosition(format, theta, span);
    return {
        positionExactLimit: limit,
        collidingPositions: collidingPositions(format, span),
        angleErrorMax: overflow === null && scanAllowed(theta.length, span) ? angleErrorMax(format, theta, span) : null,
        overflowPosition: overflow,
        blurredPairs: span - 1 > limit || scanAllowed(theta.length, span) ? blurredPairs(format, theta, span) : null,
    };
}

;// CONCATENATED MODULE: ./src/core/metrics/parameter-count.ts

/**
 * count: one attention block, `hidden·heads·headDim + 2·hidden·kvHeads·headDim +
 * heads·headDim·hidden` (q, k, v, o; Ainslie et al. 2023 for kvHeads < heads), plus q, k, v, o
 * biases when on.
 */
function attentionParams(hidden, heads, kvHeads, headDim, bias) {
    const weights = hidden * heads * headDim + 2 * hidden * kvHeads * headDim + heads * headDim * hidden;
    return weights + (bias ? heads * headDim + 2 * kvHeads * headDim + hidden : 0);
}
/** count: one feed-forward block, `(gated ? 3 : 2)·hidden·ffn`, plus biases when on (per hidden unit and output). */
function feedForwardParams(hidden, ffn, gated, bias) {
    return (gated ? 3 : 2) * hidden * ffn + (bias ? (gated ? 2 : 1) * ffn + hidden : 0);
}
/** count: one normalisation of width `hidden`: a scale, plus a shift when biases are on (LayerNorm). */
function normParams(hidden, bias) {
    return bias ? 2 * hidden : hidden;
}
/**
 * count: `params`, `activeParams`, `nonEmbeddingParams` (METRICS.md). Per decoder layer: attention,
 * feed-forward (times E experts, plus a router `hidden·E`; k experts for the active count), two
 * norms; decoder layers of an encoder-decoder add cross-attention (the same q, k, v, o shapes)
 * and a third norm; encoder layers (dense) have attention, feed-forward and two norms; one final
 * norm per stack. Embeddings: `vocab·hidden`, again when untied, and a learned position table
 * `declaredSpan·hidden`. Null when any size it needs is not a positive whole number or the count
 * is not finite.
 */
function parameterCounts(spec) {
    const layers = positiveCount(spec.layers);
    const hidden = positiveCount(spec.hidden);
    const heads = positiveCount(spec.heads);
    const kvHeads = positiveCount(spec.kvHeads);
    const headDim = positiveCount(spec.headDim);
    const ffn = positiveCount(spec.ffn);
    const vocab = positiveCount(spec.vocab);
    if (layers === null || hidden === null || heads === null || kvHeads === null || headDim === null || ffn === null || vocab === null) {
        return null;
    }
    const bias = spec.bias === true;
    const gated = spec.gated === true;
    let total = 1;
    let active = 1;
    if (spec.experts !== null && spec.experts !== undefined) {
        const e = positiveCount(spec.experts.total);
        const k = positiveCount(spec.experts.active);
        if (e === null || k === null || k > e)
            return null;
        total = e;
        active = k;
    }
    const attention = attentionParams(hidden, heads, kvHeads, headDim, bias);
    const ff = feedForwardParams(hidden, ffn, gated, bias);
    const router = spec.experts ? hidden * total : 0;
    const encoderDecoder = spec.encoder !== null && spec.encoder !== undefined;
    const decoderShared = attention + (encoderDecoder ? attention : 0) + (encoderDecoder ? 3 : 2) * normParams(hidden, bias) + router;
    let stacksTotal = layers * (decoderShared + total * ff) + normParams(hidden, bias);
    let stacksActive = layers * (decoderShared + active * ff) + normParams(hidden, bias);
    if (encoderDecoder) {
        const enc = spec.encoder;
        const eLayers = positiveCount(enc.layers);
        const eHeads = positiveCount(enc.heads);
        const eKv = positiveCount(enc.kvHeads);
        const eHeadDim = positiveCount(enc.headDim);
        const eFfn = positiveCount(enc.ffn);
        if (eLayers === null || eHeads === null || eKv === null || eHeadDim === null || eFfn === null)
            return null;
        const encoderLayer = attentionParams(hidden, eHeads, eKv, eHeadDim, bias) + feedForwardParams(hidden, eFfn, gated, bias) + 2 * normParams(hidden, bias);
        const encoder = eLayers * encoderLayer + normParams(hidden, bias);
        stacksTotal += encoder;
        stacksActive += encoder;
    }
    let embeddings = vocab * hidden * (spec.tied === false ? 2 : 1);
    if (spec.position?.kind === 'learned') {
        const table = positiveCount(spec.declaredSpan);
        if (table === null)
            return null;
        embeddings += table * hidden;
    }
    const params = stacksTotal + embeddings;
    const activeParams = stacksActive + embeddings;
    if (!Number.isFinite(params) || !Number.isFinite(activeParams))
        return null;
    return { params, activeParams, nonEmbeddingParams: stacksActive };
}

;// CONCATENATED MODULE: ./src/core/metrics/position-share.ts

/**
 * 0..1: `code / (code + token)` per token at initialisation, with token energy
 * `hidden·std²·multiplier²` and code energy `hidden/2` for sinusoidal codes (each pair's
 * sin² + cos² = 1; Vaswani et al. 2017, §3.5), or `hidden·std²` for a learned table, assumed
 * initialised like the token embedding (common practice). Null for other codes, an unknown or
 * degenerate std, or a degenerate multiplier (multiplier default: `1`).
 */
function positionShare(spec) {
    const kind = spec.position?.kind;
    if (kind !== 'sinusoidal' && kind !== 'learned')
        return null;
    const hidden = positiveCount(spec.hidden);
    const std = positiveFinite(spec.embeddingInitStd);
    const multiplier = spec.embeddingMultiplier === null || spec.embeddingMultiplier === undefined ? 1 : finiteOrNull(spec.embeddingMultiplier);
    if (hidden === null || std === null || multiplier === null)
        return null;
    const token = hidden * std * std * multiplier * multiplier;
    const code = kind === 'sinusoidal' ? hidden / 2 : hidden * std * std;
    const share = code / (code + token);
    return Number.isFinite(share) ? share : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/reach.ts

/** factor: the configured rotary scaling factor `s` (1 without scaling); null when degenerate. */
function scalingFactor(spec) {
    const code = spec.position;
    if (code?.kind !== 'rotary' || code.scaling === null || code.scaling === undefined)
        return 1;
    return positiveFinite(code.scaling.factor);
}
/**
 * tokens: `reach`: a learned table's size; otherwise `L0·factor`, and when the trained span was
 * not stated explicitly at least `declaredSpan` (METRICS.md).
 */
function reach(spec, trained, declared) {
    if (spec.position?.kind === 'learned')
        return declared;
    const factor = scalingFactor(spec);
    if (trained === null || factor === null)
        return null;
    const r = trained * factor;
    if (!Number.isFinite(r))
        return null;
    if (spec.trainedSpan !== null && spec.trainedSpan !== undefined)
        return r;
    return declared === null ? null : Math.max(r, declared);
}
/** tokens: `scalingCover = L0·factor` for scaled rotary codes; null otherwise. */
function scalingCover(spec, trained) {
    const code = spec.position;
    if (code?.kind !== 'rotary' || !code.scaling || trained === null)
        return null;
    const factor = scalingFactor(spec);
    if (factor === null)
        return null;
    const c = trained * factor;
    return Number.isFinite(c) ? c : null;
}
/** tokens: `headroom = reach - T` (negative: the span goes past what the scheme supports). */
function headroom(reachTokens, span) {
    return reachTokens === null || span === null ? null : reachTokens - span;
}
/** ratio: `extensionRatio = T / L0`. */
function extensionRatio(span, trained) {
    return span === null || trained === null ? null : span / trained;
}

;// CONCATENATED MODULE: ./src/core/metrics/receptive-field.ts


/** tokens: `receptiveField = layers · w` when every decoder layer has the window w; null otherwise. */
function receptiveField(spec) {
    const layers = positiveCount(spec.layers);
    const windowed = windowedLayers(spec);
    if (layers === null || windowed === null || windowed !== layers)
        return null;
    const r = layers * spec.slidingWindow;
    return Number.isFinite(r) ? r : null;
}

;// CONCATENATED MODULE: ./src/core/metrics/similarity-scan.ts
/**
 * Similarity of a code with itself at offset k, `S(k) = (1/P) Σ_i cos(k θ'_i)`, scanned over
 * every k in [1, T): `separationFloor`, `separationFloorOffset` (METRICS.md) and
 * `discriminationSpan`, the first k with `Σ_i cos(k θ'_i) < 0` (Men et al. 2024, "Base of RoPE
 * Bounds Context Length", Thm 1, Eqs. 9–10).
 *
 * Method, and why it is exact. The definition is the straightforward loop over k and i with
 * Math.cos(k * θ) summed in pair order, `sqrt(2 (1 - sum/P))`; the results here are identical to
 * that loop, not close to it. Blocks of B = 512 offsets are filled pair by pair with the Chebyshev
 * recurrence `c_{j+1} = 2cos(θ) c_j - c_{j-1}` (one multiply, one subtract per element; eight
 * pairs interleaved so the chains overlap), re-seeded exactly at every block start from
 * Math.cos/Math.sin of `k0 θ` (reduced by whole turns first, adding under 20ε, because large
 * arguments take a slow path). With unit roundoff ε = 2^-53 and `|U_n(cos θ)| <= n + 1`, seeds
 * within 22ε and 56ε and local errors of 8ε per step (4ε of them from `2cos θ`) leave a
 * recurrence value after n <= B steps within ε(4n² + 78n) of the cosine of the seeded argument;
 * the seed argument and the reference's own argument `fl(kθ)` are both within `ε kθ` of `kθ`;
 * the two pair-order sums add `P² ε` each. So the approximate sum at k differs from the
 * reference sum by at most
 *   bound(k) = ε (P (4B² + 80B + 2) + 2 k Σθ + 2P² + 4P)   (≈ 1e-8 for P = 64, B = 512, k = 2^20).
 * Decisions are then made with a margin of 2.5 bound (two approximate sums are compared, and a
 * quarter of the bound each is spare): an offset is re-evaluated exactly (the
 * reference expression, Math.cos per pair) when its approximate sum is within the margin of the
 * best approximate sum seen so far, or within the margin of zero while no negative sum has been
 * found; every other offset provably cannot change the floor, its offset (ties go to the
 * earlier k, which was already evaluated) or the first negative sum. Memory is O(P + B), never
 * O(T).
 */

const BLOCK = 512;
const EPS = 2 ** -53;
/** sum: `Σ_i cos(k θ'_i)` in pair order, the reference expression. */
function cosineSum(theta, k) {
    let s = 0;
    for (let i = 0; i < theta.length; i++)
        s += Math.cos(k * theta[i]);
    return s;
}
/** 0..2: `sqrt(2 (1 - S(k)))` with `S(k) = cosineSum / P` (METRICS.md, separationFloor). */
function separationAt(theta, k) {
    return Math.sqrt(2 * (1 - cosineSum(theta, k) / theta.length));
}
/**
 * Scans offsets k in [kStart, kEnd) (so two workers can split a span and `mergeSimilarity` the
 * halves); null for an empty range or no pairs.
 */
function scanSimilarityRange(theta, kStart, kEnd) {
    const P = theta.length;
    if (P === 0 || !(kEnd > kStart) || !(kStart >= 1))
        return null;
    const a2 = new Float64Array(P);
    const cT = new Float64Array(P);
    const sT = new Float64Array(P);
    let sumTheta = 0;
    for (let i = 0; i < P; i++) {
        cT[i] = Math.cos(theta[i]);
        sT[i] = Math.sin(theta[i]);
        a2[i] = 2 * cT[i];
        sumTheta += theta[i];
    }
    const buf = new Float64Array(BLOCK);
    const seedNow = new Float64Array(P);
    const seedBefore = new Float64Array(P);
    let bestApprox = -Infinity;
    let bestFloor = Infinity;
    let bestK = -1;
    let negative = null;
    for (let k0 = kStart; k0 < kEnd; k0 += BLOCK) {
        const n = Math.min(BLOCK, kEnd - k0);
        fillBlock(theta, a2, cT, sT, k0, n, buf, seedNow, seedBefore);
        const margin = 2.5 * EPS * (P * (4 * n * n + 80 * n + 2) + 2 * (k0 + n) * sumTheta + 2 * P * P + 4 * P);
        let threshold = bestApprox - margin;
        for (let j = 0; j < n; j++) {
            const v = buf[j];
            if (v >= threshold) {
                const k = k0 + j;
                const exact = cosineSum(theta, k);
                const f = Math.sqrt(2 * (1 - exact / P));
                if (f < bestFloor) {
                    bestFloor = f;
                    bestK = k;
                }
                if (v > bestApprox) {
                    bestApprox = v;
                    threshold = v - margin;
                }
                if (negative === null && exact < 0)
                    negative = k;
            }
            else if (negative === null && v < margin) {
                const k = k0 + j;
                if (v < -margin || cosineSum(theta, k) < 0)
                    negative = k;
            }
        }
    }
    return { floor: bestFloor, offset: bestK, negative };
}
/** Combines two scanned ranges: the lower floor (the smaller offset on a tie), the first negative. */
function mergeSimilarity(a, b) {
    const takeA = a.floor < b.floor || (a.floor === b.floor && a.offset < b.offset);
    const negative = a.negative === null ? b.negative : b.negative === null ? a.negative : Math.min(a.negative, b.negative);
    return { floor: takeA ? a.floor : b.floor, offset: takeA ? a.offset : b.offset, negative };
}
/**
 * 0..2, tokens, tokens: `separationFloor`, `separationFloorOffset`, `discriminationSpan` over
 * k in [1, T) (METRICS.md); all null when `T < 2`, there are no pairs, or the scan is past
 * `MAX_SCAN_SPAN` / `MAX_SCAN_ELEMENTS`.
 */
function similarityScan(theta, span) {
    const none = { separationFloor: null, separationFloorOffset: null, discriminationSpan: null };
    if (theta === null || span === null || span < 2 || !scanAllowed(theta.length, span))
        return none;
    const r = scanSimilarityRange(theta, 1, span);
    if (r === null)
        return none;
    return { separationFloor: r.floor, separationFloorOffset: r.offset, discriminationSpan: r.negative };
}
// 2π = A + B + C + D: A and B have 24 significant bits, so n·A and n·B are exact for n < 2^29;
// A + B + C is exactly the binary64 value 2·Math.PI, and D = 2π - 2·Math.PI = 2(π - Math.PI)
// (π - Math.PI = 1.2246467991473531772e-16) carries the rest, so the turn itself is off by
// under 1e-31 per turn instead of 2.4e-16.
const TURN_A = Math.fround(2 * Math.PI);
const TURN_B = Math.fround(2 * Math.PI - TURN_A);
const TURN_C = 2 * Math.PI - TURN_A - TURN_B;
const TURN_D = 2.4492935982947064e-16;
const MAX_TURNS = 2 ** 29;
/**
 * radians: `x - n·2π` for the nearest whole n (Cody–Waite reduction), so the seeds avoid the slow
 * large-argument path of Math.cos. `x - n·A` is exact (Sterbenz), the three later steps add
 * under 20ε for a result within π. Arguments past `2^29` turns are left to Math.cos.
 */
function reduceTurns(x) {
    if (!(x > 1e5))
        return x;
    const n = Math.round(x / (2 * Math.PI));
    if (n >= MAX_TURNS)
        return x;
    return x - n * TURN_A - n * TURN_B - n * TURN_C - n * TURN_D;
}
/**
 * Fills buf[j] with an approximation of Σ_i cos((k0 + j) θ_i), j < n (error bound above).
 * Eight, then four, then single pairs per pass: independent recurrences overlap in the CPU.
 */
function fillBlock(theta, a2, cT, sT, k0, n, buf, seedNow, seedBefore) {
    const P = theta.length;
    for (let i = 0; i < P; i++) {
        // cos(x0) and cos(x0 - θ) = cos(x0)cos(θ) + sin(x0)sin(θ), one argument x0 = fl(k0 θ)
        const x = reduceTurns(k0 * theta[i]);
        const c = Math.cos(x);
        seedNow[i] = c;
        seedBefore[i] = c * cT[i] + Math.sin(x) * sT[i];
    }
    buf.fill(0, 0, n);
    let i = 0;
    for (; i + 8 <= P; i += 8) {
        const a0 = a2[i], a1 = a2[i + 1], a2_ = a2[i + 2], a3 = a2[i + 3];
        const a4 = a2[i + 4], a5 = a2[i + 5], a6 = a2[i + 6], a7 = a2[i + 7];
        let q0 = seedNow[i], q1 = seedNow[i + 1], q2 = seedNow[i + 2], q3 = seedNow[i + 3];
        let q4 = seedNow[i + 4], q5 = seedNow[i + 5], q6 = seedNow[i + 6], q7 = seedNow[i + 7];
        let p0 = seedBefore[i], p1 = seedBefore[i + 1], p2 = seedBefore[i + 2], p3 = seedBefore[i + 3];
        let p4 = seedBefore[i + 4], p5 = seedBefore[i + 5], p6 = seedBefore[i + 6], p7 = seedBefore[i + 7];
        for (let j = 0; j < n; j++) {
            buf[j] += q0 + q1 + (q2 + q3) + (q4 + q5 + (q6 + q7));
            const r0 = a0 * q0 - p0, r1 = a1 * q1 - p1, r2 = a2_ * q2 - p2, r3 = a3 * q3 - p3;
            const r4 = a4 * q4 - p4, r5 = a5 * q5 - p5, r6 = a6 * q6 - p6, r7 = a7 * q7 - p7;
            p0 = q0;
            q0 = r0;
            p1 = q1;
            q1 = r1;
            p2 = q2;
            q2 = r2;
            p3 = q3;
            q3 = r3;
            p4 = q4;
            q4 = r4;
            p5 = q5;
            q5 = r5;
            p6 = q6;
            q6 = r6;
            p7 = q7;
            q7 = r7;
        }
    }
    for (; i + 4 <= P; i += 4) {
        const a0 = a2[i], a1 = a2[i + 1], a2_ = a2[i + 2], a3 = a2[i + 3];
        let q0 = seedNow[i], q1 = seedNow[i + 1], q2 = seedNow[i + 2], q3 = seedNow[i + 3];
        let p0 = seedBefore[i], p1 = seedBefore[i + 1], p2 = seedBefore[i + 2], p3 = seedBefore[i + 3];
        for (let j = 0; j < n; j++) {
            buf[j] += q0 + q1 + (q2 + q3);
            const r0 = a0 * q0 - p0, r1 = a1 * q1 - p1, r2 = a2_ * q2 - p2, r3 = a3 * q3 - p3;
            p0 = q0;
            q0 = r0;
            p1 = q1;
            q1 = r1;
            p2 = q2;
            q2 = r2;
            p3 = q3;
            q3 = r3;
        }
    }
    for (; i < P; i++) {
        const a = a2[i];
        let q = seedNow[i];
        let p = seedBefore[i];
        for (let j = 0; j < n; j++) {
            buf[j] += q;
            const r = a * q - p;
            p = q;
            q = r;
        }
    }
}

;// CONCATENATED MODULE: ./src/core/metrics/spans.ts

/** tokens: the config's maximum positions, null when not a positive whole number. */
function declaredSpan(spec) {
    return positiveCount(spec.declaredSpan);
}
/** tokens: the served span (serving block, policy or CLI flag), null when none or invalid. */
function servedSpan(spec) {
    return positiveCount(spec.serving?.span);
}
/**
 * tokens: `T`, the served span when one is given, otherwise the declared span (METRICS.md).
 * A served span that is given but invalid gives null rather than silently falling back.
 */
function evaluationSpan(spec) {
    const served = spec.serving?.span;
    if (served !== null && served !== undefined)
        return positiveCount(served);
    return declaredSpan(spec);
}
/**
 * tokens: `L0`, an explicit trained span, else the original span of a rotary scaling block,
 * else the declared span (METRICS.md). A stated but invalid value gives null.
 */
function trainedSpan(spec) {
    if (spec.trainedSpan !== null && spec.trainedSpan !== undefined)
        return positiveCount(spec.trainedSpan);
    const code = spec.position;
    if (code?.kind === 'rotary' && code.scaling && code.scaling.originalSpan !== null && code.scaling.originalSpan !== undefined) {
        return positiveCount(code.scaling.originalSpan);
    }
    return declaredSpan(spec);
}

;// CONCATENATED MODULE: ./src/core/metrics/token-budget.ts

/**
 * tokens: `T - reservedOutputTokens - reservedPromptTokens`, a missing one of the two counting 0;
 * null when the serving block gives neither, or one is not a whole number (may be negative:
 * the reservations do not fit).
 */
function tokenBudget(serving, span) {
    const out = serving?.outputTokens ?? null;
    const prompt = serving?.promptTokens ?? null;
    if (span === null || (out === null && prompt === null))
        return null;
    const o = out === null ? 0 : nonNegativeCount(out);
    const p = prompt === null ? 0 : nonNegativeCount(prompt);
    return o === null || p === null ? null : span - o - p;
}

;// CONCATENATED MODULE: ./src/core/metrics/wavelengths.ts
/**
 * Wavelengths of frequency pairs, `λ_i = 2π/θ'_i` (Vaswani et al. 2017, §3.5; Peng et al. 2023,
 * YaRN, Eq. 13).
 */
/** tokens: `min_i 2π/θ'_i` and `max_i 2π/θ'_i`; null for no pairs. */
function wavelengthRange(theta) {
    if (theta.length === 0)
        return null;
    let fastest = Infinity;
    let slowest = 0;
    for (let i = 0; i < theta.length; i++) {
        const lambda = (2 * Math.PI) / theta[i];
        if (lambda < fastest)
            fastest = lambda;
        if (lambda > slowest)
            slowest = lambda;
    }
    return Number.isFinite(fastest) && Number.isFinite(slowest) ? { fastest, slowest } : null;
}
/** count: pairs with `2π/θ'_i > L0`: they never finish one turn over the trained span (METRICS.md). */
function unturnedPairs(theta, trained) {
    let n = 0;
    for (let i = 0; i < theta.length; i++)
        if ((2 * Math.PI) / theta[i] > trained)
            n++;
    return n;
}
/**
 * count: pairs with `θ_i L0 < 2π` and `θ'_i T > θ_i L0 (1 + 1e-9)`: at the span's end they reach
 * angles never seen in training (METRICS.md; the 1e-9 keeps rounding noise from counting).
 */
function exposedPairs(theta, scaled, trained, span) {
    let n = 0;
    for (let i = 0; i < theta.length; i++) {
        const seen = theta[i] * trained;
        if (seen < 2 * Math.PI && scaled[i] * span > seen * (1 + 1e-9))
            n++;
    }
    return n;
}

;// CONCATENATED MODULE: ./src/core/metrics/compute.ts

















/**
 * per token: `θ_i` and `θ'_i` of the spec's code over span `T` and trained span `L0`; null for
 * learned, ALiBi and position-free codes and for degenerate input.
 */
function frequencyPlan(spec, span, trained) {
    const theta = baseFrequencies(spec);
    if (theta === null)
        return null;
    const code = spec.position;
    if (code.kind !== 'rotary')
        return { theta, scaled: theta };
    const r = rotaryWidth(spec.headDim, code.fraction);
    const scaled = scaleFrequencies(theta, code.base, r, code.scaling ?? null, span, trained);
    return scaled === null ? null : { theta, scaled };
}
/** ratio: `attentionScale`: `0.1 ln(s) + 1` for yarn (Peng et al. 2023, Eq. 22), 1 otherwise. */
function attentionScale(spec) {
    const code = spec.position;
    if (code?.kind === 'rotary' && code.scaling?.kind === 'yarn')
        return yarnAttentionScale(code.scaling.factor);
    return 1;
}
/** Every metric of METRICS.md for one spec; null where a metric does not apply or its inputs are degenerate. */
function computeMetrics(spec) {
    const declared = declaredSpan(spec);
    const served = servedSpan(spec);
    const span = evaluationSpan(spec);
    const trained = trainedSpan(spec);
    const reachTokens = reach(spec, trained, declared);
    const plan = frequencyPlan(spec, span, trained);
    const range = plan ? wavelengthRange(plan.scaled) : null;
    const similarity = similarityScan(plan ? plan.scaled : null, span);
    const precision = {};
    for (const format of ['fp32', 'bf16', 'fp16']) {
        precision[format] = numberFormatMetrics(format, plan ? plan.scaled : null, span);
    }
    const slopes = spec.position?.kind === 'alibi' ? alibiSlopes(spec.heads) : null;
    const counts = parameterCounts(spec);
    const weights = weightBytes(spec, counts ? counts.params : null);
    const cache = cacheBytesAtSpan(spec, span);
    const heads = positiveCount(spec.heads);
    const headDim = positiveCount(spec.headDim);
    return {
        declaredSpan: declared,
        trainedSpan: trained,
        servedSpan: served,
        evaluationSpan: span,
        reach: reachTokens,
        scalingCover: scalingCover(spec, trained),
        headroom: headroom(reachTokens, span),
        extensionRatio: extensionRatio(span, trained),
        fastestWavelength: range ? range.fastest : null,
        slowestWavelength: range ? range.slowest : null,
        unturnedPairs: plan && trained !== null ? unturnedPairs(plan.scaled, trained) : null,
        exposedPairs: plan && trained !== null && span !== null ? exposedPairs(plan.theta, plan.scaled, trained, span) : null,
        separationFloor: similarity.separationFloor,
        separationFloorOffset: similarity.separationFloorOffset,
        discriminationSpan: similarity.discriminationSpan,
        attentionScale: attentionScale(spec),
        alibiSlopes: slopes,
        alibiHorizon: alibiHorizon(slopes),
        receptiveField: receptiveField(spec),
        positionShare: positionShare(spec),
        precision,
        params: counts ? counts.params : null,
        activeParams: counts ? counts.activeParams : null,
        nonEmbeddingParams: counts ? counts.nonEmbeddingParams : null,
        weightBytes: weights,
        cachePerTokenBytes: cachePerTokenBytes(spec),
        cacheBytesAtSpan: cache,
        memoryBytes: memoryBytes(weights, cache),
        fitSequences: fitSequences(spec, weights, cache, servedSequences(spec)),
        flopsPerToken: flopsPerToken(counts ? counts.nonEmbeddingParams : null, positiveCount(spec.layers), span, heads, headDim),
        tokenBudget: tokenBudget(spec.serving, span),
    };
}

;// CONCATENATED MODULE: ./src/core/parse/errors.ts
/**
 * The one error the readers throw: the file cannot be read as a model description at all
 * (bad text, bad syntax, an unsafe or unreadable structure, no model in it). Problems with
 * single values are findings instead, so one run reports all of them.
 */
class ReadError extends Error {
    name = 'ReadError';
    /** The file as the caller named it. */
    file;
    /** 1-based line the problem was found at (default: `null`, the whole file). */
    line;
    /** Dotted key the problem is about (default: `null`). */
    key;
    /** The problem without the file and line prefix. */
    reason;
    constructor(file, line, reason, key = null) {
        super(`${file}${line === null ? '' : `, line ${line}`}: ${reason}`);
        this.file = file;
        this.line = line;
        this.key = key;
        this.reason = reason;
    }
}
/**
 * The text parsed but holds no model description (no format marker, no checkpoint keys). The
 * gate skips such files when only its default globs picked them, since `config.json` is a common
 * name for other things.
 */
class NotAModelError extends ReadError {
}

;// CONCATENATED MODULE: ./src/core/parse/quote.ts
/**
 * How values, keys and paths from an untrusted file are quoted in messages: short, exact and
 * unambiguous. Escaping for markdown or HTML is the renderer's job; this only keeps messages
 * readable (bounded length, visible quotes, `-0` kept).
 */
const MAX_QUOTED = 60;
/** `s` cut to `max` characters with an ellipsis (default: `60`). */
function truncate(s, max = MAX_QUOTED) {
    return s.length <= max ? s : `${s.slice(0, max - 1)}…`;
}
/**
 * A number as a reader would write it: `-0` stays `-0`, whole numbers past 2^53 in full (the
 * exact value of the double, not JavaScript's shortest form `1152921504606847000`), others as
 * JavaScript prints them.
 */
function formatNumber(n) {
    if (Object.is(n, -0))
        return '-0';
    if (Number.isInteger(n) && !Number.isSafeInteger(n) && Math.abs(n) < 1e21)
        return BigInt(n).toString();
    return String(n);
}
/** A string in double quotes with JSON escapes, so spaces, quotes and controls stay visible. */
function quoteText(s) {
    return truncate(JSON.stringify(s), MAX_QUOTED + 2);
}
/**
 * The dotted form of a path as written in the file: keys joined by `.`, list indexes in
 * brackets (`rope_scaling.factor`, `layer_types[3]`).
 */
function dottedKey(path) {
    let out = '';
    for (const segment of path) {
        if (typeof segment === 'number')
            out += `[${segment}]`;
        else
            out += out === '' ? truncate(segment) : `.${truncate(segment)}`;
    }
    return out;
}
/** What kind of value `v` is, in words, for "expected …" messages. */
function kindOf(v) {
    if (v === null || v === undefined)
        return 'empty';
    if (Array.isArray(v))
        return 'a list';
    switch (typeof v) {
        case 'string':
            return 'text';
        case 'number':
            return 'a number';
        case 'boolean':
            return 'a boolean';
        case 'object':
            return 'a mapping';
        default:
            return typeof v;
    }
}
/**
 * The value as it appears in the file: `literal` (the scalar's source text) when known,
 * otherwise a short rendering; collections are named, not dumped.
 */
function quoteValue(v, literal = null) {
    if (Array.isArray(v))
        return `a list of ${v.length} item${v.length === 1 ? '' : 's'}`;
    if (v !== null && typeof v === 'object')
        return 'a mapping';
    if (typeof v === 'string')
        return quoteText(v);
    if (literal !== null && literal.trim() !== '')
        return truncate(literal.trim());
    if (v === null || v === undefined)
        return 'empty';
    if (typeof v === 'number')
        return formatNumber(v);
    return String(v);
}

;// CONCATENATED MODULE: ./src/core/parse/spec-defaults.ts
/** Rotary base (default: `10000`; Su et al. 2021, RoFormer, eq. 15 with Vaswani et al.'s 10000). */
const DEFAULT_ROTARY_BASE = 10000;
/** Share of each head that rotates (default: `1`). */
const DEFAULT_ROTARY_FRACTION = 1;
/** yarn ramp ends α and β (default: `1` and `32`; Peng et al. 2023, YaRN, section 3.2, "for the Llama family"). */
const DEFAULT_YARN_ALPHA = 1;
const DEFAULT_YARN_BETA = 32;
/** banded low and high frequency factors (default: `1` and `4`; common practice). */
const DEFAULT_BANDED_LOW = 1;
const DEFAULT_BANDED_HIGH = 4;
/** Feed-forward width over model width (default: `4`; Vaswani et al. 2017, Table 3: 2048 = 4 × 512). */
const DEFAULT_FFN_RATIO = 4;
/** A size the defaults can be derived from: a whole number of at least 1 a double holds exactly. */
function isCount(n) {
    return typeof n === 'number' && Number.isSafeInteger(n) && n >= 1;
}
/** The spec with every documented default applied; derived values are NaN when their inputs are unusable. */
function completeSpec(draft) {
    const { layers, hidden, heads } = draft;
    const kvHeads = draft.kvHeads ?? (isCount(heads) ? heads : NaN);
    const headDim = draft.headDim ?? (isCount(hidden) && isCount(heads) ? hidden / heads : NaN);
    const ffn = draft.ffn ?? (isCount(hidden) ? DEFAULT_FFN_RATIO * hidden : NaN);
    return {
        name: draft.name ?? null,
        layers,
        hidden,
        heads,
        kvHeads,
        headDim,
        ffn,
        gated: draft.gated ?? false,
        vocab: draft.vocab,
        tied: draft.tied ?? true,
        bias: draft.bias ?? false,
        experts: draft.experts ?? null,
        encoder: draft.encoder ? completeEncoder(draft.encoder, hidden) : null,
        position: completePosition(draft.position),
        declaredSpan: draft.declaredSpan,
        trainedSpan: draft.trainedSpan ?? null,
        slidingWindow: draft.slidingWindow ?? null,
        windowLayers: draft.windowLayers ?? null,
        dtypes: {
            weights: draft.dtypes?.weights ?? null,
            cache: draft.dtypes?.cache ?? null,
            positions: draft.dtypes?.positions ?? null,
        },
        embeddingInitStd: draft.embeddingInitStd ?? null,
        embeddingMultiplier: draft.embeddingMultiplier ?? null,
        serving: {
            span: draft.serving?.span ?? null,
            sequences: draft.serving?.sequences ?? null,
            deviceGiB: draft.serving?.deviceGiB ?? null,
            reserve: draft.serving?.reserve ?? null,
            outputTokens: draft.serving?.outputTokens ?? null,
            promptTokens: draft.serving?.promptTokens ?? null,
        },
    };
}
function completeEncoder(e, hidden) {
    return {
        layers: e.layers,
        heads: e.heads,
        kvHeads: e.kvHeads ?? (isCount(e.heads) ? e.heads : NaN),
        headDim: e.headDim ?? (isCount(hidden) && isCount(e.heads) ? hidden / e.heads : NaN),
        ffn: e.ffn ?? (isCount(hidden) ? DEFAULT_FFN_RATIO * hidden : NaN),
    };
}
function completePosition(p) {
    if (p.kind !== 'rotary')
        return { kind: p.kind };
    return {
        kind: 'rotary',
        base: p.base ?? DEFAULT_ROTARY_BASE,
        fraction: p.fraction ?? DEFAULT_ROTARY_FRACTION,
        scaling: p.scaling ? completeScaling(p.scaling) : null,
    };
}
function completeScaling(s) {
    return {
        kind: s.kind,
        factor: s.factor,
        originalSpan: s.originalSpan ?? null,
        alpha: s.alpha ?? DEFAULT_YARN_ALPHA,
        beta: s.beta ?? DEFAULT_YARN_BETA,
        low: s.low ?? DEFAULT_BANDED_LOW,
        high: s.high ?? DEFAULT_BANDED_HIGH,
    };
}

;// CONCATENATED MODULE: ./src/core/parse/checkpoint-dialect.ts


/** Keys whose presence marks a mapping as a checkpoint-style model config. */
const CHECKPOINT_MARKERS = [
    'hidden_size', 'num_hidden_layers', 'num_attention_heads', 'n_embd', 'n_layer', 'n_head', 'd_model',
    'encoder_layers', 'decoder_layers', 'num_layers', 'num_heads',
];
/** Activations gated feed-forward configs are written with. */
const GATED_ACTIVATIONS = ['silu', 'swish', 'swiglu', 'geglu', 'reglu'];
const ROTARY_FAMILIES = new Set([
    'llama', 'mistral', 'mixtral', 'qwen2', 'qwen2_moe', 'qwen3', 'qwen3_moe', 'gemma', 'gemma2', 'gemma3_text', 'phi',
    'phi3', 'gpt_neox', 'gptj', 'stablelm', 'starcoder2', 'olmo', 'olmo2', 'cohere', 'internlm2', 'deepseek_v2',
    'deepseek_v3', 'granite', 'falcon',
]);
const LEARNED_FAMILIES = new Set([
    'gpt2', 'gpt_bigcode', 'gpt_neo', 'opt', 'bert', 'roberta', 'xlm-roberta', 'camembert', 'distilbert', 'electra',
    'bart', 'mbart', 'biogpt', 'blenderbot', 'whisper',
]);
const SINUSOIDAL_FAMILIES = new Set(['marian', 'fsmt', 'pegasus', 'm2m_100', 'xglm', 'speech_to_text']);
const ALIBI_FAMILIES = new Set(['bloom', 'mpt']);
/** Families with relative position biases, which no modelled code describes. */
const RELATIVE_FAMILIES = new Set(['t5', 'mt5', 'umt5', 'longt5', 'switch_transformers', 'deberta', 'deberta-v2']);
const BIAS_FAMILIES = new Set([
    'gpt2', 'gpt_bigcode', 'gpt_neo', 'opt', 'bert', 'roberta', 'xlm-roberta', 'camembert', 'distilbert', 'electra',
    'bart', 'mbart', 'biogpt', 'blenderbot', 'whisper', 'marian', 'fsmt', 'pegasus', 'm2m_100', 'xglm', 'bloom',
    'gpt_neox', 'phi',
]);
const ENCODER_DECODER_FAMILIES = new Set([
    't5', 'mt5', 'umt5', 'longt5', 'switch_transformers', 'bart', 'mbart', 'marian', 'pegasus', 'm2m_100', 'fsmt',
    'blenderbot', 'whisper', 'speech_to_text',
]);
const GEMMA_FAMILIES = new Set(['gemma', 'gemma2', 'gemma3_text']);
/** Families whose feed-forward block is always gated (three matrices), whatever activation the file names. */
const GATED_FAMILIES = new Set([
    'llama', 'mistral', 'mixtral', 'qwen2', 'qwen2_moe', 'qwen3', 'qwen3_moe', 'gemma', 'gemma2', 'gemma3_text', 'phi3',
    'olmo', 'olmo2', 'cohere', 'internlm2', 'deepseek_v2', 'deepseek_v3', 'granite',
]);
/** Families whose config class turns the window off unless `use_sliding_window` is true. */
const WINDOW_OFF_FAMILIES = new Set(['qwen2', 'qwen2_moe', 'qwen3', 'qwen3_moe']);
const POSITION_TYPES = {
    absolute: 'learned', learned: 'learned', sinusoidal: 'sinusoidal', rotary: 'rotary', rope: 'rotary', alibi: 'alibi', none: 'none',
};
const RELATIVE_POSITION_TYPES = new Set(['relative_key', 'relative_key_query']);
/** `rope_type` / `type` of a scaling block to our kind; `default` is no scaling. */
const SCALING_TYPES = {
    default: 'default', linear: 'linear', dynamic: 'dynamic', yarn: 'yarn', llama3: 'banded',
};
const DTYPES = { float32: 'fp32', bfloat16: 'bf16', float16: 'fp16' };
const ROTARY_KEYS = ['rope_theta', 'rotary_emb_base', 'rope_parameters', 'rope_scaling', 'partial_rotary_factor', 'rotary_pct', 'rotary_dim'];
function isMapping(v) {
    return v !== null && v !== undefined && typeof v === 'object' && !Array.isArray(v);
}
/** Whether `value` looks like a checkpoint-style model config. */
function isCheckpointConfig(value) {
    return CHECKPOINT_MARKERS.some((k) => Object.prototype.hasOwnProperty.call(value, k) && value[k] !== null);
}
/** Reads a checkpoint-style config from `r.root` into a draft; every problem becomes a finding on `r`. */
function readCheckpoint(r) {
    const modelType = typeof r.get(['model_type']) === 'string' ? String(r.get(['model_type'])).toLowerCase() : null;
    const gpt2Style = r.has(['n_embd']) || r.has(['n_layer']);
    const encoderDecoder = r.get(['is_encoder_decoder']) === true || r.has(['encoder_layers']) || r.has(['num_decoder_layers'])
        || (modelType !== null && ENCODER_DECODER_FAMILIES.has(modelType));
    const size = (field, candidates, what, required) => {
        const path = r.first(candidates.map((k) => [k]));
        if (path !== null)
            return r.count(field, path, what);
        if (!required)
            return undefined;
        const also = candidates.length > 1 ? ` (read from ${candidates.join(', ')}, the first present)` : '';
        return r.missing([candidates[0]], `${what}${also}`);
    };
    const hidden = size('hidden', ['hidden_size', 'n_embd', 'd_model'], 'the model width', true);
    const layers = size('layers', encoderDecoder
        ? ['decoder_layers', 'num_decoder_layers', 'num_layers', 'num_hidden_layers', 'n_layer']
        : ['num_hidden_layers', 'n_layer', 'num_layers'], encoderDecoder ? 'the number of decoder layers' : 'the number of layers', true);
    const heads = size('heads', encoderDecoder
        ? ['decoder_attention_heads', 'num_heads', 'num_attention_heads', 'n_head']
        : ['num_attention_heads', 'n_head', 'num_heads'], 'the number of attention heads', true);
    let kvHeads = size('kvHeads', ['num_key_value_heads', 'num_kv_heads', 'n_head_kv'], 'key/value heads', false);
    if (kvHeads === undefined && r.get(['multi_query']) === true) {
        r.locate('kvHeads', ['multi_query']);
        kvHeads = 1;
    }
    const headDim = size('headDim', ['head_dim', 'd_kv'], 'the width of one head', false);
    const ffn = size('ffn', encoderDecoder
        ? ['decoder_ffn_dim', 'd_ff', 'intermediate_size', 'ffn_dim']
        : ['intermediate_size', 'n_inner', 'ffn_dim', 'd_ff'], 'the feed-forward width', false);
    const vocab = size('vocab', ['vocab_size'], 'the vocabulary size', true);
    const declaredSpan = size('declaredSpan', ['max_position_embeddings', 'n_positions', 'n_ctx', 'max_seq_len', 'seq_length', 'max_target_positions'], 'the maximum positions', true);
    const encoder = encoderDecoder
        ? {
            layers: size('encoder.layers', ['encoder_layers', 'num_layers'], 'the number of encoder layers', true),
            heads: size('encoder.heads', ['encoder_attention_heads', 'num_heads'], 'the number of encoder heads', true),
            headDim: size('encoder.headDim', ['d_kv'], 'the width of one head', false),
            ffn: size('encoder.ffn', ['encoder_ffn_dim', 'd_ff'], 'the encoder feed-forward width', false),
        }
        : null;
    const experts = readExperts(r, size);
    const position = readPosition(r, modelType, gpt2Style, headDim ?? (isCount(hidden) && isCount(heads) ? hidden / heads : NaN));
    const window = readWindow(r, modelType, layers);
    return {
        name: null,
        layers,
        hidden,
        heads,
        kvHeads,
        headDim,
        ffn,
        gated: readGated(r, modelType),
        vocab,
        tied: r.flag('tied', ['tie_word_embeddings']),
        bias: readBias(r, modelType, gpt2Style),
        experts,
        encoder,
        position,
        declaredSpan,
        trainedSpan: null,
        slidingWindow: window.size,
        windowLayers: window.layers,
        dtypes: { weights: readWeights(r), cache: null, positions: null },
        embeddingInitStd: r.real('embeddingInitStd', ['initializer_range'], 'standard deviation', {
            test: (n) => n > 0,
            expected: 'a standard deviation above 0',
        }) ?? null,
        embeddingMultiplier: readMultiplier(r, modelType, hidden),
    };
}
function readExperts(r, size) {
    const totalKeys = ['num_local_experts', 'num_experts', 'n_routed_experts'];
    const totalPath = r.first(totalKeys.map((k) => [k]));
    if (totalPath === null)
        return null;
    // Dense configs of mixture-capable families write 0 or 1 experts.
    const stated = r.get(totalPath);
    if (stated === 0 || stated === 1)
        return null;
    return {
        total: size('experts.total', totalKeys, 'the number of experts', true),
        active: size('experts.active', ['num_experts_per_tok'], 'the number of experts each token uses', true),
    };
}
function readGated(r, modelType) {
    const proj = r.text(null, ['feed_forward_proj'], 'the feed-forward kind, e.g. "gated-gelu"');
    if (proj !== undefined) {
        r.locate('gated', ['feed_forward_proj']);
        return proj.startsWith('gated-');
    }
    const path = r.first([['hidden_act'], ['hidden_activation'], ['activation_function'], ['dense_act_fn']]);
    const act = path === null ? undefined : r.text('gated', path, 'an activation name');
    if (act !== undefined && GATED_ACTIVATIONS.includes(act.toLowerCase()))
        return true;
    // The architecture decides, whatever activation it is configured with.
    if (modelType !== null && GATED_FAMILIES.has(modelType)) {
        r.locate('gated', ['model_type']);
        return true;
    }
    return path === null ? undefined : false;
}
function readBias(r, modelType, gpt2Style) {
    const stated = [['attention_bias'], ['mlp_bias'], ['bias'], ['use_bias']].filter((p) => r.has(p));
    if (stated.length > 0) {
        const values = stated.map((p) => ({ p, v: r.flag('bias', p) }));
        const on = values.find((x) => x.v === true);
        if (on)
            r.locate('bias', on.p);
        else
            r.locate('bias', values[0].p);
        return on ? true : values.some((x) => x.v === false) ? false : undefined;
    }
    if ((modelType !== null && BIAS_FAMILIES.has(modelType)) || (modelType === null && gpt2Style)) {
        r.locate('bias', modelType !== null ? ['model_type'] : r.has(['n_embd']) ? ['n_embd'] : ['n_layer']);
        return true;
    }
    return undefined;
}
function readWeights(r) {
    const path = r.first([['dtype'], ['torch_dtype']]);
    if (path === null)
        return null;
    const name = r.text('dtypes.weights', path, 'a weight format');
    if (name === undefined)
        return null;
    if (name === 'auto') {
        r.report('key-ignored', path, `${r.key(path)} is "auto", which names no format; the weights are read at the default bf16, so state float32, bfloat16 or float16`);
        return null;
    }
    const dtype = DTYPES[name];
    if (dtype === undefined) {
        r.report('value-invalid', path, `${r.key(path)} is ${r.quote(path)}; expected one of ${Object.keys(DTYPES).join(', ')}`);
        return null;
    }
    return dtype;
}
function readMultiplier(r, modelType, hidden) {
    const scale = r.flag('embeddingMultiplier', ['scale_embedding']);
    const root = isCount(hidden) ? Math.sqrt(hidden) : NaN;
    if (scale !== undefined)
        return scale ? root : 1;
    if (modelType !== null && GEMMA_FAMILIES.has(modelType)) {
        r.locate('embeddingMultiplier', ['model_type']);
        return root;
    }
    return null;
}
function readWindow(r, modelType, layers) {
    if (!r.has(['sliding_window']))
        return { size: null, layers: null };
    const use = r.flag(null, ['use_sliding_window']);
    if (use === false)
        return { size: null, layers: null };
    if (use === undefined && !r.has(['use_sliding_window']) && modelType !== null && WINDOW_OFF_FAMILIES.has(modelType)) {
        r.report('key-ignored', ['sliding_window'], `${r.key(['sliding_window'])} has no effect: use_sliding_window is not stated, and model_type "${modelType}" turns the window off unless it is true; add "use_sliding_window": true, or remove sliding_window`);
        return { size: null, layers: null };
    }
    const size = r.count('slidingWindow', ['sliding_window'], 'tokens') ?? null;
    const types = r.get(['layer_types']);
    if (Array.isArray(types)) {
        r.locate('windowLayers', ['layer_types']);
        const windowed = types.filter((t) => t === 'sliding_attention').length;
        if (windowed === 0) {
            r.report('key-ignored', ['sliding_window'], `${r.key(['sliding_window'])} has no effect: no entry of ${r.key(['layer_types'])} is "sliding_attention"`);
            return { size: null, layers: null };
        }
        return { size, layers: windowed };
    }
    if (r.has(['max_window_layers'])) {
        const first = r.count('windowLayers', ['max_window_layers'], 'layer index');
        if (first === undefined || Number.isNaN(first) || !isCount(layers))
            return { size, layers: first === undefined ? null : NaN };
        const windowed = layers - Math.max(0, first);
        if (windowed <= 0) {
            r.report('key-ignored', ['sliding_window'], `${r.key(['sliding_window'])} has no effect: layers from index ${r.key(['max_window_layers'])} (${first}) on use the window, and there are ${layers} layers; lower max_window_layers to below ${layers}, or remove sliding_window`);
            delete r.locations.windowLayers;
            return { size: null, layers: null };
        }
        return { size, layers: windowed };
    }
    return { size, layers: null };
}
function readPosition(r, modelType, gpt2Style, headDim) {
    const typePath = ['position_embedding_type'];
    const alibiPath = r.get(['alibi']) === true ? ['alibi'] : r.get(['attn_config', 'alibi']) === true ? ['attn_config', 'alibi'] : null;
    const rotaryKeys = ROTARY_KEYS.filter((k) => r.has([k]));
    let kind;
    let assumed = null;
    const stated = r.text('position', typePath, 'a position embedding type');
    if (stated !== undefined) {
        const lower = stated.toLowerCase();
        if (POSITION_TYPES[lower] !== undefined)
            kind = POSITION_TYPES[lower];
        else if (RELATIVE_POSITION_TYPES.has(lower)) {
            kind = 'none';
            assumed = `${r.key(typePath)} is ${r.quote(typePath)}: relative position embeddings are not one of the modelled codes (learned, sinusoidal, rotary, alibi), so the code is read as none and positional-range metrics are not computed`;
        }
        else {
            r.report('value-invalid', typePath, `${r.key(typePath)} is ${r.quote(typePath)}; expected one of ${[...Object.keys(POSITION_TYPES), ...RELATIVE_POSITION_TYPES].join(', ')}`);
            kind = 'none';
        }
    }
    else if (r.has(typePath)) {
        kind = 'none';
    }
    else if (alibiPath !== null) {
        r.locate('position', alibiPath);
        kind = 'alibi';
    }
    else if (r.get(['sinusoidal_pos_embds']) === true) {
        r.locate('position', ['sinusoidal_pos_embds']);
        kind = 'sinusoidal';
    }
    else if (rotaryKeys.length > 0) {
        r.locate('position', [rotaryKeys[0]]);
        kind = 'rotary';
    }
    else if (modelType !== null && (ROTARY_FAMILIES.has(modelType) || LEARNED_FAMILIES.has(modelType) || SINUSOIDAL_FAMILIES.has(modelType) || ALIBI_FAMILIES.has(modelType) || RELATIVE_FAMILIES.has(modelType))) {
        r.locate('position', ['model_type']);
        if (ROTARY_FAMILIES.has(modelType)) {
            kind = 'rotary';
            assumed = `model_type "${modelType}" uses a rotary code, but no rotary key (rope_theta, rope_parameters) is stated, so the base is read as ${DEFAULT_ROTARY_BASE}; state rope_theta`;
        }
        else if (RELATIVE_FAMILIES.has(modelType)) {
            kind = 'none';
            assumed = `model_type "${modelType}" uses relative position biases, which are not one of the modelled codes (learned, sinusoidal, rotary, alibi), so the code is read as none and positional-range metrics are not computed`;
        }
        else {
            kind = LEARNED_FAMILIES.has(modelType) ? 'learned' : SINUSOIDAL_FAMILIES.has(modelType) ? 'sinusoidal' : 'alibi';
        }
    }
    else if (gpt2Style) {
        r.locate('position', r.has(['n_positions']) ? ['n_positions'] : ['n_embd']);
        kind = 'learned';
    }
    else {
        kind = 'none';
        assumed = `no position code is stated (no rope_theta, position_embedding_type or alibi key) and model_type ${modelType === null ? 'is not stated' : `${quoteText(modelType)} is not a known family`}, so the code is read as none and positional-range metrics are not computed; state rope_theta for a rotary code or position_embedding_type otherwise`;
    }
    if (assumed !== null)
        r.report('position-code-assumed', r.has(typePath) ? typePath : r.has(['model_type']) ? ['model_type'] : null, assumed);
    if (alibiPath !== null && kind !== 'alibi') {
        r.report('key-ignored', alibiPath, `${r.key(alibiPath)} has no effect: ${r.key(typePath)} states the ${kind} code; remove one of them`);
    }
    if (kind !== 'rotary') {
        for (const key of rotaryKeys) {
            r.report('key-ignored', [key], `${r.key([key])} has no effect: it applies to rotary codes, and the code is read as ${kind}${r.has(typePath) ? ` (${r.key(typePath)})` : alibiPath ? ` (${r.key(alibiPath)})` : ''}`);
        }
        return { kind };
    }
    return readRotary(r, headDim);
}
function readRotary(r, headDim) {
    // Newer checkpoint libraries put every rotary value in rope_parameters, per layer type where types differ.
    let params = null;
    const rp = r.get(['rope_parameters']);
    if (isMapping(rp)) {
        const nested = Object.keys(rp).filter((k) => isMapping(rp[k]));
        if (nested.length > 0 && !('rope_type' in rp) && !('rope_theta' in rp)) {
            const chosen = nested.includes('full_attention') ? 'full_attention' : nested[0];
            params = ['rope_parameters', chosen];
            for (const other of nested.filter((k) => k !== chosen)) {
                r.report('key-ignored', ['rope_parameters', other], `${r.key(['rope_parameters', other])} is not read: one rotary code describes the model, taken from ${r.key(params)}`);
            }
        }
        else
            params = ['rope_parameters'];
    }
    else if (rp !== undefined) {
        r.report('value-invalid', ['rope_parameters'], `${r.key(['rope_parameters'])} ${r.is(['rope_parameters'])}; expected a mapping with rope_type and rope_theta`);
    }
    const basePath = r.first([...(params ? [[...params, 'rope_theta']] : []), ['rope_theta'], ['rotary_emb_base']]);
    const base = basePath === null ? undefined : r.real('position.base', basePath, 'rotary base', {
        test: (n) => n > 1,
        expected: 'a rotary base above 1 (commonly 10000 or more)',
    });
    let fraction;
    const fractionPath = r.first([...(params ? [[...params, 'partial_rotary_factor']] : []), ['partial_rotary_factor'], ['rotary_pct']]);
    if (fractionPath !== null) {
        fraction = r.real('position.fraction', fractionPath, 'share', { test: (n) => n > 0 && n <= 1, expected: 'a share of the head above 0 and at most 1' });
    }
    else if (r.has(['rotary_dim'])) {
        const dim = r.count('position.fraction', ['rotary_dim'], 'rotated channels per head');
        if (dim !== undefined && !Number.isNaN(dim))
            fraction = isCount(headDim) ? dim / headDim : NaN;
    }
    let scalingPath = null;
    if (params !== null && typeof r.get([...params, 'rope_type']) === 'string' && r.get([...params, 'rope_type']) !== 'default')
        scalingPath = params;
    else if (r.has(['rope_scaling']))
        scalingPath = ['rope_scaling'];
    return { kind: 'rotary', base, fraction, scaling: scalingPath === null ? null : readScaling(r, scalingPath) };
}
function readScaling(r, at) {
    const block = r.get(at);
    if (!isMapping(block)) {
        r.report('value-invalid', at, `${r.key(at)} ${r.is(at)}; expected a mapping with rope_type and factor`);
        return null;
    }
    const typePath = r.first([[...at, 'rope_type'], [...at, 'type']]);
    if (typePath === null) {
        r.report('scaling-kind-unknown', at, `${r.key(at)} states no rope_type (or type); known kinds: ${knownKinds()}; without a kind the code is read unscaled`);
        return null;
    }
    const name = r.text('position.scaling', typePath, 'a scaling kind');
    if (name === undefined)
        return null;
    const kind = SCALING_TYPES[name];
    if (kind === undefined) {
        r.report('scaling-kind-unknown', typePath, `${r.key(typePath)} is ${r.quote(typePath)}, not a known scaling kind (${knownKinds()}); the code is read unscaled, so its reach is understated or wrong — describe the model in the context-reach format if its scaling is one of linear, ntk, dynamic, yarn or banded`);
        return null;
    }
    if (kind === 'default')
        return null;
    const factor = r.real('position.scaling.factor', [...at, 'factor'], 'scaling factor') ?? r.missing([...at, 'factor'], 'the scaling factor (extended span over original span)');
    const originalPath = r.first([[...at, 'original_max_position_embeddings'], ['original_max_position_embeddings']]);
    const draft = {
        kind,
        factor,
        originalSpan: originalPath === null ? null : r.count('position.scaling.originalSpan', originalPath, 'tokens'),
    };
    if (kind === 'yarn') {
        draft.alpha = r.real('position.scaling.alpha', [...at, 'beta_slow'], 'ramp start', { test: (n) => n >= 0, expected: 'a ramp start of at least 0' });
        draft.beta = r.real('position.scaling.beta', [...at, 'beta_fast'], 'ramp end', { test: (n) => n > 0, expected: 'a ramp end above 0' });
        ordered(r, at, 'beta_slow', draft.alpha, DEFAULT_YARN_ALPHA, 'beta_fast', draft.beta, DEFAULT_YARN_BETA);
        for (const key of ['attention_factor', 'mscale', 'mscale_all_dim']) {
            if (r.has([...at, key])) {
                r.report('key-ignored', [...at, key], `${r.key([...at, key])} is not modelled: attentionScale uses 0.1·ln(s) + 1 (YaRN, Peng et al. 2023, eq. 22), whatever this key sets`);
            }
        }
    }
    if (kind === 'banded') {
        draft.low = r.real('position.scaling.low', [...at, 'low_freq_factor'], 'low-frequency factor', { test: (n) => n > 0, expected: 'a factor above 0' });
        draft.high = r.real('position.scaling.high', [...at, 'high_freq_factor'], 'high-frequency factor', { test: (n) => n > 0, expected: 'a factor above 0' });
        ordered(r, at, 'low_freq_factor', draft.low, DEFAULT_BANDED_LOW, 'high_freq_factor', draft.high, DEFAULT_BANDED_HIGH);
    }
    return draft;
}
/** Ramp ends must be ordered (defaults standing in for an unstated end), or the ramp divides by zero or runs backwards. */
function ordered(r, at, lowKey, low, lowDefault, highKey, high, highDefault) {
    if (low === undefined && high === undefined)
        return;
    low ??= lowDefault;
    high ??= highDefault;
    if (Number.isNaN(low) || Number.isNaN(high) || high > low)
        return;
    r.report('value-invalid', r.has([...at, highKey]) ? [...at, highKey] : [...at, lowKey], `${r.key([...at, highKey])} (${high}) must be above ${r.key([...at, lowKey])} (${low}): the ramp between them would divide by zero or run backwards`);
}
function knownKinds() {
    return 'linear, dynamic, yarn, llama3 (read as banded), default (no scaling)';
}

;// CONCATENATED MODULE: ./src/core/rules/catalog.ts
/** Every rule id context-reach raises. Ids are stable: policies refer to them. */
const RULES = {
    'config-unreadable': {
        severity: 'block', scope: 'read',
        title: 'The model config cannot be read or parsed',
        help: 'Fix the syntax error, or exclude the file from the policy\'s `files` globs if it is not a model config.',
    },
    'value-invalid': {
        severity: 'block', scope: 'file',
        title: 'A value has the wrong type or is outside what the schema allows',
        help: 'Give the key a value of the documented type.',
    },
    'size-invalid': {
        severity: 'block', scope: 'file',
        title: 'A size is zero, negative, fractional or not finite',
        help: 'Sizes (layers, widths, heads, spans, vocabulary) must be positive whole numbers.',
    },
    'kv-heads-indivisible': {
        severity: 'block', scope: 'file',
        title: 'Key/value heads do not divide the attention heads',
        help: 'Grouped-query attention shares each key/value head among heads/kvHeads query heads; pick a divisor of heads.',
    },
    'rotary-width-odd': {
        severity: 'block', scope: 'file',
        title: 'The rotary width is not an even whole number',
        help: 'Rotary codes rotate pairs of channels: head size times rotary fraction must be an even integer.',
    },
    'scaling-factor-below-one': {
        severity: 'block', scope: 'file',
        title: 'A context scaling factor below 1',
        help: 'Scaling factors stretch the trained span; a factor below 1 shrinks it. Use 1 or more, or remove the scaling block.',
    },
    'original-span-above-declared': {
        severity: 'block', scope: 'file',
        title: 'The scaling block\'s original span exceeds the declared span',
        help: 'The original (trained) span of a scaled code should not exceed the maximum positions the config declares.',
    },
    'scaling-kind-unknown': {
        severity: 'block', scope: 'file',
        title: 'An unknown context scaling kind',
        help: 'Use one of the known kinds, or describe the model in the context-reach model format.',
    },
    'position-code-assumed': {
        severity: 'warn', scope: 'file',
        title: 'The config states no position code the reader can use, so one was assumed',
        help: 'State the position code (rope_theta, position_embedding_type or alibi), or describe the model in the context-reach model format.',
    },
    'key-ignored': {
        severity: 'warn', scope: 'file',
        title: 'A key is stated but has no effect on the model as read',
        help: 'Remove the key, or change the keys it depends on so that it takes effect.',
    },
    'span-past-reach': {
        severity: 'block', scope: 'file',
        title: 'The evaluated span goes past what the position code supports',
        help: 'Raise the scaling factor, use a learned table as large as the span, or serve a shorter span.',
    },
    'span-beyond-scaling-cover': {
        severity: 'warn', scope: 'file',
        title: 'The declared span goes beyond what the scaling accounts for, and no trained span is stated',
        help: 'State the trained span explicitly, or raise the scaling factor so original span times factor covers the declared span.',
    },
    'positions-collide': {
        severity: 'block', scope: 'file',
        title: 'Neighbouring positions round to the same value in the position dtype',
        help: 'Compute positions in a wider format (fp32 holds every integer up to 16,777,216), or serve a shorter span.',
    },
    'pairs-blurred': {
        severity: 'warn', scope: 'file',
        title: 'Some frequency pairs give neighbouring positions the same rounded angle',
        help: 'Compute angles in a wider format, or accept that those pairs cannot tell neighbours apart.',
    },
    'memory-over-budget': {
        severity: 'block', scope: 'file',
        title: 'Weights plus key/value cache at the span do not fit the device budget',
        help: 'Hold fewer concurrent sequences, store the cache in a narrower dtype, use fewer key/value heads, or serve a shorter span.',
    },
    'span-grew-code-unchanged': {
        severity: 'block', scope: 'change',
        title: 'The declared span grew while the position code stayed the same',
        help: 'A longer span needs a position code that reaches it: add or raise context scaling, or retrain at the longer span and state it.',
    },
    'frequencies-changed': {
        severity: 'warn', scope: 'change',
        title: 'The rotary base or the position frequencies changed',
        help: 'Changing the frequencies after training is a retraining-level change: make sure the checkpoint was trained or tuned for them.',
    },
    'cache-per-token-changed': {
        severity: 'info', scope: 'change',
        title: 'Key/value cache per token changed',
        help: 'Key/value heads, head size or cache dtype changed the memory each token holds.',
    },
    'limit-crossed': {
        severity: 'block', scope: 'limit',
        title: 'A metric crossed a limit of the team\'s policy',
        help: 'Change the config so the metric is within the limit, or change the limit in the policy on the base branch.',
    },
};
function isRuleId(id) {
    return Object.prototype.hasOwnProperty.call(RULES, id);
}

;// CONCATENATED MODULE: ./src/core/parse/fields.ts


class FieldReader {
    doc;
    root;
    prefix;
    nullIsAbsent;
    findings = [];
    locations = {};
    /**
     * @param doc the parsed file
     * @param root the mapping the model is read from (the whole file, or the `--at` block)
     * @param prefix document path of `root`, so keys are reported as written in the file
     * @param nullIsAbsent checkpoint configs write `null` for "not set"; the own dialect refuses it
     */
    constructor(doc, root, prefix, nullIsAbsent) {
        this.doc = doc;
        this.root = root;
        this.prefix = prefix;
        this.nullIsAbsent = nullIsAbsent;
    }
    /** The value at `path` under the root; undefined when absent (or null, where null means absent). */
    get(path) {
        let current = this.root;
        for (const segment of path) {
            if (Array.isArray(current) && typeof segment === 'number')
                current = current[segment];
            else if (current !== null && typeof current === 'object' && !Array.isArray(current) && typeof segment === 'string') {
                current = Object.prototype.hasOwnProperty.call(current, segment) ? current[segment] : undefined;
            }
            else
                return undefined;
        }
        if (current === null && this.nullIsAbsent)
            return undefined;
        return current;
    }
    has(path) {
        return this.get(path) !== undefined;
    }
    /** The first of `candidates` that is present, or null. */
    first(candidates) {
        return candidates.find((p) => this.has(p)) ?? null;
    }
    /** The key as written: dotted, from the top of the file. */
    key(path) {
        return dottedKey([...this.prefix, ...path]);
    }
    /** Line of the key; for an absent key, the line of the nearest present parent. */
    line(path) {
        for (let n = path.length; n >= 0; n--) {
            const line = this.doc.lineOf([...this.prefix, ...path.slice(0, n)]);
            if (line !== null)
                return line;
        }
        return null;
    }
    /** The value quoted as written in the file. */
    quote(path) {
        return quoteValue(this.get(path) ?? null, this.doc.literalOf([...this.prefix, ...path]));
    }
    /** "is 12 (text)"-style description of the value at `path`, for "… ; expected …" messages. */
    is(path) {
        const v = this.get(path);
        return v === null || v === undefined ? 'is empty' : `is ${this.quote(path)} (${kindOf(v)})`;
    }
    /** Records that spec field `field` came from `path`. */
    locate(field, path) {
        this.locations[field] = { key: this.key(path), line: this.line(path) };
    }
    /**
     * Adds a finding about `path` (null: the whole file), unless one about the same key or a key
     * containing it was already made: one problem, one finding.
     */
    report(rule, path, message) {
        const key = path === null ? null : this.key(path);
        if (key !== null && this.findings.some((f) => f.key !== null && (key === f.key || key.startsWith(`${f.key}.`))))
            return;
        this.findings.push({ rule, severity: RULES[rule].severity, message, key, line: path === null ? null : this.line(path) });
    }
    /** Whether a finding about `path` (or a key containing it) has been made. */
    reported(path) {
        const key = this.key(path);
        return this.findings.some((f) => f.key !== null && (key === f.key || key.startsWith(`${f.key}.`)));
    }
    /** Reports `path` as missing; `what` completes "expected …". Returns NaN for the spec. */
    missing(path, what) {
        this.report('value-invalid', path, `${this.key(path)} is missing; expected ${what}`);
        return NaN;
    }
    /**
     * A size (whole number expected). Undefined when absent; NaN, reported, when not a usable
     * number; otherwise the number as written (zero, negative or fractional sizes go to the spec
     * rules).
     */
    count(field, path, what) {
        return this.number(field, path, `a whole number (${what})`, true);
    }
    /** A real number; `check` adds a range. Undefined when absent; NaN, reported, when unusable. */
    real(field, path, what, check) {
        const n = this.number(field, path, check ? check.expected : `a number (${what})`, false);
        if (n === undefined || Number.isNaN(n) || !check || check.test(n))
            return n;
        this.report('value-invalid', path, `${this.key(path)} is ${this.quote(path)}; expected ${check.expected}`);
        return NaN;
    }
    /** true or false. Undefined when absent or unusable (reported). */
    flag(field, path) {
        const v = this.get(path);
        if (v === undefined)
            return undefined;
        if (field !== null)
            this.locate(field, path);
        if (typeof v === 'boolean')
            return v;
        this.report('value-invalid', path, `${this.key(path)} ${this.is(path)}; expected true or false`);
        return undefined;
    }
    /** Text. Undefined when absent or unusable (reported). */
    text(field, path, what) {
        const v = this.get(path);
        if (v === undefined)
            return undefined;
        if (field !== null)
            this.locate(field, path);
        if (typeof v === 'string')
            return v;
        this.report('value-invalid', path, `${this.key(path)} ${this.is(path)}; expected text (${what})`);
        return undefined;
    }
    /**
     * One of the names in `choices` (compared exactly), mapped to its spec value. Undefined when
     * absent; null, reported, when not one of them.
     */
    choice(field, path, choices, what) {
        const v = this.text(field, path, what);
        if (v === undefined)
            return this.has(path) ? null : undefined;
        if (Object.prototype.hasOwnProperty.call(choices, v))
            return choices[v];
        this.report('value-invalid', path, `${this.key(path)} is ${this.quote(path)}; expected one of ${Object.keys(choices).join(', ')} (${what})`);
        return null;
    }
    number(field, path, expected, whole) {
        const v = this.get(path);
        if (v === undefined)
            return undefined;
        this.locate(field, path);
        const key = this.key(path);
        if (typeof v !== 'number') {
            this.report('value-invalid', path, `${key} ${this.is(path)}; expected ${expected}`);
            return NaN;
        }
        if (Number.isNaN(v)) {
            this.report('value-invalid', path, `${key} is ${this.quote(path)}, which is not a number; expected ${expected}`);
            return NaN;
        }
        if (!Number.isFinite(v)) {
            const written = this.quote(path);
            const overflow = /inf/i.test(written) ? ', which is not finite' : `, which overflows to ${v > 0 ? '' : '-'}Infinity in a double`;
            this.report('value-invalid', path, `${key} is ${written}${overflow}; expected ${expected}`);
            return NaN;
        }
        if (whole && Number.isInteger(v) && !Number.isSafeInteger(v)) {
            this.report('value-invalid', path, `${key} is ${this.quote(path)}, beyond 2^53 − 1 = 9007199254740991, so it is not held exactly (neighbouring whole numbers share one double); expected ${expected}`);
            return NaN;
        }
        return v;
    }
}

;// CONCATENATED MODULE: ./src/core/parse/json-pointer.ts
/**
 * JSON Pointer (RFC 6901) over parsed documents, to pick a model block inside a larger file
 * (`--at /model`). Both the string form (`/a/b`) and the URI-fragment form (`#/a/b`, section 6)
 * are read.
 */

/** A pointer that is malformed or does not lead anywhere in the document. */
class PointerError extends Error {
    name = 'PointerError';
    /** The pointer as given. */
    pointer;
    /** The longest prefix that did resolve, as a pointer (`""` for the whole document). */
    resolved;
    /** Segments of the longest prefix that did resolve, as document path segments. */
    resolvedPath;
    /** The problem, without the pointer. */
    reason;
    constructor(pointer, resolvedPath, reason) {
        const resolved = formatPointer(resolvedPath.map(String));
        super(`pointer ${JSON.stringify(pointer)} ${reason}`);
        this.pointer = pointer;
        this.resolved = resolved;
        this.resolvedPath = resolvedPath;
        this.reason = reason;
    }
}
/**
 * The reference tokens of `pointer`, unescaped (`~1` → `/`, then `~0` → `~`, RFC 6901 section 4).
 * `""` (or `"#"`) is the whole document. Throws `PointerError` on a malformed pointer.
 */
function parsePointer(pointer) {
    let text = pointer;
    if (text.startsWith('#')) {
        try {
            text = decodeURIComponent(text.slice(1));
        }
        catch {
            throw new PointerError(pointer, [], 'is not a valid URI fragment: a % escape is malformed');
        }
    }
    if (text === '')
        return [];
    if (!text.startsWith('/')) {
        throw new PointerError(pointer, [], `must start with "/" (for example "/${text}")`);
    }
    return text.slice(1).split('/').map((token) => {
        if (/~(?![01])/.test(token)) {
            throw new PointerError(pointer, [], `has "~" not followed by 0 or 1 in ${JSON.stringify(token)}; write "~0" for "~" and "~1" for "/"`);
        }
        return token.replace(/~1/g, '/').replace(/~0/g, '~');
    });
}
/** The string form of a pointer to `tokens` (RFC 6901 section 5). */
function formatPointer(tokens) {
    return tokens.map((t) => `/${t.replace(/~/g, '~0').replace(/\//g, '~1')}`).join('');
}
/**
 * The value `pointer` refers to inside `root`, with the document path that leads to it
 * (list indexes as numbers). Only own keys are followed. Throws `PointerError` saying where the
 * walk stopped and why.
 */
function resolvePointer(root, pointer) {
    const tokens = parsePointer(pointer);
    let current = root;
    const path = [];
    for (const token of tokens) {
        if (Array.isArray(current)) {
            if (token === '-')
                throw new PointerError(pointer, path, `stops at ${where(path)}: "-" names the position after the last item, which holds no value`);
            if (!/^(0|[1-9][0-9]*)$/.test(token)) {
                throw new PointerError(pointer, path, `stops at ${where(path)}: that is a list, and ${JSON.stringify(token)} is not an index (0, 1, 2, … without leading zeros)`);
            }
            const index = Number(token);
            if (index >= current.length) {
                throw new PointerError(pointer, path, `stops at ${where(path)}: index ${index} is past the end of a list of ${current.length}`);
            }
            current = current[index];
            path.push(index);
        }
        else if (current !== null && typeof current === 'object') {
            if (!Object.prototype.hasOwnProperty.call(current, token)) {
                const keys = Object.keys(current);
                const some = keys.slice(0, 8).map((k) => quoteText(k)).join(', ');
                throw new PointerError(pointer, path, `stops at ${where(path)}: no key ${JSON.stringify(token)} there${keys.length ? ` (keys: ${some}${keys.length > 8 ? ', …' : ''})` : ' (the mapping is empty)'}`);
            }
            current = current[token];
            path.push(token);
        }
        else {
            throw new PointerError(pointer, path, `stops at ${where(path)}: that is ${current === null ? 'empty' : `a ${typeof current}`}, not a mapping or a list`);
        }
    }
    return { value: current, path };
}
function where(path) {
    return path.length === 0 ? 'the top level' : JSON.stringify(formatPointer(path.map(String)));
}

// EXTERNAL MODULE: ./node_modules/ajv/dist/ajv.js
var dist_ajv = __nccwpck_require__(2463);
;// CONCATENATED MODULE: ./schema/model.schema.json
const model_schema_namespaceObject = /*#__PURE__*/JSON.parse('{"$schema":"http://json-schema.org/draft-07/schema#","title":"context-reach model description","description":"A transformer model described for context-reach: its sizes, position code and number formats, and optionally how it is served. Recognised by `format: context-reach-model/1`.","type":"object","additionalProperties":false,"required":["format","model"],"properties":{"$schema":{"type":"string","description":"Schema reference for editors; ignored by context-reach."},"format":{"title":"Format","description":"Marks the file as a context-reach model description, version 1.","const":"context-reach-model/1"},"model":{"$ref":"#/definitions/model"},"serving":{"$ref":"#/definitions/serving"}},"definitions":{"model":{"title":"Model","description":"The model as trained: sizes, position code, number formats. For an encoder-decoder model the top-level sizes describe the decoder.","type":"object","additionalProperties":false,"required":["layers","hidden","heads","vocab","position","declared-span"],"properties":{"name":{"title":"Name","description":"Free-form model name, shown in reports (default: none).","type":"string","maxLength":200},"layers":{"title":"Layers","description":"Decoder (or only) stack: number of transformer layers.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[32]},"hidden":{"title":"Hidden width","description":"Model width d_model: the size of each token\'s hidden vector.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[4096]},"heads":{"title":"Attention heads","description":"Query heads per layer.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[32]},"kv-heads":{"title":"Key/value heads","description":"Key/value heads per layer; fewer than `heads` is grouped-query attention, 1 is multi-query (default: `heads`). Must divide `heads`.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[8]},"head-dim":{"title":"Head width","description":"Width of one attention head (default: `hidden / heads`).","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[128]},"feed-forward":{"title":"Feed-forward block","type":"object","additionalProperties":false,"properties":{"size":{"title":"Feed-forward width","description":"Inner width of the feed-forward block (default: `4 * hidden`).","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[14336]},"gated":{"title":"Gated","description":"Gated feed-forward with three matrices (SwiGLU-style) instead of two (default: `false`).","type":"boolean","default":false}}},"vocab":{"title":"Vocabulary","description":"Number of token embeddings.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[32000]},"tied-output":{"title":"Tied output matrix","description":"The output projection shares the token embedding matrix (default: `true`).","type":"boolean","default":true},"bias":{"title":"Biases","description":"Linear layers and norms carry bias vectors (default: `false`).","type":"boolean","default":false},"experts":{"title":"Mixture of experts","description":"Feed-forward experts per layer and how many each token uses (default: none, a dense model).","type":"object","additionalProperties":false,"required":["total","active"],"properties":{"total":{"title":"Experts","description":"Feed-forward experts per layer.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[8]},"active":{"title":"Active experts","description":"Experts each token is routed to; at most `total`.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[2]}}},"encoder":{"title":"Encoder stack","description":"The encoder of an encoder-decoder model (default: none, decoder only).","type":"object","additionalProperties":false,"required":["layers","heads"],"properties":{"layers":{"title":"Encoder layers","description":"Number of encoder layers.","type":"integer","minimum":1,"maximum":9007199254740991},"heads":{"title":"Encoder attention heads","description":"Query heads per encoder layer.","type":"integer","minimum":1,"maximum":9007199254740991},"kv-heads":{"title":"Encoder key/value heads","description":"Key/value heads per encoder layer (default: the encoder\'s `heads`).","type":"integer","minimum":1,"maximum":9007199254740991},"head-dim":{"title":"Encoder head width","description":"Width of one encoder head (default: `hidden / heads` of the encoder).","type":"integer","minimum":1,"maximum":9007199254740991},"feed-forward":{"title":"Encoder feed-forward block","type":"object","additionalProperties":false,"properties":{"size":{"title":"Encoder feed-forward width","description":"Inner width of the encoder\'s feed-forward block (default: `4 * hidden`).","type":"integer","minimum":1,"maximum":9007199254740991}}}}},"position":{"$ref":"#/definitions/position"},"declared-span":{"title":"Declared span","description":"The maximum positions the model declares, in tokens.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[8192]},"trained-span":{"title":"Trained span","description":"The span the model was trained at, when it differs from what the scaling block or the declared span implies (default: none).","type":"integer","minimum":1,"maximum":9007199254740991},"sliding-window":{"title":"Sliding attention window","description":"Attention limited to the last `size` tokens (default: none, full attention).","type":"object","additionalProperties":false,"required":["size"],"properties":{"size":{"title":"Window size","description":"Tokens each position attends to.","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[4096]},"layers":{"title":"Windowed layers","description":"How many decoder layers use the window (default: all layers).","type":"integer","minimum":1,"maximum":9007199254740991}}},"dtypes":{"title":"Number formats","type":"object","additionalProperties":false,"properties":{"weights":{"title":"Weight storage","description":"Format the weights are stored in (default: `bf16`).","enum":["fp32","bf16","fp16","fp8","int8","int4"],"default":"bf16"},"cache":{"title":"Key/value cache storage","description":"Format the key/value cache is stored in (default: the weight format).","enum":["fp32","bf16","fp16","fp8","int8","int4"]},"positions":{"title":"Position format","description":"Format positions and angles are computed in (default: `fp32`).","enum":["fp32","bf16","fp16"],"default":"fp32"}}},"embedding-init":{"title":"Embedding initialisation","type":"object","additionalProperties":false,"properties":{"std":{"title":"Initialisation standard deviation","description":"Standard deviation of the token embedding initialisation (default: unknown).","type":"number","exclusiveMinimum":0,"examples":[0.02]},"multiplier":{"title":"Embedding multiplier","description":"Factor token embeddings are multiplied by, e.g. the square root of `hidden` (default: `1`).","type":"number","exclusiveMinimum":0,"default":1}}}}},"position":{"title":"Position code","description":"How positions enter the model.","type":"object","additionalProperties":false,"required":["code"],"properties":{"code":{"title":"Code","description":"`sinusoidal` (fixed, added to embeddings), `learned` (a trained table of `declared-span` rows), `rotary` (rotations of query and key pairs), `alibi` (linear attention biases) or `none`.","enum":["sinusoidal","learned","rotary","alibi","none"]},"base":{"title":"Rotary base","description":"Rotary codes only: the base of the frequencies (default: `10000`).","type":"number","exclusiveMinimum":1,"default":10000,"examples":[10000,500000]},"fraction":{"title":"Rotary fraction","description":"Rotary codes only: share of each head\'s width that rotates; `head-dim * fraction` must be even (default: `1`).","type":"number","exclusiveMinimum":0,"maximum":1,"default":1},"scaling":{"$ref":"#/definitions/scaling"}}},"scaling":{"title":"Context scaling","description":"Rotary codes only: how the frequencies are stretched past the trained span (default: none).","type":"object","additionalProperties":false,"required":["kind","factor"],"properties":{"kind":{"title":"Kind","description":"`linear` (position interpolation), `ntk` (base change), `dynamic` (base change that grows with the sequence), `yarn` (interpolation by frequency band, with attention temperature) or `banded` (frequency bands with `low` and `high` factors).","enum":["linear","ntk","dynamic","yarn","banded"]},"factor":{"title":"Factor","description":"The scaling factor s: extended span over original span; at least 1.","type":"number","minimum":1,"examples":[4,8]},"original-span":{"title":"Original span","description":"The span the unscaled code was trained at (default: the declared span).","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[8192]},"alpha":{"title":"Ramp start (yarn)","description":"yarn: frequencies that turn fewer than `alpha` times over the original span are fully interpolated (default: `1`).","type":"number","minimum":0,"default":1},"beta":{"title":"Ramp end (yarn)","description":"yarn: frequencies that turn more than `beta` times over the original span are kept; above `alpha` (default: `32`).","type":"number","exclusiveMinimum":0,"default":32},"low":{"title":"Low-frequency factor (banded)","description":"banded: wavelengths longer than original span / `low` are fully scaled (default: `1`).","type":"number","exclusiveMinimum":0,"default":1},"high":{"title":"High-frequency factor (banded)","description":"banded: wavelengths shorter than original span / `high` are kept; above `low` (default: `4`).","type":"number","exclusiveMinimum":0,"default":4}}},"serving":{"title":"Serving","description":"How the model is served; a policy\'s `serving` block supplies values not stated here, and command-line flags override both.","type":"object","additionalProperties":false,"properties":{"span":{"title":"Served span","description":"Tokens served per sequence; the metrics are evaluated at this span (default: the declared span).","type":"integer","minimum":1,"maximum":9007199254740991,"examples":[32768]},"sequences":{"title":"Concurrent sequences","description":"Sequences held in the key/value cache at once (default: `1`).","type":"integer","minimum":1,"maximum":9007199254740991,"default":1},"device-memory-gib":{"title":"Device memory","description":"Memory budget per replica in GiB (default: none).","type":"number","exclusiveMinimum":0,"examples":[80]},"reserve":{"title":"Reserved memory share","description":"Share of device memory kept free, from 0 up to but not including 1 (default: `0.1`).","type":"number","minimum":0,"exclusiveMaximum":1,"default":0.1},"output-tokens":{"title":"Reserved output tokens","description":"Tokens of each sequence kept for the model\'s output (default: none).","type":"integer","minimum":0,"maximum":9007199254740991},"prompt-tokens":{"title":"Reserved prompt tokens","description":"Tokens of each sequence taken by a fixed prompt (default: none).","type":"integer","minimum":0,"maximum":9007199254740991}}}}}');
;// CONCATENATED MODULE: ./src/core/model.ts
/**
 * The one typed model description every dialect normalises into. Nothing past the parsers sees
 * dialect keys. Fields hold what the file states (after normalisation); `null` means "not
 * stated", and the metrics apply the documented defaults. Sizes are plain numbers that may be
 * invalid (zero, negative, fractional, NaN): the rules report them, the metrics return null.
 */
const FLOAT_FORMATS = ['fp32', 'bf16', 'fp16'];
const STORAGE_DTYPES = ['fp32', 'bf16', 'fp16', 'fp8', 'int8', 'int4'];
const SCALING_KINDS = ['linear', 'ntk', 'dynamic', 'yarn', 'banded'];
const POSITION_KINDS = ['sinusoidal', 'learned', 'rotary', 'alibi', 'none'];
const SEVERITIES = (/* unused pure expression or super */ null && (['block', 'warn', 'info']));

;// CONCATENATED MODULE: ./src/core/policy/nearest.ts
/**
 * Edit distance between two names: insertions, deletions, substitutions and swaps of two
 * neighbouring characters each cost 1 (optimal string alignment distance, Damerau 1964),
 * compared case-insensitively so `HeadRoom` is 0 from `headroom`.
 */
function editDistance(a, b) {
    const s = a.toLowerCase();
    const t = b.toLowerCase();
    // Three rolling rows: the swap step looks two rows back.
    let before = new Array(t.length + 1).fill(0);
    let previous = Array.from({ length: t.length + 1 }, (_, j) => j);
    for (let i = 1; i <= s.length; i += 1) {
        const row = new Array(t.length + 1);
        row[0] = i;
        for (let j = 1; j <= t.length; j += 1) {
            const cost = s[i - 1] === t[j - 1] ? 0 : 1;
            let best = Math.min(previous[j] + 1, row[j - 1] + 1, previous[j - 1] + cost);
            if (i > 1 && j > 1 && s[i - 1] === t[j - 2] && s[i - 2] === t[j - 1])
                best = Math.min(best, before[j - 2] + 1);
            row[j] = best;
        }
        before = previous;
        previous = row;
    }
    return previous[t.length];
}
/**
 * The candidate a mistyped `name` most likely meant, or null when none is plausibly meant: the
 * closest within max(2, length / 3) edits (first of equals, in the candidates' order), else a
 * candidate that is a prefix of the name or has it as a prefix (`minimum` → `min`).
 */
function nearestName(name, candidates) {
    // Names longer than any candidate by far are noise, not typos; cap the work they cost.
    const probe = name.slice(0, 200);
    const allowed = Math.max(2, Math.floor(probe.length / 3));
    let best = null;
    let bestDistance = Infinity;
    for (const candidate of candidates) {
        const distance = editDistance(probe, candidate);
        if (distance < bestDistance) {
            best = candidate;
            bestDistance = distance;
        }
    }
    if (best !== null && bestDistance <= allowed)
        return best;
    const lower = probe.toLowerCase();
    return candidates.find((candidate) => {
        const other = candidate.toLowerCase();
        return Math.min(other.length, lower.length) >= 3 && (lower.startsWith(other) || other.startsWith(lower));
    }) ?? null;
}

;// CONCATENATED MODULE: ./src/core/parse/suggest.ts
/**
 * The known key an unknown one was most likely meant to be: a close spelling (after reading
 * `_` as `-`), or the context-reach name of a checkpoint key written in the wrong dialect.
 */

/** Checkpoint key names people carry over into the own dialect, and the key that replaces them. */
const CHECKPOINT_SYNONYMS = {
    num_hidden_layers: 'layers',
    n_layer: 'layers',
    hidden_size: 'hidden',
    n_embd: 'hidden',
    d_model: 'hidden',
    num_attention_heads: 'heads',
    n_head: 'heads',
    num_key_value_heads: 'kv-heads',
    head_dim: 'head-dim',
    intermediate_size: 'feed-forward',
    vocab_size: 'vocab',
    tie_word_embeddings: 'tied-output',
    max_position_embeddings: 'declared-span',
    n_positions: 'declared-span',
    rope_theta: 'position',
    rope_scaling: 'position',
    sliding_window: 'sliding-window',
    torch_dtype: 'dtypes',
    dtype: 'dtypes',
    initializer_range: 'embedding-init',
    num_local_experts: 'experts',
    original_max_position_embeddings: 'original-span',
    rope_type: 'kind',
    type: 'kind',
    max_seq_len: 'span',
};
function normalise(name) {
    return name.toLowerCase().replace(/[_\s]+/g, '-');
}
/** The known key closest to `name`, or null when none is close enough to be a likely typo. */
function suggestKey(name, known) {
    if (known.length === 0)
        return null;
    const synonym = Object.prototype.hasOwnProperty.call(CHECKPOINT_SYNONYMS, name) ? CHECKPOINT_SYNONYMS[name] : undefined;
    if (synonym !== undefined && known.includes(synonym))
        return synonym;
    const probe = normalise(name.slice(0, 100));
    let best = null;
    let bestDistance = Infinity;
    for (const candidate of known) {
        const distance = editDistance(probe, normalise(candidate));
        if (distance < bestDistance) {
            best = candidate;
            bestDistance = distance;
        }
    }
    // A third of the name may be wrong before a guess stops helping: "kv-head" → "kv-heads" yes, "foo" → "bias" no.
    const allowed = Math.max(1, Math.floor(probe.length / 3));
    return bestDistance <= allowed ? best : null;
}

;// CONCATENATED MODULE: ./src/core/parse/own-dialect.ts
/**
 * context-reach's own model description (`format: context-reach-model/1`, YAML or JSON, kebab-case
 * keys). `schema/model.schema.json` is its definition; the shipped schema is checked with ajv and
 * each schema error becomes a finding naming the key and its line.
 */







/** The value of `format` that marks the own dialect. */
const MODEL_FORMAT = 'context-reach-model/1';
/** What every version of the own dialect's `format` starts with. */
const MODEL_FORMAT_FAMILY = 'context-reach-model/';
/** The model description's JSON Schema, as shipped in `schema/model.schema.json`. */
const MODEL_SCHEMA = (/* unused pure expression or super */ null && (modelSchema));
let compiled = null;
/** Schema errors for a parsed own-dialect document (empty when it conforms); errors carry `data` and `parentSchema`. */
function validateModelValue(value) {
    if (compiled === null)
        compiled = new dist_ajv.Ajv({ allErrors: true, verbose: true, strict: true }).compile(model_schema_namespaceObject);
    return compiled(value) ? [] : [...(compiled.errors ?? [])];
}
/**
 * Keys whose range the spec rules judge (`size-invalid`, `scaling-factor-below-one`): schema
 * range errors on them are left to those rules, so both dialects report a bad size alike.
 */
const RULE_CHECKED = new Set([
    '/model/layers', '/model/hidden', '/model/heads', '/model/kv-heads', '/model/head-dim', '/model/feed-forward/size',
    '/model/vocab', '/model/experts/total', '/model/experts/active', '/model/encoder/layers', '/model/encoder/heads',
    '/model/encoder/kv-heads', '/model/encoder/head-dim', '/model/encoder/feed-forward/size', '/model/declared-span',
    '/model/trained-span', '/model/sliding-window/size', '/model/sliding-window/layers', '/model/position/scaling/factor',
    '/model/position/scaling/original-span', '/serving/span', '/serving/sequences', '/serving/device-memory-gib',
    '/serving/output-tokens', '/serving/prompt-tokens',
]);
const RANGE_KEYWORDS = new Set(['minimum', 'maximum', 'exclusiveMinimum', 'exclusiveMaximum', 'multipleOf']);
const COMPARISON_WORDS = { '>=': 'at least', '>': 'above', '<=': 'at most', '<': 'below' };
const TYPE_WORDS = {
    integer: 'a whole number', number: 'a number', string: 'text', array: 'a list', object: 'a mapping', boolean: 'true or false',
};
const STORAGE = Object.fromEntries(STORAGE_DTYPES.map((d) => [d, d]));
const FLOATS = Object.fromEntries(FLOAT_FORMATS.map((d) => [d, d]));
const CODES = Object.fromEntries(POSITION_KINDS.map((k) => [k, k]));
const KINDS = Object.fromEntries(SCALING_KINDS.map((k) => [k, k]));
/** Required blocks the reader does not read as single values, and what they should hold. */
const REQUIRED_BLOCKS = {
    model: 'the model block (layers, hidden, heads, vocab, position, declared-span)',
    position: 'the position block, e.g. "position: {code: rotary, base: 10000}"',
};
const above = (limit, what) => ({ test: (n) => n > limit, expected: `${what} above ${limit}` });
/** Reads the own dialect from `r.root` into a draft; every problem becomes a finding on `r`. */
function readOwnDialect(r) {
    for (const error of validateModelValue(r.root))
        schemaFinding(r, error);
    const m = (...p) => ['model', ...p];
    const need = (n, path, what) => n ?? r.missing(path, what);
    const draft = {
        name: r.text('name', m('name'), 'a model name') ?? null,
        layers: need(r.count('layers', m('layers'), 'decoder layers'), m('layers'), 'the number of decoder layers'),
        hidden: need(r.count('hidden', m('hidden'), 'model width'), m('hidden'), 'the model width'),
        heads: need(r.count('heads', m('heads'), 'attention heads'), m('heads'), 'the number of attention heads'),
        kvHeads: r.count('kvHeads', m('kv-heads'), 'key/value heads'),
        headDim: r.count('headDim', m('head-dim'), 'head width'),
        ffn: r.count('ffn', m('feed-forward', 'size'), 'feed-forward width'),
        gated: r.flag('gated', m('feed-forward', 'gated')),
        vocab: need(r.count('vocab', m('vocab'), 'vocabulary size'), m('vocab'), 'the vocabulary size'),
        tied: r.flag('tied', m('tied-output')),
        bias: r.flag('bias', m('bias')),
        experts: r.has(m('experts'))
            ? {
                total: need(r.count('experts.total', m('experts', 'total'), 'experts'), m('experts', 'total'), 'the number of experts'),
                active: need(r.count('experts.active', m('experts', 'active'), 'active experts'), m('experts', 'active'), 'the number of experts each token uses'),
            }
            : null,
        encoder: r.has(m('encoder'))
            ? {
                layers: need(r.count('encoder.layers', m('encoder', 'layers'), 'encoder layers'), m('encoder', 'layers'), 'the number of encoder layers'),
                heads: need(r.count('encoder.heads', m('encoder', 'heads'), 'encoder heads'), m('encoder', 'heads'), 'the number of encoder heads'),
                kvHeads: r.count('encoder.kvHeads', m('encoder', 'kv-heads'), 'encoder key/value heads'),
                headDim: r.count('encoder.headDim', m('encoder', 'head-dim'), 'encoder head width'),
                ffn: r.count('encoder.ffn', m('encoder', 'feed-forward', 'size'), 'encoder feed-forward width'),
            }
            : null,
        position: own_dialect_readPosition(r, m('position')),
        declaredSpan: need(r.count('declaredSpan', m('declared-span'), 'tokens'), m('declared-span'), 'the maximum positions the model declares'),
        trainedSpan: r.count('trainedSpan', m('trained-span'), 'tokens') ?? null,
        slidingWindow: r.has(m('sliding-window'))
            ? need(r.count('slidingWindow', m('sliding-window', 'size'), 'tokens'), m('sliding-window', 'size'), 'the window size in tokens')
            : null,
        windowLayers: r.count('windowLayers', m('sliding-window', 'layers'), 'layers') ?? null,
        dtypes: {
            weights: r.choice('dtypes.weights', m('dtypes', 'weights'), STORAGE, 'weight storage') ?? null,
            cache: r.choice('dtypes.cache', m('dtypes', 'cache'), STORAGE, 'key/value cache storage') ?? null,
            positions: r.choice('dtypes.positions', m('dtypes', 'positions'), FLOATS, 'position format') ?? null,
        },
        embeddingInitStd: r.real('embeddingInitStd', m('embedding-init', 'std'), 'standard deviation', above(0, 'a standard deviation')) ?? null,
        embeddingMultiplier: r.real('embeddingMultiplier', m('embedding-init', 'multiplier'), 'factor', above(0, 'a factor')) ?? null,
        serving: {
            span: r.count('serving.span', ['serving', 'span'], 'tokens') ?? null,
            sequences: r.count('serving.sequences', ['serving', 'sequences'], 'sequences') ?? null,
            deviceGiB: r.real('serving.deviceGiB', ['serving', 'device-memory-gib'], 'GiB') ?? null,
            reserve: r.real('serving.reserve', ['serving', 'reserve'], 'share', {
                test: (n) => n >= 0 && n < 1,
                expected: 'a share from 0 up to but not including 1',
            }) ?? null,
            outputTokens: r.count('serving.outputTokens', ['serving', 'output-tokens'], 'tokens') ?? null,
            promptTokens: r.count('serving.promptTokens', ['serving', 'prompt-tokens'], 'tokens') ?? null,
        },
    };
    return draft;
}
function own_dialect_readPosition(r, at) {
    const code = r.choice('position', [...at, 'code'], CODES, 'the position code');
    if (code === undefined && !r.reported([...at, 'code']))
        r.missing([...at, 'code'], `the position code: ${POSITION_KINDS.join(', ')}`);
    if (code !== 'rotary') {
        for (const key of ['base', 'fraction', 'scaling']) {
            if (code && r.has([...at, key])) {
                r.report('key-ignored', [...at, key], `${r.key([...at, key])} has no effect: it applies to rotary codes, and ${r.key([...at, 'code'])} is ${code}; remove it or set the code to rotary`);
            }
        }
        return { kind: code ?? 'none' };
    }
    const base = r.real('position.base', [...at, 'base'], 'rotary base', above(1, 'a rotary base'));
    const fraction = r.real('position.fraction', [...at, 'fraction'], 'share', {
        test: (n) => n > 0 && n <= 1,
        expected: 'a share of the head above 0 and at most 1',
    });
    return { kind: 'rotary', base, fraction, scaling: r.has([...at, 'scaling']) ? own_dialect_readScaling(r, [...at, 'scaling']) : null };
}
function own_dialect_readScaling(r, at) {
    const kind = r.choice('position.scaling', [...at, 'kind'], KINDS, 'the scaling kind');
    if (!kind) {
        if (kind === undefined)
            r.missing([...at, 'kind'], `the scaling kind: ${SCALING_KINDS.join(', ')}`);
        return null;
    }
    const factor = r.real('position.scaling.factor', [...at, 'factor'], 'scaling factor') ?? r.missing([...at, 'factor'], 'the scaling factor (extended span over original span)');
    const draft = {
        kind,
        factor,
        originalSpan: r.count('position.scaling.originalSpan', [...at, 'original-span'], 'tokens') ?? null,
        alpha: r.real('position.scaling.alpha', [...at, 'alpha'], 'ramp start', { test: (n) => n >= 0, expected: 'a ramp start of at least 0' }),
        beta: r.real('position.scaling.beta', [...at, 'beta'], 'ramp end', above(0, 'a ramp end')),
        low: r.real('position.scaling.low', [...at, 'low'], 'low-frequency factor', above(0, 'a low-frequency factor')),
        high: r.real('position.scaling.high', [...at, 'high'], 'high-frequency factor', above(0, 'a high-frequency factor')),
    };
    orderedPair(r, at, 'alpha', draft.alpha, DEFAULT_YARN_ALPHA, 'beta', draft.beta, DEFAULT_YARN_BETA);
    orderedPair(r, at, 'low', draft.low, DEFAULT_BANDED_LOW, 'high', draft.high, DEFAULT_BANDED_HIGH);
    for (const key of kind === 'yarn' ? ['low', 'high'] : kind === 'banded' ? ['alpha', 'beta'] : ['alpha', 'beta', 'low', 'high']) {
        if (r.has([...at, key])) {
            r.report('key-ignored', [...at, key], `${r.key([...at, key])} has no effect on ${kind} scaling (alpha and beta are yarn's, low and high are banded's); remove it`);
        }
    }
    return draft;
}
/** Ramp ends must be ordered (defaults standing in for an unstated end), or the ramp divides by zero or runs backwards. */
function orderedPair(r, at, lowKey, low, lowDefault, highKey, high, highDefault) {
    if (low === undefined && high === undefined)
        return;
    low ??= lowDefault;
    high ??= highDefault;
    if (Number.isNaN(low) || Number.isNaN(high) || high > low)
        return;
    const path = r.has([...at, highKey]) ? [...at, highKey] : [...at, lowKey];
    r.report('value-invalid', path, `${r.key([...at, highKey])} (${high}) must be above ${r.key([...at, lowKey])} (${low}): the ramp between them would divide by zero or run backwards; raise ${highKey} or lower ${lowKey}`);
}
function schemaFinding(r, error) {
    const pointer = error.instancePath;
    // Numbers of the wrong kind (1e400, 2.5 layers) are the readers' and the spec rules' to report.
    const expects = String(error.params.type ?? '');
    if (error.keyword === 'type' && typeof error.data === 'number' && (expects === 'integer' || expects === 'number'))
        return;
    if (RULE_CHECKED.has(pointer) && RANGE_KEYWORDS.has(error.keyword))
        return;
    const path = parsePointer(pointer);
    const key = r.key(path);
    const params = error.params;
    const schema = (error.parentSchema ?? {});
    switch (error.keyword) {
        case 'required': {
            // Single values are the reader's to call missing, in its words; only whole blocks are named here.
            const name = String(params.missingProperty);
            const block = REQUIRED_BLOCKS[name];
            if (block !== undefined)
                r.report('value-invalid', [...path, name], `${r.key([...path, name])} is missing; expected ${block}`);
            return;
        }
        case 'additionalProperties': {
            const name = String(params.additionalProperty);
            const known = Object.keys(schema.properties ?? {}).filter((k) => k !== '$schema');
            const nearest = suggestKey(name, known);
            const where = path.length === 0 ? 'at the top level' : `under ${key}`;
            r.report('value-invalid', [...path, name], `${r.key([...path, name])} is not a known key ${where}${nearest === null ? '' : `; did you mean "${nearest}"?`} (known keys: ${known.join(', ')})`);
            return;
        }
        case 'type': {
            const types = (Array.isArray(params.type) ? params.type : String(params.type).split(',')).map((t) => TYPE_WORDS[String(t)] ?? String(t));
            r.report('value-invalid', path, `${key} ${r.is(path)}; expected ${types.join(' or ')}`);
            return;
        }
        case 'enum': {
            const allowed = params.allowedValues.map(String);
            const nearest = typeof error.data === 'string' ? suggestKey(error.data, allowed) : null;
            const hint = nearest === null ? '' : `; did you mean "${nearest}"?`;
            if (pointer.endsWith('/scaling/kind')) {
                r.report('scaling-kind-unknown', path, `${key} is ${r.quote(path)}, not a known scaling kind (${allowed.join(', ')})${hint}; without a known kind the code is read unscaled`);
            }
            else {
                r.report('value-invalid', path, `${key} is ${r.quote(path)}; expected one of ${allowed.join(', ')}${hint}`);
            }
            return;
        }
        case 'minimum':
        case 'maximum':
        case 'exclusiveMinimum':
        case 'exclusiveMaximum':
            r.report('value-invalid', path, `${key} is ${r.quote(path)}; expected a number ${COMPARISON_WORDS[String(params.comparison)] ?? String(params.comparison)} ${String(params.limit)}`);
            return;
        case 'maxLength':
            r.report('value-invalid', path, `${key} is ${String(error.data).length} characters long; expected at most ${String(params.limit)}`);
            return;
        default:
            r.report('value-invalid', path, `${key} is ${quoteValue(error.data)}; ${error.message ?? 'not allowed by the model schema'}`);
    }
}

// EXTERNAL MODULE: ./node_modules/yaml/dist/index.js
var dist = __nccwpck_require__(8815);
;// CONCATENATED MODULE: ./src/core/parse/source.ts
/**
 * One reader for JSON and YAML text (JSON is read as YAML 1.2 flow style, which it is a subset
 * of, apart from duplicate keys, which are refused here). It keeps the 1-based line of every key
 * and the source text of every scalar, and it is built for untrusted text from forks: bounded
 * size, nesting and alias expansion, no prototype-altering keys, no binary text.
 */



/** Deepest nesting of mappings and lists accepted; the top-level mapping is level 1 (default: `256`). */
const MAX_NESTING = 256;
/** Alias expansions accepted per file, counting aliases met inside expanded content (default: `100`). */
const MAX_ALIASES = 100;
/** Values that alias expansion may add to a file (default: `100000`). */
const MAX_ALIAS_VALUES = 100_000;
/** Longest text accepted, in UTF-16 code units (default: `8388608`, 8 Mi). */
const MAX_TEXT_LENGTH = 8 * 1024 * 1024;
/** Keys refused anywhere: tools that merge parsed objects would turn them into prototype changes. */
const FORBIDDEN_KEYS = ['__proto__', 'constructor', 'prototype'];
const BOM = '\uFEFF';
/**
 * Bytes of a file as text: strict UTF-8 (a byte sequence that is not UTF-8 is refused, never
 * replaced), a leading byte-order mark dropped, and the text checks of `parseSource` applied
 * (no NUL, so no binary or UTF-16 data; bounded length). Throws `ReadError` naming `path`.
 */
function decodeText(bytes, path) {
    if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
        throw new ReadError(path, 1, 'starts with a UTF-16 byte-order mark; expected UTF-8 text (save the file as UTF-8)');
    }
    let text;
    try {
        text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
    }
    catch {
        const at = firstInvalidUtf8(bytes);
        const line = lineAtByte(bytes, at);
        const hex = Array.from(bytes.subarray(at, at + 4), (b) => b.toString(16).padStart(2, '0')).join(' ');
        throw new ReadError(path, line, `is not UTF-8 text: bytes ${hex} at byte offset ${at} do not form a UTF-8 character (save the file as UTF-8)`);
    }
    // A decoder with ignoreBOM false drops the mark itself; this covers a doubled one.
    if (text.startsWith(BOM))
        text = text.slice(1);
    checkText(text, path);
    return text;
}
/**
 * Parses JSON or YAML `text` holding one document whose top level is a mapping.
 * Throws `ReadError` (naming `file` and the line) on bad text, bad syntax, duplicate or
 * forbidden keys, nesting deeper than `MAX_NESTING`, excessive aliasing or a non-mapping top level.
 */
function parseSource(text, file) {
    if (text.startsWith(BOM))
        text = text.slice(1);
    checkText(text, file);
    // YAML would read a broken config.json (a bare word, a trailing comma) that JSON loaders refuse.
    const json = /\.json$/i.test(file);
    if (json)
        checkJson(text, file);
    const lineCounter = new dist/* LineCounter */.HN();
    const tokens = Array.from(new dist/* Parser */.iX(lineCounter.addNewLine).parse(text));
    const lineAt = (offset) => lineCounter.linePos(offset).line;
    // The composer recurses once per level; refusing deep input before it runs keeps the stack safe.
    const deep = firstTooDeep(tokens);
    if (deep !== null) {
        throw new ReadError(file, lineAt(deep), `nesting is deeper than ${MAX_NESTING} levels of mappings and lists; a model file needs a handful`);
    }
    const composer = new dist/* Composer */.Dk({
        version: '1.2',
        schema: 'core',
        uniqueKeys: true,
        strict: true,
        prettyErrors: false,
    });
    const docs = Array.from(composer.compose(tokens, true, text.length));
    for (const doc of docs) {
        const problem = doc.errors[0] ?? doc.warnings[0];
        if (problem)
            throw syntaxError(problem, text, file, lineAt);
    }
    if (docs.length > 1) {
        throw new ReadError(file, lineAt(docs[1].range[0]), 'holds more than one YAML document; a model file holds one');
    }
    const doc = docs[0];
    const root = doc?.contents ?? null;
    if (root === null || ((0,dist/* isScalar */.jn)(root) && root.value === null)) {
        throw new ReadError(file, null, 'is empty; expected a mapping of keys');
    }
    if (!(0,dist/* isMap */.jh)(root)) {
        const what = (0,dist/* isSeq */.oP)(root) ? 'a list' : (0,dist/* isScalar */.jn)(root) ? quoteValue(root.value) : 'not a mapping';
        throw new ReadError(file, lineAt(root.range?.[0] ?? 0), `top level is ${what}; expected a mapping of keys`);
    }
    const builder = new Builder(doc, text, file, lineAt, json);
    const value = builder.build(root, [], 1);
    return {
        value,
        lineOf: (path) => builder.notesAt(value, path)?.line ?? null,
        literalOf: (path) => builder.notesAt(value, path)?.literal ?? null,
    };
}
function checkText(text, file) {
    if (text.length > MAX_TEXT_LENGTH) {
        throw new ReadError(file, null, `is ${text.length} characters long; model files are limited to ${MAX_TEXT_LENGTH}`);
    }
    const lineOfIndex = (i) => {
        let line = 1;
        for (let j = text.indexOf('\n'); j !== -1 && j < i; j = text.indexOf('\n', j + 1))
            line++;
        return line;
    };
    const nul = text.indexOf('\0');
    if (nul !== -1) {
        throw new ReadError(file, lineOfIndex(nul), 'contains a NUL character, so it is binary data or UTF-16 text; expected UTF-8 text');
    }
    const replacement = text.indexOf('\uFFFD');
    if (replacement !== -1) {
        throw new ReadError(file, lineOfIndex(replacement), 'contains U+FFFD, the character a lenient decoder puts in place of bytes that are not UTF-8; save the file as UTF-8');
    }
    const lone = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.exec(text);
    if (lone) {
        throw new ReadError(file, lineOfIndex(lone.index), 'contains a lone UTF-16 surrogate, which no UTF-8 file can hold; save the file as UTF-8');
    }
}
/**
 * Strict JSON syntax, as the JSON loaders of the checkpoint libraries apply it: their Python
 * reader also takes bare NaN, Infinity and -Infinity, so those pass here too (and read as numbers).
 */
function checkJson(text, file) {
    // Same-length stand-ins keep error positions true to the file.
    const standIn = text.replace(/"(?:[^"\\]|\\.)*"|-?Infinity|NaN/g, (m) => (m.startsWith('"') ? m : `0${' '.repeat(m.length - 1)}`));
    try {
        JSON.parse(standIn);
    }
    catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        const at = /at position (\d+)/.exec(message);
        const lineCol = /\(line (\d+) column \d+\)/.exec(message);
        let line = null;
        if (at)
            line = text.slice(0, Number(at[1])).split('\n').length;
        else if (lineCol)
            line = Number(lineCol[1]);
        else if (/Unexpected end/.test(message))
            line = text.split('\n').length;
        const reason = message
            .replace(/ in JSON at position \d+.*$/s, '')
            .replace(/ \(line \d+ column \d+\)$/, '')
            .replace(/, ".*" is not valid JSON$/s, '');
        throw new ReadError(file, line, `is not valid JSON: ${reason}`);
    }
}
/** Offset of the first collection nested deeper than `MAX_NESTING`, or null; walks the syntax tree without recursion. */
function firstTooDeep(tokens) {
    const stack = [];
    for (const token of tokens)
        if (token.type === 'document' && token.value)
            stack.push([token.value, 0]);
    while (stack.length > 0) {
        const [token, depth] = stack.pop();
        if (token.type !== 'block-map' && token.type !== 'block-seq' && token.type !== 'flow-collection')
            continue;
        const level = depth + 1;
        if (level > MAX_NESTING)
            return token.offset;
        for (const item of token.items) {
            if (item.key)
                stack.push([item.key, level]);
            if (item.value)
                stack.push([item.value, level]);
        }
    }
    return null;
}
function syntaxError(problem, text, file, lineAt) {
    const start = problem.pos[0];
    const line = lineAt(start);
    if (problem.code === 'DUPLICATE_KEY') {
        const written = /^("(?:[^"\\\n]|\\.)*"|'(?:[^'\n]|'')*'|[^:,{}[\]\n]+)/.exec(text.slice(start, start + 1024));
        const key = written ? truncate(written[1].trim()) : 'here';
        return new ReadError(file, line, `duplicate key ${key}; each key may appear once in a mapping`);
    }
    const reason = problem.message.split('\n')[0].replace(/ at line \d+, column \d+:?$/, '');
    // JSON readers meet YAML's wording for JSON's commonest slip; say what it usually means.
    const jsonHint = text.trimStart().startsWith('{') && problem.code !== 'BAD_DQ_ESCAPE' ? ' (in JSON: a missing comma or colon at or just before this line?)' : '';
    return new ReadError(file, line, `is not valid JSON or YAML: ${reason}${jsonHint}`);
}
/** Builds plain values from the composed document, noting each entry's line and literal beside its container. */
class Builder {
    doc;
    text;
    file;
    lineAt;
    json;
    notes = new WeakMap();
    aliases = 0;
    aliasValues = 0;
    expanding = new Set();
    insideAlias = 0;
    constructor(doc, text, file, lineAt, json) {
        this.doc = doc;
        this.text = text;
        this.file = file;
        this.lineAt = lineAt;
        this.json = json;
    }
    build(node, path, level) {
        if (this.insideAlias > 0 && ++this.aliasValues > MAX_ALIAS_VALUES) {
            throw new ReadError(this.file, this.nodeLine(node), `aliases expand to more than ${MAX_ALIAS_VALUES} values; a model file needs far fewer`);
        }
        if ((0,dist/* isAlias */.Vj)(node))
            return this.expand(node, path, level);
        if ((0,dist/* isScalar */.jn)(node))
            return this.scalar(node, path);
        if (level > MAX_NESTING) {
            throw new ReadError(this.file, this.nodeLine(node), `nesting is deeper than ${MAX_NESTING} levels of mappings and lists once aliases are expanded`);
        }
        if ((0,dist/* isMap */.jh)(node)) {
            const out = Object.create(null);
            const notes = new Map();
            this.notes.set(out, notes);
            for (const pair of node.items) {
                const key = this.key(pair.key, path, notes);
                notes.set(key, { line: this.nodeLine(pair.key), literal: this.literal(pair.value) });
                out[key] = pair.value === null || pair.value === undefined ? null : this.build(pair.value, [...path, key], level + 1);
            }
            return out;
        }
        if ((0,dist/* isSeq */.oP)(node)) {
            const out = [];
            const notes = new Map();
            this.notes.set(out, notes);
            node.items.forEach((item, i) => {
                notes.set(i, { line: this.nodeLine(item), literal: this.literal(item) });
                out.push(item === null || item === undefined ? null : this.build(item, [...path, i], level + 1));
            });
            return out;
        }
        throw new ReadError(this.file, this.nodeLine(node), 'holds a value of an unsupported kind');
    }
    /** Notes on the entry `path` leads to inside `root`, or undefined when the path is not there. */
    notesAt(root, path) {
        if (path.length === 0)
            return undefined;
        let container = root;
        for (let i = 0; i < path.length - 1; i++) {
            if (container === null || typeof container !== 'object')
                return undefined;
            const step = container[String(path[i])];
            if (!this.has(container, path[i]))
                return undefined;
            container = step;
        }
        if (container === null || typeof container !== 'object')
            return undefined;
        const last = path[path.length - 1];
        return this.notes.get(container)?.get(Array.isArray(container) ? Number(last) : String(last));
    }
    has(container, segment) {
        return Array.isArray(container) ? Number.isInteger(Number(segment)) && Number(segment) < container.length : Object.prototype.hasOwnProperty.call(container, String(segment));
    }
    /** A scalar's source text (quotes included); null for collections, aliases and empty values. */
    literal(node) {
        if (!(0,dist/* isScalar */.jn)(node) || !node.range)
            return null;
        return this.text.slice(node.range[0], node.range[1]);
    }
    key(keyNode, path, seen) {
        const line = this.nodeLine(keyNode);
        if (!(0,dist/* isScalar */.jn)(keyNode)) {
            throw new ReadError(this.file, line, `has a ${(0,dist/* isAlias */.Vj)(keyNode) ? 'alias' : 'list or mapping'} as a key under ${this.where(path)}; keys must be plain text`);
        }
        const raw = keyNode.value;
        if (raw === null || (typeof raw !== 'string' && typeof raw !== 'number' && typeof raw !== 'boolean')) {
            throw new ReadError(this.file, line, `has an empty or non-text key under ${this.where(path)}; keys must be plain text`);
        }
        const key = String(raw);
        if (FORBIDDEN_KEYS.includes(key)) {
            throw new ReadError(this.file, line, `key ${quoteText(key)} under ${this.where(path)} is refused: tools that merge parsed objects would treat it as a prototype change; rename or remove it`, dottedKey([...path, key]));
        }
        // Keys that differ only in type (1 and "1") are distinct to YAML but collide as object keys.
        if (seen.has(key)) {
            throw new ReadError(this.file, line, `duplicate key ${quoteText(key)} under ${this.where(path)}; each key may appear once in a mapping`, dottedKey([...path, key]));
        }
        return key;
    }
    scalar(node, path) {
        const v = node.value;
        if (this.json && node.type === 'PLAIN' && (v === 'NaN' || v === 'Infinity' || v === '-Infinity'))
            return Number(v);
        if (v === null || typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean')
            return v;
        throw new ReadError(this.file, this.nodeLine(node), `${this.where(path)} holds a value of an unsupported kind; expected text, a number, a boolean or empty`);
    }
    expand(alias, path, level) {
        const line = this.nodeLine(alias);
        if (++this.aliases > MAX_ALIASES) {
            throw new ReadError(this.file, line, `expands more than ${MAX_ALIASES} aliases; a model file needs few, and many suggest an expansion attack`);
        }
        const target = alias.resolve(this.doc);
        if (!target)
            throw new ReadError(this.file, line, `alias *${truncate(alias.source)} has no anchor &${truncate(alias.source)} before it`);
        if (this.expanding.has(target)) {
            throw new ReadError(this.file, line, `alias *${truncate(alias.source)} refers to a value that contains it`);
        }
        this.expanding.add(target);
        this.insideAlias++;
        try {
            return this.build(target, path, level);
        }
        finally {
            this.insideAlias--;
            this.expanding.delete(target);
        }
    }
    where(path) {
        return path.length === 0 ? 'the top level' : dottedKey(path);
    }
    nodeLine(node) {
        const range = node?.range;
        return this.lineAt(range?.[0] ?? 0);
    }
}
function firstInvalidUtf8(bytes) {
    const decoder = new TextDecoder('utf-8', { fatal: true });
    // Binary search on prefixes would split characters; walk the encoding instead.
    let i = 0;
    while (i < bytes.length) {
        const b = bytes[i];
        const size = b < 0x80 ? 1 : b >= 0xc2 && b < 0xe0 ? 2 : b >= 0xe0 && b < 0xf0 ? 3 : b >= 0xf0 && b < 0xf5 ? 4 : 0;
        if (size === 0)
            return i;
        try {
            decoder.decode(bytes.subarray(i, i + size));
        }
        catch {
            return i;
        }
        i += size;
    }
    return i;
}
function lineAtByte(bytes, at) {
    let line = 1;
    for (let i = 0; i < at && i < bytes.length; i++)
        if (bytes[i] === 0x0a)
            line++;
    return line;
}

;// CONCATENATED MODULE: ./src/core/parse/read-model.ts








function read_model_isMapping(v) {
    return v !== null && v !== undefined && typeof v === 'object' && !Array.isArray(v);
}
/** Which dialect `value` is written in (any `context-reach-model/` version counts as the own one), or null when it is not a model description. */
function detectDialect(value) {
    const format = value.format;
    if (typeof format === 'string' && format.startsWith(MODEL_FORMAT_FAMILY))
        return 'context-reach';
    if (isCheckpointConfig(value))
        return 'checkpoint';
    return null;
}
/**
 * Reads the model description in `text` (JSON or YAML) from file `path`.
 * Throws `ReadError` naming the file and line when the text cannot be read as a model at all.
 */
function readModel(text, path, options = {}) {
    const doc = parseSource(text, path);
    const { root, prefix } = selectBlock(doc, path, options.at);
    const format = root.format;
    if (typeof format === 'string' && format.startsWith(MODEL_FORMAT_FAMILY) && format !== MODEL_FORMAT) {
        const formatPath = [...prefix, 'format'];
        throw new ReadError(path, doc.lineOf(formatPath), `format ${quoteValue(format)} is not supported; this version reads ${MODEL_FORMAT}`, 'format');
    }
    const dialect = detectDialect(root);
    if (dialect === null)
        throw notAModel(doc, root, prefix, path);
    const reader = new FieldReader(doc, root, prefix, dialect === 'checkpoint');
    const draft = dialect === 'context-reach' ? readOwnDialect(reader) : readCheckpoint(reader);
    return { dialect, spec: completeSpec(draft), locations: reader.locations, findings: reader.findings };
}
function selectBlock(doc, file, at) {
    if (at === undefined || at === '')
        return { root: doc.value, prefix: [] };
    let selected;
    try {
        selected = resolvePointer(doc.value, at);
    }
    catch (error) {
        if (!(error instanceof PointerError))
            throw error;
        const line = error.resolvedPath.length === 0 ? null : doc.lineOf(error.resolvedPath);
        throw new ReadError(file, line, `--at ${error.message}`);
    }
    if (!read_model_isMapping(selected.value)) {
        throw new ReadError(file, doc.lineOf(selected.path), `--at ${JSON.stringify(at)} selects ${kindOf(selected.value)}; expected a mapping holding a model`);
    }
    return { root: selected.value, prefix: selected.path };
}
function notAModel(doc, root, prefix, file) {
    const where = prefix.length === 0 ? 'at the top level' : `under ${JSON.stringify(formatPointer(prefix.map(String)))}`;
    const line = prefix.length === 0 ? (Object.keys(root).length > 0 ? doc.lineOf([Object.keys(root)[0]]) : null) : doc.lineOf(prefix);
    // A model nested one level down (multimodal configs keep it under text_config) is worth naming.
    const nested = Object.keys(root).find((k) => read_model_isMapping(root[k]) && detectDialect(root[k]) !== null);
    const hint = nested === undefined
        ? ''
        : `; ${truncate(nested)} (line ${doc.lineOf([...prefix, nested]) ?? '?'}) holds one: read it with --at ${formatPointer([...prefix.map(String), nested])}`;
    return new NotAModelError(file, line, `not a model config: expected "format: ${MODEL_FORMAT}" or checkpoint keys such as hidden_size and num_hidden_layers ${where}${hint}`);
}

;// CONCATENATED MODULE: ./src/core/rules/spec-rules.ts


/** Every size the rules check, in report order. */
const SIZE_FIELDS = [
    { field: 'layers', get: (s) => s.layers, what: 'the number of layers' },
    { field: 'hidden', get: (s) => s.hidden, what: 'the model width' },
    { field: 'heads', get: (s) => s.heads, what: 'the number of attention heads' },
    { field: 'kvHeads', get: (s) => s.kvHeads, what: 'the number of key/value heads' },
    { field: 'headDim', get: (s) => s.headDim, what: 'the width of one head' },
    { field: 'ffn', get: (s) => s.ffn, what: 'the feed-forward width' },
    { field: 'vocab', get: (s) => s.vocab, what: 'the vocabulary size' },
    { field: 'declaredSpan', get: (s) => s.declaredSpan, what: 'the maximum positions in tokens' },
    { field: 'trainedSpan', get: (s) => s.trainedSpan, what: 'the span trained at, in tokens' },
    { field: 'experts.total', get: (s) => s.experts?.total, what: 'the number of experts' },
    { field: 'experts.active', get: (s) => s.experts?.active, what: 'the number of experts each token uses' },
    { field: 'encoder.layers', get: (s) => s.encoder?.layers, what: 'the number of encoder layers' },
    { field: 'encoder.heads', get: (s) => s.encoder?.heads, what: 'the number of encoder heads' },
    { field: 'encoder.kvHeads', get: (s) => s.encoder?.kvHeads, what: 'the number of encoder key/value heads' },
    { field: 'encoder.headDim', get: (s) => s.encoder?.headDim, what: 'the width of one encoder head' },
    { field: 'encoder.ffn', get: (s) => s.encoder?.ffn, what: 'the encoder feed-forward width' },
    { field: 'slidingWindow', get: (s) => s.slidingWindow, what: 'the window in tokens' },
    { field: 'windowLayers', get: (s) => s.windowLayers, what: 'the number of windowed layers' },
    {
        field: 'position.scaling.originalSpan',
        get: (s) => (s.position.kind === 'rotary' ? s.position.scaling?.originalSpan : null),
        what: 'the span trained at before scaling, in tokens',
    },
    { field: 'serving.span', get: (s) => s.serving.span, what: 'the served span in tokens' },
    { field: 'serving.sequences', get: (s) => s.serving.sequences, what: 'the number of concurrent sequences' },
    { field: 'serving.deviceGiB', get: (s) => s.serving.deviceGiB, what: 'the device memory in GiB', real: true },
    { field: 'serving.outputTokens', get: (s) => s.serving.outputTokens, what: 'the tokens kept for output', min: 0 },
    { field: 'serving.promptTokens', get: (s) => s.serving.promptTokens, what: 'the tokens taken by a fixed prompt', min: 0 },
];
/** A whole number of at least 1 that a double holds exactly. */
function spec_rules_isCount(n) {
    return typeof n === 'number' && Number.isSafeInteger(n) && n >= 1;
}
/**
 * Findings of `spec` on its own (all `block`): `size-invalid`, `kv-heads-indivisible`,
 * `rotary-width-odd`, `scaling-factor-below-one`, `original-span-above-declared`, and
 * `value-invalid` for sizes that contradict each other (more active experts than experts, more
 * windowed layers than layers). Each names the key as `locations` records it.
 */
function specFindings(spec, locations) {
    const out = [];
    const push = (rule, field, message) => {
        const at = field === null ? undefined : locations[field];
        out.push({ rule, severity: RULES[rule].severity, message, key: at?.key ?? null, line: at?.line ?? null });
    };
    const name = (field) => locations[field]?.key ?? field;
    for (const size of SIZE_FIELDS) {
        const v = size.get(spec);
        if (v === null || v === undefined || Number.isNaN(v))
            continue;
        const problem = sizeProblem(v, size.min ?? 1, size.real ?? false);
        if (problem === null)
            continue;
        const kind = size.real ? `a number above 0` : `a whole number of at least ${size.min ?? 1}`;
        const derived = derivation(spec, locations, size.field);
        const message = derived
            ? `${derived.subject}${problem}; ${derived.advice}`
            : `${name(size.field)} is ${formatNumber(v)}${problem}; set it to ${size.what}: ${kind}`;
        push('size-invalid', locations[size.field] ? size.field : derivedFrom(size.field, locations), message);
    }
    headGrouping(spec.heads, spec.kvHeads, 'heads', 'kvHeads', name, push);
    if (spec.encoder)
        headGrouping(spec.encoder.heads, spec.encoder.kvHeads, 'encoder.heads', 'encoder.kvHeads', name, push);
    if (spec.experts && spec_rules_isCount(spec.experts.total) && spec_rules_isCount(spec.experts.active) && spec.experts.active > spec.experts.total) {
        push('value-invalid', 'experts.active', `${name('experts.active')} is ${spec.experts.active}, more than ${name('experts.total')} ${spec.experts.total}; a token cannot use more experts than there are: set it to at most ${spec.experts.total}`);
    }
    if (spec_rules_isCount(spec.windowLayers) && spec_rules_isCount(spec.layers) && spec.windowLayers > spec.layers) {
        push('value-invalid', 'windowLayers', `${name('windowLayers')} makes ${spec.windowLayers} windowed layers, more than the ${spec.layers} layers (${name('layers')}); set it to at most ${spec.layers}`);
    }
    if (spec.position.kind === 'rotary') {
        spec_rules_rotaryWidth(spec, locations, name, push);
        const scaling = spec.position.scaling;
        if (scaling && Number.isFinite(scaling.factor) && scaling.factor < 1) {
            const hint = spec_rules_isCount(scaling.originalSpan) && spec_rules_isCount(spec.declaredSpan) && spec.declaredSpan > scaling.originalSpan
                ? ` such as ${formatNumber(spec.declaredSpan / scaling.originalSpan)} (${name('declaredSpan')} ${spec.declaredSpan} / ${name('position.scaling.originalSpan')} ${scaling.originalSpan})`
                : '';
            push('scaling-factor-below-one', 'position.scaling.factor', `${name('position.scaling.factor')} is ${formatNumber(scaling.factor)}; a scaling factor below 1 shrinks the trained span instead of extending it: set it to the extended span over the original span, at least 1${hint}, or remove the scaling block`);
        }
        if (scaling && spec_rules_isCount(scaling.originalSpan) && spec_rules_isCount(spec.declaredSpan) && scaling.originalSpan > spec.declaredSpan) {
            const extended = Number.isFinite(scaling.factor) && scaling.factor >= 1 ? ` (${scaling.originalSpan} × ${formatNumber(scaling.factor)} = ${formatNumber(scaling.originalSpan * scaling.factor)})` : '';
            push('original-span-above-declared', 'position.scaling.originalSpan', `${name('position.scaling.originalSpan')} is ${scaling.originalSpan}, above ${name('declaredSpan')} ${spec.declaredSpan}; the original span is the span trained before scaling and cannot exceed the declared span: set ${name('declaredSpan')} to the extended span${extended}, or ${name('position.scaling.originalSpan')} to the span the model was trained at`);
        }
    }
    return out;
}
/** Why `v` is not a size: a phrase starting with ", " (or empty for a plain range miss), or null when it is fine. */
function sizeProblem(v, min, real) {
    if (!Number.isFinite(v))
        return ', not a finite number';
    if (real)
        return v > 0 ? null : '';
    if (!Number.isInteger(v))
        return ', not a whole number';
    if (!Number.isSafeInteger(v))
        return ', too large to hold exactly in a double (beyond 2^53 − 1)';
    return v >= min ? null : '';
}
/** For a size the defaults derived (no location), how it was derived and what to change; null when it was stated. */
function derivation(spec, locations, field) {
    if (locations[field])
        return null;
    const key = (f) => locations[f]?.key ?? f;
    if (field === 'headDim' && spec_rules_isCount(spec.hidden) && spec_rules_isCount(spec.heads)) {
        return {
            subject: `the head width is not stated, and ${key('hidden')} / ${key('heads')} = ${spec.hidden} / ${spec.heads} = ${formatNumber(Number(spec.headDim.toPrecision(6)))}`,
            advice: `state the width of one head, or use a head count that divides ${spec.hidden}`,
        };
    }
    if (field === 'encoder.headDim' && spec.encoder && spec_rules_isCount(spec.hidden) && spec_rules_isCount(spec.encoder.heads)) {
        return {
            subject: `the encoder head width is not stated, and ${key('hidden')} / ${key('encoder.heads')} = ${spec.hidden} / ${spec.encoder.heads} = ${formatNumber(Number(spec.encoder.headDim.toPrecision(6)))}`,
            advice: `state the width of one encoder head, or use an encoder head count that divides ${spec.hidden}`,
        };
    }
    return null;
}
/** Where a derived size's finding points: the key it is derived from. */
function derivedFrom(field, locations) {
    const from = { headDim: 'heads', kvHeads: 'heads', ffn: 'hidden', 'encoder.headDim': 'encoder.heads', 'encoder.kvHeads': 'encoder.heads', 'encoder.ffn': 'hidden' };
    const source = from[field];
    return source !== undefined && locations[source] ? source : null;
}
function headGrouping(heads, kvHeads, headsField, kvField, name, push) {
    if (!spec_rules_isCount(heads) || !spec_rules_isCount(kvHeads) || heads % kvHeads === 0)
        return;
    const divisors = divisorsOf(heads);
    const below = divisors.filter((d) => d < kvHeads).pop();
    const above = divisors.find((d) => d > kvHeads);
    const choices = [below, above].filter((d) => d !== undefined);
    const examples = choices.length > 0 ? ` such as ${choices.join(' or ')}` : '';
    push('kv-heads-indivisible', kvField, `${name(kvField)} is ${kvHeads}, which does not divide ${name(headsField)} ${heads}; use a divisor of ${heads}${examples}`);
}
/** Divisors of `n` in ascending order, by trial up to sqrt(n); none past 2^32, where the trial would take too long for a message. */
function divisorsOf(n) {
    if (n > 2 ** 32)
        return [];
    const small = [];
    const large = [];
    for (let d = 1; d * d <= n; d++) {
        if (n % d !== 0)
            continue;
        small.push(d);
        if (d * d !== n)
            large.unshift(n / d);
    }
    return [...small, ...large];
}
/**
 * Rotary codes turn channel pairs, so `headDim * fraction` must be an even whole number
 * (`r = 2 floor(headDim * fraction / 2)` in the metric contract silently drops the rest).
 */
function spec_rules_rotaryWidth(spec, locations, name, push) {
    if (spec.position.kind !== 'rotary')
        return;
    const { fraction } = spec.position;
    const headDim = spec.headDim;
    if (!spec_rules_isCount(headDim) || !Number.isFinite(fraction) || fraction <= 0 || fraction > 1)
        return;
    const width = headDim * fraction;
    // A decimal fraction is inexact in binary; the product lands within a few ulps of the decimal one.
    const nearest = Math.round(width);
    const whole = Math.abs(width - nearest) <= 1e-9 * Math.max(1, width);
    if (whole && nearest % 2 === 0 && nearest >= 2)
        return;
    const headName = locations.headDim ? `${name('headDim')} ${headDim}` : `the head width ${headDim} (${name('hidden')} / ${name('heads')})`;
    const used = 2 * Math.floor((whole ? nearest : width) / 2);
    const metricsNote = `the metrics use ${used} channel${used === 1 ? '' : 's'}`;
    if (fraction === 1) {
        const evens = [headDim - 1, headDim + 1].filter((d) => d >= 2);
        push('rotary-width-odd', locations.headDim ? 'headDim' : locations.heads ? 'heads' : null, `${headName} is odd, so the rotary width ${headDim} leaves one channel without a partner (${metricsNote}); use an even head width such as ${evens.join(' or ')}`);
        return;
    }
    const widthText = whole ? String(nearest) : formatNumber(Number(width.toPrecision(6)));
    const lo = 2 * Math.floor(width / 2);
    const candidates = [lo, lo + 2].filter((w) => w >= 2 && w <= headDim);
    const suggestions = candidates.map((w) => `${formatNumber(Number((w / headDim).toPrecision(6)))} (${w} channels)`);
    push('rotary-width-odd', locations['position.fraction'] ? 'position.fraction' : 'headDim', `${headName} × ${name('position.fraction')} ${formatNumber(fraction)} = ${widthText}, which is not an even whole number, so the rotary channels do not pair up (${metricsNote}); use a fraction giving an even width${suggestions.length ? `, such as ${suggestions.join(' or ')}` : ''}`);
}

;// CONCATENATED MODULE: ./src/core/metrics/memory-curve.ts




/** bytes: `weightBytes + cacheBytesAtSpan` with T = `span`; null for degenerate input. */
function memoryAtSpan(spec, span) {
    const t = positiveCount(span);
    const counts = parameterCounts(spec);
    return memoryBytes(weightBytes(spec, counts ? counts.params : null), cacheBytesAtSpan(spec, t));
}
/** bytes: `deviceGiB · 2^30 · (1 - reserve)`, null without a device budget (reserve default: `0.1`). */
function usableDeviceBytes(spec) {
    const device = positiveFinite(spec.serving?.deviceGiB);
    const stated = spec.serving?.reserve;
    const reserve = stated === null || stated === undefined ? DEFAULT_RESERVE : stated;
    if (device === null || !(Number.isFinite(reserve) && reserve >= 0 && reserve < 1))
        return null;
    return device * 2 ** 30 * (1 - reserve);
}

;// CONCATENATED MODULE: ./src/core/units.ts
/** Human units for messages and reports. Every function takes null and prints an em dash. */
const INTEGER = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });
/** `131072` → `131,072`. */
function formatInteger(value) {
    if (value === null || !Number.isFinite(value))
        return '—';
    return INTEGER.format(value);
}
/** Significant-digit formatting for ratios and radians, with exponent for tiny or huge values. */
function units_formatNumber(value, digits = 4) {
    if (value === null || !Number.isFinite(value))
        return '—';
    if (value === 0)
        return '0';
    const magnitude = Math.abs(value);
    if (magnitude >= 1e-3 && magnitude < 1e7) {
        if (Number.isInteger(value))
            return formatInteger(value);
        return String(Number(value.toPrecision(digits)));
    }
    return value.toExponential(digits - 1).replace('e+', 'e');
}
/** Tokens with a binary-k/M suffix when round: `131072` → `131,072 (128k)`. */
function formatTokens(value) {
    if (value === null || !Number.isFinite(value))
        return '—';
    const plain = formatInteger(value);
    const magnitude = Math.abs(value);
    if (magnitude >= 1024 * 1024 && magnitude % (1024 * 1024) === 0)
        return `${plain} (${value / (1024 * 1024)}M)`;
    if (magnitude >= 1024 && magnitude % 1024 === 0)
        return `${plain} (${value / 1024}k)`;
    return plain;
}
const BYTE_UNITS = ['B', 'KiB', 'MiB', 'GiB', 'TiB', 'PiB'];
/** Bytes in binary units, three significant digits: `524288` → `512 KiB`. */
function formatBytes(value) {
    if (value === null || !Number.isFinite(value))
        return '—';
    let magnitude = Math.abs(value);
    let unit = 0;
    while (magnitude >= 1024 && unit < BYTE_UNITS.length - 1) {
        magnitude /= 1024;
        unit += 1;
    }
    const sign = value < 0 ? '-' : '';
    const digits = unit === 0 ? String(magnitude) : String(Number(magnitude.toPrecision(3)));
    return `${sign}${digits} ${BYTE_UNITS[unit]}`;
}
/** Large counts with a decimal suffix: `6738415616` → `6.74B`. */
function formatCount(value) {
    if (value === null || !Number.isFinite(value))
        return '—';
    const magnitude = Math.abs(value);
    for (const [size, suffix] of [[1e12, 'T'], [1e9, 'B'], [1e6, 'M'], [1e3, 'k']]) {
        if (magnitude >= size)
            return `${Number((value / size).toPrecision(3))}${suffix}`;
    }
    return formatInteger(value);
}
/** A signed percentage change from `before` to `after`, null when undefined. */
function percentChange(before, after) {
    if (before === null || after === null || !Number.isFinite(before) || !Number.isFinite(after))
        return null;
    if (before === 0)
        return after === 0 ? 0 : null;
    return ((after - before) / Math.abs(before)) * 100;
}

;// CONCATENATED MODULE: ./src/core/rules/metric-rules.ts



function at(locations, ...paths) {
    for (const path of paths) {
        const found = locations[path];
        if (found)
            return { key: found.key, line: found.line };
    }
    return { key: null, line: null };
}
function finding(rule, message, where) {
    return { rule, severity: RULES[rule].severity, message, ...where };
}
function spanName(spec, locations) {
    if (spec.serving.span !== null)
        return { label: 'served span', where: at(locations, 'serving.span') };
    return { label: 'declared span', where: at(locations, 'declaredSpan') };
}
function codeLabel(spec) {
    const code = spec.position;
    if (code.kind !== 'rotary')
        return `${code.kind} position code`;
    return code.scaling ? `rotary code with ${code.scaling.kind} scaling` : 'rotary code without scaling';
}
/** Findings that follow from one file's metrics: span past reach, unaccounted spans, rounding. */
function metricFindings(spec, metrics, locations) {
    const findings = [];
    const T = metrics.evaluationSpan;
    const { label, where } = spanName(spec, locations);
    if (metrics.headroom !== null && metrics.headroom < 0 && metrics.reach !== null && T !== null) {
        const L0 = metrics.trainedSpan;
        let advice;
        if (spec.position.kind === 'learned') {
            advice = `grow the position table to ${formatInteger(T)} rows (retraining it), or serve at most ${formatInteger(metrics.reach)} tokens`;
        }
        else if (spec.position.kind === 'rotary' && L0 !== null && L0 > 0) {
            const kind = spec.position.scaling?.kind ?? 'linear';
            advice = `raise the ${kind} scaling factor to at least ${formatInteger(Math.ceil(T / L0))} (covers ${formatInteger(Math.ceil(T / L0) * L0)}), or serve at most ${formatInteger(metrics.reach)} tokens`;
        }
        else {
            advice = `serve at most ${formatInteger(metrics.reach)} tokens`;
        }
        findings.push(finding('span-past-reach', `The ${label} ${formatTokens(T)} is ${formatInteger(-metrics.headroom)} tokens past the reach ${formatTokens(metrics.reach)} of the ${codeLabel(spec)} (trained span ${formatTokens(L0)}); ${advice}.`, where));
    }
    if (spec.position.kind === 'rotary' && spec.position.scaling && spec.trainedSpan === null
        && metrics.scalingCover !== null && metrics.declaredSpan !== null && metrics.declaredSpan > metrics.scalingCover) {
        const scaling = spec.position.scaling;
        findings.push(finding('span-beyond-scaling-cover', `The declared span ${formatTokens(metrics.declaredSpan)} goes beyond the ${formatTokens(metrics.scalingCover)} that ${scaling.kind} scaling accounts for (original span ${formatTokens(metrics.trainedSpan)} × factor ${scaling.factor}), and no trained span is stated; state the trained span if the model was tuned longer, or raise the factor to ${formatInteger(Math.ceil(metrics.declaredSpan / (metrics.trainedSpan ?? 1)))}.`, at(locations, 'declaredSpan')));
    }
    const usable = usableDeviceBytes(spec);
    if (usable !== null && metrics.memoryBytes !== null && metrics.memoryBytes > usable) {
        const sequences = spec.serving.sequences ?? 1;
        const fit = metrics.fitSequences !== null && metrics.fitSequences > 0
            ? `at most ${formatInteger(metrics.fitSequences)} sequence${metrics.fitSequences === 1 ? '' : 's'} of ${formatTokens(T)} fit`
            : 'not even one sequence at this span fits';
        findings.push(finding('memory-over-budget', `Weights (${formatBytes(metrics.weightBytes)}) plus the key/value cache for ${formatInteger(sequences)} sequence${sequences === 1 ? '' : 's'} of ${formatTokens(T)} tokens (${formatBytes(metrics.cacheBytesAtSpan)}) need ${formatBytes(metrics.memoryBytes)}, over the ${formatBytes(usable)} usable of ${formatInteger(spec.serving.deviceGiB)} GiB; ${fit}: hold fewer sequences, a narrower cache dtype or fewer key/value heads, or serve a shorter span.`, at(locations, 'serving.sequences', 'serving.span', 'serving.deviceGiB', 'dtypes.cache')));
    }
    const format = spec.dtypes.positions ?? 'fp32';
    const rounding = metrics.precision[format];
    const formatWhere = at(locations, 'dtypes.positions', 'serving.span', 'declaredSpan');
    if (rounding.collidingPositions !== null && rounding.collidingPositions > 0 && T !== null) {
        const overflow = rounding.overflowPosition !== null ? `; from position ${formatInteger(rounding.overflowPosition)} on it overflows` : '';
        findings.push(finding('positions-collide', `In ${format}, ${formatInteger(rounding.collidingPositions)} of the ${formatInteger(T - 1)} neighbouring position pairs in the ${label} ${formatTokens(T)} round to the same value (every integer is exact only up to ${formatInteger(rounding.positionExactLimit)})${overflow}; compute positions in fp32, or serve at most ${formatInteger(rounding.positionExactLimit)} tokens.`, formatWhere));
    }
    if (rounding.blurredPairs !== null && rounding.blurredPairs > 0) {
        findings.push(finding('pairs-blurred', `In ${format}, ${formatInteger(rounding.blurredPairs)} frequency pairs give two neighbouring positions within the ${label} ${formatTokens(T)} the same rounded angle, so those pairs cannot tell the neighbours apart; compute angles in a wider format if the model relies on them.`, formatWhere));
    }
    return findings;
}

;// CONCATENATED MODULE: ./src/core/serving-patch.ts
/** Where each patch field lands in the spec, as a location-map path. */
const SPEC_PATH = {
    span: 'serving.span',
    sequences: 'serving.sequences',
    deviceGiB: 'serving.deviceGiB',
    reserve: 'serving.reserve',
    outputTokens: 'serving.outputTokens',
    promptTokens: 'serving.promptTokens',
    weights: 'dtypes.weights',
    cache: 'dtypes.cache',
    positions: 'dtypes.positions',
    trainedSpan: 'trainedSpan',
};
function current(spec, field) {
    switch (field) {
        case 'weights':
        case 'cache':
        case 'positions': return spec.dtypes[field];
        case 'trainedSpan': return spec.trainedSpan;
        default: return spec.serving[field];
    }
}
/**
 * A copy of `spec` with the patch applied, and the locations of the patched fields pointed at
 * `origin` (the policy file or the command line), so findings name where a value came from.
 */
function applyServing(spec, locations, patch, mode, origin) {
    const next = { ...spec, dtypes: { ...spec.dtypes }, serving: { ...spec.serving } };
    const nextLocations = { ...locations };
    for (const field of Object.keys(SPEC_PATH)) {
        const value = patch[field];
        if (value === undefined)
            continue;
        if (mode === 'default' && current(spec, field) !== null)
            continue;
        switch (field) {
            case 'weights':
            case 'cache':
                next.dtypes[field] = value;
                break;
            case 'positions':
                next.dtypes.positions = value;
                break;
            case 'trainedSpan':
                next.trainedSpan = value;
                break;
            default: next.serving[field] = value;
        }
        nextLocations[SPEC_PATH[field]] = typeof origin === 'function' ? origin(field) : origin;
    }
    return { spec: next, locations: nextLocations };
}

;// CONCATENATED MODULE: ./src/core/severity.ts
/** Sort key: block first. */
const SEVERITY_ORDER = { block: 0, warn: 1, info: 2 };
/** The more severe of two severities. */
function worse(a, b) {
    return SEVERITY_ORDER[a] <= SEVERITY_ORDER[b] ? a : b;
}

;// CONCATENATED MODULE: ./src/core/inspect.ts







/** Turns anything thrown while reading a file into a failure that names the file and line. */
function toFailure(path, error) {
    const line = error?.line;
    return {
        path,
        line: typeof line === 'number' ? line : null,
        message: error instanceof Error ? error.message : String(error),
        ...(error instanceof NotAModelError ? { notAModel: true } : {}),
    };
}
/** Read, measure and judge one model config. Throws `ReadError` when the text cannot be read. */
function inspectModel(text, path, options = {}) {
    const read = readModel(text, path, { at: options.at });
    let spec = read.spec;
    let locations = read.locations;
    if (options.defaults) {
        ({ spec, locations } = applyServing(spec, locations, options.defaults, 'default', options.defaultsOrigin ?? { key: 'policy serving', line: null }));
    }
    if (options.overrides) {
        ({ spec, locations } = applyServing(spec, locations, options.overrides, 'override', options.overridesOrigin ?? { key: 'command line', line: null }));
    }
    const metrics = computeMetrics(spec);
    const findings = [...read.findings, ...specFindings(spec, locations), ...metricFindings(spec, metrics, locations)];
    return { path, dialect: read.dialect, spec, locations, metrics, findings: sortFindings(findings) };
}
/** Most severe first, then by line, so the first rows of any report are the ones that matter. */
function sortFindings(findings) {
    return [...findings].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity] || (a.line ?? Infinity) - (b.line ?? Infinity));
}

;// CONCATENATED MODULE: ./src/core/metrics/types.ts
/** Scalar metric names (everything but `precision` and `alibiSlopes`), in report order. */
const SCALAR_METRICS = [
    'declaredSpan', 'trainedSpan', 'servedSpan', 'evaluationSpan', 'reach', 'scalingCover', 'headroom',
    'extensionRatio', 'fastestWavelength', 'slowestWavelength', 'unturnedPairs', 'exposedPairs',
    'separationFloor', 'separationFloorOffset', 'discriminationSpan', 'attentionScale', 'alibiHorizon',
    'receptiveField', 'positionShare',
    'params', 'activeParams', 'nonEmbeddingParams', 'weightBytes', 'cachePerTokenBytes', 'cacheBytesAtSpan',
    'memoryBytes', 'fitSequences', 'flopsPerToken', 'tokenBudget',
];
const PRECISION_METRICS = [
    'positionExactLimit', 'collidingPositions', 'angleErrorMax', 'overflowPosition', 'blurredPairs',
];

;// CONCATENATED MODULE: ./src/core/compare/metric-path.ts


/** Every name a policy limit or a report row can use, scalar metrics first. */
const METRIC_PATHS = [
    ...SCALAR_METRICS,
    ...FLOAT_FORMATS.flatMap((format) => PRECISION_METRICS.map((name) => `precision.${format}.${name}`)),
];
const KNOWN = new Set(METRIC_PATHS);
function isMetricPath(name) {
    return KNOWN.has(name);
}
/** The value of one metric, or null when it does not apply. */
function metricValue(metrics, path) {
    if (path.startsWith('precision.')) {
        const [, format, name] = path.split('.');
        return metrics.precision[format]?.[name] ?? null;
    }
    const value = metrics[path];
    return typeof value === 'number' ? value : null;
}
/**
 * Spec fields a metric follows from, most direct first: where an annotation about the metric
 * goes when the limit itself has no line in the model file.
 */
const METRIC_SOURCES = {
    declaredSpan: ['declaredSpan'],
    trainedSpan: ['trainedSpan', 'position.scaling.originalSpan', 'declaredSpan'],
    servedSpan: ['serving.span'],
    reach: ['position.scaling.factor', 'trainedSpan', 'declaredSpan'],
    scalingCover: ['position.scaling.factor', 'position.scaling.originalSpan'],
    headroom: ['serving.span', 'declaredSpan', 'position.scaling.factor'],
    extensionRatio: ['serving.span', 'declaredSpan', 'trainedSpan'],
    separationFloor: ['position.base', 'serving.span', 'declaredSpan'],
    discriminationSpan: ['position.base', 'position.scaling.factor'],
    unturnedPairs: ['position.base', 'trainedSpan'],
    exposedPairs: ['position.base', 'serving.span', 'declaredSpan'],
    params: ['layers', 'hidden', 'ffn', 'vocab'],
    weightBytes: ['dtypes.weights', 'layers', 'hidden'],
    cachePerTokenBytes: ['kvHeads', 'headDim', 'dtypes.cache', 'layers'],
    cacheBytesAtSpan: ['serving.sequences', 'serving.span', 'dtypes.cache', 'kvHeads'],
    memoryBytes: ['serving.sequences', 'serving.span', 'dtypes.cache', 'dtypes.weights'],
    fitSequences: ['serving.sequences', 'serving.deviceGiB', 'serving.span', 'dtypes.cache'],
    flopsPerToken: ['serving.span', 'layers', 'hidden'],
    tokenBudget: ['serving.outputTokens', 'serving.promptTokens', 'serving.span'],
};

;// CONCATENATED MODULE: ./src/core/compare/decide.ts





function isReport(version) {
    return version !== null && 'metrics' in version;
}
function isFailure(version) {
    return version !== null && !('metrics' in version);
}
function locate(locations, paths) {
    for (const path of paths ?? []) {
        const found = locations[path];
        if (found)
            return { key: found.key, line: found.line };
    }
    return { key: null, line: null };
}
function sameCode(a, b) {
    return JSON.stringify(a.position) === JSON.stringify(b.position) && a.trainedSpan === b.trainedSpan;
}
/** Frequencies before scaling: they follow from the code kind, the rotary base and width, or d_model. */
function frequencyKey(spec) {
    const code = spec.position;
    if (code.kind === 'rotary')
        return `rotary:${code.base}:${2 * Math.floor((spec.headDim * code.fraction) / 2)}`;
    if (code.kind === 'sinusoidal')
        return `sinusoidal:${spec.hidden}`;
    return code.kind;
}
/** Findings that only make sense as a change between base and head. */
function changeFindings(base, head) {
    const findings = [];
    const b = base.metrics;
    const h = head.metrics;
    const at = (...paths) => locate(head.locations, paths);
    if (b.declaredSpan !== null && h.declaredSpan !== null && h.declaredSpan > b.declaredSpan && sameCode(base.spec, head.spec)) {
        findings.push({
            rule: 'span-grew-code-unchanged', severity: RULES['span-grew-code-unchanged'].severity,
            message: `The declared span grew from ${formatInteger(b.declaredSpan)} to ${formatInteger(h.declaredSpan)} tokens while the position code (${head.spec.position.kind}${head.spec.position.kind === 'rotary' ? `, base ${units_formatNumber(head.spec.position.base, 6)}, ${head.spec.position.scaling ? `${head.spec.position.scaling.kind} × ${head.spec.position.scaling.factor}` : 'no scaling'}` : ''}) stayed the same; add or raise context scaling so the code reaches ${formatInteger(h.declaredSpan)}, or state the trained span if the model was trained that long.`,
            ...at('declaredSpan'),
        });
    }
    const before = frequencyKey(base.spec);
    const after = frequencyKey(head.spec);
    if (before !== after) {
        const describe = (spec) => spec.position.kind === 'rotary'
            ? `rotary base ${units_formatNumber(spec.position.base, 6)} over ${2 * Math.floor((spec.headDim * spec.position.fraction) / 2)} channels`
            : spec.position.kind === 'sinusoidal' ? `sinusoidal over ${spec.hidden} channels` : `${spec.position.kind} code`;
        findings.push({
            rule: 'frequencies-changed', severity: RULES['frequencies-changed'].severity,
            message: `The position frequencies changed from ${describe(base.spec)} to ${describe(head.spec)}: the checkpoint was trained with the old ones, so this needs retraining or tuning at the new frequencies.`,
            ...at('position.base', 'position.fraction', 'headDim', 'position'),
        });
    }
    if (b.cachePerTokenBytes !== null && h.cachePerTokenBytes !== null && b.cachePerTokenBytes !== h.cachePerTokenBytes) {
        const pct = percentChange(b.cachePerTokenBytes, h.cachePerTokenBytes);
        findings.push({
            rule: 'cache-per-token-changed', severity: RULES['cache-per-token-changed'].severity,
            message: `Key/value cache per token changed from ${formatInteger(b.cachePerTokenBytes)} to ${formatInteger(h.cachePerTokenBytes)} bytes (${pct === null ? 'n/a' : `${pct > 0 ? '+' : ''}${units_formatNumber(pct, 3)} %`}): key/value heads ${base.spec.kvHeads} → ${head.spec.kvHeads}, head size ${base.spec.headDim} → ${head.spec.headDim}, cache ${base.spec.dtypes.cache ?? base.spec.dtypes.weights ?? 'bf16'} → ${head.spec.dtypes.cache ?? head.spec.dtypes.weights ?? 'bf16'}.`,
            ...at('kvHeads', 'dtypes.cache', 'headDim'),
        });
    }
    return findings;
}
/** Which bounds of `limit` the head value (and its change over base) crosses, and whether any was judged. */
function checkLimit(limit, base, head) {
    const crossed = [];
    let judged = false;
    if (head !== null) {
        if (limit.max !== undefined) {
            judged = true;
            if (head > limit.max)
                crossed.push(`above the maximum ${units_formatNumber(limit.max, 6)}`);
        }
        if (limit.min !== undefined) {
            judged = true;
            if (head < limit.min)
                crossed.push(`below the minimum ${units_formatNumber(limit.min, 6)}`);
        }
    }
    if (limit.maxIncreasePct !== undefined && base !== null && head !== null) {
        const pct = percentChange(base, head);
        judged = true;
        if (pct === null ? head > base : pct > limit.maxIncreasePct) {
            crossed.push(`${pct === null ? 'up from 0' : `up ${units_formatNumber(pct, 3)} %`} over base, more than the ${units_formatNumber(limit.maxIncreasePct, 3)} % allowed`);
        }
    }
    return { crossed, judged };
}
function deltasAndLimitFindings(base, head, judging) {
    const deltas = [];
    const findings = [];
    for (const metric of METRIC_PATHS) {
        const b = base ? metricValue(base.metrics, metric) : null;
        const h = metricValue(head.metrics, metric);
        const limit = judging.limits[metric] ?? null;
        const change = b !== null && h !== null ? h - b : null;
        let state = 'unjudged';
        if (limit) {
            const { crossed, judged } = checkLimit(limit, b, h);
            state = crossed.length > 0 ? 'crossed' : judged ? 'ok' : 'unjudged';
            if (crossed.length > 0) {
                findings.push({
                    rule: 'limit-crossed', severity: limit.severity,
                    message: `${metric} is ${units_formatNumber(h, 6)}${b !== null && b !== h ? ` (base ${units_formatNumber(b, 6)})` : ''}: ${crossed.join('; ')}.`,
                    ...locate(head.locations, METRIC_SOURCES[metric.startsWith('precision.') ? 'collidingPositions' : metric] ?? ['serving.span', 'declaredSpan']),
                    metric,
                });
            }
        }
        const changed = base !== null && b !== h;
        if (changed || limit) {
            deltas.push({ metric, base: b, head: h, change, changePct: percentChange(b, h), limit, state });
        }
    }
    return { deltas, findings };
}
const findingKey = (f) => `${f.rule}\u0000${f.key ?? ''}`;
/** Judge one changed config: its findings with policy, standing and waiver applied, and its deltas. */
function decideFile(config, waiverApplied) {
    const { change, judging } = config;
    const base = isReport(config.base) ? config.base : null;
    const head = isReport(config.head) ? config.head : null;
    const headError = isFailure(config.head) ? config.head : null;
    let raw = [];
    let deltas = [];
    if (head) {
        const limits = deltasAndLimitFindings(base, head, judging);
        deltas = limits.deltas;
        raw = [...head.findings, ...(base ? changeFindings(base, head) : []), ...limits.findings];
    }
    else if (headError) {
        raw = [{ rule: 'config-unreadable', severity: 'block', message: headError.message, key: null, line: headError.line }];
    }
    const baseKeys = new Set((base?.findings ?? []).map(findingKey));
    const findings = [];
    for (const finding of raw) {
        const configured = isRuleId(finding.rule) && RULES[finding.rule].scope !== 'limit' ? judging.rules[finding.rule] : undefined;
        if (configured === 'off')
            continue;
        const severity = configured ?? finding.severity;
        const standing = baseKeys.has(findingKey(finding)) && RULES[finding.rule]?.scope === 'file';
        let counts = severity;
        if (standing && severity === 'block' && judging.standing === 'report')
            counts = 'info';
        let waived = false;
        if (counts === 'block' && waiverApplied) {
            counts = 'warn';
            waived = true;
        }
        findings.push({ ...finding, severity, standing, counts, waived, file: change.path });
    }
    const sorted = sortFindings(findings);
    return {
        path: change.path,
        previousPath: change.previousPath,
        status: change.status,
        dialect: head?.dialect ?? null,
        verdict: verdictOf(sorted),
        deltas,
        findings: sorted,
        base,
        head,
        baseError: isFailure(config.base) ? config.base : null,
        headError,
    };
}
function verdictOf(findings) {
    if (findings.some((f) => f.counts === 'block'))
        return 'block';
    if (findings.some((f) => f.counts === 'warn'))
        return 'warn';
    return 'ok';
}
/** The gate's one decision for a pull request. */
function decide(input) {
    const files = input.configs.map((config) => decideFile(config, input.waiver.applied));
    const all = files.flatMap((f) => f.findings);
    const verdict = files.some((f) => f.verdict === 'block') ? 'block' : files.some((f) => f.verdict === 'warn') ? 'warn' : 'ok';
    return {
        version: 1,
        verdict,
        blocking: all.filter((f) => f.counts === 'block').length,
        warnings: all.filter((f) => f.counts === 'warn').length,
        files: [...files].sort((a, b) => SEVERITY_ORDER[a.verdict === 'ok' ? 'info' : a.verdict] - SEVERITY_ORDER[b.verdict === 'ok' ? 'info' : b.verdict] || a.path.localeCompare(b.path)),
        deleted: input.deleted,
        policy: input.policy,
        waiver: { ...input.waiver, waivedBlocks: all.filter((f) => f.waived).length },
        notices: input.notices,
        base: input.base,
        head: input.head,
    };
}

;// CONCATENATED MODULE: ./src/core/policy/defaults.ts
/** Where a repository keeps its policy (default: `.github/context-reach.yml`). */
const DEFAULT_POLICY_PATH = '.github/context-reach.yml';
/**
 * Model-config globs when a policy has no `files`: checkpoint configs (`config.json`), files
 * named for a model, and the context-reach model format's `.reach` files.
 */
const DEFAULT_FILES = Object.freeze([
    '**/config.json',
    '**/*model*.{json,yaml,yml}',
    '**/*.reach.{yaml,yml,json}',
]);
/**
 * Never judged when a policy has no `exclude`: dependencies, workflow files, tokenizers, npm
 * manifests, and sharded-weight indexes (`model.safetensors.index.json` matches `*model*`).
 */
const DEFAULT_EXCLUDE = Object.freeze([
    'node_modules/**',
    '**/node_modules/**',
    '.github/**',
    '**/tokenizer*.json',
    '**/package*.json',
    '**/*.index.json',
]);
/** Largest policy file accepted, in UTF-16 code units of the decoded text (default: `1 MiB`). */
const defaults_MAX_POLICY_CHARS = 1024 * 1024;
/** The policy of a repository without a policy file: built-in rules, no numeric limits. */
const DEFAULT_POLICY = Object.freeze({
    path: null,
    files: DEFAULT_FILES,
    exclude: DEFAULT_EXCLUDE,
    serving: Object.freeze({}),
    limits: Object.freeze(Object.create(null)),
    rules: Object.freeze(Object.create(null)),
    overrides: Object.freeze([]),
    standing: 'report',
    waiverLabel: null,
    locations: Object.freeze(Object.create(null)),
});

// EXTERNAL MODULE: ./node_modules/picomatch/index.js
var picomatch = __nccwpck_require__(4006);
var picomatch_default = /*#__PURE__*/__nccwpck_require__.n(picomatch);
;// CONCATENATED MODULE: ./src/core/policy/locate.ts
/**
 * Line lookup inside a parsed YAML document: from a key path (as the schema validator reports
 * it) to the node and its 1-based line.
 */

function keyText(key) {
    return (0,dist/* isScalar */.jn)(key) ? String(key.value) : null;
}
function nodeAt(doc, path) {
    let node = (doc.contents ?? null);
    let key = null;
    let nearest = node;
    for (const segment of path) {
        // Aliases stand for their anchor; the guard on alias count already ran in toJS.
        if (node && (0,dist/* isAlias */.Vj)(node))
            node = (node.resolve(doc) ?? null);
        if (node && (0,dist/* isMap */.jh)(node)) {
            const pair = node.items.find((item) => keyText(item.key) === String(segment));
            if (!pair)
                return { value: null, key: null, nearest };
            key = (pair.key ?? null);
            node = (pair.value ?? null);
            nearest = node ?? key;
        }
        else if (node && (0,dist/* isSeq */.oP)(node)) {
            const item = node.items[Number(segment)];
            if (item === undefined)
                return { value: null, key: null, nearest };
            key = null;
            node = (item ?? null);
            nearest = node ?? nearest;
        }
        else {
            return { value: null, key: null, nearest };
        }
    }
    return { value: node, key, nearest };
}
/** 1-based line where a node starts, null for a node without a place in the source. */
function lineOf(lineCounter, node) {
    const offset = node?.range?.[0];
    return typeof offset === 'number' ? lineCounter.linePos(offset).line : null;
}
/** Key path written the way users read it: `overrides[0].limits.headroom`. */
function formatKeyPath(path) {
    let text = '';
    for (const segment of path) {
        if (typeof segment === 'number')
            text += `[${segment}]`;
        else
            text += text === '' ? segment : `.${segment}`;
    }
    return text;
}

;// CONCATENATED MODULE: ./schema/policy.schema.json
const policy_schema_namespaceObject = /*#__PURE__*/JSON.parse('{"$schema":"http://json-schema.org/draft-07/schema#","title":"context-reach policy","description":"A team\'s policy for the context-reach pull-request gate: which files are model configs, serving defaults, limits on metrics, rule severities. Read from the base commit of a pull request, so a pull request cannot loosen its own gate.","type":"object","additionalProperties":false,"properties":{"$schema":{"type":"string","description":"Schema reference for editors; ignored by the gate."},"files":{"title":"Model config globs","description":"Globs (repository-relative, `**` for any depth) that pick the model configs to judge. Replaces the built-in list when given.","$ref":"#/definitions/globs","default":["**/config.json","**/*model*.{json,yaml,yml}","**/*.reach.{yaml,yml,json}"]},"exclude":{"title":"Excluded globs","description":"Globs of files never judged, even when `files` matches them. Replaces the built-in list when given.","$ref":"#/definitions/globs","default":["node_modules/**","**/node_modules/**",".github/**","**/tokenizer*.json","**/package*.json","**/*.index.json"]},"serving":{"$ref":"#/definitions/serving"},"limits":{"$ref":"#/definitions/limits"},"rules":{"$ref":"#/definitions/rules"},"overrides":{"title":"Overrides","description":"Settings for parts of the repository. Every entry whose `files` match a config applies, in order; later entries win key by key.","type":"array","maxItems":200,"items":{"$ref":"#/definitions/override"},"default":[]},"standing":{"title":"Standing findings","description":"What a finding the base version already had does: `report` lists it without blocking, `block` lets it block like a new one.","type":"string","enum":["report","block"],"default":"report"},"waiver-label":{"title":"Waiver label","description":"A pull-request label that turns blocks into warnings; the report records the waiver. Without it no label waives anything.","type":"string","minLength":1,"maxLength":50}},"definitions":{"glob":{"type":"string","minLength":1,"maxLength":1000,"pattern":"^[^!/]","description":"A repository-relative glob; no leading `/`, no `!` negation (use `exclude`)."},"globs":{"type":"array","items":{"$ref":"#/definitions/glob"},"minItems":1,"maxItems":200},"serving":{"title":"Serving defaults","description":"Defaults for every model config; a value the config states itself wins.","type":"object","additionalProperties":false,"properties":{"span":{"title":"Served span","description":"Tokens served per sequence; the metrics are evaluated at this span (default: the config\'s declared span).","type":"integer","minimum":1,"maximum":9007199254740991},"sequences":{"title":"Concurrent sequences","description":"Sequences held in the key/value cache at once (default: `1`).","type":"integer","minimum":1,"maximum":9007199254740991,"default":1},"device-memory-gib":{"title":"Device memory","description":"Memory budget per replica in GiB, for `fitSequences` (default: none).","type":"number","exclusiveMinimum":0,"maximum":1048576},"reserve":{"title":"Reserved memory share","description":"Share of device memory kept free, from 0 up to but not including 1 (default: `0.1`).","type":"number","minimum":0,"exclusiveMaximum":1,"default":0.1},"weights":{"title":"Weight dtype","description":"Storage format of the weights (default: `bf16`).","type":"string","enum":["fp32","bf16","fp16","fp8","int8","int4"],"default":"bf16"},"cache":{"title":"Cache dtype","description":"Storage format of the key/value cache (default: the weight dtype).","type":"string","enum":["fp32","bf16","fp16","fp8","int8","int4"]},"positions":{"title":"Position dtype","description":"Format positions and angles are computed in (default: `fp32`).","type":"string","enum":["fp32","bf16","fp16"],"default":"fp32"},"output-tokens":{"title":"Reserved output tokens","description":"Tokens reserved for the model\'s output, for `tokenBudget` (default: none).","type":"integer","minimum":0,"maximum":9007199254740991},"prompt-tokens":{"title":"Reserved prompt tokens","description":"Tokens reserved for a fixed prompt, for `tokenBudget` (default: none).","type":"integer","minimum":0,"maximum":9007199254740991},"trained-span":{"title":"Trained span","description":"The span the model was trained at, when the config does not say (default: the scaling block\'s original span, else the declared span).","type":"integer","minimum":1,"maximum":9007199254740991}}},"limit":{"title":"Limit","description":"Bounds on one metric of the head version. Give at least one of `max`, `min`, `max-increase-pct`; in an override, `null` removes a bound set earlier.","type":["object","null"],"additionalProperties":false,"minProperties":1,"properties":{"max":{"description":"The head value must not exceed this, in the metric\'s unit.","type":["number","null"]},"min":{"description":"The head value must not fall below this, in the metric\'s unit.","type":["number","null"]},"max-increase-pct":{"description":"The head value may exceed the base value by at most this many percent: 100 × (head − base) / |base|.","type":["number","null"],"minimum":0},"severity":{"description":"What crossing the limit does (default: `block`).","type":"string","enum":["block","warn","info"],"default":"block"}}},"limits":{"title":"Limits","description":"Limits keyed by metric name exactly as in the metric contract; precision metrics as `precision.<fp32|bf16|fp16>.<metric>`.","type":"object","additionalProperties":false,"properties":{"declaredSpan":{"$ref":"#/definitions/limit","description":"tokens: the config\'s maximum positions."},"trainedSpan":{"$ref":"#/definitions/limit","description":"tokens: L0, the span the model was trained at."},"servedSpan":{"$ref":"#/definitions/limit","description":"tokens: the served span, when one is given."},"evaluationSpan":{"$ref":"#/definitions/limit","description":"tokens: T, the span every scan runs over (served span, else declared span)."},"reach":{"$ref":"#/definitions/limit","description":"tokens: learned table size, otherwise L0 × scaling factor."},"scalingCover":{"$ref":"#/definitions/limit","description":"tokens: L0 × factor for scaled rotary codes."},"headroom":{"$ref":"#/definitions/limit","description":"tokens: reach − T; negative when the span goes past what the position code supports."},"extensionRatio":{"$ref":"#/definitions/limit","description":"ratio: T / L0."},"fastestWavelength":{"$ref":"#/definitions/limit","description":"tokens: min of 2π/θ\'_i."},"slowestWavelength":{"$ref":"#/definitions/limit","description":"tokens: max of 2π/θ\'_i."},"unturnedPairs":{"$ref":"#/definitions/limit","description":"count: pairs whose wavelength exceeds L0."},"exposedPairs":{"$ref":"#/definitions/limit","description":"count: pairs that reach angles at the span\'s end never seen in training."},"separationFloor":{"$ref":"#/definitions/limit","description":"0..2: min over offsets k in [1, T) of sqrt(2(1 − S(k)))."},"separationFloorOffset":{"$ref":"#/definitions/limit","description":"tokens: the smallest offset attaining the separation floor."},"discriminationSpan":{"$ref":"#/definitions/limit","description":"tokens: smallest k in [1, T) with Σ cos(k θ\'_i) < 0 (Men et al. 2024)."},"attentionScale":{"$ref":"#/definitions/limit","description":"ratio: yarn attention temperature 0.1 ln(s) + 1; 1 otherwise."},"alibiHorizon":{"$ref":"#/definitions/limit","description":"tokens: ceil(ln(10^4) / min slope) for ALiBi (Press et al. 2022)."},"receptiveField":{"$ref":"#/definitions/limit","description":"tokens: layers × sliding window."},"positionShare":{"$ref":"#/definitions/limit","description":"0..1: position-code energy over input energy at initialisation."},"params":{"$ref":"#/definitions/limit","description":"count: all parameters."},"activeParams":{"$ref":"#/definitions/limit","description":"count: parameters with k active experts."},"nonEmbeddingParams":{"$ref":"#/definitions/limit","description":"count: active parameters less embeddings and position tables (Kaplan et al. 2020)."},"weightBytes":{"$ref":"#/definitions/limit","description":"bytes: params × bytes per weight."},"cachePerTokenBytes":{"$ref":"#/definitions/limit","description":"bytes: key/value cache per token, Σ layers 2 × kvHeads × headDim × bytes."},"cacheBytesAtSpan":{"$ref":"#/definitions/limit","description":"bytes: key/value cache for all sequences at span T."},"memoryBytes":{"$ref":"#/definitions/limit","description":"bytes: weightBytes + cacheBytesAtSpan."},"fitSequences":{"$ref":"#/definitions/limit","description":"count: sequences that fit the device budget at span T."},"flopsPerToken":{"$ref":"#/definitions/limit","description":"FLOP: 2 × nonEmbeddingParams + 2 × layers × T × heads × headDim (Kaplan et al. 2020)."},"tokenBudget":{"$ref":"#/definitions/limit","description":"tokens: T − reserved output tokens − reserved prompt tokens."},"precision.fp32.positionExactLimit":{"$ref":"#/definitions/limit","description":"tokens: largest n with every integer in [0, n] exact in fp32 (IEEE 754 binary32)."},"precision.fp32.collidingPositions":{"$ref":"#/definitions/limit","description":"count: positions p in [1, T) with fl(p) == fl(p − 1) in fp32 (IEEE 754 binary32)."},"precision.fp32.angleErrorMax":{"$ref":"#/definitions/limit","description":"radians: largest rounding error of a rotary angle computed in fp32 (IEEE 754 binary32)."},"precision.fp32.overflowPosition":{"$ref":"#/definitions/limit","description":"token: first position whose value or angle overflows fp32 (IEEE 754 binary32)."},"precision.fp32.blurredPairs":{"$ref":"#/definitions/limit","description":"count: pairs giving two neighbouring positions the same rounded angle in fp32 (IEEE 754 binary32)."},"precision.bf16.positionExactLimit":{"$ref":"#/definitions/limit","description":"tokens: largest n with every integer in [0, n] exact in bf16 (bfloat16)."},"precision.bf16.collidingPositions":{"$ref":"#/definitions/limit","description":"count: positions p in [1, T) with fl(p) == fl(p − 1) in bf16 (bfloat16)."},"precision.bf16.angleErrorMax":{"$ref":"#/definitions/limit","description":"radians: largest rounding error of a rotary angle computed in bf16 (bfloat16)."},"precision.bf16.overflowPosition":{"$ref":"#/definitions/limit","description":"token: first position whose value or angle overflows bf16 (bfloat16)."},"precision.bf16.blurredPairs":{"$ref":"#/definitions/limit","description":"count: pairs giving two neighbouring positions the same rounded angle in bf16 (bfloat16)."},"precision.fp16.positionExactLimit":{"$ref":"#/definitions/limit","description":"tokens: largest n with every integer in [0, n] exact in fp16 (IEEE 754 binary16)."},"precision.fp16.collidingPositions":{"$ref":"#/definitions/limit","description":"count: positions p in [1, T) with fl(p) == fl(p − 1) in fp16 (IEEE 754 binary16)."},"precision.fp16.angleErrorMax":{"$ref":"#/definitions/limit","description":"radians: largest rounding error of a rotary angle computed in fp16 (IEEE 754 binary16)."},"precision.fp16.overflowPosition":{"$ref":"#/definitions/limit","description":"token: first position whose value or angle overflows fp16 (IEEE 754 binary16)."},"precision.fp16.blurredPairs":{"$ref":"#/definitions/limit","description":"count: pairs giving two neighbouring positions the same rounded angle in fp16 (IEEE 754 binary16)."}}},"ruleLevel":{"type":"string","enum":["off","info","warn","block"]},"rules":{"title":"Rule severities","description":"Rule id to `off`, `info`, `warn` or `block` (default: each rule\'s own severity).","type":"object","additionalProperties":false,"properties":{"config-unreadable":{"$ref":"#/definitions/ruleLevel","description":"The model config cannot be read or parsed."},"value-invalid":{"$ref":"#/definitions/ruleLevel","description":"A value has the wrong type or is outside what the schema allows."},"size-invalid":{"$ref":"#/definitions/ruleLevel","description":"A size is zero, negative, fractional or not finite."},"kv-heads-indivisible":{"$ref":"#/definitions/ruleLevel","description":"Key/value heads do not divide the attention heads."},"rotary-width-odd":{"$ref":"#/definitions/ruleLevel","description":"The rotary width is not an even whole number."},"scaling-factor-below-one":{"$ref":"#/definitions/ruleLevel","description":"A context scaling factor below 1."},"original-span-above-declared":{"$ref":"#/definitions/ruleLevel","description":"The scaling block\'s original span exceeds the declared span."},"scaling-kind-unknown":{"$ref":"#/definitions/ruleLevel","description":"An unknown context scaling kind."},"position-code-assumed":{"$ref":"#/definitions/ruleLevel","description":"The config states no position code the reader can use, so one was assumed."},"key-ignored":{"$ref":"#/definitions/ruleLevel","description":"A key is stated but has no effect on the model as read."},"span-past-reach":{"$ref":"#/definitions/ruleLevel","description":"The evaluated span goes past what the position code supports."},"span-beyond-scaling-cover":{"$ref":"#/definitions/ruleLevel","description":"The declared span goes beyond what the scaling accounts for, and no trained span is stated."},"positions-collide":{"$ref":"#/definitions/ruleLevel","description":"Neighbouring positions round to the same value in the position dtype."},"pairs-blurred":{"$ref":"#/definitions/ruleLevel","description":"Some frequency pairs give neighbouring positions the same rounded angle."},"memory-over-budget":{"$ref":"#/definitions/ruleLevel","description":"Weights plus key/value cache at the span do not fit the device budget."},"span-grew-code-unchanged":{"$ref":"#/definitions/ruleLevel","description":"The declared span grew while the position code stayed the same."},"frequencies-changed":{"$ref":"#/definitions/ruleLevel","description":"The rotary base or the position frequencies changed."},"cache-per-token-changed":{"$ref":"#/definitions/ruleLevel","description":"Key/value cache per token changed."},"limit-crossed":{"$ref":"#/definitions/ruleLevel","description":"A metric crossed a limit of the team\'s policy."}}},"override":{"type":"object","additionalProperties":false,"required":["files"],"properties":{"files":{"description":"Globs of the configs this override applies to.","$ref":"#/definitions/globs"},"serving":{"$ref":"#/definitions/serving"},"limits":{"$ref":"#/definitions/limits"},"rules":{"$ref":"#/definitions/rules"}}}}}');
;// CONCATENATED MODULE: ./src/core/policy/schema.ts
/**
 * The policy file's JSON Schema (shipped as `schema/policy.schema.json` for editor completion)
 * and its compiled validator.
 */


const POLICY_SCHEMA = (/* unused pure expression or super */ null && (policySchema));
let schema_compiled = null;
/** Validates a plain value against the policy schema; errors carry `parentSchema` and `data`. */
function validatePolicyValue(value) {
    if (schema_compiled === null) {
        // allowUnionTypes: limits admit `null` to remove a bound in an override.
        const ajv = new dist_ajv.Ajv({ allErrors: true, verbose: true, strict: true, allowUnionTypes: true });
        schema_compiled = ajv.compile(policy_schema_namespaceObject);
    }
    return schema_compiled(value) ? [] : [...(schema_compiled.errors ?? [])];
}

;// CONCATENATED MODULE: ./src/core/policy/parse.ts
/**
 * Reading the policy file: YAML text to a checked `Policy`, or a `PolicyError` naming the file,
 * key and line of every problem. The gate fails closed on the error, so nothing here guesses.
 */






/** Problems listed in one error at most; the rest are counted. */
const MAX_PROBLEMS = 20;
/** Aliases one policy may expand; a real policy needs a handful, an expansion bomb needs thousands. */
const parse_MAX_ALIASES = 100;
function formatProblem(problem) {
    const where = problem.line === null ? problem.file : `${problem.file}:${problem.line}`;
    return problem.key === null ? `${where}: ${problem.message}` : `${where}: ${problem.key}: ${problem.message}`;
}
/** A policy file the gate cannot use. `file`, `line`, `key` describe the first problem. */
class PolicyError extends Error {
    file;
    line;
    key;
    problems;
    constructor(problems) {
        const first = problems[0];
        const more = problems.length > 1 ? ` (and ${problems.length - 1} more: ${problems.slice(1).map(formatProblem).join('; ')})` : '';
        super(`${formatProblem(first)}${more}`);
        this.name = 'PolicyError';
        this.file = first.file;
        this.line = first.line;
        this.key = first.key;
        this.problems = problems;
    }
}
/** A value quoted for a message: strings in quotes, long ones cut. */
function quote(value) {
    if (value === null)
        return 'null';
    if (Array.isArray(value))
        return 'a list';
    if (typeof value === 'object')
        return 'a mapping';
    if (typeof value === 'number')
        return Object.is(value, -0) ? '-0' : String(value);
    const text = typeof value === 'string' ? JSON.stringify(value) : String(value);
    return text.length > 80 ? `${text.slice(0, 77)}..."` : text;
}
const parse_TYPE_WORDS = {
    integer: 'a whole number', number: 'a finite number', string: 'a string', array: 'a list',
    object: 'a mapping', boolean: 'true or false', null: 'null',
};
function typeWords(type) {
    const names = Array.isArray(type) ? type : String(type).split(',');
    return names.map((name) => parse_TYPE_WORDS[String(name)] ?? String(name)).join(' or ');
}
const parse_COMPARISON_WORDS = { '>=': 'at least', '>': 'above', '<=': 'at most', '<': 'below' };
/** Instance path of an ajv error as key segments; digits index lists. */
function segments(instancePath, data) {
    const parts = instancePath === '' ? [] : instancePath.slice(1).split('/').map((part) => part.replace(/~1/g, '/').replace(/~0/g, '~'));
    const path = [];
    let cursor = data;
    for (const part of parts) {
        if (Array.isArray(cursor)) {
            path.push(Number(part));
            cursor = cursor[Number(part)];
        }
        else {
            path.push(part);
            cursor = cursor !== null && typeof cursor === 'object' ? cursor[part] : undefined;
        }
    }
    return path;
}
function unknownKeyMessage(parentKey, name, allowed) {
    const nearest = nearestName(name, allowed);
    const hint = nearest === null ? '' : `; did you mean "${nearest}"?`;
    if (parentKey === 'limits') {
        return `unknown metric ${quote(name)}: limits are keyed by metric names exactly as in the metric contract (METRICS.md)${hint}`;
    }
    if (parentKey === 'rules')
        return `unknown rule id ${quote(name)}: expected a rule id of context-reach${hint}`;
    return `unknown key ${quote(name)}: expected one of ${allowed.join(', ')}${hint}`;
}
function schemaProblem(error, file, doc, lines, data) {
    const path = segments(error.instancePath, data);
    const located = nodeAt(doc, path);
    const valueLine = lineOf(lines, located.value) ?? lineOf(lines, located.key) ?? lineOf(lines, located.nearest);
    const value = error.data;
    const params = error.params;
    const base = { file, key: path.length === 0 ? null : formatKeyPath(path), line: valueLine };
    switch (error.keyword) {
        case 'additionalProperties': {
            const name = String(params.additionalProperty);
            const keyPath = [...path, name];
            const at = nodeAt(doc, keyPath);
            const allowed = Object.keys(error.parentSchema?.properties ?? {})
                .filter((key) => key !== '$schema');
            return {
                file,
                key: formatKeyPath(keyPath),
                line: lineOf(lines, at.key) ?? valueLine,
                message: unknownKeyMessage(path[path.length - 1], name, allowed),
            };
        }
        case 'required':
            return { ...base, message: `has no ${quote(params.missingProperty)}; expected a list of globs naming the configs this entry applies to` };
        case 'type':
            return { ...base, message: `is ${quote(value)}; expected ${typeWords(params.type)}` };
        case 'enum': {
            const allowed = params.allowedValues.map(String);
            const nearest = typeof value === 'string' ? nearestName(value, allowed) : null;
            return { ...base, message: `is ${quote(value)}; expected one of ${allowed.join(', ')}${nearest === null ? '' : `; did you mean "${nearest}"?`}` };
        }
        case 'minimum':
        case 'maximum':
        case 'exclusiveMinimum':
        case 'exclusiveMaximum':
            return { ...base, message: `is ${quote(value)}; expected a number ${parse_COMPARISON_WORDS[String(params.comparison)]} ${String(params.limit)}` };
        case 'minItems':
        case 'maxItems':
            return { ...base, message: `has ${value.length} entries; expected ${error.keyword === 'minItems' ? 'at least' : 'at most'} ${String(params.limit)}` };
        case 'minLength':
        case 'maxLength':
            return { ...base, message: `is ${quote(value)} (${String(value).length} characters); expected ${error.keyword === 'minLength' ? 'at least' : 'at most'} ${String(params.limit)} characters` };
        case 'minProperties':
            return { ...base, message: `is empty; expected at least one of ${Object.keys(error.parentSchema?.properties ?? {}).join(', ')}` };
        case 'pattern':
            return { ...base, message: `is ${quote(value)}; expected a repository-relative glob without a leading "/" or "!" (list files to leave out under exclude)` };
        default:
            return { ...base, message: `is ${quote(value)}; ${error.message ?? 'not allowed by the policy schema'}` };
    }
}
/** The first line of a YAML parser message, without its own position suffix. */
function yamlMessage(code, message, text, offsets) {
    if (code === 'DUPLICATE_KEY') {
        const key = text.slice(offsets[0], offsets[0] + 200).split(/[:\n]/)[0].trim();
        return `duplicate key ${quote(key)}; expected each key once per mapping`;
    }
    if (/call stack/i.test(message))
        return 'nested too deeply; expected a policy a few levels deep';
    const first = message.split('\n')[0].replace(/ at line \d+, column \d+:?$/, '');
    return `not valid YAML: ${first}`;
}
/** Problems the schema cannot express: limits without a bound, min above max, unusable globs. */
function semanticProblems(data, file, doc, lines) {
    const problems = [];
    const at = (path, message) => {
        const located = nodeAt(doc, path);
        problems.push({ file, key: formatKeyPath(path), line: lineOf(lines, located.key) ?? lineOf(lines, located.value), message });
    };
    const checkLimits = (limits, prefix, topLevel) => {
        if (limits === null || typeof limits !== 'object')
            return;
        for (const [metric, limit] of Object.entries(limits)) {
            if (limit === null || typeof limit !== 'object')
                continue;
            const entry = limit;
            const bounds = ['max', 'min', 'max-increase-pct'].filter((name) => typeof entry[name] === 'number');
            if (topLevel && bounds.length === 0) {
                at([...prefix, metric], 'sets no bound; expected at least one of max, min, max-increase-pct');
            }
            if (typeof entry.min === 'number' && typeof entry.max === 'number' && entry.min > entry.max) {
                at([...prefix, metric, 'min'], `is ${quote(entry.min)}, above max ${quote(entry.max)}; expected min at most max`);
            }
        }
    };
    const checkGlobs = (globs, prefix) => {
        if (!Array.isArray(globs))
            return;
        globs.forEach((glob, index) => {
            if (typeof glob !== 'string')
                return;
            let reason = null;
            try {
                // picomatch turns a pattern it cannot read ("[z-a]", "{a,b") into one that matches nothing.
                if (picomatch_default().makeRe(glob, { dot: true }).source === '$^')
                    reason = 'it can match no path';
            }
            catch (error) {
                reason = error.message;
            }
            if (reason !== null)
                at([...prefix, index], `is ${quote(glob)}, not a usable glob (${reason}); expected a glob such as "models/**/config.json"`);
        });
    };
    checkLimits(data.limits, ['limits'], true);
    checkGlobs(data.files, ['files']);
    checkGlobs(data.exclude, ['exclude']);
    if (Array.isArray(data.overrides)) {
        data.overrides.forEach((override, index) => {
            if (override === null || typeof override !== 'object')
                return;
            const entry = override;
            checkLimits(entry.limits, ['overrides', index, 'limits'], false);
            checkGlobs(entry.files, ['overrides', index, 'files']);
        });
    }
    return problems;
}
const SERVING_FIELDS = [
    ['span', 'span'],
    ['sequences', 'sequences'],
    ['device-memory-gib', 'deviceGiB'],
    ['reserve', 'reserve'],
    ['output-tokens', 'outputTokens'],
    ['prompt-tokens', 'promptTokens'],
    ['weights', 'weights'],
    ['cache', 'cache'],
    ['positions', 'positions'],
    ['trained-span', 'trainedSpan'],
];
/** The policy's `serving` block in spec terms (camelCase `ServingPatch`), keys it leaves out left out. */
function servingPatchOf(block) {
    const patch = {};
    for (const [written, field] of SERVING_FIELDS) {
        if (block[written] !== undefined)
            patch[field] = block[written];
    }
    return patch;
}
function limitTable(limits) {
    const table = Object.create(null);
    for (const [metric, entry] of Object.entries(limits ?? {})) {
        if (entry === null) {
            table[metric] = null;
            continue;
        }
        const setting = {};
        if (entry.max !== undefined)
            setting.max = entry.max;
        if (entry.min !== undefined)
            setting.min = entry.min;
        if (entry['max-increase-pct'] !== undefined)
            setting.maxIncreasePct = entry['max-increase-pct'];
        if (entry.severity !== undefined)
            setting.severity = entry.severity;
        table[metric] = setting;
    }
    return table;
}
function ruleTable(rules) {
    const table = Object.create(null);
    for (const [id, level] of Object.entries(rules ?? {}))
        table[id] = level;
    return table;
}
/** Where each setting of one block (top level or an override) was written. */
function recordLocations(locations, block, prefix, doc, lines) {
    const record = (name, path) => {
        const located = nodeAt(doc, path);
        locations[name] = { key: formatKeyPath(path), line: lineOf(lines, located.key) ?? lineOf(lines, located.value) };
    };
    const lead = formatKeyPath(prefix);
    const named = (rest) => (lead === '' ? rest : `${lead}.${rest}`);
    for (const [written, field] of SERVING_FIELDS) {
        if (block.serving?.[written] !== undefined)
            record(named(`serving.${field}`), [...prefix, 'serving', written]);
    }
    for (const metric of Object.keys(block.limits ?? {}))
        record(named(`limits.${metric}`), [...prefix, 'limits', metric]);
    for (const id of Object.keys(block.rules ?? {}))
        record(named(`rules.${id}`), [...prefix, 'rules', id]);
}
/**
 * Parses and checks a policy file (YAML; JSON is YAML too). Pure: the caller reads the file.
 * Throws `PolicyError` listing every problem with file, key and line.
 */
function parsePolicy(text, path) {
    const fail = (problems) => {
        throw new PolicyError(problems.slice(0, MAX_PROBLEMS));
    };
    if (text.length > defaults_MAX_POLICY_CHARS) {
        fail([{ file: path, line: null, key: null, message: `is ${text.length} characters long; expected at most ${defaults_MAX_POLICY_CHARS} (a policy is a short file)` }]);
    }
    const lines = new dist/* LineCounter */.HN();
    let doc;
    let data;
    try {
        doc = (0,dist/* parseDocument */.Tp)(text, { lineCounter: lines, prettyErrors: false, uniqueKeys: true, strict: true });
        if (doc.errors.length > 0) {
            const seen = new Set();
            fail(doc.errors
                .map((error) => ({
                file: path,
                line: lines.linePos(error.pos[0]).line,
                key: null,
                message: yamlMessage(error.code, error.message, text, error.pos),
            }))
                .filter((problem) => !seen.has(problem.message) && seen.add(problem.message)));
        }
        data = doc.toJS({ maxAliasCount: parse_MAX_ALIASES });
    }
    catch (error) {
        if (error instanceof PolicyError)
            throw error;
        // toJS refuses alias bombs with a ReferenceError; absurd nesting overflows the stack.
        const reason = error instanceof RangeError ? 'nested too deeply' : error.message;
        return fail([{ file: path, line: null, key: null, message: `cannot be read as YAML: ${reason}` }]);
    }
    // An empty file (or one of comments only) is a policy that sets nothing.
    if (data === null || data === undefined)
        data = {};
    if (typeof data !== 'object' || Array.isArray(data)) {
        fail([{ file: path, line: 1, key: null, message: `is ${quote(data)}; expected a mapping of policy keys (files, exclude, serving, limits, rules, overrides, standing, waiver-label)` }]);
    }
    const allErrors = validatePolicyValue(data);
    // An enum says more than the type check beside it ("expected one of …"): keep only the enum.
    const enumPaths = new Set(allErrors.filter((error) => error.keyword === 'enum').map((error) => error.instancePath));
    const schemaErrors = allErrors.filter((error) => !(error.keyword === 'type' && enumPaths.has(error.instancePath)));
    if (schemaErrors.length > 0) {
        const problems = schemaErrors.map((error) => schemaProblem(error, path, doc, lines, data));
        const seen = new Set();
        fail(problems
            .filter((problem) => {
            const id = `${problem.key}\u0000${problem.message}`;
            if (seen.has(id))
                return false;
            seen.add(id);
            return true;
        })
            .sort((a, b) => (a.line ?? Infinity) - (b.line ?? Infinity)));
    }
    const record = data;
    const semantic = semanticProblems(record, path, doc, lines);
    if (semantic.length > 0)
        fail(semantic.sort((a, b) => (a.line ?? Infinity) - (b.line ?? Infinity)));
    const checked = record;
    const locations = Object.create(null);
    for (const key of ['files', 'exclude', 'standing', 'waiver-label']) {
        if (checked[key] !== undefined) {
            const located = nodeAt(doc, [key]);
            locations[key] = { key, line: lineOf(lines, located.key) };
        }
    }
    recordLocations(locations, checked, [], doc, lines);
    const overrides = (checked.overrides ?? []).map((override, index) => {
        const located = nodeAt(doc, ['overrides', index]);
        locations[`overrides[${index}]`] = { key: `overrides[${index}]`, line: lineOf(lines, located.value) };
        recordLocations(locations, override, ['overrides', index], doc, lines);
        return {
            files: [...override.files],
            serving: servingPatchOf(override.serving ?? {}),
            limits: limitTable(override.limits),
            rules: ruleTable(override.rules),
        };
    });
    return {
        path,
        files: checked.files ? [...checked.files] : DEFAULT_FILES,
        exclude: checked.exclude ? [...checked.exclude] : DEFAULT_EXCLUDE,
        serving: servingPatchOf(checked.serving ?? {}),
        limits: limitTable(checked.limits),
        rules: ruleTable(checked.rules),
        overrides,
        standing: checked.standing ?? 'report',
        waiverLabel: checked['waiver-label'] ?? null,
        locations,
    };
}
/**
 * Parses a policy file from its bytes: refuses more than `MAX_POLICY_CHARS` bytes unread and
 * anything that is not UTF-8 text (a byte-order mark is allowed), then `parsePolicy`.
 */
function parsePolicyBytes(bytes, path) {
    if (bytes.byteLength > MAX_POLICY_CHARS) {
        throw new PolicyError([{ file: path, line: null, key: null, message: `is ${bytes.byteLength} bytes long; expected at most ${MAX_POLICY_CHARS} (a policy is a short file)` }]);
    }
    let text;
    try {
        text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
    }
    catch {
        // The lossy decoding marks the first bad sequence with U+FFFD: its line is the place to look.
        const lossy = new TextDecoder('utf-8').decode(bytes);
        const line = lossy.slice(0, Math.max(lossy.indexOf('\uFFFD'), 0)).split('\n').length;
        throw new PolicyError([{ file: path, line, key: null, message: 'is not UTF-8 text; expected a YAML file saved as UTF-8' }]);
    }
    return parsePolicy(text, path);
}

;// CONCATENATED MODULE: ./src/core/policy/resolve.ts
/**
 * What a policy says for one model config: matching globs, and the top level with every
 * matching override laid over it.
 */


const GLOB_OPTIONS = { dot: true };
const matchers = new WeakMap();
/** One compiled matcher per glob list; policies are parsed once and asked about many paths. */
function matcherFor(globs) {
    let matcher = matchers.get(globs);
    if (!matcher) {
        matcher = globs.length === 0 ? () => false : picomatch_default()([...globs], GLOB_OPTIONS);
        matchers.set(globs, matcher);
    }
    return matcher;
}
/** Repository paths as globs see them: forward slashes, no leading `./`. */
function resolve_normalise(path) {
    return path.replace(/\\/g, '/').replace(/^(\.\/)+/, '');
}
/** Whether the policy's `files` globs pick `path` and its `exclude` globs leave it in. */
function isModelConfig(policy, path) {
    const file = resolve_normalise(path);
    if (file === '')
        return false;
    return matcherFor(policy.files)(file) && !matcherFor(policy.exclude)(file);
}
/** The overrides whose globs match `path`, in file order. */
function matchingOverrides(policy, path) {
    const file = resolve_normalise(path);
    return policy.overrides.filter((override) => matcherFor(override.files)(file));
}
/** The policy for one config: serving defaults, limits and rule levels after the overrides. */
function resolvePolicy(policy, filePath) {
    const file = resolve_normalise(filePath);
    const serving = {};
    const rules = Object.create(null);
    const limits = new Map();
    const origins = Object.create(null);
    const where = (name) => policy.locations[name] ?? { key: name, line: null };
    const layer = (block, prefix) => {
        for (const [field, value] of Object.entries(block.serving)) {
            if (value === undefined)
                continue;
            serving[field] = value;
            origins[`serving.${field}`] = where(`${prefix}serving.${field}`);
        }
        for (const [metric, setting] of Object.entries(block.limits)) {
            const origin = where(`${prefix}limits.${metric}`);
            origins[`limits.${metric}`] = origin;
            if (setting === null) {
                limits.delete(metric);
                continue;
            }
            // Key by key: an override can change a severity and keep the bound set above it.
            const state = { ...(limits.get(metric) ?? {}), origin };
            if (setting.max !== undefined)
                state.max = setting.max;
            if (setting.min !== undefined)
                state.min = setting.min;
            if (setting.maxIncreasePct !== undefined)
                state.maxIncreasePct = setting.maxIncreasePct;
            if (setting.severity !== undefined)
                state.severity = setting.severity;
            limits.set(metric, state);
        }
        for (const [id, level] of Object.entries(block.rules)) {
            rules[id] = level;
            origins[`rules.${id}`] = where(`${prefix}rules.${id}`);
        }
    };
    layer(policy, '');
    policy.overrides.forEach((override, index) => {
        if (matcherFor(override.files)(file))
            layer(override, `overrides[${index}].`);
    });
    const resolved = Object.create(null);
    // Contract order, so reports list limits the same way every time.
    for (const metric of METRIC_PATHS) {
        const state = limits.get(metric);
        if (!state)
            continue;
        const limit = { severity: state.severity ?? 'block' };
        if (typeof state.max === 'number')
            limit.max = state.max;
        if (typeof state.min === 'number')
            limit.min = state.min;
        if (typeof state.maxIncreasePct === 'number')
            limit.maxIncreasePct = state.maxIncreasePct;
        if (limit.max !== undefined || limit.min !== undefined || limit.maxIncreasePct !== undefined)
            resolved[metric] = limit;
    }
    return {
        limits: resolved,
        rules,
        standing: policy.standing,
        serving: serving,
        waiverLabel: policy.waiverLabel,
        origins,
    };
}
/** The level a rule runs at for one config: the policy's choice, else the rule's own severity. */
function ruleLevel(filePolicy, ruleId, ownSeverity) {
    return Object.prototype.hasOwnProperty.call(filePolicy.rules, ruleId) ? filePolicy.rules[ruleId] : ownSeverity;
}

;// CONCATENATED MODULE: ./src/core/policy/index.ts
/** The team policy file: parse, check, and resolve per model config. */






;// CONCATENATED MODULE: ./src/core/compare/judging.ts
const BUILT_IN_JUDGING = { limits: {}, rules: {}, standing: 'report' };

;// CONCATENATED MODULE: ./src/core/remedy/apply-change.ts


/** Every field path a remedy may change, in the order reports list them. */
const CHANGE_KEYS = [
    'position.base', 'position.scaling.kind', 'position.scaling.factor', 'position.scaling.originalSpan',
    'kvHeads', 'dtypes.cache', 'dtypes.positions', 'serving.span', 'serving.sequences',
];
/** Thrown for a change no remedy can produce: an unknown field or a value of the wrong kind. */
class ChangeError extends Error {
}
function isKey(key) {
    return CHANGE_KEYS.includes(key);
}
function numberOf(key, value) {
    if (typeof value !== 'number' || !Number.isFinite(value))
        throw new ChangeError(`change ${key} = ${JSON.stringify(value)}: expected a finite number`);
    return value;
}
function nameOf(key, value, allowed) {
    if (typeof value !== 'string' || !allowed.includes(value)) {
        throw new ChangeError(`change ${key} = ${JSON.stringify(value)}: expected one of ${allowed.join(', ')}`);
    }
    return value;
}
/** A scaling block with the documented defaults, for a code that had none (linear unless told). */
function freshScaling(kind) {
    return { kind, factor: 1, originalSpan: null, alpha: DEFAULT_YARN_ALPHA, beta: DEFAULT_YARN_BETA, low: DEFAULT_BANDED_LOW, high: DEFAULT_BANDED_HIGH };
}
/**
 * A copy of `spec` with `change` applied; `spec` is not touched. Scaling fields on a rotary code
 * without scaling add a scaling block (linear unless the change names the kind). Throws
 * `ChangeError` for an unknown field, a value of the wrong kind, or a rotary field on another code.
 */
function applyChange(spec, change) {
    const next = { ...spec, dtypes: { ...spec.dtypes }, serving: { ...spec.serving } };
    const position = spec.position.kind === 'rotary'
        ? { ...spec.position, scaling: spec.position.scaling ? { ...spec.position.scaling } : null }
        : spec.position;
    const rotary = () => {
        if (position.kind !== 'rotary')
            throw new ChangeError(`change to the rotary code of a ${position.kind} position code`);
        return position;
    };
    const scaling = () => {
        const code = rotary();
        if (code.scaling === null) {
            const kind = change['position.scaling.kind'];
            code.scaling = freshScaling(kind === undefined ? 'linear' : nameOf('position.scaling.kind', kind, SCALING_KINDS));
        }
        return code.scaling;
    };
    for (const [key, value] of Object.entries(change)) {
        if (!isKey(key))
            throw new ChangeError(`change ${key}: not a field a remedy changes (${CHANGE_KEYS.join(', ')})`);
        switch (key) {
            case 'position.base':
                rotary().base = numberOf(key, value);
                break;
            case 'position.scaling.kind':
                scaling().kind = nameOf(key, value, SCALING_KINDS);
                break;
            case 'position.scaling.factor':
                scaling().factor = numberOf(key, value);
                break;
            case 'position.scaling.originalSpan':
                scaling().originalSpan = numberOf(key, value);
                break;
            case 'kvHeads':
                next.kvHeads = numberOf(key, value);
                break;
            case 'dtypes.cache':
                next.dtypes.cache = nameOf(key, value, STORAGE_DTYPES);
                break;
            case 'dtypes.positions':
                next.dtypes.positions = nameOf(key, value, FLOAT_FORMATS);
                break;
            case 'serving.span':
                next.serving.span = numberOf(key, value);
                break;
            case 'serving.sequences':
                next.serving.sequences = numberOf(key, value);
                break;
        }
    }
    next.position = position;
    return next;
}
/** The value a field has before the change, in the change's terms; null when not stated (a default applies). */
function currentValue(spec, key) {
    const code = spec.position;
    const scaling = code.kind === 'rotary' ? code.scaling : null;
    switch (key) {
        case 'position.base': return code.kind === 'rotary' ? code.base : null;
        case 'position.scaling.kind': return scaling ? scaling.kind : null;
        case 'position.scaling.factor': return scaling ? scaling.factor : null;
        case 'position.scaling.originalSpan': return scaling ? scaling.originalSpan : null;
        case 'kvHeads': return spec.kvHeads;
        case 'dtypes.cache': return spec.dtypes.cache;
        case 'dtypes.positions': return spec.dtypes.positions;
        case 'serving.span': return spec.serving.span;
        case 'serving.sequences': return spec.serving.sequences;
        default: return null;
    }
}
/** The change's entries in `CHANGE_KEYS` order, so every report lists them the same way. */
function changeEntries(change) {
    return CHANGE_KEYS.filter((key) => Object.hasOwn(change, key)).map((key) => [key, change[key]]);
}

;// CONCATENATED MODULE: ./src/core/remedy/light-metrics.ts







function budgetMetrics(spec) {
    const counts = parameterCounts(spec);
    const weights = weightBytes(spec, counts ? counts.params : null);
    const cache = cacheBytesAtSpan(spec, evaluationSpan(spec));
    return {
        weightBytes: weights,
        cachePerTokenBytes: cachePerTokenBytes(spec),
        cacheBytesAtSpan: cache,
        memoryBytes: memoryBytes(weights, cache),
        fitSequences: fitSequences(spec, weights, cache, servedSequences(spec)),
    };
}
function rangeMetrics(spec) {
    const declared = declaredSpan(spec);
    const trained = trainedSpan(spec);
    const span = evaluationSpan(spec);
    const r = reach(spec, trained, declared);
    return {
        declaredSpan: declared, trainedSpan: trained, evaluationSpan: span, reach: r,
        scalingCover: scalingCover(spec, trained), headroom: headroom(r, span), extensionRatio: extensionRatio(span, trained),
    };
}
/**
 * The value of `metric` for `spec` when it needs no scan, else `undefined` (the caller measures
 * in full): budget and range metrics, and `precision.<D>.collidingPositions`.
 */
function lightMetric(spec, metric) {
    if (metric in BUDGET_NAMES)
        return budgetMetrics(spec)[metric];
    if (metric in RANGE_NAMES)
        return rangeMetrics(spec)[metric];
    const colliding = /^precision\.(fp32|bf16|fp16)\.collidingPositions$/.exec(metric);
    if (colliding) {
        // Null without frequencies, as `numberFormatMetrics` reports it.
        const span = evaluationSpan(spec);
        if (span === null || frequencyPlan(spec, span, trainedSpan(spec)) === null)
            return null;
        return collidingPositions(colliding[1], span);
    }
    return undefined;
}
const BUDGET_NAMES = { weightBytes: 1, cachePerTokenBytes: 1, cacheBytesAtSpan: 1, memoryBytes: 1, fitSequences: 1 };
const RANGE_NAMES = { declaredSpan: 1, trainedSpan: 1, evaluationSpan: 1, reach: 1, scalingCover: 1, headroom: 1, extensionRatio: 1 };

;// CONCATENATED MODULE: ./src/core/remedy/prove.ts






/** `rule` or `rule:metric`. */
function identityOf(finding) {
    return finding.metric ? `${finding.rule}:${finding.metric}` : finding.rule;
}
function sameFinding(a, b) {
    return a.rule === b.rule && a.message === b.message && a.key === b.key && a.line === b.line;
}
/** The head's findings less the ones its spec and metrics give again: those came from reading the text. */
function readerFindings(head) {
    const derived = [...specFindings(head.spec, head.locations), ...metricFindings(head.spec, head.metrics, head.locations)];
    const out = [];
    for (const finding of head.findings) {
        const at = derived.findIndex((d) => sameFinding(d, finding));
        if (at >= 0)
            derived.splice(at, 1);
        else
            out.push(finding);
    }
    return out;
}
function blockingCounts(decision) {
    const counts = new Map();
    for (const finding of decision.findings) {
        if (finding.severity !== 'block')
            continue;
        const id = identityOf(finding);
        counts.set(id, (counts.get(id) ?? 0) + 1);
    }
    return counts;
}
/** The context of one file: judged once as it is, so proofs compare like with like. */
function remedyContext(head, base, judging, change) {
    const decision = decideFile({ change, base, head, judging }, false);
    return {
        head, base, judging, change,
        readFindings: readerFindings(head),
        blockingBefore: blockingCounts(decision),
        findingsBefore: new Set(decision.findings.map(identityOf)),
    };
}
/** A spec measured and judged as the gate would judge the head (waivers do not apply: the proof is of the severity). */
function judgeSpec(ctx, spec) {
    const metrics = computeMetrics(spec);
    const findings = sortFindings([
        ...ctx.readFindings, ...specFindings(spec, ctx.head.locations), ...metricFindings(spec, metrics, ctx.head.locations),
    ]);
    const head = { ...ctx.head, spec, metrics, findings };
    return { metrics, decision: decideFile({ change: ctx.change, base: ctx.base, head, judging: ctx.judging }, false) };
}
/**
 * Applies `change` to the head and judges it. With a `target`, passing means the target's
 * identity no longer blocks and no identity blocks more often than before; with `null`, that
 * nothing blocks at all (all remedies of a file applied together).
 */
function prove(ctx, target, change) {
    const spec = applyChange(ctx.head.spec, change);
    const { metrics, decision } = judgeSpec(ctx, spec);
    const after = blockingCounts(decision);
    const blockers = [];
    const targetId = target ? identityOf(target) : null;
    for (const [id, count] of after) {
        if (target === null || id === targetId || count > (ctx.blockingBefore.get(id) ?? 0))
            blockers.push(id);
    }
    const raises = [...new Set(decision.findings
            .filter((f) => f.severity !== 'block' && !ctx.findingsBefore.has(identityOf(f)))
            .map(identityOf))];
    return { spec, metrics, decision, passes: blockers.length === 0, blockers, raises };
}

;// CONCATENATED MODULE: ./src/core/remedy/rotary-base.ts
/**
 * The rotary base nearest to the current one that a criterion accepts, typically the long-range
 * criterion of Men et al. 2024 ("Base of RoPE Bounds Context Length", Thm 1, Eqs. 9–11: the
 * smallest base with `Σ_i cos(k θ_i) >= 0` for every k up to the span, solved numerically there
 * too).
 *
 * Method. Which bases pass is NOT monotone in the base (SOURCES.md §12: a larger base can fail
 * where a smaller one passes), so plain bisection could return a base that fails. The search
 * (1) moves away from the current base by doubling (halving, downwards) until a base passes;
 * (2) bisects geometrically between the last failing and the first passing base, keeping the
 * passing end, to a ratio of 1.001; (3) rounds that passing base to two significant digits in
 * the search's direction, as published bases are written, and verifies the rounded value; when it
 * fails (a pocket of failing bases), it steps along the two-digit grid to the first base that
 * passes; (4) when the grid finds none within its steps, it offers the bisection's own base,
 * which passed. Every base returned was accepted by the criterion; a smaller passing base may
 * exist in a pocket the doubling stepped over, so this is the nearest base found, not
 * necessarily the nearest there is. Each step is capped and the result says when a cap stopped it.
 */
const DEFAULT_BASE_CAPS = { doublings: 30, bisections: 40, gridSteps: 30 };
/**
 * base: `x` rounded to two significant digits, up or down (`1,294,337` → `1,300,000` up,
 * `1,200,000` down); null for a value that is not positive and finite.
 */
function roundBase(x, direction) {
    if (!(x > 0 && Number.isFinite(x)))
        return null;
    const e = Math.floor(Math.log10(x)) - 1;
    const scaled = x / 10 ** e;
    // Within 1e-9 of a grid value counts as on it: the division is inexact.
    const m = direction === 'up' ? Math.ceil(scaled - 1e-9) : Math.floor(scaled + 1e-9);
    return Number((m * 10 ** e).toPrecision(2));
}
/** base: the next two-significant-digit value after `g` (itself on the grid), in `direction`. */
function nextGridBase(g, direction) {
    const e = Math.floor(Math.log10(g)) - 1;
    const m = Math.round(g / 10 ** e);
    if (direction === 'up')
        return Number(((m + 1) * 10 ** e).toPrecision(2));
    // 10 × 10^e steps down to 99 × 10^(e-1).
    return m <= 10 ? Number((99 * 10 ** (e - 1)).toPrecision(2)) : Number(((m - 1) * 10 ** e).toPrecision(2));
}
/**
 * base: the nearest base to `from` in `direction` that `passes`, found as the file doc says;
 * null when `from` is not a positive finite number or nothing passed within the caps.
 */
function searchRotaryBase(from, direction, passes, caps = DEFAULT_BASE_CAPS) {
    let evaluations = 0;
    const test = (b) => { evaluations += 1; return passes(b); };
    if (!(from > 0 && Number.isFinite(from)))
        return { base: null, evaluations, capped: false };
    const step = direction === 'up' ? 2 : 0.5;
    // (1) doubling away from the current base
    let failing = from;
    let passing = null;
    for (let i = 0; i < caps.doublings; i++) {
        const b = failing * step;
        if (!Number.isFinite(b) || b <= 0)
            break;
        if (test(b)) {
            passing = b;
            break;
        }
        failing = b;
    }
    if (passing === null)
        return { base: null, evaluations, capped: true };
    // (2) geometric bisection, keeping the passing end
    let bisected = 0;
    while (Math.max(passing, failing) / Math.min(passing, failing) > 1.001 && bisected < caps.bisections) {
        const mid = Math.sqrt(passing * failing);
        if (test(mid))
            passing = mid;
        else
            failing = mid;
        bisected += 1;
    }
    // (3) the two-digit grid, stepping past pockets of failing bases
    let g = roundBase(passing, direction);
    for (let i = 0; g !== null && i < caps.gridSteps; i++) {
        if (test(g))
            return { base: g, evaluations, capped: false };
        g = nextGridBase(g, direction);
    }
    // (4) the bisection's own base passed
    return { base: passing, evaluations, capped: true };
}

;// CONCATENATED MODULE: ./src/core/remedy/scaling-factor.ts
/**
 * The scaling factor that makes a rotary code reach a span.
 */
/**
 * factor: `ceil(span / L0)`, the smallest whole factor `s` with `L0 · s >= span`. Position
 * interpolation stretches a code trained at `L` to `L'` with `s = L'/L` (Chen et al. 2023, §2.3,
 * Eq. 4: `f'(x, m) = f(x, mL/L')`), and `reach = L0 · factor` for every scaling kind (METRICS.md);
 * whole factors, as Chen et al. 2023 Table 1 and common configs use. Null when either span is not
 * a positive whole number.
 */
function coveringFactor(span, trained) {
    if (!Number.isSafeInteger(span) || span < 1 || !Number.isSafeInteger(trained) || trained < 1)
        return null;
    return Math.max(1, Math.ceil(span / trained));
}

;// CONCATENATED MODULE: ./src/core/remedy/whole-search.ts
/**
 * Bisection over whole numbers for a predicate that holds up to some point and fails after it
 * (memory against sequences or span, colliding positions against span): exact, and at most
 * `ceil(log2(hi - lo + 1)) + 1` evaluations (54 for any range of safe integers).
 */
/**
 * count: the largest whole n in [lo, hi] with `passes(n)`, for a `passes` that is true on
 * [lo, n*] and false above; null when `passes(lo)` is false or the range is empty.
 */
function largestPassing(lo, hi, passes) {
    let evaluations = 0;
    const test = (n) => { evaluations += 1; return passes(n); };
    if (!(Number.isSafeInteger(lo) && Number.isSafeInteger(hi)) || hi < lo || !test(lo))
        return { value: null, evaluations };
    if (test(hi))
        return { value: hi, evaluations };
    let good = lo;
    let bad = hi;
    while (bad - good > 1) {
        const mid = good + Math.floor((bad - good) / 2);
        if (test(mid))
            good = mid;
        else
            bad = mid;
    }
    return { value: good, evaluations };
}

;// CONCATENATED MODULE: ./src/core/remedy/propose.ts
/**
 * For one blocking finding, the nearest change that passes. Each kind of change (a scaling
 * factor, a served span, a sequence count, a cache dtype, a key/value head count, a rotary base,
 * a position format) first searches the cheap metrics it moves for the nearest value that clears
 * the finding, then proves that value: the whole description measured and judged again (see
 * `prove.ts`). The first kind that proves is the remedy, the other kinds that prove are
 * alternatives, and when none proves the reasons are given. Searches are bounded: a whole-number
 * bisection (at most 54 steps), at most `MAX_PROOFS_PER_KIND` full proofs per kind, and the
 * capped stages of the base search (`rotary-base.ts`).
 */



















/** Full proofs one kind of change may run before it gives up (default: `4`). */
const MAX_PROOFS_PER_KIND = 4;
const none = (whyNot) => ({ remedy: null, whyNot });
/** The value of a metric for a changed spec: cheaply when it needs no scan, else measured in full. */
function propose_valueOf(spec, metric) {
    const light = lightMetric(spec, metric);
    if (light !== undefined)
        return light;
    return isMetricPath(metric) ? metricValue(computeMetrics(spec), metric) : null;
}
/** Whether a changed spec clears the target finding, judged on the metrics it depends on. */
function resolver(ctx, target) {
    switch (target.rule) {
        case 'span-past-reach':
            return (spec) => { const h = rangeMetrics(spec).headroom; return h !== null && h >= 0; };
        case 'span-beyond-scaling-cover':
        case 'span-grew-code-unchanged':
            return (spec) => {
                const r = rangeMetrics(spec);
                return r.scalingCover !== null && r.declaredSpan !== null && r.scalingCover >= r.declaredSpan;
            };
        case 'memory-over-budget':
            return (spec) => {
                const usable = usableDeviceBytes(spec);
                const memory = budgetMetrics(spec).memoryBytes;
                return usable === null || (memory !== null && memory <= usable);
            };
        case 'positions-collide':
            return (spec) => {
                const colliding = lightMetric(spec, `precision.${spec.dtypes.positions ?? 'fp32'}.collidingPositions`);
                return !(typeof colliding === 'number' && colliding > 0);
            };
        case 'limit-crossed': {
            const { limit, metric } = target;
            if (!limit || !metric)
                return null;
            return (spec) => checkLimit(limit, target.baseValue, propose_valueOf(spec, metric)).crossed.length === 0;
        }
        default:
            return null;
    }
}
function blockerText(id) {
    return id.startsWith('limit-crossed:') ? `the ${id.slice('limit-crossed:'.length)} limit` : id;
}
function describeBlockers(proof) {
    return proof.blockers.map(blockerText).join(', ');
}
function remedyOf(change, proof, shown, target) {
    const metrics = {};
    for (const name of [...(target.metric ? [target.metric] : []), ...shown]) {
        if (isMetricPath(name) && !(name in metrics))
            metrics[name] = metricValue(proof.metrics, name);
    }
    return { change, metrics, raises: proof.raises };
}
/**
 * Proves candidate changes in order (at most `MAX_PROOFS_PER_KIND`), returning the first that
 * passes; `what` names the kind in reasons.
 */
function proveFirst(ctx, target, candidates, shown, what) {
    let last = null;
    const tried = candidates.slice(0, MAX_PROOFS_PER_KIND);
    for (const change of tried) {
        const proof = prove(ctx, target, change);
        if (proof.passes)
            return { remedy: remedyOf(change, proof, shown, target), whyNot: null };
        last = proof;
    }
    if (last === null)
        return none(`no ${what} to try`);
    const capped = candidates.length > tried.length ? ` (stopped after ${tried.length} proofs)` : '';
    return none(`${what} ${tried.length === 1 ? 'clears it but still blocks' : 'cleared it but each still blocked'} on ${describeBlockers(last)}${capped}`);
}
// ---- kinds of change -------------------------------------------------------------------------
/**
 * A scaling factor on the code, adding a linear scaling block when there is none, and stating
 * the original span when the changed description would otherwise take another trained span.
 */
function factorChange(spec, factor, trained) {
    const code = spec.position;
    const change = code.kind === 'rotary' && code.scaling
        ? { 'position.scaling.factor': factor }
        : { 'position.scaling.kind': 'linear', 'position.scaling.factor': factor };
    if (trainedSpan(applyChange(spec, change)) !== trained)
        change['position.scaling.originalSpan'] = trained;
    return change;
}
/** The smallest whole scaling factor (of the kind in use, else linear) with `L0 · f` covering `need`. */
function factorKind(ctx, target, resolves, trained, need) {
    const spec = ctx.head.spec;
    const code = spec.position;
    if (code.kind !== 'rotary')
        return none(`a ${code.kind} position code has no scaling factor`);
    if (trained === null || need === null)
        return none('the trained span or the span to cover is unknown');
    const f0 = coveringFactor(need, trained);
    if (f0 === null)
        return none(`no whole factor covers ${formatTokens(need)} from ${formatTokens(trained)}`);
    const current = code.scaling ? code.scaling.factor : 1;
    if (f0 <= current) {
        return none(`the ${code.scaling ? `${code.scaling.kind} factor ${units_formatNumber(current)}` : 'code'} already covers ${formatTokens(need)}; state the trained span if the model was tuned at it`);
    }
    const candidates = [];
    for (let f = f0; f < f0 + MAX_PROOFS_PER_KIND; f++) {
        const change = factorChange(spec, f, trained);
        if (resolves(applyChange(spec, change)))
            candidates.push(change);
    }
    const shown = ['reach', 'scalingCover', 'headroom', 'trainedSpan', 'discriminationSpan', 'exposedPairs',
        ...(code.scaling?.kind === 'yarn' ? ['attentionScale'] : [])];
    const kind = code.scaling ? code.scaling.kind : 'linear';
    return proveFirst(ctx, target, candidates, shown, `a ${kind} factor of ${f0}${candidates.length > 1 ? ' or more' : ''}`);
}
/** The longest served span that clears the finding. */
function spanKind(ctx, target, resolves) {
    const spec = ctx.head.spec;
    const T = evaluationSpan(spec);
    if (T === null || T < 2)
        return none('the span is not a whole number above 1');
    const found = largestPassing(1, T - 1, (t) => resolves(applyChange(spec, { 'serving.span': t })));
    if (found.value === null)
        return none(`no served span from 1 to ${formatInteger(T - 1)} tokens clears it`);
    return proveFirst(ctx, target, [{ 'serving.span': found.value }], ['evaluationSpan', 'headroom', 'memoryBytes', 'fitSequences'], `serving at most ${formatTokens(found.value)} tokens`);
}
/** The most concurrent sequences that clear the finding. */
function sequencesKind(ctx, target, resolves) {
    const spec = ctx.head.spec;
    const current = servedSequences(spec);
    if (current === null)
        return none('the sequence count is not a whole number');
    if (current <= 1)
        return none('the service already holds one sequence');
    const found = largestPassing(1, current - 1, (n) => resolves(applyChange(spec, { 'serving.sequences': n })));
    if (found.value === null)
        return none(`not even one sequence of ${formatTokens(evaluationSpan(spec))} tokens clears it`);
    return proveFirst(ctx, target, [{ 'serving.sequences': found.value }], ['memoryBytes', 'cacheBytesAtSpan', 'fitSequences'], `${found.value} sequence${found.value === 1 ? '' : 's'}`);
}
/** The widest cache dtype narrower than the current one that clears the finding. */
function cacheDtypeKind(ctx, target, resolves) {
    const spec = ctx.head.spec;
    const current = cacheDType(spec);
    const bytes = bytesPerElement(current);
    if (bytes === null)
        return none(`the cache dtype ${current} is unknown`);
    const narrower = STORAGE_DTYPES.filter((d) => (bytesPerElement(d) ?? Infinity) < bytes);
    if (narrower.length === 0)
        return none(`the cache is already in ${current}, the narrowest dtype`);
    const candidates = narrower.filter((d) => resolves(applyChange(spec, { 'dtypes.cache': d })))
        .map((d) => ({ 'dtypes.cache': d }));
    if (candidates.length === 0)
        return none(`even a ${narrower[narrower.length - 1]} cache does not clear it`);
    return proveFirst(ctx, target, candidates, ['cachePerTokenBytes', 'memoryBytes', 'fitSequences'], `a ${candidates[0]['dtypes.cache']} cache`);
}
/** Divisors of `n` below `below`, largest first (grouped-query attention needs kvHeads to divide heads). */
function divisorsBelow(n, below) {
    const out = [];
    for (let d = Math.min(n, below - 1); d >= 1 && out.length < 64; d--)
        if (n % d === 0)
            out.push(d);
    return out;
}
/** The most key/value heads, a divisor of the heads, that clear the finding. */
function kvHeadsKind(ctx, target, resolves) {
    const spec = ctx.head.spec;
    const heads = positiveCount(spec.heads);
    const kv = positiveCount(spec.kvHeads);
    if (heads === null || kv === null)
        return none('heads or key/value heads are not whole numbers');
    if (kv <= 1)
        return none('the model already has one key/value head');
    const candidates = divisorsBelow(heads, kv).filter((d) => resolves(applyChange(spec, { kvHeads: d })))
        .map((d) => ({ kvHeads: d }));
    if (candidates.length === 0)
        return none('even one key/value head does not clear it');
    return proveFirst(ctx, target, candidates, ['cachePerTokenBytes', 'weightBytes', 'memoryBytes', 'fitSequences'], `${candidates[0].kvHeads} key/value heads (a retraining-level change)`);
}
/** The narrowest position format with every position in the span distinct. */
function formatKind(ctx, target, resolves) {
    const spec = ctx.head.spec;
    const current = spec.dtypes.positions ?? 'fp32';
    const order = [...FLOAT_FORMATS].sort((a, b) => positionExactLimit(a) - positionExactLimit(b));
    const candidates = order.filter((f) => f !== current && resolves(applyChange(spec, { 'dtypes.positions': f })))
        .map((f) => ({ 'dtypes.positions': f }));
    if (candidates.length === 0) {
        return none(`no format keeps every position of ${formatTokens(evaluationSpan(spec))} distinct (fp32 holds every whole number up to ${formatInteger(positionExactLimit('fp32'))})`);
    }
    const format = candidates[0]['dtypes.positions'];
    return proveFirst(ctx, target, candidates, [`precision.${format}.collidingPositions`, `precision.${format}.angleErrorMax`], `positions in ${format}`);
}
/** Which way the base must move for the crossed bound of a discrimination or separation limit. */
function baseDirection(metric, limit, value) {
    if (value === null)
        return null;
    const below = limit.min !== undefined && value < limit.min;
    // A larger base turns slower: far offsets stay positive longer, but neighbours separate less.
    if (metric === 'discriminationSpan')
        return below ? 'up' : 'down';
    if (metric === 'separationFloor')
        return below ? 'down' : 'up';
    return null;
}
/** The nearest rotary base (two significant digits) that clears a discrimination or separation limit. */
function baseKind(ctx, target) {
    const spec = ctx.head.spec;
    const code = spec.position;
    const { metric, limit } = target;
    if (code.kind !== 'rotary')
        return none(`a ${code.kind} position code has no base to change`);
    if (!metric || !limit)
        return none('no limit to meet');
    const T = evaluationSpan(spec);
    const L0 = trainedSpan(spec);
    const direction = baseDirection(metric, limit, metricValue(ctx.head.metrics, metric));
    if (T === null || direction === null)
        return none('the span or the current value is unknown');
    const scaledAt = (base) => frequencyPlan(applyChange(spec, { 'position.base': base }), T, L0)?.scaled ?? null;
    // discriminationSpan >= min: no negative sum before min(T, min), so only that far is scanned.
    const onlyMin = metric === 'discriminationSpan' && direction === 'up' && limit.max === undefined && limit.maxIncreasePct === undefined;
    const passes = (base) => {
        const theta = scaledAt(base);
        if (theta === null)
            return false;
        if (onlyMin) {
            const end = Math.min(T, Math.ceil(limit.min));
            return end <= 1 || scanSimilarityRange(theta, 1, end)?.negative === null;
        }
        const value = similarityScan(theta, T)[metric];
        return checkLimit(limit, target.baseValue, value).crossed.length === 0;
    };
    const search = searchRotaryBase(code.base, direction, passes);
    if (search.base === null) {
        return none(`no rotary base ${direction === 'up' ? 'above' : 'below'} ${units_formatNumber(code.base, 6)} meets the ${metric} limit within the search's caps (${search.evaluations} scans)`);
    }
    return proveFirst(ctx, target, [{ 'position.base': search.base }], ['discriminationSpan', 'separationFloor', 'unturnedPairs', 'slowestWavelength'], `a rotary base of ${units_formatNumber(search.base, 6)} (a retraining-level change)`);
}
function kindsFor(ctx, target) {
    const spec = ctx.head.spec;
    const range = rangeMetrics(spec);
    const T = range.evaluationSpan;
    const memory = [sequencesKind, cacheDtypeKind, kvHeadsKind, spanKind];
    switch (target.rule) {
        case 'span-past-reach':
            return [(c, t, r) => factorKind(c, t, r, range.trainedSpan, T), spanKind];
        case 'span-beyond-scaling-cover':
            return [(c, t, r) => factorKind(c, t, r, range.trainedSpan, range.declaredSpan)];
        case 'span-grew-code-unchanged':
            // The trained span is the base's: the head's own is only its (grown) declared span.
            return [(c, t, r) => factorKind(c, t, r, ctx.base?.metrics.trainedSpan ?? null, range.declaredSpan)];
        case 'memory-over-budget':
            return memory;
        case 'positions-collide':
            return [formatKind, spanKind];
        case 'limit-crossed': {
            const metric = target.metric ?? '';
            const limit = target.limit;
            if (!limit)
                return `the policy has no limit on ${metric}`;
            if (metric === 'discriminationSpan' || metric === 'separationFloor')
                return [(c, t) => baseKind(c, t)];
            if (metric === 'memoryBytes' || metric === 'cacheBytesAtSpan')
                return memory;
            if (metric === 'fitSequences')
                return [cacheDtypeKind, kvHeadsKind, spanKind];
            if (metric === 'cachePerTokenBytes')
                return [cacheDtypeKind, kvHeadsKind];
            if (metric === 'headroom' && limit.min !== undefined && T !== null) {
                return [(c, t, r) => factorKind(c, t, r, range.trainedSpan, T + Math.max(0, Math.ceil(limit.min))), spanKind];
            }
            if (metric === 'reach' && limit.min !== undefined) {
                return [(c, t, r) => factorKind(c, t, r, range.trainedSpan, Math.ceil(limit.min))];
            }
            if (/^precision\.(fp32|bf16|fp16)\.collidingPositions$/.test(metric))
                return [spanKind];
            return `no remedy is searched for a limit on ${metric}: remedies cover spans and reach, rotary discrimination and separation, memory, and colliding positions`;
        }
        default: {
            const help = isRuleId(target.rule) ? ` ${RULES[target.rule].help}` : '';
            return `no remedy is searched for ${target.rule}: the value itself must be corrected, as the message says.${help}`;
        }
    }
}
/**
 * The remedy of one blocking finding of `ctx`'s head: the first kind of change that proves, the
 * other kinds that prove as alternatives, or why none does.
 */
function proposeRemedy(ctx, finding) {
    const metric = finding.metric;
    const limit = finding.rule === 'limit-crossed' && metric ? ctx.judging.limits[metric] ?? null : null;
    const baseValue = metric && ctx.base && isMetricPath(metric) ? metricValue(ctx.base.metrics, metric) : null;
    const target = { rule: finding.rule, ...(metric ? { metric } : {}), limit, baseValue };
    const kinds = kindsFor(ctx, target);
    if (typeof kinds === 'string')
        return { remedy: null, remedyWhyNot: kinds, remedyAlternatives: [] };
    const resolves = resolver(ctx, target);
    if (resolves === null)
        return { remedy: null, remedyWhyNot: `no remedy is searched for ${finding.rule}`, remedyAlternatives: [] };
    const outcomes = kinds.map((kind) => kind(ctx, target, resolves));
    const proven = outcomes.filter((o) => o.remedy !== null).map((o) => o.remedy);
    if (proven.length === 0) {
        return { remedy: null, remedyWhyNot: `No change found that passes: ${outcomes.map((o) => o.whyNot).join('; ')}.`, remedyAlternatives: [] };
    }
    return { remedy: proven[0], remedyWhyNot: null, remedyAlternatives: proven.slice(1) };
}

;// CONCATENATED MODULE: ./src/core/remedy/attach.ts





const UNREADABLE = {
    remedy: null,
    remedyWhyNot: 'The head version could not be read, so there is no description to change.',
    remedyAlternatives: [],
};
/**
 * Every blocking finding's first remedy applied at once, proven the same way; null with fewer
 * than two remedies (one is already shown) or when two remedies set one field differently.
 */
function combineRemedies(ctx, findings) {
    const remedies = findings.map((f) => f.remedy).filter((r) => r !== null && r !== undefined);
    if (remedies.length < 2)
        return null;
    const change = {};
    for (const remedy of remedies) {
        for (const [key, value] of changeEntries(remedy.change)) {
            if (key in change && change[key] !== value)
                return null;
            change[key] = value;
        }
    }
    const proof = prove(ctx, null, change);
    const metrics = {};
    for (const remedy of remedies) {
        for (const name of Object.keys(remedy.metrics))
            if (isMetricPath(name))
                metrics[name] = metricValue(proof.metrics, name);
    }
    return { change, metrics, passes: proof.passes, stillBlocking: proof.blockers };
}
function withRemedies(file, config) {
    if (!file.findings.some((f) => f.severity === 'block'))
        return file;
    if (!file.head || !config) {
        return { ...file, findings: file.findings.map((f) => (f.severity === 'block' ? { ...f, ...UNREADABLE } : f)) };
    }
    const ctx = remedyContext(file.head, file.base, config.judging, config.change);
    const findings = file.findings.map((f) => (f.severity === 'block' ? { ...f, ...proposeRemedy(ctx, f) } : f));
    return { ...file, findings, remedyTogether: combineRemedies(ctx, findings) };
}
/** The gate's report with a remedy (or the reason there is none) on every blocking finding. */
function attachRemedies(report, configs) {
    const byPath = new Map(configs.map((c) => [c.change.path, c]));
    return { ...report, files: report.files.map((file) => withRemedies(file, byPath.get(file.path))) };
}
/**
 * One inspected file with a remedy on every blocking finding, judged with the built-in rules and
 * no base version; `remedyTogether` when two or more remedies apply at once.
 */
function remedyFileReport(report) {
    if (!report.findings.some((f) => f.severity === 'block'))
        return { ...report, remedyTogether: null };
    const ctx = remedyContext(report, null, BUILT_IN_JUDGING, { status: 'added', path: report.path, previousPath: null });
    const findings = report.findings.map((f) => (f.severity === 'block' ? { ...f, ...proposeRemedy(ctx, f) } : f));
    return { ...report, findings, remedyTogether: combineRemedies(ctx, findings) };
}

;// CONCATENATED MODULE: ./src/core/gate.ts





/** Thrown when the policy file on the base commit cannot be read: the gate fails closed. */
class PolicyUnreadableError extends (/* unused pure expression or super */ null && (Error)) {
}
async function readVersion(source, ref, path, serving, overrides, policyPath) {
    let bytes;
    try {
        bytes = await source.read(ref, path);
    }
    catch (error) {
        return toFailure(path, error);
    }
    if (bytes === null)
        return null;
    try {
        return inspectModel(decodeText(bytes, path), path, {
            defaults: serving, defaultsOrigin: { key: `${policyPath} serving`, line: null },
            overrides, overridesOrigin: { key: 'command line', line: null },
        });
    }
    catch (error) {
        return toFailure(path, error);
    }
}
async function mapLimited(items, limit, work) {
    const results = new Array(items.length);
    let next = 0;
    const workers = Array.from({ length: Math.min(limit, items.length) }, async () => {
        while (next < items.length) {
            const index = next++;
            results[index] = await work(items[index]);
        }
    });
    await Promise.all(workers);
    return results;
}
function sameBytes(a, b) {
    if (a === null || b === null)
        return a === b;
    return a.length === b.length && a.every((byte, i) => byte === b[i]);
}
/**
 * The whole gate over a pull request: the policy from the base commit, the changed model
 * configs read at both commits, and one decision. Nothing from the pull request is executed;
 * files are read as data.
 */
async function runGate(source, request) {
    const { base, head, policyPath } = request;
    const basePolicyBytes = await source.read(request.policyRef ?? base, policyPath);
    let policy = DEFAULT_POLICY;
    if (basePolicyBytes !== null) {
        policy = parsePolicy(decodeText(basePolicyBytes, policyPath), policyPath);
    }
    const headPolicyBytes = request.changes.some((c) => c.path === policyPath || c.previousPath === policyPath)
        ? await source.read(head, policyPath)
        : basePolicyBytes;
    const policyChanged = !sameBytes(basePolicyBytes, headPolicyBytes);
    const relevant = request.changes.filter((c) => isModelConfig(policy, c.path) || (c.previousPath !== null && isModelConfig(policy, c.previousPath)));
    const deleted = relevant.filter((c) => c.status === 'deleted');
    const judged = relevant.filter((c) => c.status !== 'deleted');
    const configs = await mapLimited(judged, request.concurrency ?? 8, async (change) => {
        const filePolicy = resolvePolicy(policy, change.path);
        const judging = { limits: filePolicy.limits, rules: filePolicy.rules, standing: filePolicy.standing };
        const headVersion = await readVersion(source, head, change.path, filePolicy.serving, request.overrides, policyPath)
            ?? { path: change.path, line: null, message: `${change.path} is not a regular file at head (a symlink, a submodule or too large to read), so it was not judged` };
        let baseVersion = null;
        let status = change.status;
        if (change.status !== 'added') {
            baseVersion = await readVersion(source, base, change.previousPath ?? change.path, filePolicy.serving, request.overrides, policyPath);
            // A base version that is not there (a 404, a shallow history) is an added file.
            if (baseVersion === null)
                status = 'added';
        }
        return { change: { ...change, status }, base: baseVersion, head: headVersion, judging };
    });
    // `config.json` is a common name for things that are not models: when only the default globs
    // picked such a file, it is named in a notice instead of blocking.
    const notices = [...(request.notices ?? [])];
    const judgedConfigs = configs.filter((config) => {
        const head = config.head;
        const skip = policy.files === DEFAULT_POLICY.files && head !== null && 'notAModel' in head && head.notAModel === true;
        if (skip)
            notices.push(`${config.change.path} matched the default file globs but is not a model config; it was not judged (list your model files under \`files\` in the policy to judge exactly those).`);
        return !skip;
    });
    const labels = request.labels ?? [];
    const waiverLabel = policy.waiverLabel ?? null;
    // Every blocking finding gets its remedy here, proven against the same policy and base.
    return attachRemedies(decide({
        configs: judgedConfigs,
        deleted,
        policy: { source: basePolicyBytes === null ? 'built-in' : 'file', path: policyPath, changedInHead: policyChanged },
        waiver: { label: waiverLabel, applied: waiverLabel !== null && labels.includes(waiverLabel) },
        notices,
        base,
        head,
    }), judgedConfigs);
}

;// CONCATENATED MODULE: ./node_modules/markdown-table/index.js
// To do: next major: remove.
/**
 * @typedef {Options} MarkdownTableOptions
 *   Configuration.
 */

/**
 * @typedef Options
 *   Configuration.
 * @property {boolean | null | undefined} [alignDelimiters=true]
 *   Whether to align the delimiters (default: `true`);
 *   they are aligned by default:
 *
 *   ```markdown
 *   | Alpha | B     |
 *   | ----- | ----- |
 *   | C     | Delta |
 *   ```
 *
 *   Pass `false` to make them staggered:
 *
 *   ```markdown
 *   | Alpha | B |
 *   | - | - |
 *   | C | Delta |
 *   ```
 * @property {ReadonlyArray<string | null | undefined> | string | null | undefined} [align]
 *   How to align columns (default: `''`);
 *   one style for all columns or styles for their respective columns;
 *   each style is either `'l'` (left), `'r'` (right), or `'c'` (center);
 *   other values are treated as `''`, which doesn’t place the colon in the
 *   alignment row but does align left;
 *   *only the lowercased first character is used, so `Right` is fine.*
 * @property {boolean | null | undefined} [delimiterEnd=true]
 *   Whether to end each row with the delimiter (default: `true`).
 *
 *   > 👉 **Note**: please don’t use this: it could create fragile structures
 *   > that aren’t understandable to some markdown parsers.
 *
 *   When `true`, there are ending delimiters:
 *
 *   ```markdown
 *   | Alpha | B     |
 *   | ----- | ----- |
 *   | C     | Delta |
 *   ```
 *
 *   When `false`, there are no ending delimiters:
 *
 *   ```markdown
 *   | Alpha | B
 *   | ----- | -----
 *   | C     | Delta
 *   ```
 * @property {boolean | null | undefined} [fillRows=true]
 *   Whether to fill rows with empty cells up to the most cells in a row
 *   (default: `true`).
 *
 *   When `true`, all rows have as many cells as the longest row:
 *
 *   ```markdown
 *   | Alpha | B    |   |
 *   | ----- | ---- | - |
 *   | C     |      |   |
 *   | D     | Echo | F |
 *   ```
 *
 *   When `false`, rows keep their cells,
 *   and the delimiter row has as many cells as the header row:
 *
 *   ```markdown
 *   | Alpha | B    |
 *   | ----- | ---- |
 *   | C     |
 *   | D     | Echo | F |
 *   ```
 * @property {boolean | null | undefined} [delimiterStart=true]
 *   Whether to begin each row with the delimiter (default: `true`).
 *
 *   > 👉 **Note**: please don’t use this: it could create fragile structures
 *   > that aren’t understandable to some markdown parsers.
 *
 *   When `true`, there are starting delimiters:
 *
 *   ```markdown
 *   | Alpha | B     |
 *   | ----- | ----- |
 *   | C     | Delta |
 *   ```
 *
 *   When `false`, there are no starting delimiters:
 *
 *   ```markdown
 *   Alpha | B     |
 *   ----- | ----- |
 *   C     | Delta |
 *   ```
 * @property {boolean | null | undefined} [padding=true]
 *   Whether to add a space of padding between delimiters and cells
 *   (default: `true`).
 *
 *   When `true`, there is padding:
 *
 *   ```markdown
 *   | Alpha | B     |
 *   | ----- | ----- |
 *   | C     | Delta |
 *   ```
 *
 *   When `false`, there is no padding:
 *
 *   ```markdown
 *   |Alpha|B    |
 *   |-----|-----|
 *   |C    |Delta|
 *   ```
 * @property {((value: string) => number) | null | undefined} [stringLength]
 *   Function to detect the length of table cell content (optional);
 *   this is used when aligning the delimiters (`|`) between table cells;
 *   full-width characters and emoji mess up delimiter alignment when viewing
 *   the markdown source;
 *   to fix this, you can pass this function,
 *   which receives the cell content and returns its “visible” size;
 *   note that what is and isn’t visible depends on where the text is displayed.
 *
 *   Without such a function, the following:
 *
 *   ```js
 *   markdownTable([
 *     ['Alpha', 'Bravo'],
 *     ['中文', 'Charlie'],
 *     ['👩‍❤️‍👩', 'Delta']
 *   ])
 *   ```
 *
 *   Yields:
 *
 *   ```markdown
 *   | Alpha | Bravo |
 *   | - | - |
 *   | 中文 | Charlie |
 *   | 👩‍❤️‍👩 | Delta |
 *   ```
 *
 *   With [`string-width`](https://github.com/sindresorhus/string-width):
 *
 *   ```js
 *   import stringWidth from 'string-width'
 *
 *   markdownTable(
 *     [
 *       ['Alpha', 'Bravo'],
 *       ['中文', 'Charlie'],
 *       ['👩‍❤️‍👩', 'Delta']
 *     ],
 *     {stringLength: stringWidth}
 *   )
 *   ```
 *
 *   Yields:
 *
 *   ```markdown
 *   | Alpha | Bravo   |
 *   | ----- | ------- |
 *   | 中文  | Charlie |
 *   | 👩‍❤️‍👩    | Delta   |
 *   ```
 */

/**
 * Get the length of a cell.
 *
 * @param {string} value
 *   Cell value.
 * @returns {number}
 *   Cell size.
 */
function defaultStringLength(value) {
  return value.length
}

/**
 * Generate a markdown
 * ([GFM](https://docs.github.com/en/github/writing-on-github/working-with-advanced-formatting/organizing-information-with-tables))
 * table.
 *
 * @param {ReadonlyArray<ReadonlyArray<string | null | undefined>>} table
 *   Table data (matrix of strings).
 * @param {Readonly<Options> | null | undefined} [options]
 *   Configuration (optional).
 * @returns {string}
 *   Result.
 */
function markdownTable(table, options) {
  const settings = options || {}
  // To do: next major: change to spread.
  // eslint-disable-next-line unicorn/prefer-spread -- `align` can be a string.
  const align = (settings.align || []).concat()
  const stringLength = settings.stringLength || defaultStringLength
  /** @type {Array<number>} Character codes as symbols for alignment per column. */
  const alignments = []
  /** @type {Array<Array<string>>} Cells per row. */
  const cellMatrix = []
  /** @type {Array<Array<number>>} Sizes of each cell per row. */
  const sizeMatrix = []
  /** @type {Array<number>} */
  const longestCellByColumn = []
  let mostCellsPerRow = 0
  let rowIndex = -1

  // This is a superfluous loop if we don’t align delimiters, but otherwise we’d
  // do superfluous work when aligning, so optimize for aligning.
  while (++rowIndex < table.length) {
    /** @type {Array<string>} */
    const row = []
    /** @type {Array<number>} */
    const sizes = []
    let columnIndex = -1

    if (table[rowIndex].length > mostCellsPerRow) {
      mostCellsPerRow = table[rowIndex].length
    }

    while (++columnIndex < table[rowIndex].length) {
      const cell = serialize(table[rowIndex][columnIndex])

      if (settings.alignDelimiters !== false) {
        const size = stringLength(cell)
        sizes[columnIndex] = size

        if (
          longestCellByColumn[columnIndex] === undefined ||
          size > longestCellByColumn[columnIndex]
        ) {
          longestCellByColumn[columnIndex] = size
        }
      }

      row.push(cell)
    }

    cellMatrix[rowIndex] = row
    sizeMatrix[rowIndex] = sizes
  }

  // Figure out which alignments to use.
  let columnIndex = -1

  if (typeof align === 'object' && 'length' in align) {
    while (++columnIndex < mostCellsPerRow) {
      alignments[columnIndex] = toAlignment(align[columnIndex])
    }
  } else {
    const code = toAlignment(align)

    while (++columnIndex < mostCellsPerRow) {
      alignments[columnIndex] = code
    }
  }

  // Inject the alignment row.
  columnIndex = -1
  /** @type {Array<string>} */
  const row = []
  /** @type {Array<number>} */
  const sizes = []

  while (++columnIndex < mostCellsPerRow) {
    const code = alignments[columnIndex]
    let before = ''
    let after = ''

    if (code === 99 /* `c` */) {
      before = ':'
      after = ':'
    } else if (code === 108 /* `l` */) {
      before = ':'
    } else if (code === 114 /* `r` */) {
      after = ':'
    }

    // There *must* be at least one hyphen-minus in each alignment cell.
    let size =
      settings.alignDelimiters === false
        ? 1
        : Math.max(
            1,
            longestCellByColumn[columnIndex] - before.length - after.length
          )

    const cell = before + '-'.repeat(size) + after

    if (settings.alignDelimiters !== false) {
      size = before.length + size + after.length

      if (size > longestCellByColumn[columnIndex]) {
        longestCellByColumn[columnIndex] = size
      }

      sizes[columnIndex] = size
    }

    row[columnIndex] = cell
  }

  // Inject the alignment row.
  cellMatrix.splice(1, 0, row)
  sizeMatrix.splice(1, 0, sizes)

  rowIndex = -1
  /** @type {Array<string>} */
  const lines = []

  while (++rowIndex < cellMatrix.length) {
    const row = cellMatrix[rowIndex]
    const sizes = sizeMatrix[rowIndex]
    const cellsInRow =
      settings.fillRows === false
        ? Math.max(1, cellMatrix[rowIndex === 1 ? 0 : rowIndex].length)
        : mostCellsPerRow
    columnIndex = -1
    /** @type {Array<string>} */
    const line = []

    while (++columnIndex < cellsInRow) {
      const cell = row[columnIndex] || ''
      let before = ''
      let after = ''

      if (settings.alignDelimiters !== false) {
        const size =
          longestCellByColumn[columnIndex] - (sizes[columnIndex] || 0)
        const code = alignments[columnIndex]

        if (code === 114 /* `r` */) {
          before = ' '.repeat(size)
        } else if (code === 99 /* `c` */) {
          const half = size / 2

          if (size % 2) {
            before = ' '.repeat(half + 0.5)
            after = ' '.repeat(half - 0.5)
          } else {
            before = ' '.repeat(half)
            after = before
          }
        } else {
          after = ' '.repeat(size)
        }
      }

      if (settings.delimiterStart !== false && !columnIndex) {
        line.push('|')
      }

      if (
        settings.padding !== false &&
        // Don’t add the opening space if we’re not aligning and the cell is
        // empty: there will be a closing space.
        !(settings.alignDelimiters === false && cell === '') &&
        (settings.delimiterStart !== false || columnIndex)
      ) {
        line.push(' ')
      }

      if (settings.alignDelimiters !== false) {
        line.push(before)
      }

      line.push(cell)

      if (settings.alignDelimiters !== false) {
        line.push(after)
      }

      if (settings.padding !== false) {
        line.push(' ')
      }

      if (settings.delimiterEnd !== false || columnIndex !== cellsInRow - 1) {
        line.push('|')
      }
    }

    lines.push(
      settings.delimiterEnd === false
        ? line.join('').replace(/ +$/, '')
        : line.join('')
    )
  }

  return lines.join('\n')
}

/**
 * Serialize a cell value.
 *
 * @param {string | null | undefined} [value]
 *   Value to serialize.
 * @returns {string}
 *   Result.
 */
function serialize(value) {
  return value === null || value === undefined ? '' : String(value)
}

/**
 * Get the alignment character code from a value.
 *
 * @param {string | null | undefined} value
 *   Value.
 * @returns {number}
 *   Alignment.
 */
function toAlignment(value) {
  const code = typeof value === 'string' ? value.codePointAt(0) : 0

  return code === 67 /* `C` */ || code === 99 /* `c` */
    ? 99 /* `c` */
    : code === 76 /* `L` */ || code === 108 /* `l` */
      ? 108 /* `l` */
      : code === 82 /* `R` */ || code === 114 /* `r` */
        ? 114 /* `r` */
        : 0
}

;// CONCATENATED MODULE: ./src/core/render/escape.ts
/**
 * Everything that reaches markdown or HTML from a pull request (paths, keys, values, messages
 * quoting them) goes through one of these two functions. GitHub renders comments as GFM with
 * inline HTML, links bare URLs and turns `@name` and `#123` into mentions and references, so
 * plain markdown escaping is not enough.
 */
const ZERO_WIDTH_SPACE = '\u200b';
const HTML_ENTITIES = {
    '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;',
};
/** Text for HTML element content or a quoted attribute value. */
function escapeHtml(text) {
    return text.replace(/[&<>"']/g, (c) => HTML_ENTITIES[c]);
}
/**
 * Text for a markdown paragraph or a table cell: no element, link, emphasis, mention, reference
 * or comment survives, and a table keeps its shape (`|` and line breaks cannot split a cell).
 * One pass over the characters, so no entity is escaped twice.
 */
function escapeMarkdown(text) {
    return text
        .replace(/\r\n|[\r\n\u2028\u2029]|[\u0000-\u0008\u000b-\u001f\u007f]/g, ' ')
        .replace(/[&<>"|#\\`*_{}[\]()!~+=-]/g, (c) => MARKDOWN_ESCAPES[c] ?? `\\${c}`)
        // Mentions, team mentions and issue references are linked from text nodes, after entities
        // are decoded; a zero-width space after the sign stops the link and reads the same.
        .replace(/(@|&#35;)(?=[\p{L}\p{N}_])/gu, `$1${ZERO_WIDTH_SPACE}`)
        // Bare URLs and www. hosts are autolinked; break the scheme separator and the www. prefix.
        .replace(/:\/\//g, `:${ZERO_WIDTH_SPACE}//`)
        .replace(/\b(www)\./gi, `$1${ZERO_WIDTH_SPACE}.`)
        .replace(/ {2,}/g, ' ');
}
/**
 * Entities for characters that would open an element, split a table cell or start a heading or
 * reference; other GFM punctuation is backslash-escaped so it prints as itself.
 */
const MARKDOWN_ESCAPES = {
    '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', '|': '&#124;', '#': '&#35;',
};
/** Untrusted text shown as code: `<code>` with escaped content (backticks cannot be nested safely). */
function codeSpan(text) {
    return `<code>${escapeMarkdown(text)}</code>`;
}
/** A path segment for a link target, percent-encoded so a crafted path cannot leave the URL. */
function encodePath(path) {
    return path.split('/').map((segment) => encodeURIComponent(segment)).join('/');
}

;// CONCATENATED MODULE: ./src/core/render/metric-format.ts

const KIND = {
    declaredSpan: 'tokens', trainedSpan: 'tokens', servedSpan: 'tokens', evaluationSpan: 'tokens', reach: 'tokens',
    scalingCover: 'tokens', headroom: 'tokens', extensionRatio: 'ratio', fastestWavelength: 'ratio',
    slowestWavelength: 'ratio', unturnedPairs: 'count', exposedPairs: 'count', separationFloor: 'ratio',
    separationFloorOffset: 'tokens', discriminationSpan: 'tokens', attentionScale: 'ratio', alibiHorizon: 'tokens',
    receptiveField: 'tokens', positionShare: 'share', params: 'large', activeParams: 'large',
    nonEmbeddingParams: 'large', weightBytes: 'bytes', cachePerTokenBytes: 'bytes', cacheBytesAtSpan: 'bytes',
    memoryBytes: 'bytes', fitSequences: 'count', flopsPerToken: 'flop', tokenBudget: 'tokens',
    positionExactLimit: 'tokens', collidingPositions: 'count', angleErrorMax: 'radians', overflowPosition: 'tokens',
    blurredPairs: 'count',
};
function metric_format_kindOf(metric) {
    const name = metric.startsWith('precision.') ? metric.split('.')[2] : metric;
    return KIND[name] ?? 'ratio';
}
/** A metric value in the unit people read it in: tokens with k/M, bytes in GiB, counts with separators. */
function formatMetric(metric, value) {
    if (value === null)
        return '—';
    switch (metric_format_kindOf(metric)) {
        case 'tokens': return formatTokens(value);
        case 'bytes': return formatBytes(value);
        case 'count': return formatInteger(value);
        case 'large': return formatCount(value);
        case 'flop': return formatCount(value);
        case 'share': return `${units_formatNumber(value * 100, 3)} %`;
        case 'radians': return `${units_formatNumber(value, 3)} rad`;
        default: return units_formatNumber(value);
    }
}
/** A signed change in the metric's unit, with the percentage when defined. */
function formatChange(metric, change, pct) {
    if (change === null)
        return '—';
    if (change === 0)
        return '0';
    const sign = change > 0 ? '+' : '−';
    const magnitude = formatMetric(metric, Math.abs(change)).replace(/ \(\d+[kM]\)$/, '');
    return pct === null ? `${sign}${magnitude}` : `${sign}${magnitude} (${sign}${units_formatNumber(Math.abs(pct), 3)} %)`;
}

;// CONCATENATED MODULE: ./src/core/render/memory-chart.ts


const GIB = 1024 ** 3;
/** Spans to plot: powers of two from 1k up to the larger evaluation span, plus both spans themselves. */
function chartSpans(...spans) {
    const known = spans.filter((s) => s !== null && Number.isFinite(s) && s > 0);
    if (known.length === 0)
        return [];
    const top = Math.max(...known);
    const points = new Set(known);
    for (let s = 1024; s < top; s *= 2)
        points.add(s);
    let sorted = [...points].sort((a, b) => a - b);
    // Keep the chart readable: at most 12 points, always keeping the evaluated spans.
    while (sorted.length > 12) {
        const drop = sorted.findIndex((s, i) => i > 0 && !known.includes(s));
        if (drop < 0)
            break;
        sorted = sorted.filter((_, i) => i !== drop);
    }
    return sorted;
}
function spanLabel(span) {
    if (span >= 1024 * 1024 && span % (1024 * 1024) === 0)
        return `${span / (1024 * 1024)}M`;
    if (span >= 1024 && span % 1024 === 0)
        return `${span / 1024}k`;
    return String(span);
}
/**
 * A Mermaid line chart (GitHub renders it in comments): weights plus key/value cache in GiB
 * against span, for base and head, with the usable device budget as a flat line. Only numbers
 * and our own labels go into it, never text from the pull request.
 */
function memoryChart(file) {
    const base = file.base;
    const head = file.head;
    if (!head)
        return null;
    const spans = chartSpans(base?.metrics.evaluationSpan ?? null, head.metrics.evaluationSpan);
    if (spans.length < 2)
        return null;
    const series = [];
    for (const [name, report] of [['base', base], ['head', head]]) {
        if (!report)
            continue;
        const values = spans.map((s) => memoryAtSpan(report.spec, s));
        if (values.every((v) => v !== null))
            series.push({ name, values: values.map((v) => v / GIB) });
    }
    if (series.length === 0)
        return null;
    const budget = usableDeviceBytes(head.spec);
    if (budget !== null)
        series.push({ name: 'usable device memory', values: spans.map(() => budget / GIB) });
    const top = Math.max(...series.flatMap((s) => s.values));
    const round = (v) => units_formatNumber(v, 4).replace(/,/g, '');
    const lines = [
        '```mermaid',
        'xychart-beta',
        '    title "Weights + key/value cache (GiB) against span"',
        `    x-axis "span (tokens)" [${spans.map((s) => `"${spanLabel(s)}"`).join(', ')}]`,
        `    y-axis "GiB" 0 --> ${round(top * 1.1)}`,
        ...series.map((s) => `    line [${s.values.map(round).join(', ')}]`),
        '```',
    ];
    const legend = series.map((s, i) => `${i + 1}. ${s.name}`).join(' · ');
    return `<details open><summary>Memory against span</summary>\n\n${lines.join('\n')}\n\nLines, in order: ${legend}. Sequences held: base ${base?.spec.serving.sequences ?? 1}, head ${head.spec.serving.sequences ?? 1}.\n\n</details>`;
}

;// CONCATENATED MODULE: ./src/core/render/notice.ts
/** Said in every report: what the numbers are and are not. */
const ESTIMATE_NOTICE = 'These metrics are estimates computed from the config alone, to support a review; they are not a guarantee of model quality, and a model can fail or succeed for reasons no config shows.';
/** Hidden first line of the pull-request comment; the action finds its own comment by it. */
const COMMENT_MARKER = '<!-- context-reach:pull-request-report -->';

;// CONCATENATED MODULE: ./src/core/render/remedy-text.ts



const TOKEN_KEYS = new Set(['serving.span', 'position.scaling.originalSpan']);
/** A change value in the unit people read it in. */
function formatChangeValue(key, value) {
    if (value === null)
        return 'not set';
    if (typeof value === 'string')
        return value;
    if (TOKEN_KEYS.has(key))
        return formatTokens(value);
    if (key === 'position.base')
        return units_formatNumber(value, 6);
    if (Number.isInteger(value))
        return formatInteger(value);
    return units_formatNumber(value, 6);
}
function changeParts(change, spec) {
    return changeEntries(change).map(([key, value]) => {
        const before = spec ? currentValue(spec, key) : null;
        return { key, before: spec ? formatChangeValue(key, before) : null, after: formatChangeValue(key, value) };
    });
}
/** `position.scaling.factor 4 → 8, serving.sequences 8 → 5`. */
function changeText(change, spec) {
    return changeParts(change, spec).map((p) => (p.before === null ? `${p.key} = ${p.after}` : `${p.key} ${p.before} → ${p.after}`)).join(', ');
}
function metricParts(metrics) {
    return Object.entries(metrics).map(([metric, value]) => ({ metric, value: value === null && metric === 'discriminationSpan' ? 'none within the span' : formatMetric(metric, value) }));
}
/** `reach 262,144 (256k), headroom 0`. */
function metricsText(metrics) {
    return metricParts(metrics).map((p) => `${p.metric} ${p.value}`).join(', ');
}
/** `position.scaling.factor 4 → 8 ⇒ reach 262,144 (256k), headroom 0 (also raises frequencies-changed)`. */
function remedyText(remedy, spec) {
    const raises = remedy.raises.length > 0 ? ` (also raises ${remedy.raises.join(', ')})` : '';
    return `${changeText(remedy.change, spec)} ⇒ ${metricsText(remedy.metrics)}${raises}`;
}
/** Lines for one finding: the remedy, each alternative, or why there is none; empty for findings without remedy fields. */
function remedyLines(fields, spec) {
    if (fields.remedy === undefined)
        return [];
    if (fields.remedy === null)
        return [{ label: 'no remedy', text: fields.remedyWhyNot ?? 'none found' }];
    return [
        { label: 'remedy', text: remedyText(fields.remedy, spec) },
        ...(fields.remedyAlternatives ?? []).map((r) => ({ label: 'or', text: remedyText(r, spec) })),
    ];
}
/** `All remedies together (a, b) pass` or what still blocks. */
function togetherText(together, spec) {
    const verdict = together.passes ? 'pass: nothing blocks' : `still block on ${together.stillBlocking.join(', ')}`;
    return `All first remedies together (${changeText(together.change, spec)}) ${verdict} ⇒ ${metricsText(together.metrics)}`;
}
/** Said once wherever remedies are shown. */
const REMEDY_NOTE = 'Each remedy was applied to the description, measured and judged again by the same rules and limits before it is shown.';

;// CONCATENATED MODULE: ./src/core/render/comment.ts









/** GitHub refuses comment bodies over 65,536 characters; keep a margin for the trim notice. */
const COMMENT_LIMIT = 65_536;
const VERDICT_LINE = {
    block: '🔴 **Blocked**',
    warn: '🟡 **Passes with warnings**',
    ok: '🟢 **Passes**',
};
const SEVERITY_ICON = { block: '🔴 block', warn: '🟡 warn', info: '🔵 info' };
function comment_where(file, finding, ctx) {
    const label = finding.line !== null ? `line ${finding.line}` : 'file';
    const key = finding.key ? ` ${codeSpan(finding.key)}` : '';
    if (!ctx.blobUrl)
        return `${label}${key}`;
    const anchor = finding.line !== null ? `#L${finding.line}` : '';
    return `[${label}](${ctx.blobUrl}/${encodePath(file.path)}${anchor})${key}`;
}
function state(finding) {
    const parts = [SEVERITY_ICON[finding.severity]];
    if (finding.standing)
        parts.push('standing');
    else
        parts.push('new');
    if (finding.waived)
        parts.push('waived');
    return parts.join(' · ');
}
function deltaState(delta) {
    if (delta.state === 'crossed')
        return `❌ ${delta.limit?.severity ?? 'block'}`;
    if (delta.state === 'ok')
        return '✅ within';
    return '';
}
function limitText(delta) {
    const limit = delta.limit;
    if (!limit)
        return '';
    const parts = [];
    if (limit.min !== undefined)
        parts.push(`≥ ${formatMetric(delta.metric, limit.min)}`);
    if (limit.max !== undefined)
        parts.push(`≤ ${formatMetric(delta.metric, limit.max)}`);
    if (limit.maxIncreasePct !== undefined)
        parts.push(`≤ +${units_formatNumber(limit.maxIncreasePct, 3)} %`);
    return parts.join(', ');
}
function deltaTable(file) {
    if (file.deltas.length === 0)
        return '_No metric changed and none is limited by the policy._';
    return markdownTable([
        ['metric', 'base', 'head', 'change', 'limit', 'state'],
        ...file.deltas.map((d) => [
            `\`${d.metric}\``, formatMetric(d.metric, d.base), formatMetric(d.metric, d.head),
            formatChange(d.metric, d.change, d.changePct), limitText(d), deltaState(d),
        ]),
    ], { align: ['l', 'r', 'r', 'r', 'l', 'l'] });
}
function findingsTable(file, ctx) {
    if (file.findings.length === 0)
        return '_No findings._';
    return markdownTable([
        ['', 'rule', 'finding', 'where'],
        ...file.findings.map((f) => [state(f), `\`${f.rule}\``, escapeMarkdown(f.message), comment_where(file, f, ctx)]),
    ]);
}
function fullMetrics(file) {
    const rows = METRIC_PATHS.map((metric) => {
        const b = file.base ? formatMetric(metric, metricValue(file.base.metrics, metric)) : '—';
        const h = file.head ? formatMetric(metric, metricValue(file.head.metrics, metric)) : '—';
        return [`\`${metric}\``, b, h];
    }).filter(([, b, h]) => b !== '—' || h !== '—');
    return `<details><summary>All metrics</summary>\n\n${markdownTable([['metric', 'base', 'head'], ...rows], { align: ['l', 'r', 'r'] })}\n\n</details>`;
}
function title(file) {
    const status = file.status === 'renamed' && file.previousPath
        ? ` (renamed from ${codeSpan(file.previousPath)})`
        : file.status === 'added' ? ' (new file, judged on its own)' : '';
    return `### ${VERDICT_LINE[file.verdict].split(' ')[0]} ${codeSpan(file.path)}${status}`;
}
function fileSection(file, ctx, parts) {
    const lines = [title(file), ''];
    if (file.headError) {
        lines.push(`Could not be read at head: ${escapeMarkdown(file.headError.message)}`, '');
    }
    if (file.baseError) {
        lines.push(`_The base version could not be read (${escapeMarkdown(file.baseError.message)}); the head is judged on its own._`, '');
    }
    if (file.head) {
        lines.push(deltaTable(file), '');
    }
    const findings = file.findings.slice(0, parts.maxFindings);
    lines.push(findingsTable({ ...file, findings }, ctx), '');
    if (findings.length < file.findings.length) {
        lines.push(`_${file.findings.length - findings.length} more findings are in the job summary and the JSON report._`, '');
    }
    lines.push(...remedySection(file));
    if (parts.chart && file.head) {
        const chart = memoryChart(file);
        if (chart)
            lines.push(chart, '');
    }
    if (parts.details && file.head)
        lines.push(fullMetrics(file), '');
    return lines.join('\n');
}
/** `` `key` before → **after**, … ⇒ metric value, … `` with every part escaped. */
function changeMarkdown(change, spec) {
    return changeParts(change, spec)
        .map((p) => `${codeSpan(p.key)} ${p.before === null ? '' : `${escapeMarkdown(p.before)} → `}**${escapeMarkdown(p.after)}**`).join(', ');
}
function metricsMarkdown(metrics, max = Infinity) {
    return metricParts(metrics).slice(0, max).map((m) => `${escapeMarkdown(m.metric)} ${escapeMarkdown(m.value)}`).join(', ');
}
function remedyMarkdown(remedy, spec, maxMetrics = Infinity) {
    const raises = remedy.raises.length > 0 ? ` _(also raises ${remedy.raises.map((r) => escapeMarkdown(r)).join(', ')})_` : '';
    return `${changeMarkdown(remedy.change, spec)} ⇒ ${metricsMarkdown(remedy.metrics, maxMetrics)}${raises}`;
}
/** The first line under a blocking finding: its remedy, or why there is none. */
function firstRemedyLine(finding, spec) {
    if (finding.remedy === undefined)
        return null;
    if (finding.remedy === null)
        return `⛔ no remedy: ${escapeMarkdown(finding.remedyWhyNot ?? 'none found')}`;
    return `✅ **remedy**: ${remedyMarkdown(finding.remedy, spec, 3)}`;
}
/** The remedies of a file's blocking findings: the proven change, its alternatives, or why there is none. */
function remedySection(file) {
    const blocking = file.findings.filter((f) => f.severity === 'block' && f.remedy !== undefined);
    if (blocking.length === 0)
        return [];
    const spec = file.head?.spec ?? null;
    const lines = [`**Remedies** <sub>${escapeMarkdown(REMEDY_NOTE)}</sub>`, ''];
    for (const finding of blocking) {
        lines.push(`- \`${finding.rule}\`${finding.metric ? ` (${codeSpan(finding.metric)})` : ''}`);
        if (!finding.remedy) {
            lines.push(`  - ⛔ no remedy: ${escapeMarkdown(finding.remedyWhyNot ?? 'none found')}`);
            continue;
        }
        lines.push(`  - ✅ **remedy**: ${remedyMarkdown(finding.remedy, spec)}`);
        for (const alternative of finding.remedyAlternatives ?? [])
            lines.push(`  - or: ${remedyMarkdown(alternative, spec)}`);
    }
    const together = file.remedyTogether;
    if (together) {
        const verdict = together.passes ? 'pass: nothing blocks' : `still block on ${together.stillBlocking.map((b) => escapeMarkdown(b)).join(', ')}`;
        lines.push(`- ${together.passes ? '✅' : '⚠️'} All first remedies together (${changeMarkdown(together.change, spec)}) ${verdict}.`);
    }
    lines.push('');
    return lines;
}
function headline(report) {
    const counts = `${formatInteger(report.blocking)} blocking, ${formatInteger(report.warnings)} warning${report.warnings === 1 ? '' : 's'}`;
    return `## context-reach · ${VERDICT_LINE[report.verdict]} · ${counts}`;
}
function blockers(report, ctx) {
    const rows = report.files.flatMap((file) => file.findings.filter((f) => f.counts === 'block').map((f) => ({ file, f })));
    if (rows.length === 0)
        return [];
    return ['**What blocks:**', '', ...rows.flatMap(({ file, f }) => {
            const first = firstRemedyLine(f, file.head?.spec ?? null);
            return [
                `- ${codeSpan(file.path)} ${comment_where(file, f, ctx)}: \`${f.rule}\` ${escapeMarkdown(f.message)}`,
                ...(first ? [`  - ${first}`] : []),
            ];
        }), ''];
}
function preamble(report, ctx) {
    const lines = [];
    const judged = report.files.length;
    lines.push(`Judged ${judged} changed model config${judged === 1 ? '' : 's'} between \`${report.base.slice(0, 12)}\` (base) and \`${report.head.slice(0, 12)}\` (head).`, '');
    if (report.policy.source === 'built-in') {
        lines.push(`> [!NOTE]\n> No policy file at ${codeSpan(report.policy.path)} on the base commit: built-in rules only, no numeric limits.`, '');
    }
    if (report.policy.changedInHead) {
        lines.push(`> [!NOTE]\n> This pull request changes the policy ${codeSpan(report.policy.path)}. It was judged by the base commit's policy; the change applies after merge.`, '');
    }
    if (report.waiver.applied && report.waiver.label) {
        lines.push(`> [!WARNING]\n> The waiver label ${codeSpan(report.waiver.label)} is on this pull request: ${report.waiver.waivedBlocks} blocking finding${report.waiver.waivedBlocks === 1 ? '' : 's'} counted as warnings.`, '');
    }
    for (const notice of report.notices)
        lines.push(`> [!NOTE]\n> ${escapeMarkdown(notice)}`, '');
    if (ctx.unannotated && ctx.unannotated > 0) {
        lines.push(`_${ctx.unannotated} findings were not shown as line annotations (GitHub shows at most 10 errors and 10 warnings per step); all are listed below._`, '');
    }
    return lines;
}
function footer(report, ctx) {
    const lines = [];
    if (report.deleted.length > 0) {
        lines.push(`Deleted, not judged: ${report.deleted.map((d) => codeSpan(d.path)).join(', ')}.`, '');
    }
    if (ctx.htmlReportUrl)
        lines.push(`[Charts and full report (HTML)](${encodeURI(ctx.htmlReportUrl)})`, '');
    lines.push(`<sub>${escapeMarkdown(ESTIMATE_NOTICE)}</sub>`);
    return lines;
}
/**
 * The pull-request comment (and job summary): verdict and blockers first, then a section per
 * file. When the whole report is over the limit, the least important parts go first: full
 * metric tables, then charts, then findings beyond the first few, then whole file sections;
 * the comment says what was left out.
 */
function renderComment(report, ctx = {}) {
    const limit = ctx.limit ?? COMMENT_LIMIT;
    const attempts = [
        { chart: true, details: true, maxFindings: Infinity },
        { chart: true, details: false, maxFindings: Infinity },
        { chart: false, details: false, maxFindings: Infinity },
        { chart: false, details: false, maxFindings: 5 },
    ];
    const head = [COMMENT_MARKER, headline(report), '', ...preamble(report, ctx), ...blockers(report, ctx)].join('\n');
    const tail = footer(report, ctx).join('\n');
    for (const [index, parts] of attempts.entries()) {
        const trimNote = index === 0 ? '' : `\n_Trimmed to fit GitHub's comment limit: ${[
            !parts.details && 'full metric tables', !parts.chart && 'charts', parts.maxFindings !== Infinity && `findings past the first ${parts.maxFindings} per file`,
        ].filter(Boolean).join(', ')} are left out here; the job summary and the JSON report have everything._\n`;
        const body = `${head}\n${trimNote}\n${report.files.map((f) => fileSection(f, ctx, parts)).join('\n')}\n${tail}\n`;
        if (body.length <= limit)
            return body;
    }
    // Still too long: as many whole file sections as fit, the rest named in one line each.
    const minimal = attempts[attempts.length - 1];
    const sections = [];
    let used = head.length + tail.length + 400;
    let shown = 0;
    for (const file of report.files) {
        const section = fileSection(file, ctx, minimal);
        if (used + section.length > limit)
            break;
        sections.push(section);
        used += section.length;
        shown += 1;
    }
    const rest = report.files.slice(shown);
    const restLines = [];
    for (const f of rest) {
        const line = `- ${VERDICT_LINE[f.verdict].split(' ')[0]} ${codeSpan(f.path)}: ${f.findings.length} findings`;
        if (used + line.length + 200 > limit) {
            restLines.push(`- … and ${rest.length - restLines.length} more files`);
            break;
        }
        restLines.push(line);
        used += line.length + 1;
    }
    const note = `\n_Trimmed to fit GitHub's comment limit: ${rest.length} of ${report.files.length} files are listed by name only; the job summary and the JSON report have everything._\n`;
    return `${head}\n${note}\n${sections.join('\n')}\n${restLines.join('\n')}\n\n${tail}\n`;
}

;// CONCATENATED MODULE: ./src/core/render/inspect-text.ts




const PLAIN = { bold: (t) => t, dim: (t) => t, severity: (_s, t) => t };
function section(style, title, rows) {
    const shown = rows.filter(([, value]) => value !== '—');
    if (shown.length === 0)
        return [];
    const width = Math.max(...shown.map(([label]) => label.length));
    return ['', `  ${style.bold(title)}`, ...shown.map(([label, value]) => `    ${label.padEnd(width)}  ${value}`)];
}
function positionLine(report) {
    const code = report.spec.position;
    if (code.kind !== 'rotary')
        return code.kind;
    const parts = [`rotary, base ${units_formatNumber(code.base, 6)}`];
    if (code.fraction !== 1)
        parts.push(`fraction ${code.fraction}`);
    if (code.scaling)
        parts.push(`${code.scaling.kind} scaling × ${code.scaling.factor}`);
    return parts.join(', ');
}
function rangeRows(m) {
    return [
        ['declared span', formatTokens(m.declaredSpan)],
        ['trained span', formatTokens(m.trainedSpan)],
        ['served span', formatTokens(m.servedSpan)],
        ['reach', formatTokens(m.reach)],
        ['scaling cover', formatTokens(m.scalingCover)],
        ['headroom', formatInteger(m.headroom)],
        ['extension ratio', m.extensionRatio === null ? '—' : `${units_formatNumber(m.extensionRatio)}×`],
        ['attention scale', m.attentionScale === null || m.attentionScale === 1 ? '—' : units_formatNumber(m.attentionScale)],
        ['ALiBi slopes', m.alibiSlopes === null ? '—' : `${m.alibiSlopes.length} heads, ${units_formatNumber(m.alibiSlopes[0] ?? null)} … ${units_formatNumber(m.alibiSlopes[m.alibiSlopes.length - 1] ?? null)}`],
        ['ALiBi horizon', formatTokens(m.alibiHorizon)],
        ['receptive field', formatTokens(m.receptiveField)],
        ['position share', m.positionShare === null ? '—' : `${units_formatNumber(m.positionShare * 100, 3)} %`],
    ];
}
function spectrumRows(m) {
    return [
        ['fastest wavelength', m.fastestWavelength === null ? '—' : `${units_formatNumber(m.fastestWavelength)} tokens`],
        ['slowest wavelength', m.slowestWavelength === null ? '—' : `${units_formatNumber(m.slowestWavelength)} tokens`],
        ['unturned pairs', formatInteger(m.unturnedPairs)],
        ['exposed pairs', formatInteger(m.exposedPairs)],
        ['separation floor', m.separationFloor === null ? '—' : `${units_formatNumber(m.separationFloor)} at offset ${formatInteger(m.separationFloorOffset)}`],
        ['discrimination span', m.discriminationSpan === null ? (m.fastestWavelength === null ? '—' : 'none within the span') : formatTokens(m.discriminationSpan)],
    ];
}
function precisionRows(m) {
    const header = ['format', 'exact to', 'colliding', 'blurred pairs', 'angle error max', 'overflow at'];
    const rows = FLOAT_FORMATS.map((format) => {
        const p = m.precision[format];
        return [format, formatInteger(p.positionExactLimit), formatInteger(p.collidingPositions),
            formatInteger(p.blurredPairs), p.angleErrorMax === null ? '—' : `${units_formatNumber(p.angleErrorMax, 3)} rad`,
            formatInteger(p.overflowPosition)];
    });
    if (rows.every((row) => row.slice(1).every((cell) => cell === '—')))
        return [];
    const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
    const line = (cells) => `    ${cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ')}`;
    return [line(header), ...rows.map(line)];
}
function budgetRows(m) {
    return [
        ['parameters', m.params === null ? '—' : `${formatCount(m.params)} (${formatInteger(m.params)})`],
        ['active parameters', m.activeParams === m.params ? '—' : formatCount(m.activeParams)],
        ['non-embedding parameters', formatCount(m.nonEmbeddingParams)],
        ['weights', formatBytes(m.weightBytes)],
        ['cache per token', formatBytes(m.cachePerTokenBytes)],
        ['cache at span', formatBytes(m.cacheBytesAtSpan)],
        ['memory', formatBytes(m.memoryBytes)],
        ['sequences that fit', formatInteger(m.fitSequences)],
        ['FLOP per token', formatCount(m.flopsPerToken)],
        ['token budget', formatTokens(m.tokenBudget)],
    ];
}
function findingLines(style, report) {
    const { path, findings } = report;
    if (findings.length === 0)
        return ['', `  ${style.bold('Findings')}`, '    none'];
    const lines = ['', `  ${style.bold('Findings')}`, ...findings.map((f) => {
            const where = f.line !== null ? `${path}:${f.line}` : path;
            const key = f.key ? ` ${f.key}` : '';
            const remedies = remedyLines(f, report.spec).map((r) => `\n          ${style.bold(`${r.label}:`)} ${r.text}`).join('');
            return `    ${style.severity(f.severity, f.severity.padEnd(5))} ${f.rule}  ${style.dim(`${where}${key}`)}\n          ${f.message}${remedies}`;
        })];
    if (report.remedyTogether)
        lines.push(`    ${style.bold('together:')} ${togetherText(report.remedyTogether, report.spec)}`);
    return lines;
}
/** The readable report of `inspect` for one file. */
function renderFileText(report, style = PLAIN) {
    const m = report.metrics;
    const title = report.spec.name ? `${report.path} (${report.spec.name})` : report.path;
    const lines = [
        style.bold(title),
        `  ${style.dim(`${report.dialect} format · ${positionLine(report)} · evaluated at ${formatTokens(m.evaluationSpan)} tokens`)}`,
        ...section(style, 'Range', rangeRows(m)),
        ...section(style, 'Spectrum', spectrumRows(m)),
    ];
    const precision = precisionRows(m);
    if (precision.length > 0) {
        const own = report.spec.dtypes.positions ?? 'fp32';
        lines.push('', `  ${style.bold('Number formats')} ${style.dim(`(positions computed in ${own})`)}`, ...precision);
    }
    lines.push(...section(style, 'Budget', budgetRows(m)));
    lines.push(...findingLines(style, report));
    return lines.join('\n');
}
/** The whole `inspect` text output: each file, each failure, and the estimate notice. */
function renderInspectText(reports, failures, style = PLAIN) {
    const blocks = reports.map((r) => renderFileText(r, style));
    for (const failure of failures) {
        const where = failure.line !== null ? `${failure.path}:${failure.line}` : failure.path;
        blocks.push(`${style.bold(failure.path)}\n  ${style.severity('block', 'error')} ${where}: ${failure.message}`);
    }
    blocks.push(style.dim(ESTIMATE_NOTICE));
    return `${blocks.join('\n\n')}\n`;
}

;// CONCATENATED MODULE: ./src/core/render/diff-text.ts





/** The gate's decision as terminal text, for `context-reach diff --format text`. */
function renderDiffText(report, style = PLAIN) {
    const verdict = report.verdict === 'block' ? style.severity('block', 'BLOCK')
        : report.verdict === 'warn' ? style.severity('warn', 'WARN') : style.bold('OK');
    const lines = [
        `${style.bold('context-reach')} ${verdict}: ${formatInteger(report.blocking)} blocking, ${formatInteger(report.warnings)} warnings, ${report.files.length} model configs changed (${report.base.slice(0, 12)} → ${report.head.slice(0, 12)})`,
    ];
    if (report.policy.source === 'built-in')
        lines.push(style.dim(`no policy at ${report.policy.path} on the base commit: built-in rules only`));
    if (report.policy.changedInHead)
        lines.push(style.dim(`the policy ${report.policy.path} changes in head; judged by the base version`));
    if (report.waiver.applied)
        lines.push(style.dim(`waiver label ${report.waiver.label}: ${report.waiver.waivedBlocks} blocks counted as warnings`));
    for (const notice of report.notices)
        lines.push(style.dim(notice));
    for (const file of report.files) {
        const renamed = file.previousPath ? ` (renamed from ${file.previousPath})` : file.status === 'added' ? ' (new)' : '';
        lines.push('', `${style.bold(file.path)}${renamed}  ${file.verdict}`);
        if (file.headError)
            lines.push(`  ${style.severity('block', 'error')} ${file.headError.message}`);
        const width = Math.max(0, ...file.deltas.map((d) => d.metric.length));
        for (const d of file.deltas) {
            const mark = d.state === 'crossed' ? style.severity(d.limit?.severity ?? 'block', ' ✗ limit') : d.state === 'ok' ? ' ✓' : '';
            lines.push(`  ${d.metric.padEnd(width)}  ${formatMetric(d.metric, d.base).padStart(18)} → ${formatMetric(d.metric, d.head).padEnd(18)} ${formatChange(d.metric, d.change, d.changePct)}${mark}`);
        }
        for (const f of file.findings) {
            const tags = [f.standing ? 'standing' : 'new', f.waived ? 'waived' : null].filter(Boolean).join(', ');
            const at = f.line !== null ? `${file.path}:${f.line}` : file.path;
            lines.push(`  ${style.severity(f.severity, f.severity.padEnd(5))} ${f.rule} (${tags})  ${style.dim(at)}`, `        ${f.message}`);
            for (const r of remedyLines(f, file.head?.spec ?? null))
                lines.push(`        ${style.bold(`${r.label}:`)} ${r.text}`);
        }
        if (file.remedyTogether)
            lines.push(`  ${file.remedyTogether.passes ? style.bold('together:') : style.severity('warn', 'together:')} ${togetherText(file.remedyTogether, file.head?.spec ?? null)}`);
    }
    if (report.deleted.length > 0)
        lines.push('', `deleted, not judged: ${report.deleted.map((d) => d.path).join(', ')}`);
    lines.push('', style.dim(ESTIMATE_NOTICE));
    return `${lines.join('\n')}\n`;
}

;// CONCATENATED MODULE: ./src/core/render/gate-json.ts

/**
 * The versioned JSON report of the gate: the decision, and per file both versions' spec, metrics
 * and findings. Locations are left out (the findings carry key and line). Every blocking finding
 * carries `remedy` (`{change, metrics, raises}`, or null), `remedyWhyNot` and
 * `remedyAlternatives`; a file with two or more remedies carries `remedyTogether`.
 */
function renderGateJson(report) {
    const files = report.files.map((file) => ({
        path: file.path,
        previousPath: file.previousPath,
        status: file.status,
        dialect: file.dialect,
        verdict: file.verdict,
        deltas: file.deltas,
        findings: file.findings,
        base: file.base ? { spec: file.base.spec, metrics: file.base.metrics } : null,
        head: file.head ? { spec: file.head.spec, metrics: file.head.metrics } : null,
        baseError: file.baseError,
        headError: file.headError,
        ...(file.remedyTogether ? { remedyTogether: file.remedyTogether } : {}),
    }));
    return `${JSON.stringify({
        version: report.version,
        notice: ESTIMATE_NOTICE,
        verdict: report.verdict,
        blocking: report.blocking,
        warnings: report.warnings,
        base: report.base,
        head: report.head,
        policy: report.policy,
        waiver: report.waiver,
        notices: report.notices,
        deleted: report.deleted,
        files,
    }, null, 2)}\n`;
}

;// CONCATENATED MODULE: external "node:child_process"
const external_node_child_process_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:child_process");
;// CONCATENATED MODULE: ./src/action/git.ts
/**
 * The one adapter for git: every git call of the action and the CLI goes through here. Git runs
 * as a child process with an argument array (never a shell), bounded output and a timeout.
 * Revisions and paths come from events and pull requests, so they are checked before use and
 * blobs are read with `cat-file` (no textconv or filters from the pull request's attributes).
 */

/** Largest model config read, in bytes; larger blobs are refused unread (default: `4 MiB`). */
const MAX_CONFIG_BYTES = 4 * 1024 * 1024;
/** A file refused because it is larger than `limit` bytes. */
class ContentTooLargeError extends Error {
    path;
    size;
    limit;
    constructor(path, size, limit) {
        super(`${path} is ${size} bytes; expected at most ${limit} bytes for a model config (the file was not read)`);
        this.path = path;
        this.size = size;
        this.limit = limit;
        this.name = 'ContentTooLargeError';
    }
}
/** A git call that failed: exit status, signal, or output past its bound. */
class GitError extends Error {
    args;
    exitCode;
    stderr;
    constructor(message, args, exitCode, stderr) {
        super(message);
        this.args = args;
        this.exitCode = exitCode;
        this.stderr = stderr;
        this.name = 'GitError';
    }
}
/** A revision from an event or an input: no option lookalikes, no control characters, sane length. */
function checkRevision(rev) {
    if (typeof rev !== 'string' || rev === '' || rev.length > 256 || rev.startsWith('-') || /[\u0000-\u0020\u007f]/.test(rev)) {
        throw new GitError(`revision ${JSON.stringify(rev)} is not usable; expected a commit id or ref name without spaces or a leading "-"`, [], null, '');
    }
    return rev;
}
function checkPath(path) {
    if (typeof path !== 'string' || path === '' || path.includes('\u0000') || path.startsWith('/') || path.split('/').some((part) => part === '' || part === '.' || part === '..')) {
        throw new GitError(`path ${JSON.stringify(path)} is not usable; expected a repository-relative path without empty, "." or ".." parts`, [], null, '');
    }
    return path;
}
const git_KINDS = { blob: 'file', tree: 'directory', commit: 'submodule' };
/** Runs git; resolves with any exit status, rejects on timeout, output overflow or spawn failure. */
/** The git command of an argument list (`commit` in `-c user.name=x commit -m y`), for messages. */
function verb(args) {
    return args.find((arg, i) => !arg.startsWith('-') && args[i - 1] !== '-c') ?? 'command';
}
function runner(cwd, git, timeout) {
    return function run(args, maxBuffer) {
        // The checkout's own settings stay, but nothing may prompt or run a file-system monitor.
        const full = ['-c', 'core.fsmonitor=false', '-c', 'core.quotePath=false', ...args];
        return new Promise((resolve, reject) => {
            (0,external_node_child_process_namespaceObject.execFile)(git, full, {
                cwd,
                encoding: 'buffer',
                maxBuffer,
                timeout,
                windowsHide: true,
                env: { ...process.env, GIT_TERMINAL_PROMPT: '0', GIT_OPTIONAL_LOCKS: '0', LC_ALL: 'C' },
            }, (error, stdout, stderr) => {
                const errText = stderr.toString('utf8').slice(0, 2000).trim();
                if (!error) {
                    resolve({ code: 0, stdout, stderr: errText });
                    return;
                }
                const failure = error;
                if (failure.code === 'ERR_CHILD_PROCESS_STDIO_MAXBUFFER') {
                    reject(new GitError(`git ${verb(args)} wrote more than ${maxBuffer} bytes; expected less (output refused)`, args, null, errText));
                }
                else if (failure.killed || failure.signal) {
                    reject(new GitError(`git ${verb(args)} did not finish within ${timeout} ms (stopped with ${failure.signal ?? 'a signal'})`, args, null, errText));
                }
                else if (typeof failure.code === 'number') {
                    resolve({ code: failure.code, stdout, stderr: errText });
                }
                else {
                    reject(new GitError(`git could not be started (${failure.code ?? failure.message}); expected a git executable at ${JSON.stringify(git)}`, args, null, errText));
                }
            });
        });
    };
}
function failed(args, result) {
    const reason = result.stderr.split('\n')[0] || 'no message';
    return new GitError(`git ${args.join(' ')} failed with exit status ${result.code}: ${reason}`, args, result.code, result.stderr);
}
function createGitReader(cwd, options = {}) {
    const git = options.git ?? 'git';
    const timeout = options.timeoutMs ?? 30_000;
    const maxList = options.maxListBytes ?? 64 * 1024 * 1024;
    const maxFile = options.maxFileBytes ?? MAX_CONFIG_BYTES;
    const run = runner(cwd, git, timeout);
    async function resolveCommit(rev) {
        const args = ['rev-parse', '--verify', '--quiet', `${checkRevision(rev)}^{commit}`];
        const result = await run(args, 4096);
        if (result.code === 0)
            return result.stdout.toString('utf8').trim();
        // --quiet turns "no such commit" into exit status 1 and nothing else.
        if (result.code === 1)
            return null;
        throw failed(args, result);
    }
    async function entry(commit, path) {
        checkPath(path);
        const slash = path.lastIndexOf('/');
        const dir = slash < 0 ? '' : path.slice(0, slash);
        const name = path.slice(slash + 1);
        // List the parent tree and compare names exactly: ls-tree's own path arguments are patterns.
        const tree = dir === '' ? `${checkRevision(commit)}^{tree}` : `${checkRevision(commit)}:${dir}`;
        const args = ['ls-tree', '-z', tree];
        const result = await run(args, maxList);
        if (result.code !== 0) {
            // The parent is missing or is not a directory (a file, or a symlink git does not follow).
            if (/not a tree object|Not a valid object name|does not exist|bad revision/i.test(result.stderr))
                return null;
            throw failed(args, result);
        }
        for (const record of result.stdout.toString('utf8').split('\u0000')) {
            const tab = record.indexOf('\t');
            if (tab < 0 || record.slice(tab + 1) !== name)
                continue;
            const [mode, type, oid] = record.slice(0, tab).split(' ');
            const kind = mode === '120000' ? 'symlink' : git_KINDS[type] ?? 'file';
            return { kind, mode, oid };
        }
        return null;
    }
    return {
        async hasCommit(rev) {
            return (await resolveCommit(rev)) !== null;
        },
        resolveCommit,
        async changedFiles(base, head) {
            const args = ['diff', '--name-status', '-M', '-z', '--no-ext-diff', '--no-textconv', '--no-color', checkRevision(base), checkRevision(head), '--'];
            const result = await run(args, maxList);
            if (result.code !== 0)
                throw failed(args, result);
            return parseNameStatus(result.stdout.toString('utf8'));
        },
        entry,
        async show(commit, path) {
            const found = await entry(commit, path);
            if (found === null || found.kind !== 'file')
                return null;
            const sizeArgs = ['cat-file', '-s', found.oid];
            const sized = await run(sizeArgs, 4096);
            if (sized.code !== 0)
                throw failed(sizeArgs, sized);
            const size = Number(sized.stdout.toString('utf8').trim());
            if (!Number.isSafeInteger(size) || size > maxFile)
                throw new ContentTooLargeError(path, size, maxFile);
            const blobArgs = ['cat-file', 'blob', found.oid];
            const blob = await run(blobArgs, maxFile + 1);
            if (blob.code !== 0)
                throw failed(blobArgs, blob);
            return new Uint8Array(blob.stdout.buffer, blob.stdout.byteOffset, blob.stdout.byteLength);
        },
        async mergeBase(a, b) {
            const args = ['merge-base', checkRevision(a), checkRevision(b)];
            const result = await run(args, 4096);
            if (result.code === 0)
                return result.stdout.toString('utf8').trim();
            if (result.code === 1)
                return null;
            throw failed(args, result);
        },
    };
}
/** Identity of scratch commits: invented, so no one's global git settings are needed or used. */
const SCRATCH_IDENTITY = ['-c', 'user.name=context-reach demo', '-c', 'user.email=demo@example.invalid', '-c', 'commit.gpgsign=false'];
function createScratchRepository(cwd, options = {}) {
    const run = runner(cwd, options.git ?? 'git', options.timeoutMs ?? 30_000);
    const must = async (args) => {
        const result = await run(args, 1024 * 1024);
        if (result.code !== 0)
            throw failed(args, result);
        return result.stdout.toString('utf8').trim();
    };
    return {
        async init() {
            await must(['init', '-q']);
            // `init -b` needs git 2.28; pointing HEAD works on any git.
            await must(['symbolic-ref', 'HEAD', 'refs/heads/main']);
        },
        async commitAll(message) {
            await must(['add', '-A']);
            await must([...SCRATCH_IDENTITY, 'commit', '-q', '--allow-empty', '--no-verify', '-m', message]);
            return must(['rev-parse', 'HEAD']);
        },
    };
}
/**
 * Parses `git diff --name-status -z` output: `STATUS NUL path NUL`, or for renames and copies
 * `R<score> NUL old NUL new NUL`. Copies count as added files; type changes as modified.
 */
function parseNameStatus(output) {
    const fields = output.split('\u0000');
    if (fields[fields.length - 1] === '')
        fields.pop();
    const files = [];
    for (let i = 0; i < fields.length;) {
        const status = fields[i];
        const letter = status.charAt(0);
        if (letter === 'R' || letter === 'C') {
            const previous = fields[i + 1];
            const path = fields[i + 2];
            if (previous === undefined || path === undefined)
                throw new GitError(`git diff output ends inside a ${JSON.stringify(status)} record; expected two paths`, [], null, '');
            files.push(letter === 'R' ? { status: 'renamed', path, previousPath: previous } : { status: 'added', path, previousPath: null });
            i += 3;
            continue;
        }
        const path = fields[i + 1];
        if (path === undefined)
            throw new GitError(`git diff output ends after status ${JSON.stringify(status)}; expected a path`, [], null, '');
        if (letter === 'A')
            files.push({ status: 'added', path, previousPath: null });
        else if (letter === 'M' || letter === 'T')
            files.push({ status: 'modified', path, previousPath: null });
        else if (letter === 'D')
            files.push({ status: 'deleted', path, previousPath: null });
        else
            throw new GitError(`git diff reported status ${JSON.stringify(status)} for ${JSON.stringify(path)}; expected A, M, T, D, R or C`, [], null, '');
        i += 2;
    }
    return files;
}

;// CONCATENATED MODULE: ./src/cli/options.ts

/** A command-line mistake: reported in one line with exit status 2, never a stack trace. */
class UsageError extends Error {
}
/** A positive whole number of tokens or sequences, up to 2^53. */
function positiveInteger(flag, text) {
    const value = Number(text);
    if (!/^\d+$/.test(text.trim()) || !Number.isSafeInteger(value) || value <= 0) {
        throw new UsageError(`--${flag} takes a positive whole number, got '${text}'`);
    }
    return value;
}
function positiveNumber(flag, text) {
    const value = Number(text);
    if (text.trim() === '' || !Number.isFinite(value) || value <= 0) {
        throw new UsageError(`--${flag} takes a positive number, got '${text}'`);
    }
    return value;
}
function storageDType(flag, text) {
    if (STORAGE_DTYPES.includes(text))
        return text;
    throw new UsageError(`--${flag} takes one of ${STORAGE_DTYPES.join(', ')}, got '${text}'`);
}
function floatFormat(flag, text) {
    if (FLOAT_FORMATS.includes(text))
        return text;
    throw new UsageError(`--${flag} takes one of ${FLOAT_FORMATS.join(', ')}, got '${text}'`);
}
/** Serving flags shared by `inspect` and `diff`, for node:util parseArgs. */
const SERVING_FLAGS = {
    'served-span': { type: 'string' },
    'trained-span': { type: 'string' },
    sequences: { type: 'string' },
    'device-gib': { type: 'string' },
    'weight-dtype': { type: 'string' },
    'cache-dtype': { type: 'string' },
    'position-dtype': { type: 'string' },
};
/** The serving patch the flags describe (only the flags given). */
function servingPatch(values) {
    const patch = {};
    const text = (name) => (typeof values[name] === 'string' ? values[name] : undefined);
    let v;
    if ((v = text('served-span')) !== undefined)
        patch.span = positiveInteger('served-span', v);
    if ((v = text('trained-span')) !== undefined)
        patch.trainedSpan = positiveInteger('trained-span', v);
    if ((v = text('sequences')) !== undefined)
        patch.sequences = positiveInteger('sequences', v);
    if ((v = text('device-gib')) !== undefined)
        patch.deviceGiB = positiveNumber('device-gib', v);
    if ((v = text('weight-dtype')) !== undefined)
        patch.weights = storageDType('weight-dtype', v);
    if ((v = text('cache-dtype')) !== undefined)
        patch.cache = storageDType('cache-dtype', v);
    if ((v = text('position-dtype')) !== undefined)
        patch.positions = floatFormat('position-dtype', v);
    return patch;
}

;// CONCATENATED MODULE: ./src/cli/terminal.ts

const ANSI = { bold: [1, 22], dim: [2, 22], red: [31, 39], yellow: [33, 39], cyan: [36, 39] };
function wrap(code, text) {
    const [open, close] = ANSI[code];
    return `\u001b[${open}m${text}\u001b[${close}m`;
}
const COLOUR = {
    bold: (text) => wrap('bold', text),
    dim: (text) => wrap('dim', text),
    severity: (severity, text) => wrap(severity === 'block' ? 'red' : severity === 'warn' ? 'yellow' : 'cyan', text),
};
/** Colour only on a terminal, and never when NO_COLOR is set (no-color.org convention). */
function terminalStyle(stream, env) {
    if (!stream.isTTY || env.NO_COLOR !== undefined || env.TERM === 'dumb')
        return PLAIN;
    return COLOUR;
}

;// CONCATENATED MODULE: ./src/cli/diff.ts








const DIFF_USAGE = `usage: context-reach diff [--base REF] [--head REF] [--policy FILE]
       [--format text|markdown|json] [--fail-on block|warn|never] [--label NAME]...
       [--served-span N] [--sequences N] [--device-gib G] [--cache-dtype D] ...`;
const FORMATS = ['text', 'markdown', 'json'];
const FAIL_ON = ['block', 'warn', 'never'];
/** Exit status for a verdict under `--fail-on`: 1 fails the check, 0 passes it. */
function exitStatus(report, failOn) {
    if (failOn === 'never')
        return 0;
    if (report.verdict === 'block')
        return 1;
    return failOn === 'warn' && report.verdict === 'warn' ? 1 : 0;
}
function renderReport(report, format, io) {
    if (format === 'json')
        return renderGateJson(report);
    if (format === 'markdown')
        return renderComment(report);
    return renderDiffText(report, terminalStyle(io.stdout, io.env));
}
async function commitOf(git, rev, flag) {
    const sha = await git.resolveCommit(rev);
    if (sha === null)
        throw new UsageError(`${flag} ${rev} names no commit in this repository`);
    return sha;
}
/**
 * Without `--base`: where the branch left the main line (the first of origin/HEAD, origin/main,
 * origin/master, main, master that exists), or the parent commit when already on it.
 */
async function defaultBase(git, head) {
    for (const candidate of ['origin/HEAD', 'origin/main', 'origin/master', 'main', 'master']) {
        const tip = await git.resolveCommit(candidate);
        if (tip === null)
            continue;
        const fork = await git.mergeBase(head, tip);
        if (fork !== null && fork !== head)
            return fork;
    }
    const parent = await git.resolveCommit(`${head}~1`);
    if (parent === null)
        throw new UsageError('no base to compare with: give --base REF');
    return parent;
}
/** `diff`: the gate's decision between two commits of the git checkout in the working folder. */
async function runDiff(args, io) {
    const { values } = (0,external_node_util_namespaceObject.parseArgs)({
        args, allowPositionals: false, strict: true,
        options: {
            base: { type: 'string' }, head: { type: 'string' }, policy: { type: 'string' },
            format: { type: 'string' }, 'fail-on': { type: 'string' }, label: { type: 'string', multiple: true },
            ...SERVING_FLAGS,
        },
    });
    const format = (values.format ?? 'text');
    if (!FORMATS.includes(format))
        throw new UsageError(`--format takes one of ${FORMATS.join(', ')}, got '${values.format}'`);
    const failOn = (values['fail-on'] ?? 'block');
    if (!FAIL_ON.includes(failOn))
        throw new UsageError(`--fail-on takes one of ${FAIL_ON.join(', ')}, got '${values['fail-on']}'`);
    const git = createGitReader(io.cwd);
    const head = await commitOf(git, values.head ?? 'HEAD', '--head');
    const base = values.base !== undefined ? await commitOf(git, values.base, '--base') : await defaultBase(git, head);
    // Changes since head left the base (as a pull request shows them); the policy from the base itself.
    const start = (await git.mergeBase(base, head)) ?? base;
    const changes = await git.changedFiles(start, head);
    const report = await runGate({ read: (ref, path) => git.show(ref, path) }, {
        base: start, policyRef: base, head, changes,
        policyPath: values.policy ?? '.github/context-reach.yml',
        labels: values.label ?? [],
        overrides: servingPatch(values),
    });
    io.out(renderReport(report, format, io));
    return exitStatus(report, failOn);
}

;// CONCATENATED MODULE: external "node:os"
const external_node_os_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:os");
;// CONCATENATED MODULE: external "node:path"
const external_node_path_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:path");
;// CONCATENATED MODULE: external "node:url"
const external_node_url_namespaceObject = __WEBPACK_EXTERNAL_createRequire(import.meta.url)("node:url");
;// CONCATENATED MODULE: ./src/cli/demo.ts








/** The bundled demo: `fixtures/demo` above this file, found from the source tree or from `dist/`. */
async function findDemo() {
    let folder = (0,external_node_path_namespaceObject.dirname)((0,external_node_url_namespaceObject.fileURLToPath)(import.meta.url));
    for (let i = 0; i < 6; i += 1) {
        const candidate = (0,external_node_path_namespaceObject.join)(folder, 'fixtures', 'demo');
        if (await (0,promises_namespaceObject.stat)((0,external_node_path_namespaceObject.join)(candidate, 'base')).then(() => true, () => false))
            return candidate;
        folder = (0,external_node_path_namespaceObject.resolve)(folder, '..');
    }
    throw new Error('the bundled demo (fixtures/demo) was not found next to this program');
}
async function replaceTree(repo, from) {
    for (const entry of await (0,promises_namespaceObject.readdir)(repo))
        if (entry !== '.git')
            await (0,promises_namespaceObject.rm)((0,external_node_path_namespaceObject.join)(repo, entry), { recursive: true, force: true });
    await (0,promises_namespaceObject.cp)(from, repo, { recursive: true });
}
/**
 * `demo`: builds a scratch git repository from the demo's base and head trees (an invented pull
 * request), runs the gate on it and prints the comment as it would appear. Always exits 0: a showcase.
 */
async function runDemo(args, io) {
    const { values } = (0,external_node_util_namespaceObject.parseArgs)({ args, strict: true, options: { format: { type: 'string' }, keep: { type: 'boolean' } } });
    const format = (values.format ?? 'markdown');
    const demo = await findDemo();
    const repo = await (0,promises_namespaceObject.mkdtemp)((0,external_node_path_namespaceObject.join)((0,external_node_os_namespaceObject.tmpdir)(), 'context-reach-demo-'));
    try {
        const scratch = createScratchRepository(repo);
        await scratch.init();
        await replaceTree(repo, (0,external_node_path_namespaceObject.join)(demo, 'base'));
        const base = await scratch.commitAll('Quillmoor main before the pull request');
        await replaceTree(repo, (0,external_node_path_namespaceObject.join)(demo, 'head'));
        const head = await scratch.commitAll('Serve Quill Mini at 256k and give Quill 8B a longer context');
        const git = createGitReader(repo);
        const report = await runGate({ read: (ref, path) => git.show(ref, path) }, {
            base, head, changes: await git.changedFiles(base, head), policyPath: '.github/context-reach.yml',
        });
        io.out(renderReport(report, ['markdown', 'text', 'json'].includes(format) ? format : 'markdown', io));
        if (format !== 'json') {
            io.out(`\nverdict: ${report.verdict} (${report.blocking} blocking, ${report.warnings} warnings). In a workflow the check would ${report.verdict === 'block' ? 'fail' : 'pass'}; the demo exits 0.\n`);
            if (values.keep)
                io.out(`scratch repository kept at ${repo}\n`);
        }
        return 0;
    }
    finally {
        if (!values.keep)
            await (0,promises_namespaceObject.rm)(repo, { recursive: true, force: true });
    }
}

;// CONCATENATED MODULE: ./src/core/render/inspect-json.ts

/** Version of the JSON documents context-reach writes; bumped on any incompatible change. */
const REPORT_VERSION = 1;
/**
 * The one JSON document of `inspect --json`. Unreadable files carry `error` and no metrics;
 * blocking findings carry `remedy`, `remedyWhyNot` and `remedyAlternatives` when the caller
 * attached them (`remedyFileReport`), and a file `remedyTogether` when two or more apply.
 */
function renderInspectJson(reports, failures) {
    const files = [
        ...reports.map((r) => {
            const together = r.remedyTogether;
            return { path: r.path, dialect: r.dialect, spec: r.spec, metrics: r.metrics, findings: r.findings, ...(together ? { remedyTogether: together } : {}) };
        }),
        ...failures.map((f) => ({
            path: f.path, dialect: null, spec: null, metrics: null,
            findings: [{ rule: 'config-unreadable', severity: 'block', message: f.message, key: null, line: f.line }],
            error: { message: f.message, line: f.line },
        })),
    ];
    return `${JSON.stringify({ version: REPORT_VERSION, notice: ESTIMATE_NOTICE, files }, null, 2)}\n`;
}

;// CONCATENATED MODULE: ./src/cli/inspect.ts








const INSPECT_USAGE = `usage: context-reach inspect FILE... [--json] [--at POINTER]
       [--served-span N] [--trained-span N] [--sequences N] [--device-gib G]
       [--weight-dtype D] [--cache-dtype D] [--position-dtype D]`;
/** `inspect`: measure each file; exit status 2 when any file could not be read. */
async function runInspect(args, files, io) {
    const { values, positionals } = (0,external_node_util_namespaceObject.parseArgs)({
        args, allowPositionals: true, strict: true,
        options: { json: { type: 'boolean' }, at: { type: 'string' }, ...SERVING_FLAGS },
    });
    if (positionals.length === 0) {
        io.error(`inspect needs at least one FILE\n${INSPECT_USAGE}`);
        return 2;
    }
    const overrides = servingPatch(values);
    const reports = [];
    const failures = [];
    for (const path of positionals) {
        try {
            const text = decodeText(await files.read(path), path);
            // Blocking findings get their remedies, judged with the built-in rules.
            reports.push(remedyFileReport(inspectModel(text, path, { at: values.at, overrides })));
        }
        catch (error) {
            failures.push(toFailure(path, error));
        }
    }
    if (values.json)
        io.out(renderInspectJson(reports, failures));
    else
        io.out(renderInspectText(reports, failures, terminalStyle(io.stdout, io.env)));
    for (const failure of failures)
        if (values.json)
            io.error(`${failure.path}: ${failure.message}`);
    return failures.length > 0 ? 2 : 0;
}

;// CONCATENATED MODULE: ./src/core/version.ts
/** The tool's version, reported in JSON and SARIF (kept equal to package.json by a test). */
const VERSION = '0.1.0';

;// CONCATENATED MODULE: ./src/cli/run.ts





const DEMO_USAGE = 'usage: context-reach demo [--format markdown|text|json] [--keep]';
const USAGE = `context-reach: positional-range and context-budget review of transformer model configs

${INSPECT_USAGE}

${DIFF_USAGE}

${DEMO_USAGE}

'context-reach COMMAND --help' shows one command's usage.`;
const COMMANDS = {
    inspect: { usage: INSPECT_USAGE, run: (args, deps) => runInspect(args, deps.files, deps.io) },
    diff: { usage: DIFF_USAGE, run: (args, deps) => runDiff(args, deps.io) },
    demo: { usage: DEMO_USAGE, run: (args, deps) => runDemo(args, deps.io) },
};
/** Dispatch a command; returns the exit status. Usage mistakes exit 2 with one line, no stack trace. */
async function run(argv, deps) {
    const [command, ...rest] = argv;
    if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
        deps.io.out(`${USAGE}\n`);
        return command === undefined ? 2 : 0;
    }
    if (command === '--version') {
        deps.io.out(`context-reach ${VERSION}\n`);
        return 0;
    }
    const entry = COMMANDS[command];
    try {
        if (!entry)
            throw new UsageError(`unknown command '${command}'`);
        if (rest.includes('--help') || rest.includes('-h')) {
            deps.io.out(`${entry.usage}\n`);
            return 0;
        }
        return await entry.run(rest, deps);
    }
    catch (error) {
        if (error instanceof UsageError || String(error?.code ?? '').startsWith('ERR_PARSE_ARGS')) {
            deps.io.error(`context-reach: ${error.message}\n${entry?.usage ?? USAGE}`);
            return 2;
        }
        throw error;
    }
}

;// CONCATENATED MODULE: ./src/cli/main.ts



const io = createConsole();
run(process.argv.slice(2), { files: createFileSource(), io }).then((code) => { process.exitCode = code; }, (error) => {
    io.error(`context-reach: ${error instanceof Error ? error.message : String(error)}`);
    process.exitCode = 2;
});

