import {
  PASSWORD_MAX_BYTES,
  PASSWORD_MIN_LENGTH,
  ROLES,
  type CreateUserRequest,
  type Role,
  type UpdateUserRequest,
  type UserDto,
} from '@tiermode/shared-types';
import * as yup from 'yup';

export interface UserFormValues {
  email: string;
  name: string;
  role: Role;
  password: string;
  active: boolean;
  licenseNumber: string;
  licenseJurisdiction: string;
  licenseExpiresOn: string;
}

export function initialValues(user?: UserDto): UserFormValues {
  return {
    email: user?.email ?? '',
    name: user?.name ?? '',
    role: user?.role ?? 'designer',
    password: '',
    active: user?.active ?? true,
    licenseNumber: user?.licenseNumber ?? '',
    licenseJurisdiction: user?.licenseJurisdiction ?? '',
    licenseExpiresOn: user?.licenseExpiresOn ?? '',
  };
}

// A blank password on an edit means "keep the current one"; the length rules apply otherwise.
const passwordRule = yup
  .string()
  .test(
    'length',
    `Use at least ${PASSWORD_MIN_LENGTH} characters`,
    (value) => !value || [...value].length >= PASSWORD_MIN_LENGTH,
  )
  .test(
    'bytes',
    `Use at most ${PASSWORD_MAX_BYTES} bytes (fewer characters if they are accented)`,
    (value) => !value || new TextEncoder().encode(value).length <= PASSWORD_MAX_BYTES,
  );

/** The same rules the server applies; the server also refuses common passwords. */
export function userFormSchema(isNew: boolean) {
  return yup.object({
    email: yup
      .string()
      .trim()
      .email('Enter a valid email address')
      .required('Enter an email address'),
    name: yup.string().trim().max(200, 'Use at most 200 characters').required('Enter a name'),
    role: yup
      .mixed<Role>()
      .oneOf([...ROLES], 'Choose a role')
      .required('Choose a role'),
    password: isNew ? passwordRule.required('Enter a first password') : passwordRule,
    active: yup.boolean().required(),
    licenseNumber: yup.string().max(100, 'Use at most 100 characters'),
    licenseJurisdiction: yup.string().max(100, 'Use at most 100 characters'),
    licenseExpiresOn: yup.string().matches(/^\d{4}-\d{2}-\d{2}$/, {
      message: 'Write the date as YYYY-MM-DD',
      excludeEmptyString: true,
    }),
  });
}

const licenceOf = (values: UserFormValues) =>
  values.role === 'reviewer'
    ? {
        licenseNumber: values.licenseNumber.trim() || null,
        licenseJurisdiction: values.licenseJurisdiction.trim() || null,
        licenseExpiresOn: values.licenseExpiresOn || null,
      }
    : { licenseNumber: null, licenseJurisdiction: null, licenseExpiresOn: null };

export function toCreateRequest(values: UserFormValues): CreateUserRequest {
  const licence = licenceOf(values);
  return {
    email: values.email.trim(),
    name: values.name.trim(),
    role: values.role,
    password: values.password,
    ...(licence.licenseNumber ? { licenseNumber: licence.licenseNumber } : {}),
    ...(licence.licenseJurisdiction ? { licenseJurisdiction: licence.licenseJurisdiction } : {}),
    ...(licence.licenseExpiresOn ? { licenseExpiresOn: licence.licenseExpiresOn } : {}),
  };
}

/** Only what changed, with the version the form was read at, so a stale edit is refused. */
export function toUpdateRequest(user: UserDto, values: UserFormValues): UpdateUserRequest {
  const next = {
    email: values.email.trim(),
    name: values.name.trim(),
    role: values.role,
    active: values.active,
    ...licenceOf(values),
  };
  const body: UpdateUserRequest = { version: user.version };
  (Object.keys(next) as (keyof typeof next)[]).forEach((key) => {
    if (next[key] !== user[key]) Object.assign(body, { [key]: next[key] });
  });
  if (values.password) body.password = values.password;
  return body;
}
