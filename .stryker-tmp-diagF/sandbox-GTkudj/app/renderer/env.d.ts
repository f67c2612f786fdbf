// @ts-nocheck
/// <reference types="svelte" />
/// <reference types="vite/client" />
