/** The sign-in address field's settings, shared by every form that asks for it. */
export const signInEmailProps = {
  label: 'E-mail',
  type: 'email',
  autoComplete: 'username',
  inputMode: 'email',
  autoCapitalize: 'none',
  spellCheck: false,
} as const;
