type ClassPart = string | false | null | undefined | 0;

/**
 * Joins class names, skipping falsy parts, so conditional classes read inline:
 * `cn("px-3", isActive && "bg-moss-50")`. No conflict merging: components put caller
 * classes last and avoid setting the same property twice.
 */
export function cn(...parts: ClassPart[]): string {
  return parts.filter(Boolean).join(" ");
}
