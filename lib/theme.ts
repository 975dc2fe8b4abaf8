/** localStorage key holding the chosen theme ("light" | "dark"); absent means "follow the system". */
export const themeStorageKey = "mooring-theme";

export type Theme = "light" | "dark";

/**
 * Runs inline in <head> before first paint so the page never flashes the wrong theme:
 * it applies the stored choice, or the system preference when nothing is stored.
 */
export const themeInitScript = `(function(){try{var t=localStorage.getItem(${JSON.stringify(themeStorageKey)});if(t!=="light"&&t!=="dark"){t=window.matchMedia("(prefers-color-scheme: dark)").matches?"dark":"light"}var d=document.documentElement;d.classList.toggle("dark",t==="dark");d.style.colorScheme=t}catch(e){}})()`;
