// Used by svelte-check and editors; the Vite build passes the same options inline.
export default { compilerOptions: { runes: true } };
