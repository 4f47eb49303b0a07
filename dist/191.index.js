export const id = 191;
export const ids = [191];
export const modules = {

/***/ 9191:
/***/ ((__unused_webpack_module, __webpack_exports__, __webpack_require__) => {

__webpack_require__.r(__webpack_exports__);
/* harmony export */ __webpack_require__.d(__webpack_exports__, {
/* harmony export */   actionsDefaults: () => (/* reexport safe */ _actions_github_lib_utils__WEBPACK_IMPORTED_MODULE_1__.NT),
/* harmony export */   getOctokit: () => (/* reexport safe */ _actions_github__WEBPACK_IMPORTED_MODULE_0__.Q),
/* harmony export */   retry: () => (/* reexport safe */ _octokit_plugin_retry__WEBPACK_IMPORTED_MODULE_2__.L),
/* harmony export */   throttling: () => (/* reexport safe */ _octokit_plugin_throttling__WEBPACK_IMPORTED_MODULE_3__.A)
/* harmony export */ });
/* harmony import */ var _actions_github__WEBPACK_IMPORTED_MODULE_0__ = __webpack_require__(1351);
/* harmony import */ var _actions_github_lib_utils__WEBPACK_IMPORTED_MODULE_1__ = __webpack_require__(5555);
/* harmony import */ var _octokit_plugin_retry__WEBPACK_IMPORTED_MODULE_2__ = __webpack_require__(9735);
/* harmony import */ var _octokit_plugin_throttling__WEBPACK_IMPORTED_MODULE_3__ = __webpack_require__(6856);
/**
 * The Octokit stack (client, the runner's request defaults, the retry and throttling plugins),
 * loaded by `github.ts` with `import()` on the first API call only: it is most of the action's
 * bundle, and runs that never call the API should not compile it at start-up.
 */






/***/ })

};
