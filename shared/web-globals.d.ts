// shared/ is compiled without the DOM and Node libraries, so it sees only what ES2023 defines.
// The WHATWG URL parser is the one web global it uses: browsers and Node both provide it, and
// isWebLink must judge a link exactly as the browser that opens it will. Only what shared reads
// is declared here.
declare class URL {
  constructor(url: string, base?: string);
  readonly protocol: string;
}
