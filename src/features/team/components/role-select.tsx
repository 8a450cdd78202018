import { forwardRef, type SelectHTMLAttributes } from 'react';
import type { Role } from '../../../../shared/schemas/team';

export const roleLabels: Record<Role, string> = {
  owner: 'Owner — everything, including members',
  editor: 'Editor — creates and changes presets and profiles',
  viewer: 'Viewer — sees everything, downloads kits',
};

/**
 * A select of the three roles; label it from outside (the table and the form word it differently). Never
 * wider than its box: on a phone the long role words are cut in the closed select and shown whole in its list.
 */
export const RoleSelect = forwardRef<HTMLSelectElement, SelectHTMLAttributes<HTMLSelectElement>>(
  function RoleSelect(props, ref) {
    return (
      <select ref={ref} {...props} className="max-w-full rounded-md border border-ink-faint bg-white px-2 py-2">
        {(Object.keys(roleLabels) as Role[]).map((role) => (
          <option key={role} value={role}>
            {roleLabels[role]}
          </option>
        ))}
      </select>
    );
  },
);
